// Rows -> the JSON the API answers (ISO times, parsed JSON columns, camelCase).
import type { PatternView, RevisionView } from '@shared/schemas/library.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { upgradeSpec } from '@shared/schemas/spec-upgrade.ts';
import type { RevisionRow } from '../revisions/revisions.repository.ts';
import type { PatternRow } from './patterns.repository.ts';

export const iso = (ms: number | string) => new Date(Number(ms)).toISOString();

export function patternView(row: PatternRow, following: boolean): PatternView {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind as PatternView['kind'],
    tags: JSON.parse(row.tags) as string[],
    archived: Boolean(row.archived),
    headNumber: row.head_number,
    createdAt: iso(row.created_at),
    updatedAt: iso(row.updated_at),
    following,
  };
}

export function revisionView(row: Omit<RevisionRow, 'spec'> & { spec?: string }): RevisionView {
  return {
    number: row.number,
    // Old revisions count the middle hole from 0; the editor and every reader get today's shape.
    ...(row.spec !== undefined ? { spec: upgradeSpec(JSON.parse(row.spec) as StrapSpec) } : {}),
    engineVersion: row.engine_version,
    note: row.note,
    createdAt: iso(row.created_at),
    author: row.author_id !== null ? { id: row.author_id, name: row.author_name ?? '' } : null,
    restoredFrom: row.restored_from,
  };
}
