import type { PieceSpec, StrapSpec } from '../schemas/strap-spec.ts';
import { formatLength } from '../units/format-length.ts';
import type { RuleVsFit } from './layout-types.ts';
import { fitReport, type LoopParts } from './strap-length.ts';

/**
 * Rule and fit side by side: both blank lengths, where the nominal hole sits and the inner
 * length it gives, and a sentence on what fit mode would change.
 */
export function ruleVsFit(spec: StrapSpec, strap: PieceSpec, ruleL: number, fitL: number, parts: LoopParts): RuleVsFit {
  const u = spec.units;
  const side = (L: number) => {
    const f = fitReport(spec, strap, L, parts);
    const n = f.holes[f.nominalIndex];
    return { blankLengthMm: L, ...(n ? { nominalAtMm: n.atMm, nominalInnerMm: n.innerMm } : {}), dev: f.deviationMm };
  };
  const r = side(ruleL);
  const f = side(fitL);
  const holeShiftMm = (f.nominalAtMm ?? fitL) - (r.nominalAtMm ?? ruleL);
  const target = spec.girthMm + spec.easeMm;
  const where = strap.end.kind === 'adjustable' ? 'at the middle hole the inside length' : spec.closes ? 'closed, the inside length' : 'the working length';
  const aim = spec.easeMm ? 'the girth plus ease' : 'the girth';
  const dev = (d: number) => (Math.abs(d) < 0.05 ? `exactly ${aim}` : `${formatLength(Math.abs(d), u)} ${d < 0 ? 'tighter' : 'looser'} than ${aim}, ${formatLength(target, u)}`);
  const summary =
    `By the shop rule: blank ${formatLength(ruleL, u)}; ${where} is ${formatLength(r.nominalInnerMm ?? 0, u)} (${dev(r.dev)}). ` +
    `Fitted to the measure: blank ${formatLength(fitL, u)} (${fitL >= ruleL ? '+' : '-'}${formatLength(Math.abs(fitL - ruleL), u)})` +
    (strap.end.kind === 'adjustable' ? `, holes move ${formatLength(Math.abs(holeShiftMm), u)} ${holeShiftMm >= 0 ? 'toward the tip' : 'toward the buckle'}.` : '.');
  const strip = ({ dev: _d, ...rest }: typeof r) => rest;
  return { rule: strip(r), fit: strip(f), blankDeltaMm: fitL - ruleL, holeShiftMm, summary };
}
