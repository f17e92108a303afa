import { computeLayout, drawLayout, type PatternLayout, type StrapSpec } from '@shared/pattern/index.ts';
import type { Drawing } from '@shared/render/drawing.ts';
import type { PrintOptions } from './print-options.ts';
import { specsForSize, type SizeDef } from './size-run.ts';

/** What a saved revision adds to a spec when it is printed. */
export interface RevisionMeta {
  patternName: string;
  revision: number | string;
  /** The revision's date: printed in the title block and fixed in the PDF metadata. */
  date: Date | string;
  /** The pattern's graded sizes, when it has a run (`size=M` or `size=all` pick from them). */
  sizes?: readonly SizeDef[];
  /** Added to the title block's revision row, e.g. "at 14 in girth" or "from rev 3". */
  revisionNote?: string;
  /** Printed first on every page's footer line, e.g. that the values are not saved. */
  footerNote?: string;
  /** An order's section at the top of the job sheet (plain data: it crosses to the print worker). */
  jobSheetOrder?: { heading: string; lines: string[] };
}

/** The date as a Date and as the title block's "YYYY-MM-DD". */
export function revisionDate(date: Date | string): { date: Date; text: string } {
  const d = date instanceof Date ? date : new Date(date);
  if (Number.isNaN(d.getTime())) throw new Error(`date: "${String(date)}" is not a date`);
  return { date: d, text: d.toISOString().slice(0, 10) };
}

/** A revision's layouts and one Drawing holding every size asked for. */
export interface RevisionDrawing {
  drawing: Drawing;
  layouts: { size?: string; layout: PatternLayout; spec: StrapSpec }[];
}

/**
 * Spec to Drawing for printing: picks the sizes, lays each out (computeLayout -> drawLayout),
 * and merges them into one Drawing whose pieces carry their size in id and name.
 */
export function revisionDrawing(spec: StrapSpec, options: Pick<PrintOptions, 'size'>, meta: RevisionMeta, onEach?: (done: number, total: number) => void): RevisionDrawing {
  const { text: dateText } = revisionDate(meta.date);
  const revisionText = typeof meta.revision === 'number' ? `rev ${meta.revision}` : meta.revision;
  const revision = meta.revisionNote ? `${revisionText} · ${meta.revisionNote}` : revisionText;
  const picked = specsForSize(spec, options.size, meta.sizes);
  const layouts: RevisionDrawing['layouts'] = [];
  const drawings: Drawing[] = [];
  picked.forEach((p, i) => {
    const layout = computeLayout(p.spec);
    layouts.push({ ...(p.size !== undefined ? { size: p.size } : {}), layout, spec: p.spec });
    drawings.push(drawLayout(layout, p.spec, { revision, date: dateText }));
    onEach?.(i + 1, picked.length);
  });
  const first = drawings[0];
  const last = drawings[drawings.length - 1];
  if (!first || !last) throw new Error('no sizes to print');
  const many = picked.length > 1;
  const pieces = drawings.flatMap((d, i) => {
    const size = picked[i]?.size;
    return d.pieces.map((pc) => (size === undefined ? pc : { ...pc, id: `${pc.id}-${size}`, name: `${pc.name}, size ${size}`, size: { name: size, girth: d.title.girth, width: d.title.width } }));
  });
  const sizeText = many ? `${picked.map((p) => p.size).join(', ')}` : (picked[0]?.size ?? first.title.size);
  return {
    drawing: {
      title: {
        ...first.title,
        pattern: meta.patternName || first.title.pattern,
        ...(sizeText ? { size: sizeText } : {}),
        girth: many ? `${first.title.girth} to ${last.title.girth}` : first.title.girth,
      },
      pieces,
    },
    layouts,
  };
}
