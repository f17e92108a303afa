import { describe, expect, it } from 'vitest';
import { paths, safeRedirect } from './paths.ts';

// Open redirects through a "return to" parameter: OWASP Unvalidated Redirects and Forwards
// Cheat Sheet advises accepting only local paths.
describe('safeRedirect', () => {
  it('when the target is a local path, then it is kept with its query', () => {
    expect(safeRedirect('/patterns/7?tab=history')).toBe('/patterns/7?tab=history');
  });

  it('when the target is another site (absolute or protocol-relative), then home is used instead (OWASP)', () => {
    expect(safeRedirect('https://evil.example/')).toBe(paths.home.getHref());
    expect(safeRedirect('//evil.example/x')).toBe(paths.home.getHref());
    expect(safeRedirect('javascript:alert(1)')).toBe(paths.home.getHref());
  });

  it('when there is no target, then the fallback is used', () => {
    expect(safeRedirect(null, '/x')).toBe('/x');
  });
});

describe('paths', () => {
  it('when sign-in is asked to return somewhere, then the address carries it encoded', () => {
    const href = paths.auth.signIn.getHref('/patterns/3?q=a b');
    expect(new URL(href, 'http://x').searchParams.get('redirectTo')).toBe('/patterns/3?q=a b');
  });
});
