/** The public engine: spec in, Layout and Drawing out. The spec file format is documented in README.md. */
export { PRESET_NAMES, type PresetName, type StrapSpec } from '../schemas/strap-spec.ts';
export { presetSpec, presetVariant, PRESET_VARIANTS } from './presets/index.ts';
export { parseSpec } from './parse-spec.ts';
export { computeLayout } from './compute-layout.ts';
export { drawLayout, type DrawOptions } from './draw-layout.ts';
export { specAtGirth, findSize, type FitAt } from './spec-at-girth.ts';
export { gradeSizes, type SizeRunReport, type SizeRow, type SizeJoin } from './grade-sizes.ts';
export { EngineError } from './engine-error.ts';
export { ENGINE_VERSION } from './engine-version.ts';
export { specFromOptions, type SpecOptions } from './spec-from-options.ts';
export { bendAllowanceMm, innerCircumferenceMm } from './bend.ts';
export { nearestPunch, punchDiameterMm } from './punch.ts';
export type * from './layout-types.ts';
