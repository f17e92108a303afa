import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client.ts';
import { applyServerErrors } from './form-errors.ts';

type Values = { email: string; password: string };

function collect() {
  const placed: Record<string, string> = {};
  const setError = ((name: string, e: { message?: string }) => {
    placed[name] = e.message ?? '';
  }) as Parameters<typeof applyServerErrors<Values>>[1];
  return { placed, setError };
}

// The API's error body is { error: { code, message, fields? } } (the project's DESIGN.md).
describe('server field errors in forms', () => {
  it('when the server names a field the form has, then the message goes beside that field and nothing above the form', () => {
    const { placed, setError } = collect();
    const rest = applyServerErrors<Values>(new ApiError(409, 'email_taken', 'email is already registered', { email: 'email is already registered' }), setError, ['email', 'password']);
    expect(placed).toEqual({ email: 'email is already registered' });
    expect(rest).toBeUndefined();
  });

  it('when the server names a field the form does not show, then its message is returned for the notice', () => {
    const { placed, setError } = collect();
    const rest = applyServerErrors<Values>(new ApiError(400, 'invalid_input', 'x', { 'spec.girthMm': 'girth must be at least 50 mm' }), setError, ['email', 'password']);
    expect(placed).toEqual({});
    expect(rest).toBe('girth must be at least 50 mm');
  });

  it('when the answer has no fields (a wrong password, a rate limit), then the server message is returned', () => {
    const { setError } = collect();
    expect(applyServerErrors<Values>(new ApiError(429, 'rate_limited', 'Too many attempts; wait a few minutes.'), setError, ['email'])).toBe('Too many attempts; wait a few minutes.');
  });

  it('when the failure is not from the API, then a generic sentence is returned', () => {
    const { setError } = collect();
    expect(applyServerErrors<Values>(new TypeError('boom'), setError, ['email'])).toBe('Something went wrong. Try again.');
  });
});
