import { useWatch } from 'react-hook-form';
import { LengthField } from '@/components/form/length-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { CheckboxInput } from '@/components/form/checkbox-input.tsx';
import { FormSection } from './form-section.tsx';
import type { SectionProps } from './types.ts';

const UNIT_OPTIONS = [
  { value: 'in', label: 'Inches' },
  { value: 'mm', label: 'Millimetres' },
];
const MODE_OPTIONS = [
  { value: 'rule', label: 'Shop rule: girth + allowance' },
  { value: 'fit', label: 'Fit: girth + ease, thickness counted' },
];
const MEASURE_OPTIONS = [
  { value: 'blank', label: 'Whole blank' },
  { value: 'nominal-hole', label: 'Bar to the middle hole' },
];

/** The measurement, how the length is found, and the unit everything is shown in. */
export function MeasureSection({ control, unit, disabled }: SectionProps) {
  const mode = useWatch({ control, name: 'mode' });
  return (
    <FormSection title="Measure">
      <LengthField control={control} name="girthMm" label="Girth" unit={unit} disabled={disabled} hint="Neck, waist or wrist, measured where it is worn." />
      <LengthField control={control} name="easeMm" label="Ease" unit={unit} disabled={disabled} hint="Room added in fit mode." />
      <SelectInput control={control} name="mode" label="Length from" options={MODE_OPTIONS} disabled={disabled} wrapperClassName="col-span-2" />
      <SelectInput control={control} name="rule.measure" label="Rule measures" options={MEASURE_OPTIONS} disabled={disabled || mode !== 'rule'} />
      <LengthField control={control} name="rule.allowanceMm" label="Rule allowance" unit={unit} disabled={disabled || mode !== 'rule'} />
      <SelectInput control={control} name="units" label="Show lengths in" options={UNIT_OPTIONS} disabled={disabled} />
      <div className="flex items-end pb-2">
        <CheckboxInput control={control} name="closes" label="Closes round the body" hint="Counts the thickness in the loop." disabled={disabled} />
      </div>
    </FormSection>
  );
}
