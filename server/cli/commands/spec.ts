// `latchet spec --preset NAME` prints the preset's complete spec as JSON (a starting point for a spec file).
import { specFromArgv, withEngineErrors } from './strap-args.ts';

export async function run(argv: string[]): Promise<number> {
  return withEngineErrors(() => {
    const { spec } = specFromArgv(argv, {});
    process.stdout.write(`${JSON.stringify(spec, null, 2)}\n`);
    return 0;
  });
}
