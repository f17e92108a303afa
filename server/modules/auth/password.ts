// Argon2id password hashes with the OWASP Password Storage Cheat Sheet's first
// recommended setting: m = 19456 KiB (19 MiB), t = 2, p = 1.
import { hash, verify, type Options } from '@node-rs/argon2';

/** Argon2id in @node-rs/argon2's Algorithm enum (a const enum we cannot import under isolatedModules). */
const ARGON2ID = 2;

/** The hashing parameters (OWASP Password Storage Cheat Sheet, Argon2id). */
export const ARGON2_OPTIONS: Options = { algorithm: ARGON2ID as Options['algorithm'], memoryCost: 19456, timeCost: 2, parallelism: 1 };

/** A PHC-format Argon2id hash of `password`. */
export const hashPassword = (password: string) => hash(password, ARGON2_OPTIONS);

/** True when `password` matches `passwordHash`. */
export const verifyPassword = (passwordHash: string, password: string) => verify(passwordHash, password);

let dummy: Promise<string> | undefined;
/**
 * Verifies against a throwaway hash so an unknown e-mail costs the same time as a wrong
 * password and sign-in timing does not reveal which addresses have accounts.
 */
export async function burnVerifyTime(password: string): Promise<void> {
  dummy ??= hashPassword('latchet-dummy-password-for-timing');
  await verify(await dummy, password);
}
