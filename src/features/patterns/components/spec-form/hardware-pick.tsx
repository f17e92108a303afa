import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { HardwareItem } from '@shared/schemas/shop-standards.ts';
import { SelectField } from '@/components/ui/field.tsx';
import { shopListsQueryOptions } from '../../api/start-spec.ts';

/**
 * Picks an item of the shop's hardware list and hands it to `onPick`, which copies its
 * measures into the spec (the spec keeps the measures, not the choice, so the select
 * starts empty each time and the form stays clean until something is picked).
 */
export function HardwarePick({ label, kinds, disabled, onPick }: { label: string; kinds: ReadonlyArray<HardwareItem['kind']>; disabled: boolean; onPick: (item: HardwareItem) => void }) {
  const lists = useQuery(shopListsQueryOptions());
  const [picked, setPicked] = useState<string>();
  const items = (lists.data?.hardware ?? []).filter((h) => kinds.includes(h.kind));
  if (items.length === 0) return null;
  return (
    <SelectField
      label={label}
      value=""
      hint={picked ? `Measures copied from ${picked}.` : 'Copies its measures into the fields.'}
      disabled={disabled}
      wrapperClassName="col-span-2"
      onChange={(e) => {
        const item = items.find((h) => h.id === e.target.value);
        if (!item) return;
        onPick(item);
        setPicked(item.name);
      }}
    >
      <option value="">Choose from the shop&rsquo;s hardware…</option>
      {items.map((h) => (
        <option key={h.id} value={h.id}>
          {h.name}
        </option>
      ))}
    </SelectField>
  );
}
