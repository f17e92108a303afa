import { PRESET_NAMES, type PresetName, type StrapSpec } from '../schemas/strap-spec.ts';
import { parseLengthMm, parseThickness } from '../units/length.ts';
import { EngineError } from './engine-error.ts';
import { parseSpec } from './parse-spec.ts';
import { presetSpec } from './presets/index.ts';

/** Command-line style overrides: strings as typed ("13in", "330mm", "10oz", "4mm"). */
export interface SpecOptions {
  preset?: string;
  /** An already-parsed spec file (JSON value). */
  spec?: unknown;
  girth?: string;
  width?: string;
  thickness?: string;
  mode?: string;
}

/**
 * Builds a validated spec from a preset or a spec file plus overrides. Lengths without a unit
 * take the spec's display unit. Throws {@link EngineError} naming the option or field.
 */
export function specFromOptions(o: SpecOptions): StrapSpec {
  let base: unknown;
  if (o.spec !== undefined) base = o.spec;
  else {
    const name = o.preset ?? 'collar';
    if (!(PRESET_NAMES as readonly string[]).includes(name)) throw new EngineError('preset', `unknown preset "${name}"`, `one of ${PRESET_NAMES.join(', ')}`);
    base = presetSpec(name as PresetName);
  }
  const spec = parseSpec(base);
  const next: StrapSpec = structuredClone(spec);
  const len = (field: 'girth' | 'width', text: string) => {
    const v = parseLengthMm(text, spec.units);
    if (v === undefined) throw new EngineError(field, `"${text}" is not a length`, 'a number with in or mm, e.g. 13in or 330mm');
    return v;
  };
  if (o.girth !== undefined) next.girthMm = len('girth', o.girth);
  if (o.width !== undefined) {
    const w = len('width', o.width);
    next.widthMm = w;
    // A plain strap's hardware follows its width unless a spec file says otherwise.
    if (o.spec === undefined) {
      next.hardware.buckle.insideWidthMm = w;
      next.hardware.dRings.insideWidthMm = w;
    }
  }
  if (o.thickness !== undefined) {
    const t = parseThickness(o.thickness);
    if (!t) throw new EngineError('thickness', `"${o.thickness}" is not a thickness`, 'a number with oz or mm, e.g. 10oz or 4mm');
    next.thickness = t;
  }
  if (o.mode !== undefined) {
    if (o.mode !== 'rule' && o.mode !== 'fit') throw new EngineError('mode', `unknown mode "${o.mode}"`, 'rule or fit');
    next.mode = o.mode;
  }
  return parseSpec(next);
}
