import { readFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { EngineError, specFromOptions, type StrapSpec } from '@shared/pattern/index.ts';

/** Options every strap command accepts: --preset, --spec FILE.json, --girth, --width, --thickness, --mode. */
export const STRAP_OPTIONS = {
  preset: { type: 'string' },
  spec: { type: 'string' },
  girth: { type: 'string' },
  width: { type: 'string' },
  thickness: { type: 'string' },
  mode: { type: 'string' },
} as const;

/**
 * Parses argv into a validated spec plus the remaining values. Throws EngineError naming the
 * option or spec field on bad input (the caller prints one line and exits 2).
 */
export function specFromArgv<T extends Record<string, { type: 'string' | 'boolean'; short?: string }>>(argv: string[], extra: T) {
  let parsed;
  try {
    parsed = parseArgs({ args: argv, options: { ...STRAP_OPTIONS, ...extra }, allowPositionals: false, strict: true });
  } catch (e) {
    throw new EngineError('options', (e as Error).message, 'the options listed in the README');
  }
  const v = parsed.values as Record<string, string | boolean | undefined>;
  let specJson: unknown;
  if (typeof v.spec === 'string') {
    let text: string;
    try {
      text = readFileSync(v.spec, 'utf8');
    } catch {
      throw new EngineError('spec', `cannot read ${v.spec}`, 'a readable JSON file');
    }
    try {
      specJson = JSON.parse(text);
    } catch (e) {
      throw new EngineError('spec', `${v.spec} is not JSON: ${(e as Error).message}`, 'valid JSON');
    }
  }
  const str = (k: string) => (typeof v[k] === 'string' ? (v[k] as string) : undefined);
  const opts = {
    ...(str('preset') !== undefined ? { preset: str('preset') } : {}),
    ...(specJson !== undefined ? { spec: specJson } : {}),
    ...(str('girth') !== undefined ? { girth: str('girth') } : {}),
    ...(str('width') !== undefined ? { width: str('width') } : {}),
    ...(str('thickness') !== undefined ? { thickness: str('thickness') } : {}),
    ...(str('mode') !== undefined ? { mode: str('mode') } : {}),
  };
  const spec: StrapSpec = specFromOptions(opts);
  return { spec, values: v };
}

/** Runs a command body; an EngineError becomes one line on stderr and exit code 2. */
export async function withEngineErrors(body: () => Promise<number> | number): Promise<number> {
  try {
    return await body();
  } catch (e) {
    if (e instanceof EngineError) {
      process.stderr.write(`latchet: ${e.field}: ${e.message}${e.limit ? ` (limit: ${e.limit})` : ''}\n`);
      return 2;
    }
    throw e;
  }
}
