/**
 * The cautions the product shows: cutting and punching, dyes and solvents, pet collars,
 * sizes as starting points, straps that hold weight. One list for every surface: the editor
 * and the share page show the full forms, the job sheet prints them, and the short forms fit
 * the one line on every template page.
 */

interface Caution {
  short: string;
  full: string;
}

const CUT: Caution = {
  short: 'cut away from you on a mat, sharp blade',
  full: 'Cut away from the body on a cutting mat; a sharp blade is safer than a dull one.',
};
const PUNCH: Caution = {
  short: 'punch on a punching surface, poly or rawhide mallet',
  full: 'Strike punches on a punching surface with a poly or rawhide mallet.',
};
const DYE: Caution = {
  short: 'dyes and cements: ventilate, gloves, no flames, read the SDS',
  full: "Dyes, solvents and cements: ventilate, wear gloves, keep vapours away from flames, and follow the product's safety data sheet.",
};
const PET: Caution = {
  short: 'collars: two-finger fit, recheck growing pets, breakaway for cats, off in crates',
  full: 'Pet collars: check the fit with two fingers and recheck growing animals; breakaway collars for cats; slip collars only under supervision; take collars off in crates.',
};
const LOAD: Caution = {
  short: 'straps that hold weight or restrain: your judgement and local codes first',
  full: "For anything that holds weight or restrains (leashes, harness, tool or instrument straps), the maker's judgement and local codes and licensed practice come first.",
};
const SIZES: Caution = {
  short: 'sizes are starting points: check on scrap and by fitting',
  full: 'Sizes are starting points: check on scrap and by fitting.',
};

/** Piece kinds that change which cautions apply. */
export type CautionKind = 'collar' | 'load' | 'other';

function list(kind: CautionKind): Caution[] {
  // Collars get the pet cautions; leashes and other straps that hold weight get the load one.
  return [CUT, PUNCH, DYE, ...(kind === 'collar' ? [PET] : []), ...(kind === 'load' ? [LOAD] : []), SIZES];
}

/** The full cautions for the job sheet. */
export function cautionsFor(kind: CautionKind): string[] {
  return list(kind).map((c) => c.full);
}

/** The cautions as the one line printed on every page. */
export function cautionLine(kind: CautionKind): string {
  const s = list(kind).map((c) => c.short).join(' · ');
  return `Caution: ${s}.`;
}

/** The caution group of a pattern kind or name ("collar", "leash", "bag-strap", "guitar strap", ...). */
export function cautionKind(text: string): CautionKind {
  const t = text.toLowerCase();
  if (/collar/.test(t)) return 'collar';
  if (/leash|lead|harness|instrument|guitar|bag|tool|sling|camera/.test(t)) return 'load';
  return 'other';
}
