/** Joins class names, dropping falsy ones (no dependency for a one-liner). */
export function cx(...parts: Array<string | false | null | undefined>): string {
  return parts.filter(Boolean).join(' ');
}
