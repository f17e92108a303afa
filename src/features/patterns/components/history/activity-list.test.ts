import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { activitySentence } from './activity-list.tsx';

const item = (action: string, detail: Record<string, unknown> = {}) => ({ id: 1, action, detail, at: '2026-12-03T15:00:00.000Z', by: null });

/** Every audit action the server writes (`action: 'x.y'` in server/), read from the source. */
function serverActions(dir = join(process.cwd(), 'server')): string[] {
  const found = new Set<string>();
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) serverActions(path).forEach((a) => found.add(a));
    else if (name.endsWith('.ts')) for (const m of readFileSync(path, 'utf8').matchAll(/action: '([a-z-]+\.[a-z.-]+)'/g)) found.add(m[1]!);
  }
  return [...found];
}

describe('pattern activity in sentences', () => {
  it('when a revision is saved or restored, then the sentence gives the numbers', () => {
    expect(activitySentence(item('revision.saved', { number: 4 }))).toBe('saved revision 4');
    expect(activitySentence(item('revision.restored', { number: 5, restoredFrom: 2 }))).toBe('restored revision 2 as revision 5');
  });

  it('when the server records any action, then a person reads words, never the action code', () => {
    const actions = serverActions();
    expect(actions.length).toBeGreaterThan(5);
    for (const a of [...actions, 'pattern.something-new']) {
      const s = activitySentence(item(a, { number: 1, revision: 1, restoredFrom: 1 }));
      expect(s, a).not.toContain(a);
      expect(s, a).toMatch(/^[a-z][a-z0-9 ,]+$/);
    }
  });
});
