// Strong entity tags for revisions and the If-Match check (RFC 9110, 8.8.3 and 13.1.1).
import { HttpError } from '../../http/http-error.ts';

/** The strong ETag of revision `n` of pattern `patternId`, quotes included. */
export const revisionEtag = (patternId: number, n: number) => `"p${patternId}-r${n}"`;

/** Entity tags listed in an If-Match header; weak tags are dropped (If-Match compares strongly). */
export function parseIfMatch(header: string): string[] {
  return (header.match(/(W\/)?"[^"]*"/g) ?? []).filter((t) => !t.startsWith('W/'));
}

/**
 * Throws 428 when the header is missing (RFC 6585, 3) or names no tag we could compare.
 * "*" is refused too: it would match any head and defeat the compare-and-set.
 */
export function requireIfMatch(header: string | undefined): string[] {
  const tags = header === undefined ? [] : parseIfMatch(header);
  if (tags.length === 0) {
    throw new HttpError(428, 'precondition_required', 'Send If-Match with the ETag of the revision you started from, so a newer save is never overwritten.');
  }
  return tags;
}
