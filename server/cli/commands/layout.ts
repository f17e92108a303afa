// `latchet layout [--preset NAME] [--spec FILE.json] [--girth 13in] [--width 1in] [--thickness 10oz] [--mode rule|fit]`
// prints the Layout as JSON. The strap piece's fields (blank, width, features, folds) are also at
// the top level, so one-piece patterns read flat; `pieces` holds every piece.
import { computeLayout, gradeSizes, type PatternLayout } from '@shared/pattern/index.ts';
import { specFromArgv, withEngineErrors } from './strap-args.ts';

/** The printed JSON: the layout, with the strap piece's own fields copied to the top level. */
export function layoutJson(layout: PatternLayout): Record<string, unknown> {
  const strap = layout.pieces.find((p) => p.role === 'strap') ?? layout.pieces[0];
  if (!strap) return { ...layout };
  const { warnings: _pieceWarnings, fit: _fit, name: _name, ...piece } = strap;
  return { ...piece, ...layout, pieceId: strap.id, pieces: layout.pieces };
}

export async function run(argv: string[]): Promise<number> {
  return withEngineErrors(() => {
    const { spec } = specFromArgv(argv, {});
    const json = layoutJson(computeLayout(spec));
    // A pattern with a size run also reports each size's fit range and the joins between them.
    if (spec.sizes.length > 0) json.sizeRun = gradeSizes(spec, spec.sizes);
    process.stdout.write(`${JSON.stringify(json, null, 2)}\n`);
    return 0;
  });
}
