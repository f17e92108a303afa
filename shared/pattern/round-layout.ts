/**
 * Rounds every number in a plain-data value to the nanometre (1e-9 mm). Positions are sums
 * of inch values (533.4 - 76.2 - 2 x 19.05), and binary floating point leaves them as
 * 400.04999999999995; a Layout is read by people in JSON, the API and diffs, and 1e-9 mm is
 * far below any tolerance of leather or paper. Returns a new value; the input is untouched.
 */
export function roundLayoutNumbers<T>(value: T): T {
  if (typeof value === 'number') return (Number.isFinite(value) ? Math.round(value * 1e9) / 1e9 : value) as T;
  if (Array.isArray(value)) return value.map(roundLayoutNumbers) as T;
  if (value && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = roundLayoutNumbers(v);
    return out as T;
  }
  return value;
}
