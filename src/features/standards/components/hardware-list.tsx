import { useController, useFieldArray, useWatch, type FieldPath } from 'react-hook-form';
import { HARDWARE_KIND_LABELS, HARDWARE_KINDS, type HardwareItem, type HardwareKind, type ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { MoneyField } from './money-field.tsx';
import { StandardLengthField, type StandardsControl } from './standard-length-field.tsx';


/** What a freshly typed item carries, so every field its type shows has a value. */
function itemOfKind(kind: HardwareKind, keep: Pick<HardwareItem, 'id' | 'name' | 'unitCostCents'>): HardwareItem {
  switch (kind) {
    case 'buckle':
      return { ...keep, kind, insideWidthMm: 25.4, tongueLengthMm: 24, tongueWireMm: 3, buckleStyle: 'centre-bar' };
    case 'd-ring':
    case 'ring':
    case 'slider':
    case 'swivel':
      return { ...keep, kind, insideWidthMm: 25.4, wireDiameterMm: 4 };
    case 'rivet':
    case 'snap':
      return { ...keep, kind, postLengthMm: 8 };
    default:
      return { ...keep, kind };
  }
}

/** A short id no other row has ("hw-3"). */
const freshId = (taken: string[]) => {
  let n = taken.length + 1;
  while (taken.includes(`hw-${n}`)) n += 1;
  return `hw-${n}`;
};

type Path = FieldPath<ShopStandardsInput>;

function HardwareRow({ control, index, unit, disabled, onRemove }: { control: StandardsControl; index: number; unit: LengthUnit; disabled: boolean; onRemove: () => void }) {
  const p = `hardware.${index}` as const;
  const { field } = useController({ control, name: p as Path });
  const item = field.value as HardwareItem;
  const { field: style } = useController({ control, name: `${p}.buckleStyle` as Path });
  const name = item.name || 'this item';
  return (
    <li className="grid grid-cols-1 gap-x-3 gap-y-3 rounded-md border border-hide-200 bg-paper/60 p-3 sm:grid-cols-2 lg:grid-cols-4" data-testid="hardware-row">
      <SelectField label="Type" value={item.kind} disabled={disabled} onChange={(e) => field.onChange(itemOfKind(e.target.value as HardwareKind, item))}>
        {HARDWARE_KINDS.map((k) => (
          <option key={k} value={k}>
            {HARDWARE_KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <NameField control={control} name={`${p}.name` as Path} disabled={disabled} />
      {item.kind === 'buckle' && (
        <>
          <StandardLengthField control={control} name={`${p}.insideWidthMm` as Path} label="Inside width" unit={unit} disabled={disabled} />
          <StandardLengthField control={control} name={`${p}.tongueLengthMm` as Path} label="Tongue length" unit={unit} optional disabled={disabled} />
          <StandardLengthField control={control} name={`${p}.tongueWireMm` as Path} label="Tongue wire" unit={unit} optional disabled={disabled} />
          <SelectField label="Frame" value={(style.value as string | undefined) ?? 'centre-bar'} disabled={disabled} onChange={(e) => style.onChange(e.target.value)}>
            <option value="centre-bar">Centre bar</option>
            <option value="heel-bar">Heel bar</option>
            <option value="roller">Roller</option>
            <option value="tongue-less">No tongue</option>
          </SelectField>
        </>
      )}
      {(item.kind === 'd-ring' || item.kind === 'ring' || item.kind === 'slider' || item.kind === 'swivel') && (
        <>
          <StandardLengthField control={control} name={`${p}.insideWidthMm` as Path} label="Inside width" unit={unit} disabled={disabled} />
          <StandardLengthField control={control} name={`${p}.wireDiameterMm` as Path} label="Wire thickness" unit={unit} optional disabled={disabled} />
        </>
      )}
      {(item.kind === 'rivet' || item.kind === 'snap') && <StandardLengthField control={control} name={`${p}.postLengthMm` as Path} label="Post length" unit={unit} disabled={disabled} />}
      <MoneyField control={control} name={`${p}.unitCostCents` as Path} label="Unit cost" disabled={disabled} hint="Each, in the shop's currency." />
      {!disabled && (
        <div className="flex items-end">
          <Button size="sm" variant="ghost" onClick={onRemove} aria-label={`Remove ${name}`}>
            Remove
          </Button>
        </div>
      )}
    </li>
  );
}

function NameField({ control, name, disabled }: { control: StandardsControl; name: Path; disabled: boolean }) {
  const { field, fieldState } = useController({ control, name });
  return <TextField label="Name" name={field.name} ref={field.ref} value={(field.value as string) ?? ''} error={fieldState.error?.message} disabled={disabled} onChange={(e) => field.onChange(e.target.value)} onBlur={field.onBlur} />;
}

/** The hardware the shop stocks: buckles, rings, snaps, rivets, each with its unit cost. */
export function HardwareList({ control, unit, disabled, onRemoved }: { control: StandardsControl; unit: LengthUnit; disabled: boolean; onRemoved: (id: string) => void }) {
  const { fields, append, remove } = useFieldArray({ control, name: 'hardware', keyName: 'key' });
  const items = useWatch({ control, name: 'hardware' }) ?? [];
  return (
    <div className="grid gap-3">
      {fields.length === 0 && <p className="text-sm text-hide-600">No hardware listed yet.</p>}
      <ul className="grid gap-3">
        {fields.map((f, i) => (
          <HardwareRow key={f.key} control={control} index={i} unit={unit} disabled={disabled} onRemove={() => {
              const id = items[i]?.id;
              remove(i);
              if (id) onRemoved(id);
            }}
          />
        ))}
      </ul>
      {!disabled && (
        <div>
          <Button size="sm" variant="secondary" onClick={() => append(itemOfKind('buckle', { id: freshId(items.map((h) => h.id)), name: '', unitCostCents: 0 }))}>
            Add hardware
          </Button>
        </div>
      )}
    </div>
  );
}
