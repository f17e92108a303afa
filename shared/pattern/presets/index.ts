import type { PresetName, StrapSpec } from '../../schemas/strap-spec.ts';
import { bagStrapPreset } from './bag-strap.ts';
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
