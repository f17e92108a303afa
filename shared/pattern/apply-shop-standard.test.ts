import { describe, expect, it } from 'vitest';
import { PRESET_NAMES } from '../schemas/strap-spec.ts';
import { ShopStandardsSchema } from '../schemas/shop-standards.ts';
import { applyKindStandard, specFromShopStandard } from './apply-shop-standard.ts';
import { presetSpec } from './presets/index.ts';
import { builtInKindStandard, builtInShopStandards } from './shop-standard-defaults.ts';

describe('shop standards over the built-in presets', () => {
  it.each(PRESET_NAMES)('when the built-in standard of %s is applied, then the preset comes back unchanged (so it opens with no changes)', (kind) => {
    expect(specFromShopStandard(builtInShopStandards(), kind)).toEqual(presetSpec(kind));
  });

  it('when the built-in document is parsed by its own schema, then it passes unchanged', () => {
    const doc = builtInShopStandards();
    expect(ShopStandardsSchema.parse(doc)).toEqual(doc);
  });

  it('when a collar standard sets allowance, ease, six holes and a 1 1/2 in buckle, then the new collar carries each', () => {
    const std = { ...builtInKindStandard('collar'), rule: { measure: 'blank' as const, allowanceMm: 190.5 }, easeMm: 12.7, holes: { count: 6, spacingMm: 19.05, diameterMm: 4.7625 }, buckleId: 'b' };
    const spec = applyKindStandard(presetSpec('collar'), std, [{ id: 'b', kind: 'buckle', name: 'Brass 1 1/2 in', insideWidthMm: 38.1, tongueLengthMm: 30, tongueWireMm: 4, unitCostCents: 250 }]);
    expect(spec.rule).toEqual({ measure: 'blank', allowanceMm: 190.5 });
    expect(spec.easeMm).toBe(12.7);
    expect(spec.hardware.buckle).toMatchObject({ insideWidthMm: 38.1, tongueLengthMm: 30, tongueWireMm: 4, style: 'centre-bar' });
    const end = spec.pieces[0]!.end;
    expect(end.kind === 'adjustable' && end.holes).toMatchObject({ count: 6, middleHole: 3 });
  });

  it('when a kind points at a buckle id the hardware list lacks, then the schema names the buckle field', () => {
    const doc = builtInShopStandards();
    doc.kinds.collar = { ...doc.kinds.collar!, buckleId: 'missing' };
    const r = ShopStandardsSchema.safeParse(doc);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]).toMatchObject({ path: ['kinds', 'collar', 'buckleId'], message: expect.stringMatching(/^Buckle must be/) });
  });
});
