import { useController, useWatch, type FieldPath } from 'react-hook-form';
import type { PresetName } from '@shared/schemas/strap-spec.ts';
import type { HardwareItem, KindStandard, ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { NumberField } from '@/components/form/number-field.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { StandardLengthField, type StandardsControl } from './standard-length-field.tsx';
import { StandardShapeFields } from './standard-shape-fields.tsx';

const MEASURES = [
  { value: 'blank', label: 'Blank = measured length + allowance' },
  { value: 'nominal-hole', label: 'Buckle bar to middle hole = measured length + allowance' },
  { value: 'fixed', label: 'A fixed blank length' },
];
const RING_KINDS: ReadonlyArray<HardwareItem['kind']> = ['d-ring', 'ring', 'slider', 'swivel'];

type Path = FieldPath<ShopStandardsInput>;

/** Picks a hardware item by id; "" (the preset's own) is stored as null. */
function HardwarePick({ control, name, label, items, disabled }: { control: StandardsControl; name: Path; label: string; items: HardwareItem[]; disabled: boolean }) {
  const { field, fieldState } = useController({ control, name });
  return (
    <SelectField label={label} name={field.name} value={(field.value as string | null) ?? ''} error={fieldState.error?.message} disabled={disabled} onChange={(e) => field.onChange(e.target.value === '' ? null : e.target.value)}>
      <option value="">As the built-in preset has it</option>
      {items.map((h) => (
        <option key={h.id} value={h.id}>
          {h.name}
        </option>
      ))}
    </SelectField>
  );
}

/** One kind's standard: the length rule, ease, width, holes, end shapes, stitching, hardware. */
export function KindStandardFields({ control, kind, unit, hardware, disabled }: { control: StandardsControl; kind: PresetName; unit: LengthUnit; hardware: HardwareItem[]; disabled: boolean }) {
  const p = `kinds.${kind}` as const;
  const std = useWatch({ control, name: p as Path }) as KindStandard | undefined;
  const { field: rule } = useController({ control, name: `${p}.rule` as Path });
  if (!std) return null;
  const r = std.rule;
  const onMeasure = (measure: string) => {
    const allowanceMm = 'allowanceMm' in r ? r.allowanceMm : 0;
    const blankMm = 'blankMm' in r ? r.blankMm : 100;
    rule.onChange(measure === 'fixed' ? { measure: 'fixed', blankMm } : { measure, allowanceMm });
  };
  const buckles = hardware.filter((h) => h.kind === 'buckle');
  const rings = hardware.filter((h) => RING_KINDS.includes(h.kind));
  return (
    <div className="grid grid-cols-1 gap-x-3 gap-y-3 sm:grid-cols-2" data-testid={`kind-standard-${kind}`}>
      <SelectField label="Length rule" wrapperClassName="sm:col-span-2" value={r.measure} disabled={disabled} onChange={(e) => onMeasure(e.target.value)}>
        {MEASURES.map((m) => (
          <option key={m.value} value={m.value}>
            {m.label}
          </option>
        ))}
      </SelectField>
      {r.measure === 'fixed' ? (
        <StandardLengthField key="blank" control={control} name={`${p}.rule.blankMm` as Path} label="Blank length" unit={unit} disabled={disabled} />
      ) : (
        <StandardLengthField key="allowance" control={control} name={`${p}.rule.allowanceMm` as Path} label="Allowance" unit={unit} disabled={disabled} hint="Added to the measured length." />
      )}
      <StandardLengthField control={control} name={`${p}.easeMm` as Path} label="Ease" unit={unit} disabled={disabled} hint="Room added when holes are placed to fit." />
      <StandardLengthField control={control} name={`${p}.widthMm` as Path} label="Width" unit={unit} disabled={disabled} />
      <StandardLengthField control={control} name={`${p}.edgeGuideMm` as Path} label="Edge guide" unit={unit} disabled={disabled} hint="Line scribed in from the edge." />
      <StandardLengthField control={control} name={`${p}.stitchPitchMm` as Path} label="Stitch pitch" unit="mm" disabled={disabled} hint="Prong spacing of the pricking iron; irons are sold by it in mm." />
      {std.holes && (
        <>
          <NumberField control={control} name={`${p}.holes.count` as Path} label="Number of holes" step={1} min={1} disabled={disabled} />
          <StandardLengthField control={control} name={`${p}.holes.spacingMm` as Path} label="Hole spacing" unit={unit} disabled={disabled} />
          <StandardLengthField control={control} name={`${p}.holes.diameterMm` as Path} label="Hole size" unit={unit} disabled={disabled} />
        </>
      )}
      <StandardShapeFields control={control} path={`${p}.buckleEndShape`} widthMm={std.widthMm} label="Buckle end shape" unit={unit} disabled={disabled} />
      <StandardShapeFields control={control} path={`${p}.tipShape`} widthMm={std.widthMm} label="Tip shape" unit={unit} disabled={disabled} />
      <HardwarePick control={control} name={`${p}.buckleId` as Path} label="Buckle" items={buckles} disabled={disabled} />
      <HardwarePick control={control} name={`${p}.ringId` as Path} label="D-ring or ring" items={rings} disabled={disabled} />
    </div>
  );
}
