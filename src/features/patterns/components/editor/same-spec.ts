/**
 * Whether two form states hold the same spec, as a save would send it. react-hook-form
 * counts a size's empty grading inputs as a change once they remount after a save
 * (`holes: {}` becomes `holes: { count: undefined }`), which would leave a just-saved
 * pattern marked "changed"; empty values and empty groups are dropped before comparing.
 */
export function sameSpec(a: unknown, b: unknown): boolean {
  return JSON.stringify(withoutEmpty(a)) === JSON.stringify(withoutEmpty(b));
}

function withoutEmpty(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutEmpty);
  if (value === null || typeof value !== 'object') return value;
  const kept = Object.entries(value)
    .map(([k, v]) => [k, withoutEmpty(v)] as const)
    .filter(([, v]) => v !== undefined && !(typeof v === 'object' && v !== null && !Array.isArray(v) && Object.keys(v).length === 0));
  return Object.fromEntries(kept);
}
