// Golden SVGs: the full drawing of each preset, byte for byte. A change to drawing or
// rendering shows up here as a diff to review; regenerate with UPDATE_GOLDEN=1 after looking
// at the new output (test-output/ holds a copy of every actual file).
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, PRESET_NAMES } from '@shared/pattern/index.ts';
import { renderSvg } from '@shared/render/svg.ts';
import { svgdomDom } from '../../server/render/svgdom-window.ts';

const dir = fileURLToPath(new URL('.', import.meta.url));
const outDir = fileURLToPath(new URL('../../test-output/golden/', import.meta.url));

describe('golden SVG per preset', () => {
  for (const name of PRESET_NAMES) {
    it(`when the ${name} preset is drawn, then the SVG equals tests/golden/${name}.svg`, () => {
      const s = presetSpec(name);
      const svg = renderSvg(drawLayout(computeLayout(s), s), svgdomDom());
      const file = `${dir}${name}.svg`;
      mkdirSync(outDir, { recursive: true });
      writeFileSync(`${outDir}${name}.svg`, svg);
      if (process.env.UPDATE_GOLDEN) writeFileSync(file, svg);
      expect(existsSync(file), `${file} missing: run with UPDATE_GOLDEN=1 and review it`).toBe(true);
      expect(svg).toBe(readFileSync(file, 'utf8'));
    });
  }
});
