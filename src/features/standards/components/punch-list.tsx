import { useController, useFieldArray, useWatch, type FieldPath } from 'react-hook-form';
import type { ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { StandardLengthField, type StandardsControl } from './standard-length-field.tsx';

type Path = FieldPath<ShopStandardsInput>;

function TextInput({ control, name, label, disabled }: { control: StandardsControl; name: Path; label: string; disabled: boolean }) {
  const { field, fieldState } = useController({ control, name });
  return <TextField label={label} name={field.name} ref={field.ref} value={(field.value as string | undefined) ?? ''} error={fieldState.error?.message} disabled={disabled} onChange={(e) => field.onChange(e.target.value)} onBlur={field.onBlur} />;
}
function ShapeInput({ control, name, disabled }: { control: StandardsControl; name: Path; disabled: boolean }) {
  const { field } = useController({ control, name });
  return (
    <SelectField label="Shape" name={field.name} value={(field.value as string | undefined) ?? 'round'} disabled={disabled} onChange={(e) => field.onChange(e.target.value)}>
      <option value="round">Round</option>
      <option value="oblong">Oblong (slot)</option>
      <option value="other">Other</option>
    </SelectField>
  );
}

/** The punches on the shop's bench, by the number stamped on them and their diameter. */
export function PunchList({ control, disabled }: { control: StandardsControl; disabled: boolean }) {
  const { fields, append, remove } = useFieldArray({ control, name: 'punches', keyName: 'key' });
  const punches = useWatch({ control, name: 'punches' }) ?? [];
  const freshId = () => {
    let n = punches.length + 1;
    while (punches.some((p) => p.id === `punch-${n}`)) n += 1;
    return `punch-${n}`;
  };
  return (
    <div className="grid gap-3">
      <p className="text-xs text-hide-600">Diameters in millimetres: numbered punches differ by 1/64 in, finer than the inch fields show.</p>
      {fields.length === 0 && <p className="text-sm text-hide-600">No punches listed yet.</p>}
      <ul className="grid gap-2">
        {fields.map((f, i) => (
          <li key={f.key} className="grid grid-cols-2 items-end gap-x-3 gap-y-2 rounded-md border border-hide-200 bg-paper/60 p-3 sm:grid-cols-4" data-testid="punch-row">
            <TextInput control={control} name={`punches.${i}.number` as Path} label="Number" disabled={disabled} />
            <StandardLengthField control={control} name={`punches.${i}.diameterMm` as Path} label="Diameter" unit="mm" disabled={disabled} />
            <ShapeInput control={control} name={`punches.${i}.shape` as Path} disabled={disabled} />
            {!disabled && (
              <div>
                <Button size="sm" variant="ghost" onClick={() => remove(i)} aria-label={`Remove punch ${punches[i]?.number || i + 1}`}>
                  Remove
                </Button>
              </div>
            )}
          </li>
        ))}
      </ul>
      {!disabled && (
        <div>
          <Button size="sm" variant="secondary" onClick={() => append({ id: freshId(), diameterMm: 3.175, number: '', shape: 'round' })}>
            Add a punch
          </Button>
        </div>
      )}
    </div>
  );
}
