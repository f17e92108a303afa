import { useWatch } from 'react-hook-form';
import { LengthField } from '@/components/form/length-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { CheckboxInput } from '@/components/form/checkbox-input.tsx';
import { FormSection } from './form-section.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

const UNIT_OPTIONS = [
  { value: 'in', label: 'Inches' },
  { value: 'mm', label: 'Millimetres' },
];
const MODE_OPTIONS = [
  { value: 'rule', label: 'Shop rule' },
  { value: 'fit', label: 'Fitted: middle hole at girth + ease' },
];
// How the tape went round: a collar measured over two fingers already holds about 1 in of room.
const MEASURED_OPTIONS = [
  { value: 'snug', label: 'Snug, tape flat on the body' },
  { value: 'two-fingers', label: 'Loose, two fingers under the tape' },
];
const MEASURE_OPTIONS = [
  { value: 'blank', label: 'Blank = girth + allowance' },
  { value: 'nominal-hole', label: 'Bar to middle hole = girth + allowance' },
  { value: 'fixed', label: 'A fixed blank length' },
];

/** The measurement, how the length is found, and the unit everything is shown in. */
export function MeasureSection({ control, unit, disabled, setValue }: SectionProps & { setValue: SpecSetValue }) {
  const mode = useWatch({ control, name: 'mode' });
  const rule = useWatch({ control, name: 'rule' });
  const ruleOff = disabled || mode !== 'rule';

  // The rule's fields depend on what it measures: reshape it, keeping what carries over.
  const reshape = (measure: string) => {
    const allowanceMm = 'allowanceMm' in rule ? rule.allowanceMm : 0;
    const blankMm = 'blankMm' in rule ? rule.blankMm : 100;
    const next = measure === 'fixed' ? { measure: 'fixed' as const, blankMm } : { measure: measure as 'blank' | 'nominal-hole', allowanceMm };
    setValue('rule', next, { shouldDirty: true, shouldValidate: true });
  };

  return (
    <FormSection title="Measure">
      <LengthField control={control} name="girthMm" label="Girth" unit={unit} disabled={disabled} hint="Neck, waist or wrist, measured where it is worn." />
      <SelectInput control={control} name="girthMeasured" label="Girth measured" options={MEASURED_OPTIONS} disabled={disabled} />
      <LengthField control={control} name="easeMm" label="Ease" unit={unit} disabled={disabled} hint="Room added when the length is fitted." />
      <SelectInput control={control} name="mode" label="Length from" options={MODE_OPTIONS} disabled={disabled} wrapperClassName="col-span-2" />
      <SelectInput control={control} name="rule.measure" label="The shop rule" options={MEASURE_OPTIONS} disabled={ruleOff} wrapperClassName="col-span-2" onChanged={reshape} />
      {rule.measure === 'fixed' ? (
        <LengthField key="blank" control={control} name="rule.blankMm" label="Rule blank length" unit={unit} disabled={ruleOff} />
      ) : (
        <LengthField key="allowance" control={control} name="rule.allowanceMm" label="Rule allowance" unit={unit} disabled={ruleOff} />
      )}
      <SelectInput control={control} name="units" label="Show lengths in" options={UNIT_OPTIONS} disabled={disabled} />
      <div className="col-span-2">
        <CheckboxInput control={control} name="closes" label="Fastens round the body" hint="Buckled or snapped into a loop (a collar, a belt): the leather’s thickness is taken off the inside." disabled={disabled} />
      </div>
    </FormSection>
  );
}
