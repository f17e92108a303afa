// What must never reach a person in a refusal: a schema path (`pieces.0.end.holes.count`,
// `spec.sizes.3.girthMm`) or a camelCase key (`girthMm`). Returns what was found, or null.
export function inhumanPart(message: string): string | null {
  if (/\b[A-Za-z_]\w*\.(\d+|[A-Za-z_]\w*)\b/.test(message.replace(/\b\d+\.\d+\b/g, ''))) return 'a schema path';
  if (/\b[a-z]+[A-Z][A-Za-z]*\b/.test(message)) return 'a camelCase name';
  return null;
}
