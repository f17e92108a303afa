import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { FormSection } from './form-section.tsx';
import type { SectionProps } from './types.ts';

const BUCKLE_STYLES = [
  { value: 'centre-bar', label: 'Centre bar' },
  { value: 'heel-bar', label: 'Heel bar' },
  { value: 'roller', label: 'Roller' },
  { value: 'tongue-less', label: 'No tongue' },
  { value: 'none', label: 'No buckle' },
];

/** Buckle, D-rings and keepers. */
export function HardwareSection({ control, unit, disabled }: SectionProps) {
  return (
    <FormSection title="Hardware" note="Strap width should match the buckle's inside width.">
      <SelectInput control={control} name="hardware.buckle.style" label="Buckle" options={BUCKLE_STYLES} disabled={disabled} />
      <LengthField control={control} name="hardware.buckle.insideWidthMm" label="Buckle inside width" unit={unit} disabled={disabled} />
      <LengthField control={control} name="hardware.buckle.tongueLengthMm" label="Tongue length" unit={unit} disabled={disabled} />
      <LengthField control={control} name="hardware.buckle.tongueWireMm" label="Tongue wire" unit={unit} disabled={disabled} />
      <NumberField control={control} name="hardware.dRings.count" label="D-rings" unit="count" step={1} min={0} disabled={disabled} />
      <NumberField control={control} name="hardware.keepers" label="Keepers" unit="count" step={1} min={0} disabled={disabled} />
    </FormSection>
  );
}
