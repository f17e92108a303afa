import type { PresetName } from '@shared/schemas/strap-spec.ts';

/** How each strap kind is named and described on screen. */
export const KIND_LABELS: Record<PresetName, { label: string; blurb: string }> = {
  collar: { label: 'Collar', blurb: 'Buckle end folded round a centre bar with D-rings; five holes at the tip.' },
  belt: { label: 'Belt', blurb: 'Heel-bar buckle on screws, a keeper, five holes an inch apart.' },
  'watch-strap': { label: 'Watch strap', blurb: 'Two pieces folded round spring bars, tapering lug to buckle.' },
  'bag-strap': { label: 'Bag strap', blurb: 'A shoulder strap folded round hardware at both ends.' },
  leash: { label: 'Leash', blurb: 'A handle loop folded back at one end, a snap at the other.' },
  bracelet: { label: 'Bracelet', blurb: 'A wrist band closed with a snap or a small buckle.' },
  keeper: { label: 'Keeper', blurb: 'A loop that holds the tail of a strap.' },
};

export function kindLabel(kind: string): string {
  return (KIND_LABELS as Record<string, { label: string } | undefined>)[kind]?.label ?? kind;
}
