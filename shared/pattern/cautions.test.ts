import { describe, expect, it } from 'vitest';
import { cautionKind, cautionLine, cautionsFor } from './cautions.ts';

// The caution list follows the trade's usual cautions (TRADE.md "Cautions the product shows").
describe('cautions', () => {
  it('when the pattern is a collar, then the two-finger fit and breakaway cautions are in, the load one is not', () => {
    const c = cautionsFor(cautionKind('collar'));
    expect(c.join(' ')).toMatch(/two fingers/);
    expect(c.join(' ')).toMatch(/breakaway collars for cats/);
    expect(c.join(' ')).not.toMatch(/holds weight or restrains/);
  });

  it('when the pattern holds weight (leash, bag strap), then the maker-judgement and local-codes caution is in', () => {
    for (const kind of ['leash', 'bag-strap', 'guitar strap']) expect(cautionsFor(cautionKind(kind)).join(' '), kind).toMatch(/local codes and licensed practice/);
  });

  it('when any kind prints, then blades, punches and solvents are always cautioned, in full and in the one-line form', () => {
    for (const kind of ['belt', 'collar', 'leash', 'watch-strap']) {
      const full = cautionsFor(cautionKind(kind)).join(' ');
      expect(full).toMatch(/cutting mat/);
      expect(full).toMatch(/punching surface/);
      expect(full).toMatch(/safety data sheet/);
      expect(cautionLine(cautionKind(kind))).toMatch(/^Caution: cut away from you on a mat/);
    }
  });
});
