// Bounding box of an SVG path's points (M/L/C end and control points) for the cutter tests.
// The fixtures' curves are quarter circles whose control points lie on the bounding box, so
// the point box is the curve's box.
export function pathPointBox(d: string): { minX: number; maxX: number; minY: number; maxY: number } {
  const nums = (d.match(/-?\d+(?:\.\d+)?/g) ?? []).map(Number);
  const xs = nums.filter((_, i) => i % 2 === 0);
  const ys = nums.filter((_, i) => i % 2 === 1);
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}
