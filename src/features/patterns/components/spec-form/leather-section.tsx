import { useWatch } from 'react-hook-form';
import { mmToOz, ozToMm } from '@shared/units/length.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { FormSection } from './form-section.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

const THICKNESS_UNITS = [
  { value: 'oz', label: 'Ounce weight' },
  { value: 'mm', label: 'Millimetres' },
];

/** Width, weight and the edge guide line. */
export function LeatherSection({ control, unit, disabled, setValue }: SectionProps & { setValue: SpecSetValue }) {
  const thickness = useWatch({ control, name: 'thickness' });
  const convert = (next: string) => {
    // Keep the same leather when the unit changes: 10 oz becomes 3.97 mm (1 oz = 1/64 in).
    const value = thickness.unit === 'oz' && next === 'mm' ? ozToMm(thickness.value) : thickness.unit === 'mm' && next === 'oz' ? mmToOz(thickness.value) : thickness.value;
    setValue('thickness.value', Math.round(value * 100) / 100, { shouldValidate: true, shouldDirty: true });
  };
  return (
    <FormSection title="Leather">
      <LengthField control={control} name="widthMm" label="Strap width" unit={unit} disabled={disabled} />
      <LengthField control={control} name="edgeGuideMm" label="Edge guide" unit={unit} disabled={disabled} hint="Line scribed in from the edge." />
      <NumberField control={control} name="thickness.value" label="Thickness" unit={thickness.unit} step={0.25} disabled={disabled} />
      <SelectInput control={control} name="thickness.unit" label="Thickness in" options={THICKNESS_UNITS} disabled={disabled} onChanged={convert} />
    </FormSection>
  );
}
