/**
 * Request bodies and query strings of the pattern library API, and the shapes it answers.
 * The client's forms validate with the same schemas. Times in answers are ISO 8601 (UTC).
 */
import { z } from 'zod';
import { EmailSchema, PersonNameSchema, NewPasswordSchema, RoleSchema, type Role } from './auth.ts';
import { PRESET_NAMES, StrapSpecSchema, type StrapSpec } from './strap-spec.ts';
import type { HeadFit } from './head-fit.ts';

/** Longest pattern name. */
export const PATTERN_NAME_MAX_CHARS = 120;
/** Longest revision note. */
export const NOTE_MAX_CHARS = 1000;
/** Most tags on one pattern, and the longest tag. */
export const TAGS_MAX = 20;
export const TAG_MAX_CHARS = 40;
/** Most patterns per page of the library. */
export const PAGE_LIMIT_MAX = 100;

const intParam = (field: string, min: number, max = Number.MAX_SAFE_INTEGER) =>
  z.coerce
    .number({ error: `${field} must be a whole number` })
    .int({ error: `${field} must be a whole number` })
    .min(min, { error: `${field} must be at least ${min}` })
    .max(max, { error: `${field} must be at most ${max}` });

/** A pattern's name. */
export const PatternNameSchema = z
  .string({ error: 'name is required' })
  .trim()
  .min(1, { error: 'name must not be empty' })
  .max(PATTERN_NAME_MAX_CHARS, { error: `name must be at most ${PATTERN_NAME_MAX_CHARS} characters` });
/** Strap kind of a pattern (one of the engine's presets). */
export const PatternKindSchema = z.enum(PRESET_NAMES, { error: `kind must be one of ${PRESET_NAMES.join(', ')}` });
/** Tags: trimmed, lower-cased, unique. */
export const TagsSchema = z
  .array(z.string({ error: 'tags must be strings' }).trim().toLowerCase().min(1, { error: 'tags must not be empty' }).max(TAG_MAX_CHARS, { error: `tags must be at most ${TAG_MAX_CHARS} characters` }), {
    error: 'tags must be a list of strings',
  })
  .max(TAGS_MAX, { error: `tags must be at most ${TAGS_MAX}` })
  .transform((tags) => [...new Set(tags)]);
/** A revision note. */
export const NoteSchema = z.string({ error: 'note must be text' }).trim().max(NOTE_MAX_CHARS, { error: `note must be at most ${NOTE_MAX_CHARS} characters` });

/** `POST /api/patterns`: a new pattern with its revision 1. */
export const CreatePatternSchema = z.object({
  name: PatternNameSchema,
  kind: PatternKindSchema,
  spec: StrapSpecSchema,
  note: NoteSchema.default(''),
  tags: TagsSchema.default([]),
});
export type CreatePatternInput = z.input<typeof CreatePatternSchema>;

/** `PATCH /api/patterns/:id`: any of name, tags, archived. */
export const UpdatePatternSchema = z
  .object({ name: PatternNameSchema.optional(), tags: TagsSchema.optional(), archived: z.boolean({ error: 'archived must be true or false' }).optional() })
  .refine((v) => v.name !== undefined || v.tags !== undefined || v.archived !== undefined, { error: 'body must change at least one of name, tags, archived', path: ['name'] });
export type UpdatePatternInput = z.input<typeof UpdatePatternSchema>;

/** `POST /api/patterns/:id/revisions` (with `If-Match: <head ETag>`). */
export const SaveRevisionSchema = z.object({ spec: StrapSpecSchema, note: NoteSchema.default('') });
export type SaveRevisionInput = z.input<typeof SaveRevisionSchema>;

/** `POST /api/patterns/:id/duplicate`: from `revision` (default the head), named `name` (default "<name> (copy)"). */
export const DuplicateSchema = z.object({ revision: intParam('revision', 1).optional(), name: PatternNameSchema.optional() });

/** `POST /api/patterns/:id/share`: a link to one revision, or to the head (whatever it is when opened). */
export const CreateShareSchema = z.object({ revision: intParam('revision', 1).nullable().optional() });

/** `PATCH /api/shop/members/:userId`. */
export const MemberRoleSchema = z.object({ role: RoleSchema });
/** `POST /api/shop/invites`. */
export const CreateInviteSchema = z.object({ email: EmailSchema, role: RoleSchema });
/**
 * `POST /api/invites/:token/accept`. Signed in as the invited address: empty body. Not signed
 * in: `password` (and `name` when no account has that e-mail yet).
 */
export const AcceptInviteSchema = z.object({ name: PersonNameSchema.optional(), password: NewPasswordSchema.optional() });

/** `POST /api/me/shop`: act for another shop the user belongs to (a new session). */
export const SwitchShopSchema = z.object({ shopId: intParam('shopId', 1) });

/** `PATCH /api/me/settings`. */
export const SettingsSchema = z.object({ notifyOnFollowedRevisions: z.boolean({ error: 'notifyOnFollowedRevisions must be true or false' }) });
export type Settings = z.infer<typeof SettingsSchema>;

/** Query of `GET /api/patterns`. */
export const ListPatternsQuerySchema = z.object({
  query: z.string().trim().max(PATTERN_NAME_MAX_CHARS, { error: `query must be at most ${PATTERN_NAME_MAX_CHARS} characters` }).optional(),
  kind: PatternKindSchema.optional(),
  tag: z.string().trim().toLowerCase().max(TAG_MAX_CHARS, { error: `tag must be at most ${TAG_MAX_CHARS} characters` }).optional(),
  sort: z.enum(['updated', 'name'], { error: 'sort must be updated or name' }).default('updated'),
  cursor: z.string().max(200, { error: 'cursor must be at most 200 characters' }).optional(),
  limit: intParam('limit', 1, PAGE_LIMIT_MAX).default(25),
  archived: z.enum(['true', 'false', 'all'], { error: 'archived must be true, false or all' }).default('false'),
});
export type ListPatternsQuery = z.infer<typeof ListPatternsQuerySchema>;

/** Query of `GET /api/patterns/:id/compare`. */
export const CompareQuerySchema = z.object({ from: intParam('from', 1), to: intParam('to', 1) });

/** A person as other members see them. */
export interface PersonRef {
  id: number;
  name: string;
}
/** One saved revision. `spec` is absent in history lists. */
export interface RevisionView {
  number: number;
  spec?: StrapSpec;
  engineVersion: string;
  note: string;
  createdAt: string;
  author: PersonRef | null;
  /** The revision this one restored, or null. */
  restoredFrom: number | null;
}
/** A pattern's own data. */
export interface PatternView {
  id: number;
  name: string;
  kind: (typeof PRESET_NAMES)[number];
  tags: string[];
  archived: boolean;
  headNumber: number;
  createdAt: string;
  updatedAt: string;
  /** Whether the asking member follows it (mail on each new revision). */
  following: boolean;
}
/** `GET /api/patterns/:id`, `POST /api/patterns`. */
export interface PatternWithHead {
  pattern: PatternView;
  head: RevisionView;
}
/** `GET /api/patterns`. */
export interface PatternPage {
  /** `head.fit`: the head's girth or size range for the card (the spec itself is not sent). */
  items: Array<PatternView & { head: Omit<RevisionView, 'spec'> & { fit: HeadFit } }>;
  nextCursor: string | null;
}
/** One member in `GET /api/shop/members`. */
export interface MemberView {
  userId: number;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}
