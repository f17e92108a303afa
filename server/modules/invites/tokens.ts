// Bearer tokens for invite and share links: 256 random bits in the URL, only their SHA-256
// stored, so a copy of the database cannot be turned back into working links.
import { createHash, randomBytes } from 'node:crypto';

/** A new URL-safe token (43 characters). */
export const newToken = () => randomBytes(32).toString('base64url');

/** Hex SHA-256 of a token, as stored. */
export const tokenHash = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

/** Tokens we hand out are 43 base64url characters; anything else cannot match. */
export const plausibleToken = (raw: string | undefined): raw is string => raw !== undefined && /^[A-Za-z0-9_-]{43}$/.test(raw);
