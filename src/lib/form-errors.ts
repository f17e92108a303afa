import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client.ts';

/**
 * Puts the server's field messages beside the matching inputs and returns the message for
 * whatever could not be placed (a wrong password, a rate limit, a network failure), which
 * the form shows above its button.
 */
export function applyServerErrors<T extends FieldValues>(
  err: unknown,
  setError: UseFormSetError<T>,
  knownFields: readonly Path<T>[],
): string | undefined {
  if (!(err instanceof ApiError)) return 'Something went wrong. Try again.';
  const unplaced: string[] = [];
  for (const [field, message] of Object.entries(err.fields ?? {})) {
    if ((knownFields as readonly string[]).includes(field)) setError(field as Path<T>, { type: 'server', message });
    else unplaced.push(message);
  }
  const placedAny = Object.keys(err.fields ?? {}).length > unplaced.length;
  if (placedAny && unplaced.length === 0) return undefined;
  return unplaced.length > 0 ? unplaced.join(' ') : err.message;
}
