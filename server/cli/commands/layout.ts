// `latchet layout [--preset NAME] [--spec FILE.json] [--girth 13in] [--width 1in] [--thickness 10oz] [--mode rule|fit]`
// prints the Layout as JSON. A single-piece pattern also has its piece's fields at the top level.
import { computeLayout, type PatternLayout } from '@shared/pattern/index.ts';
import { specFromArgv, withEngineErrors } from './strap-args.ts';

/** The printed JSON: the layout, plus the strap piece's fields on top for single-piece patterns. */
export function layoutJson(layout: PatternLayout): Record<string, unknown> {
  const only = layout.pieces.length === 1 ? layout.pieces[0] : undefined;
  if (!only) return { ...layout };
  const { warnings: _pieceWarnings, fit: _fit, ...piece } = only;
  return { ...piece, ...layout, pieceId: only.id, pieces: layout.pieces };
}

export async function run(argv: string[]): Promise<number> {
  return withEngineErrors(() => {
    const { spec } = specFromArgv(argv, {});
    process.stdout.write(`${JSON.stringify(layoutJson(computeLayout(spec)), null, 2)}\n`);
    return 0;
  });
}
