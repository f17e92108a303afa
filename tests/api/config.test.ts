// The environment is parsed at boot: defaults, and one readable list of every problem.
import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../../server/config.ts';

describe('config', () => {
  it('when nothing is set, then the documented defaults apply', () => {
    const c = loadConfig({});
    expect(c).toMatchObject({ port: 3000, databaseFile: 'data/latchet.sqlite3', env: 'development', publicOrigin: 'http://localhost:3000', authRateLimit: 20 });
    expect(c.sessionAbsoluteMs).toBe(30 * 24 * 3_600_000);
  });

  it('when several values are bad, then one ConfigError lists each with its limit', () => {
    let caught: unknown;
    try {
      loadConfig({ PORT: '70000', SESSION_ABSOLUTE_HOURS: 'soon', PUBLIC_ORIGIN: 'not a url' });
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(ConfigError);
    const problems = (caught as ConfigError).problems;
    expect(problems).toHaveLength(3);
    expect(problems.find((p) => p.startsWith('PORT'))).toContain('at most 65535');
    expect(problems.find((p) => p.startsWith('SESSION_ABSOLUTE_HOURS'))).toContain('number');
    expect(problems.find((p) => p.startsWith('PUBLIC_ORIGIN'))).toContain('URL');
    expect((caught as Error).message).toMatch(/^Latchet cannot start/);
  });

  it('when production runs without PUBLIC_ORIGIN, then it refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/PUBLIC_ORIGIN: required in production/);
    expect(loadConfig({ NODE_ENV: 'production', PUBLIC_ORIGIN: 'https://patterns.harrowfinch.example/' }).publicOrigin).toBe('https://patterns.harrowfinch.example');
  });

  it('when PORT is set empty, then the default is used', () => {
    expect(loadConfig({ PORT: '' }).port).toBe(3000);
  });
});
