import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';

const bin = fileURLToPath(new URL('../bin.js', import.meta.url));
const run = async (...args: string[]) => {
  try {
    const r = await promisify(execFile)(process.execPath, [bin, ...args], { encoding: 'utf8' });
    return { code: 0, stdout: r.stdout, stderr: r.stderr };
  } catch (e) {
    const x = e as { code: number; stdout: string; stderr: string };
    return { code: x.code, stdout: x.stdout, stderr: x.stderr };
  }
};

describe('latchet layout | spec | svg', () => {
  it('when laying out the collar preset, then the JSON has blank, width, features, fit and warnings at top level', async () => {
    const r = await run('layout', '--preset', 'collar');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.blankLengthMm).toBeCloseTo(533.4, 6);
    expect(j.widthMm).toBeCloseTo(25.4, 6);
    expect(j.features.find((f: { kind: string }) => f.kind === 'slot').lengthMm).toBeCloseTo(25.4, 6);
    expect(j.fit.holes).toHaveLength(5);
    expect(j.fit.nominalIndex).toBe(2);
    expect(j.fit.rangeMm).toHaveLength(2);
    expect(Array.isArray(j.warnings)).toBe(true);
    expect(j.pieces).toHaveLength(1);
  }, 30_000);

  it('when a pattern has several pieces, then the strap piece is at the top level and every piece is in pieces', async () => {
    const j = JSON.parse((await run('layout', '--preset', 'watch-strap')).stdout);
    expect(j.pieceId).toBe('long');
    expect(j.blankLengthMm).toBe(132);
    // The watch-strap preset: long and short piece plus the keeper cut for it.
    expect(j.pieces.map((p: { id: string }) => p.id)).toEqual(['long', 'short', 'keeper']);
  }, 30_000);

  it('when --girth 14in --mode fit are given, then the nominal hole fits 14 in inside', async () => {
    const j = JSON.parse((await run('layout', '--preset', 'collar', '--girth', '14in', '--mode', 'fit')).stdout);
    expect(j.fit.holes[2].innerMm).toBeCloseTo(355.6, 6);
  }, 30_000);

  it('when the girth is impossible, then the exit code is 2 and one line names the field and the limit', async () => {
    const r = await run('layout', '--preset', 'collar', '--girth', '1in');
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/girthMm: .*at least 50/);
  }, 30_000);

  it('when spec prints a preset and layout reads it back as --spec, then the layout is the same', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'latchet-cli-'));
    const spec = await run('spec', '--preset', 'belt');
    writeFileSync(join(dir, 'belt.json'), spec.stdout);
    const a = await run('layout', '--preset', 'belt');
    const b = await run('layout', '--spec', join(dir, 'belt.json'));
    expect(b.stdout).toBe(a.stdout);
  }, 30_000);

  it('when svg is asked for with -o, then the file holds an SVG sized in mm; with bad input nothing is written', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'latchet-cli-'));
    const ok = join(dir, 'collar.svg');
    expect((await run('svg', '--preset', 'collar', '-o', ok)).code).toBe(0);
    expect(readFileSync(ok, 'utf8')).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" width="[\d.]+mm" height="[\d.]+mm"/);
    const bad = join(dir, 'bad.svg');
    const r = await run('svg', '--preset', 'collar', '--thickness', '99oz', '-o', bad);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/thickness\.value: .*at most 30/);
    expect(existsSync(bad)).toBe(false);
  }, 30_000);
});
