// A seeded random source for fault tests, so a failing run can be replayed with its seed.
// mulberry32: a small, well-known 32-bit generator (Tommy Ettinger, public domain); good enough
// to pick kill moments, nowhere near good enough for secrets.

/** Uniform numbers in [0, 1) from `seed`; the same seed gives the same sequence. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The seed from `envName` when set (to replay a run), else a fresh one; always printed by the caller. */
export function seedFrom(envName: string): number {
  const given = process.env[envName];
  if (given !== undefined && given !== '') {
    const n = Number(given);
    if (!Number.isInteger(n) || n < 0) throw new Error(`${envName} must be a non-negative integer, not ${given}`);
    return n;
  }
  return Math.floor(Math.random() * 2 ** 31);
}
