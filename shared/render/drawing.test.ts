import { describe, expect, it } from 'vitest';
import { replayPath, type PathSink } from './drawing.ts';

describe('replayPath', () => {
  it('when commands are replayed with a mm-to-pt map, then every point is mapped and order kept', () => {
    const calls: string[] = [];
    const sink: PathSink = {
      moveTo: (x, y) => calls.push(`M${x},${y}`),
      lineTo: (x, y) => calls.push(`L${x},${y}`),
      curveTo: (a, b, c, d, x, y) => calls.push(`C${a},${b},${c},${d},${x},${y}`),
      closePath: () => calls.push('Z'),
    };
    // 25.4 mm = 72 pt exactly (ISO 32000-1 default user space unit 1/72 in; 1959 inch).
    const pt = (v: number) => (v * 72) / 25.4;
    replayPath(
      [{ op: 'M', x: 0, y: 0 }, { op: 'L', x: 25.4, y: 0 }, { op: 'C', x1: 25.4, y1: 12.7, x2: 12.7, y2: 25.4, x: 0, y: 25.4 }, { op: 'Z' }],
      sink,
      (x, y) => [pt(x), pt(y)],
    );
    expect(calls).toEqual(['M0,0', 'L72,0', 'C72,36,36,72,0,72', 'Z']);
  });
});
