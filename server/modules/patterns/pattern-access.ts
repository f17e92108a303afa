// Finding a pattern for a member: ids of another shop, and ids that are not numbers,
// answer 404 exactly like ids that do not exist, so nothing leaks across shops.
import type { Knex } from 'knex';
import { notFound } from '../../http/http-error.ts';
import type { PatternRow, PatternsRepository } from './patterns.repository.ts';

/** A positive integer id from a path segment, or null. */
export function idParam(raw: string | undefined): number | null {
  if (raw === undefined || !/^[1-9]\d{0,15}$/.test(raw)) return null;
  const n = Number(raw);
  return Number.isSafeInteger(n) ? n : null;
}

/** The pattern `raw` of shop `shopId`, or a 404. */
export async function patternOr404(repo: PatternsRepository, raw: string | undefined, shopId: number, q?: Knex): Promise<PatternRow> {
  const id = idParam(raw);
  const row = id === null ? undefined : await repo.inShop(id, shopId, q);
  if (!row) throw notFound('pattern');
  return row;
}
