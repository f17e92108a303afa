import type { Role } from '@shared/schemas/auth.ts';

/** Roles with what each may do, in the words the screens use. */
export const ROLE_OPTIONS: ReadonlyArray<{ value: Role; label: string; duty: string }> = [
  { value: 'owner', label: 'Owner', duty: 'everything, including people and invites' },
  { value: 'maker', label: 'Maker', duty: 'drafts, saves and shares patterns' },
  { value: 'apprentice', label: 'Apprentice', duty: 'reads the library and prints' },
];
