/**
 * The pattern file: our own documented, versioned JSON for moving a pattern with its whole
 * history between shops or installations (`GET /api/patterns/:id/export`,
 * `POST /api/patterns/import`).
 *
 * ```json
 * {
 *   "format": "latchet-pattern",        // always this string
 *   "formatVersion": 1,                 // bumped on any incompatible change
 *   "exportedAt": "2026-12-02T03:00:00.000Z",
 *   "pattern": { "name": "Juniper's collar", "kind": "collar", "tags": ["dog"], "archived": false },
 *   "revisions": [                      // every revision, numbered 1..n without gaps
 *     { "number": 1, "spec": { ...StrapSpec, all lengths in mm... }, "engineVersion": "1.0.0",
 *       "note": "First cut", "createdAt": "2026-11-30T10:00:00.000Z", "author": "Tobias Harrow",
 *       "restoredFrom": null }
 *   ]
 * }
 * ```
 * Importing creates a new pattern in the importer's shop with the same numbered history;
 * authors become the importer (the original author's name is kept in the file only).
 */
import { z } from 'zod';
import { NoteSchema, PatternKindSchema, PatternNameSchema, TagsSchema } from './library.ts';
import { StrapSpecSchema } from './strap-spec.ts';

/** Value of the `format` member. */
export const PATTERN_FILE_FORMAT = 'latchet-pattern';
/** The version this code writes and reads. */
export const PATTERN_FILE_VERSION = 1;
/** Most revisions one file may carry. */
export const PATTERN_FILE_REVISIONS_MAX = 1000;

const isoTime = (field: string) => z.iso.datetime({ error: `${field} must be an ISO 8601 UTC time such as 2026-12-02T03:00:00.000Z` });

/** One revision in a pattern file. */
export const PatternFileRevisionSchema = z.object({
  number: z.number({ error: 'number must be a whole number' }).int({ error: 'number must be a whole number' }).min(1, { error: 'number must be at least 1' }),
  spec: StrapSpecSchema,
  engineVersion: z.string({ error: 'engineVersion is required' }).min(1, { error: 'engineVersion must not be empty' }).max(40, { error: 'engineVersion must be at most 40 characters' }),
  note: NoteSchema.default(''),
  createdAt: isoTime('createdAt'),
  author: z.string().max(100, { error: 'author must be at most 100 characters' }).nullable().default(null),
  restoredFrom: z.number().int().min(1, { error: 'restoredFrom must be at least 1' }).nullable().default(null),
});

/** A whole pattern file, checked for contiguous numbering and consistent kinds. */
export const PatternFileSchema = z
  .object({
    format: z.literal(PATTERN_FILE_FORMAT, { error: `format must be "${PATTERN_FILE_FORMAT}"` }),
    formatVersion: z.literal(PATTERN_FILE_VERSION, { error: `formatVersion must be ${PATTERN_FILE_VERSION}` }),
    exportedAt: isoTime('exportedAt'),
    pattern: z.object({ name: PatternNameSchema, kind: PatternKindSchema, tags: TagsSchema.default([]), archived: z.boolean({ error: 'archived must be true or false' }).default(false) }),
    revisions: z
      .array(PatternFileRevisionSchema, { error: 'revisions must be a list' })
      .min(1, { error: 'revisions must hold at least 1 revision' })
      .max(PATTERN_FILE_REVISIONS_MAX, { error: `revisions must hold at most ${PATTERN_FILE_REVISIONS_MAX} revisions` }),
  })
  .superRefine((file, ctx) => {
    file.revisions.forEach((r, i) => {
      if (r.number !== i + 1) ctx.addIssue({ code: 'custom', path: ['revisions', i, 'number'], message: `number must be ${i + 1}: revisions are numbered 1, 2, 3... in order` });
      if (r.spec.kind !== file.pattern.kind) ctx.addIssue({ code: 'custom', path: ['revisions', i, 'spec', 'kind'], message: `kind must be "${file.pattern.kind}" like the pattern` });
      if (r.restoredFrom !== null && r.restoredFrom >= r.number) ctx.addIssue({ code: 'custom', path: ['revisions', i, 'restoredFrom'], message: `restoredFrom must be an earlier revision than ${r.number}` });
    });
  });
/** A parsed pattern file. */
export type PatternFile = z.infer<typeof PatternFileSchema>;
