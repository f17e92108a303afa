import type { BoxMm } from '@shared/render/drawing.ts';
import type { PageFrame } from './page-frame.ts';
import type { Placement } from './page-plan.ts';

/** What the planner needs of a Drawing piece (mm, the piece's own frame). */
export interface PlanPiece {
  index: number;
  id: string;
  name: string;
  lengthMm: number;
  bounds: BoxMm;
}

/** Row furniture around each placed piece, mm: caption above, datum ruler below. */
export const ROW = { captionMm: 4.5, rulerMm: 7.5, gapMm: 3, colGapMm: 8 } as const;

/** Height a piece's row takes on the page: caption + drawing + ruler, mm. */
export function rowHeightMm(p: PlanPiece): number {
  return ROW.captionMm + (p.bounds.maxY - p.bounds.minY) + ROW.rulerMm;
}

/** A run of sheets for long pieces stacked in rows that share one tile grid. */
export interface PackedRun {
  pieceIndexes: number[];
  /** Run x of tile 0's left edge, mm from the datum (the smallest bounds.minX of its pieces). */
  originXMm: number;
  stepMm: number;
  sheets: number;
  /** Per sheet, its placements. */
  placements: Placement[][];
  /** Page y (mm) below the run's last row: the room under it is free for small pieces. */
  freeFromYMm: number;
}

function tilesFor(spanMm: number, areaWidthMm: number, stepMm: number): number {
  // Tile k covers [k*step, k*step + width]; the last one must reach the far end. The epsilon
  // keeps a piece that ends exactly on a tile edge from growing a sliver sheet.
  return Math.max(1, Math.ceil((spanMm - areaWidthMm) / stepMm - 1e-9) + 1);
}

/**
 * Groups long pieces into runs: most sheets first, stacked while their rows fit the area's
 * height, all datums aligned so one seam mark serves every row.
 */
export function packRuns(long: readonly PlanPiece[], frame: PageFrame, overlapMm: number): PackedRun[] {
  const aw = frame.area.maxX - frame.area.minX;
  const ah = frame.area.maxY - frame.area.minY;
  const step = aw - overlapMm;
  const sorted = [...long].sort(
    (a, b) => tilesFor(b.bounds.maxX - b.bounds.minX, aw, step) - tilesFor(a.bounds.maxX - a.bounds.minX, aw, step) || a.index - b.index,
  );
  const groups: PlanPiece[][] = [];
  let used = Infinity;
  for (const p of sorted) {
    const h = rowHeightMm(p);
    const last = groups[groups.length - 1];
    if (last && used + ROW.gapMm + h <= ah) {
      last.push(p);
      used += ROW.gapMm + h;
    } else {
      groups.push([p]);
      used = h;
    }
  }
  return groups.map((g) => {
    const originX = Math.min(...g.map((p) => p.bounds.minX));
    const span = Math.max(...g.map((p) => p.bounds.maxX)) - originX;
    const sheets = tilesFor(span, aw, step);
    const placements: Placement[][] = Array.from({ length: sheets }, () => []);
    let top = frame.area.minY;
    for (const p of g) {
      const h = rowHeightMm(p);
      const count = tilesFor(p.bounds.maxX - originX, aw, step);
      for (let k = 0; k < sheets; k++) {
        const tileFrom = originX + k * step;
        const from = Math.max(p.bounds.minX, tileFrom);
        const to = Math.min(p.bounds.maxX, tileFrom + aw);
        if (to <= from) continue;
        placements[k]?.push({
          pieceIndex: p.index,
          offsetXMm: frame.area.minX - tileFrom,
          offsetYMm: top + ROW.captionMm - p.bounds.minY,
          fromXMm: from,
          toXMm: to,
          clip: { minX: frame.area.minX, maxX: frame.area.maxX, minY: top, maxY: top + h },
          tile: { index: k, count },
        });
      }
      top += h + ROW.gapMm;
    }
    return { pieceIndexes: g.map((p) => p.index), originXMm: originX, stepMm: step, sheets, placements, freeFromYMm: top };
  });
}

/** Free room on an existing sheet (page index into the plan) that shelves may fill. */
export interface FreeRegion {
  pageIndex: number;
  box: BoxMm;
}

/**
 * Packs pieces that fit one sheet's width row by row (shelf packing): first into the free
 * regions given (the room under a run's rows), in order, then onto new sheets. Returns the
 * placements added to each free region's page and the new sheets.
 */
export function packShelves(
  short: readonly PlanPiece[],
  frame: PageFrame,
  free: readonly FreeRegion[] = [],
): { into: Map<number, Placement[]>; pages: Placement[][] } {
  const into = new Map<number, Placement[]>();
  const pages: Placement[][] = [];
  const bins: { box: BoxMm; out: Placement[] }[] = [];
  let bin = -1;
  let rowTop = 0;
  let rowH = 0;
  let x = 0;
  const open = (i: number): boolean => {
    if (i < free.length) {
      const f = free[i] as FreeRegion;
      const out = into.get(f.pageIndex) ?? [];
      into.set(f.pageIndex, out);
      bins[i] = { box: f.box, out };
    } else {
      const out: Placement[] = [];
      pages.push(out);
      bins[i] = { box: frame.area, out };
    }
    bin = i;
    const b = bins[i]?.box as BoxMm;
    rowTop = b.minY;
    rowH = 0;
    x = b.minX;
    return true;
  };
  for (const p of short) {
    const w = p.bounds.maxX - p.bounds.minX;
    const h = rowHeightMm(p);
    if (bin < 0) open(0);
    for (;;) {
      const box = bins[bin]?.box as BoxMm;
      if (x > box.minX && x + w > box.maxX + 1e-9) {
        rowTop += rowH + ROW.gapMm;
        rowH = 0;
        x = box.minX;
      }
      if (rowTop + h <= box.maxY + 1e-9 && x + w <= box.maxX + 1e-9) break;
      // A new sheet always takes a piece (the planner checked every row fits the area).
      if (bin >= free.length && rowTop === box.minY && x === box.minX) break;
      open(bin + 1);
    }
    bins[bin]?.out.push({
      pieceIndex: p.index,
      offsetXMm: x - p.bounds.minX,
      offsetYMm: rowTop + ROW.captionMm - p.bounds.minY,
      fromXMm: p.bounds.minX,
      toXMm: p.bounds.maxX,
      clip: { minX: x, maxX: x + w, minY: rowTop, maxY: rowTop + h },
    });
    x += w + ROW.colGapMm;
    rowH = Math.max(rowH, h);
  }
  return { into, pages };
}
