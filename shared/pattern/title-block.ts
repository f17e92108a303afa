import type { TitleBlock } from '../render/drawing.ts';
import type { StrapSpec } from '../schemas/strap-spec.ts';
import { formatLength, formatMm } from '../units/format-length.ts';
import type { PatternLayout } from './layout-types.ts';

/** A kind as words: "bag-strap" -> "Bag strap". */
const kindWords = (kind: string) => kind.charAt(0).toUpperCase() + kind.slice(1).replace(/-/g, ' ');

/** Warnings printed on the template; the rest are counted. */
const MAX_WARNING_NOTES = 4;

/** The title block strings, formatted in the pattern's display units. */
export function titleBlock(layout: PatternLayout, spec: StrapSpec, opts: { revision?: string; date?: string }): TitleBlock {
  const u = spec.units;
  const t = spec.thickness;
  const leather = t.unit === 'oz' ? `${t.value} oz (${formatMm(layout.thicknessMm)} mm)` : `${formatMm(t.value)} mm (${formatMm(t.value / (25.4 / 64))} oz)`;
  return {
    pattern: spec.name || spec.kind,
    ...(opts.revision ? { revision: opts.revision } : {}),
    size: `${kindWords(spec.kind)}, ${spec.mode === 'rule' ? 'length by the shop rule' : 'length fitted to the measure'}`,
    girth: `${formatLength(spec.girthMm, u)}${spec.easeMm ? ` + ${formatLength(spec.easeMm, u)} ease` : ''}${spec.closes ? '' : ' working length'}`,
    width: formatLength(spec.widthMm, u),
    leather,
    ...(opts.date ? { date: opts.date } : {}),
    units: u,
    notes: [
      layout.ruleVsFit.summary,
      ...layout.warnings.slice(0, MAX_WARNING_NOTES).map((w) => `Warning: ${w.message}`),
      ...(layout.warnings.length > MAX_WARNING_NOTES ? [`and ${layout.warnings.length - MAX_WARNING_NOTES} more warnings`] : []),
    ],
  };
}
