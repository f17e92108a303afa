/**
 * Request bodies of the account routes. The client's sign-up and sign-in forms and the
 * server's routes validate with these same schemas, so both name the same field and limit.
 */
import { z } from 'zod';

/** Longest e-mail address SMTP can carry (RFC 5321: 254 characters in a path). */
export const EMAIL_MAX_CHARS = 254;
/** Shortest accepted password (NIST SP 800-63B asks for at least 8 characters). */
export const PASSWORD_MIN_CHARS = 8;
/** Longest accepted password: long enough for passphrases, short enough to bound hashing work. */
export const PASSWORD_MAX_CHARS = 128;
/** Longest person or shop name we store. */
export const NAME_MAX_CHARS = 100;

/** An e-mail address, trimmed and lower-cased so the same inbox is one account. */
export const EmailSchema = z
  .string({ error: 'email is required' })
  .trim()
  .toLowerCase()
  .max(EMAIL_MAX_CHARS, { error: `email must be at most ${EMAIL_MAX_CHARS} characters` })
  .pipe(z.email({ error: 'email must be an e-mail address such as maren@example.com' }));

/** A new password (length limits only: long passphrases beat composition rules, NIST SP 800-63B). */
export const NewPasswordSchema = z
  .string({ error: 'password is required' })
  .min(PASSWORD_MIN_CHARS, { error: `password must be at least ${PASSWORD_MIN_CHARS} characters` })
  .max(PASSWORD_MAX_CHARS, { error: `password must be at most ${PASSWORD_MAX_CHARS} characters` });

const nameOf = (field: string) =>
  z
    .string({ error: `${field} is required` })
    .trim()
    .min(1, { error: `${field} must not be empty` })
    .max(NAME_MAX_CHARS, { error: `${field} must be at most ${NAME_MAX_CHARS} characters` });

/** A person's display name, 1 to {@link NAME_MAX_CHARS} characters after trimming. */
export const PersonNameSchema = nameOf('name');

/** `POST /api/auth/sign-up`: creates the user and a new shop with the user as its owner. */
export const SignUpSchema = z.object({
  email: EmailSchema,
  password: NewPasswordSchema,
  name: PersonNameSchema,
  shopName: nameOf('shopName'),
});
/** Body of `POST /api/auth/sign-up`. */
export type SignUpInput = z.infer<typeof SignUpSchema>;

/** `POST /api/auth/sign-in`. The password is only checked for presence and the hashing bound. */
export const SignInSchema = z.object({
  email: EmailSchema,
  password: z
    .string({ error: 'password is required' })
    .min(1, { error: 'password is required' })
    .max(PASSWORD_MAX_CHARS, { error: `password must be at most ${PASSWORD_MAX_CHARS} characters` }),
});
/** Body of `POST /api/auth/sign-in`. */
export type SignInInput = z.infer<typeof SignInSchema>;

/** The roles a member can hold in a shop, most to least trusted. */
export const ROLES = ['owner', 'maker', 'apprentice'] as const;
/** One of {@link ROLES}. */
export type Role = (typeof ROLES)[number];
/** Zod schema of {@link Role}. */
export const RoleSchema = z.enum(ROLES, { error: `role must be one of ${ROLES.join(', ')}` });

/** The signed-in user as the API returns it. */
export interface PublicUser {
  id: number;
  email: string;
  name: string;
}
/** The current shop as the API returns it. */
export interface PublicShop {
  id: number;
  name: string;
}
/** Answer of `GET /api/me`, `POST /api/auth/sign-up` and `POST /api/auth/sign-in`. */
export interface MeResponse {
  user: PublicUser;
  shop: PublicShop;
  role: Role;
}
