import type { DrawingPiece } from '@shared/render/drawing.ts';
import type { Placement } from './page-plan.ts';
import { ROW } from './pack.ts';
import { SEAM_CLEAR_MM } from './seam-marks.ts';
import { textMm } from './pdf-text.ts';
import { MM_PER_IN, mmToPt } from './units.ts';

interface Tick {
  atMm: number;
  lenMm: number;
  label?: string;
}

/** Ticks from the buckle-end datum to the blank's end: inches in eighths, or millimetres. */
export function rulerTicks(lengthMm: number, units: 'in' | 'mm'): Tick[] {
  const ticks: Tick[] = [];
  if (units === 'in') {
    const n = Math.floor((lengthMm / MM_PER_IN) * 8 + 1e-9);
    for (let i = 0; i <= n; i++) {
      const whole = i % 8 === 0;
      ticks.push({ atMm: (i * MM_PER_IN) / 8, lenMm: whole ? 3 : i % 4 === 0 ? 2 : i % 2 === 0 ? 1.5 : 1, ...(whole ? { label: `${i / 8}` } : {}) });
    }
  } else {
    const n = Math.floor(lengthMm + 1e-9);
    for (let i = 0; i <= n; i += 1) {
      if (i % 5 !== 0) continue;
      const major = i % 50 === 0;
      ticks.push({ atMm: i, lenMm: major ? 3 : i % 10 === 0 ? 2 : 1.2, ...(major ? { label: `${i}` } : {}) });
    }
  }
  return ticks;
}

/**
 * Draws a ruler under the piece from the datum (x = 0) to the blank's length, so any feature
 * and any seam can be checked against the printed distances with a real ruler.
 */
export function drawDatumRuler(doc: PDFKit.PDFDocument, piece: DrawingPiece, pl: Placement, units: 'in' | 'mm', seamXs: readonly number[] = []): void {
  const y = pl.clip.maxY - ROW.rulerMm + 1;
  doc.save();
  doc.rect(mmToPt(pl.clip.minX), mmToPt(pl.clip.minY), mmToPt(pl.clip.maxX - pl.clip.minX), mmToPt(pl.clip.maxY - pl.clip.minY)).clip();
  doc.lineWidth(mmToPt(0.15)).strokeColor('#333333').undash();
  const x0 = Math.max(0, pl.fromXMm);
  const x1 = Math.min(piece.lengthMm, pl.toXMm);
  if (x1 > x0) doc.moveTo(mmToPt(x0 + pl.offsetXMm), mmToPt(y)).lineTo(mmToPt(x1 + pl.offsetXMm), mmToPt(y)).stroke();
  const ticks = rulerTicks(piece.lengthMm, units).filter((t) => t.atMm >= pl.fromXMm - 1 && t.atMm <= pl.toXMm + 1);
  // All ticks in one path and one stroke: a long strap has hundreds.
  for (const t of ticks) {
    const x = t.atMm + pl.offsetXMm;
    doc.moveTo(mmToPt(x), mmToPt(y)).lineTo(mmToPt(x), mmToPt(y + t.lenMm));
  }
  if (ticks.length > 0) doc.stroke();
  for (const t of ticks) {
    const x = t.atMm + pl.offsetXMm;
    // A seam's bottom letter and diamond sit in this line; the long tick still marks the place.
    if (t.label === undefined || seamXs.some((s) => Math.abs(s - x) < SEAM_CLEAR_MM)) continue;
    textMm(doc, t.label, x, y + t.lenMm + 2.2, { capMm: 1.7, anchor: 'middle', color: '#333333' });
  }
  const unitLabel = `${units} from datum 0`;
  if (pl.fromXMm <= 0) textMm(doc, unitLabel, pl.offsetXMm + 4, y + 5, { capMm: 1.5, color: '#555555' });
  doc.restore();
}
