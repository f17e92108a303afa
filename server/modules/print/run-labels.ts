import type { Drawing, TitleBlock } from '@shared/render/drawing.ts';
import type { PagePlan, PlannedPage } from './page-plan.ts';

/** Longest a map row's name may be before it is cut with an ellipsis (characters). */
const MAX_LABEL = 14;

function cut(s: string): string {
  return s.length <= MAX_LABEL ? s : `${s.slice(0, MAX_LABEL - 1).trimEnd()}…`;
}

/** The words every name starts with ("Collar, size "), so only what differs is shown. */
function commonWordPrefix(names: string[]): string {
  const first = names[0] ?? '';
  let n = names.reduce((len, s) => {
    let i = 0;
    while (i < len && i < s.length && s[i] === first[i]) i++;
    return i;
  }, first.length);
  // Back up to a word boundary, so "size XS" and "size XL" do not lose the "X".
  while (n > 0 && !/[\s,]/.test(first[n - 1] ?? '')) n--;
  return first.slice(0, n);
}

/**
 * One short name per run of the plan, for the assembly map and the page's place: the names
 * of its pieces without what every run shares, e.g. "XS" and "S + M" for a collar size run,
 * "Belt" for a single belt.
 */
export function runLabels(plan: PagePlan, pieceNames: readonly string[]): string[] {
  const perRun = plan.runs.map((r) => r.pieceIndexes.map((i) => pieceNames[i] ?? `piece ${i + 1}`));
  const prefix = plan.runs.length > 1 ? commonWordPrefix(perRun.flat()) : '';
  return perRun.map((names) => cut(names.map((s) => s.slice(prefix.length).trim() || s).join(' + ')));
}

/**
 * The title block of one sheet of a size run: it names the sizes whose pieces are on that
 * sheet ("XS, S"), with their girths and widths, so a loose sheet says which sizes it holds.
 * Sheets of a single pattern keep the drawing's title.
 */
export function sheetTitle(drawing: Drawing, page: PlannedPage): TitleBlock {
  const seen = new Map<string, NonNullable<Drawing['pieces'][number]['size']>>();
  // In the drawing's order (the run's, smallest girth first), whatever the packing order.
  for (const i of [...new Set(page.placements.map((pl) => pl.pieceIndex))].sort((a, b) => a - b)) {
    const size = drawing.pieces[i]?.size;
    if (size && !seen.has(size.name)) seen.set(size.name, size);
  }
  const sizes = [...seen.values()];
  if (sizes.length === 0) return drawing.title;
  const range = (a: string, b: string) => (a === b ? a : `${a} to ${b}`);
  const widths = [...new Set(sizes.map((s) => s.width))];
  return {
    ...drawing.title,
    size: sizes.map((s) => s.name).join(', '),
    girth: range(sizes[0]!.girth, sizes[sizes.length - 1]!.girth),
    width: widths.length === 1 ? widths[0]! : widths.join(', '),
  };
}
