import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { FormSection } from './form-section.tsx';
import { HardwarePick } from './hardware-pick.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

const BUCKLE_STYLES = [
  { value: 'centre-bar', label: 'Centre bar' },
  { value: 'heel-bar', label: 'Heel bar' },
  { value: 'roller', label: 'Roller' },
  { value: 'tongue-less', label: 'No tongue' },
  { value: 'none', label: 'No buckle' },
];

/** Buckle, D-rings and keepers; the buckle and rings may be picked from the shop's list. */
export function HardwareSection({ control, unit, disabled, setValue }: SectionProps & { setValue: SpecSetValue }) {
  const dirty = { shouldDirty: true, shouldValidate: true } as const;
  return (
    <FormSection title="Hardware" note="Strap width should match the buckle's inside width.">
      <HardwarePick
        label="Buckle from the shop's list"
        kinds={['buckle']}
        disabled={disabled}
        onPick={(item) => {
          if (item.buckleStyle) setValue('hardware.buckle.style', item.buckleStyle, dirty);
          if (item.insideWidthMm !== undefined) setValue('hardware.buckle.insideWidthMm', item.insideWidthMm, dirty);
          if (item.tongueLengthMm !== undefined) setValue('hardware.buckle.tongueLengthMm', item.tongueLengthMm, dirty);
          if (item.tongueWireMm !== undefined) setValue('hardware.buckle.tongueWireMm', item.tongueWireMm, dirty);
        }}
      />
      <SelectInput control={control} name="hardware.buckle.style" label="Buckle" options={BUCKLE_STYLES} disabled={disabled} />
      <LengthField control={control} name="hardware.buckle.insideWidthMm" label="Buckle inside width" unit={unit} disabled={disabled} />
      <LengthField control={control} name="hardware.buckle.tongueLengthMm" label="Tongue length" unit={unit} disabled={disabled} />
      <LengthField control={control} name="hardware.buckle.tongueWireMm" label="Tongue wire" unit={unit} disabled={disabled} />
      <HardwarePick
        label="D-rings from the shop's list"
        kinds={['d-ring', 'ring']}
        disabled={disabled}
        onPick={(item) => {
          if (item.insideWidthMm !== undefined) setValue('hardware.dRings.insideWidthMm', item.insideWidthMm, dirty);
          if (item.wireDiameterMm !== undefined) setValue('hardware.dRings.wireDiameterMm', item.wireDiameterMm, dirty);
        }}
      />
      <NumberField control={control} name="hardware.dRings.count" label="D-rings" unit="count" step={1} min={0} disabled={disabled} />
      <LengthField control={control} name="hardware.dRings.insideWidthMm" label="D-ring inside width" unit={unit} disabled={disabled} />
      <LengthField control={control} name="hardware.dRings.wireDiameterMm" label="D-ring wire" unit={unit} disabled={disabled} />
      <NumberField control={control} name="hardware.keepers" label="Keepers" unit="count" step={1} min={0} disabled={disabled} />
      <LengthField control={control} name="hardware.loopExtraMm" label="Hardware length in the loop" unit={unit} disabled={disabled} hint="E.g. a watch case from spring bar to spring bar." />
    </FormSection>
  );
}
