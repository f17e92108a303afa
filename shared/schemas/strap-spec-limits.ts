/**
 * Limits of a strap spec, in mm unless the name says otherwise. Exported so forms, routes
 * and error messages quote the same numbers.
 */
export const GIRTH_MIN_MM = 50; // a small cat's neck or a child's wrist is well above this
export const GIRTH_MAX_MM = 3000; // a long leash or a large girth strap
export const EASE_MIN_MM = -100;
export const EASE_MAX_MM = 300;
export const WIDTH_MIN_MM = 3;
export const WIDTH_MAX_MM = 150;
export const THICKNESS_MIN_MM = 0.3;
export const THICKNESS_MAX_MM = 12;
export const THICKNESS_MIN_OZ = 1;
export const THICKNESS_MAX_OZ = 30;
export const BLANK_MAX_MM = 4000;
export const HOLE_DIAMETER_MIN_MM = 0.8;
export const HOLE_DIAMETER_MAX_MM = 25;
export const HOLE_COUNT_MIN = 1;
export const HOLE_COUNT_MAX = 15;
export const HOLE_SPACING_MIN_MM = 2;
export const HOLE_SPACING_MAX_MM = 100;
export const PITCH_MIN_MM = 1.5;
export const PITCH_MAX_MM = 12;
export const PIECES_MAX = 6;
export const FEATURES_MAX = 24;
export const TAPER_STATIONS_MAX = 8;
export const STITCH_ROWS_MAX = 8;
export const NAME_MAX_CHARS = 120;

/** Named sizes a pattern may be graded into (a size run). */
export const SIZES_MAX = 12;
/** Longest size name ("XL", "Juniper", "38"). */
export const SIZE_NAME_MAX_CHARS = 24;
