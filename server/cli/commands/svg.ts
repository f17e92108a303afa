// `latchet svg [strap options] -o FILE.svg` writes the full-size SVG (nothing is written on bad input).
import { writeFileSync } from 'node:fs';
import { computeLayout, drawLayout, EngineError } from '@shared/pattern/index.ts';
import { renderSvg } from '@shared/render/svg.ts';
import { svgdomDom } from '../../render/svgdom-window.ts';
import { specFromArgv, withEngineErrors } from './strap-args.ts';

export async function run(argv: string[]): Promise<number> {
  return withEngineErrors(() => {
    const { spec, values } = specFromArgv(argv, { out: { type: 'string', short: 'o' } });
    const out = values.out;
    if (typeof out !== 'string' || !out) throw new EngineError('out', 'say where to write the SVG with -o FILE.svg', 'a file path');
    const svg = renderSvg(drawLayout(computeLayout(spec), spec), svgdomDom());
    writeFileSync(out, svg);
    process.stderr.write(`wrote ${out} (${svg.length} bytes)\n`);
    return 0;
  });
}
