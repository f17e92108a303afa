import type { PresetName, StrapSpec } from '../../schemas/strap-spec.ts';
import { adjustableBagStrapPreset, bagStrapPreset } from './bag-strap.ts';
import { beltPreset } from './belt.ts';
import { braceletPreset } from './bracelet.ts';
import { collarPreset } from './collar.ts';
import { keeperPreset } from './keeper.ts';
import { leashPreset } from './leash.ts';
import { watchStrapPreset } from './watch-strap.ts';

const PRESETS: Record<PresetName, () => StrapSpec> = {
  collar: collarPreset,
  belt: beltPreset,
  'watch-strap': watchStrapPreset,
  'bag-strap': bagStrapPreset,
  leash: leashPreset,
  bracelet: braceletPreset,
  keeper: keeperPreset,
};

/** A fresh, complete spec for a preset (a new object each call; callers may edit it). */
export function presetSpec(name: PresetName): StrapSpec {
  return PRESETS[name]();
}

/** Other starting points within a kind, by name (the kind's own preset is `standard`). */
export const PRESET_VARIANTS = {
  'bag-strap': { standard: bagStrapPreset, adjustable: adjustableBagStrapPreset },
} as const satisfies Partial<Record<PresetName, Record<string, () => StrapSpec>>>;

/** A named variant of a kind's preset, e.g. presetVariant('bag-strap', 'adjustable'). */
export function presetVariant<K extends keyof typeof PRESET_VARIANTS>(kind: K, variant: keyof (typeof PRESET_VARIANTS)[K]): StrapSpec {
  return (PRESET_VARIANTS[kind][variant] as () => StrapSpec)();
}
