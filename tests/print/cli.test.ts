import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { OUT_DIR, pageSizesPt, writeOut } from './pdf-tools.ts';

const BIN = join(process.cwd(), 'server/cli/bin.js');

function latchet(...args: string[]) {
  return spawnSync(process.execPath, [BIN, ...args], { encoding: 'utf8', timeout: 60_000 });
}

describe('latchet print', () => {
  it('when the collar preset prints on Letter, then a Letter PDF is written (ASME Y14.1: 612 x 792 pt) and the exit code is 0', async () => {
    writeOut('.keep', '');
    const out = join(OUT_DIR, 'cli-collar.pdf');
    rmSync(out, { force: true });
    const r = latchet('print', '--preset', 'collar', '--paper', 'letter', '--date', '2026-12-01', '-o', out);
    expect(r.stderr).toContain('wrote');
    expect(r.status).toBe(0);
    const sizes = await pageSizesPt(readFileSync(out));
    expect(sizes.length).toBeGreaterThan(1);
    for (const s of sizes) expect([s.width, s.height].sort((a, b) => a - b)).toEqual([612, 792]);
  });

  it('when a spec file is given with --spec and A4, then an A4 PDF is written (ISO 216: 595.28 x 841.89 pt)', async () => {
    const { presetSpec } = await import('@shared/pattern/index.ts');
    const spec = writeOut('cli-watch-spec.json', JSON.stringify(presetSpec('watch-strap')));
    const out = join(OUT_DIR, 'cli-watch.pdf');
    rmSync(out, { force: true });
    const r = latchet('print', '--spec', spec, '--paper', 'a4', '--orientation', 'portrait', '--date', '2026-12-01', '-o', out);
    expect(r.status, r.stderr).toBe(0);
    for (const s of await pageSizesPt(readFileSync(out))) {
      expect(s.width).toBeCloseTo(595.28, 2);
      expect(s.height).toBeCloseTo(841.89, 2);
    }
  });

  it('when an option is bad, then it exits 2 naming the option and writes nothing', () => {
    const out = join(OUT_DIR, 'cli-bad.pdf');
    rmSync(out, { force: true });
    for (const [args, flag] of [
      [['--paper', 'b5'], '--paper'],
      [['--margin', '6'], '--margin'],
      [['--paper', 'custom', '--paper-width', '24in'], '--paper-length'],
      [['--size', 'M'], '--size'],
    ] as const) {
      const r = latchet('print', '--preset', 'collar', ...args, '-o', out);
      expect(r.status, args.join(' ')).toBe(2);
      expect(r.stderr).toContain(`latchet: ${flag}:`);
    }
    expect(existsSync(out)).toBe(false);
  });
});
