import { useWatch } from 'react-hook-form';
import type { EndSpec } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Button } from '@/components/ui/button.tsx';
import { AdjustableHoleFields } from './adjustable-hole-fields.tsx';
import { EndShapeFields } from './end-shape-fields.tsx';
import { HardwarePick } from './hardware-pick.tsx';
import { HoleList } from './hole-list.tsx';
import { reshapeConstruction, type Construction } from './reshape-construction.ts';
import type { SectionProps, SpecSetValue } from './types.ts';

const CONSTRUCTIONS: Array<{ value: Construction; label: string; tipOnly?: boolean }> = [
  { value: 'fold-over', label: 'Folded round a bar (buckle, ring, spring bar)' },
  { value: 'fold-back', label: 'Folded back into a loop (handle, snap loop)' },
  { value: 'plain', label: 'Plain, with holes for rivets, screws or snaps' },
  { value: 'adjustable', label: 'Adjustment holes for a buckle tongue', tipOnly: true },
];
const DEFAULT_HOLE_MM = 3.175;

/** How one end of a piece is made, its holes, its hardware and its shape. */
export function EndFields({ control, unit, disabled, setValue, index, end, what }: SectionProps & { setValue: SpecSetValue; index: number; end: 'start' | 'end'; what: string }) {
  const spec = useWatch({ control, name: `pieces.${index}.${end}` }) as EndSpec;
  const width = useWatch({ control, name: 'widthMm' });
  const p = `pieces.${index}.${end}` as const;
  const set = (next: EndSpec) => setValue(p, next, { shouldDirty: true, shouldValidate: true });
  const dirty = { shouldDirty: true, shouldValidate: true } as const;
  return (
    <>
      <SelectField
        label={`${what}: how it is made`}
        wrapperClassName="col-span-2"
        value={spec.kind}
        disabled={disabled}
        onChange={(e) => set(reshapeConstruction(spec, e.target.value as Construction, width))}
      >
        {CONSTRUCTIONS.filter((c) => end === 'end' || !c.tipOnly).map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </SelectField>
      {spec.kind === 'fold-over' && (
        <>
          <HardwarePick
            label="Hardware at this end"
            kinds={['buckle', 'd-ring', 'ring', 'slider', 'swivel']}
            disabled={disabled}
            onPick={(item) => {
              if (item.kind === 'buckle') {
                if (item.insideWidthMm !== undefined) setValue('hardware.buckle.insideWidthMm', item.insideWidthMm, dirty);
                if (item.tongueLengthMm !== undefined) setValue('hardware.buckle.tongueLengthMm', item.tongueLengthMm, dirty);
                if (item.tongueWireMm !== undefined) setValue('hardware.buckle.tongueWireMm', item.tongueWireMm, dirty);
                if (item.buckleStyle) setValue('hardware.buckle.style', item.buckleStyle, dirty);
              } else {
                if (item.wireDiameterMm !== undefined) setValue(`${p}.barDiameterMm`, item.wireDiameterMm, dirty);
                if (item.kind === 'd-ring' && item.insideWidthMm !== undefined) setValue('hardware.dRings.insideWidthMm', item.insideWidthMm, dirty);
                if (item.kind === 'd-ring' && item.wireDiameterMm !== undefined) setValue('hardware.dRings.wireDiameterMm', item.wireDiameterMm, dirty);
              }
            }}
          />
          <LengthField control={control} name={`${p}.foldAtMm`} label="Fold from the end" unit={unit} disabled={disabled} />
          <LengthField control={control} name={`${p}.barDiameterMm`} label="Bar thickness" unit={unit} disabled={disabled} hint="The buckle bar or ring wire the leather wraps." />
          {spec.slot ? (
            <>
              <LengthField control={control} name={`${p}.slot.lengthMm`} label="Tongue slot length" unit={unit} disabled={disabled} />
              <LengthField control={control} name={`${p}.slot.widthMm`} label="Tongue slot width" unit={unit} disabled={disabled} />
              {!disabled && (
                <div className="col-span-2">
                  <Button size="sm" variant="ghost" onClick={() => set({ ...spec, slot: null })}>
                    Remove the tongue slot
                  </Button>
                </div>
              )}
            </>
          ) : (
            !disabled && (
              <div className="col-span-2">
                <Button size="sm" variant="ghost" onClick={() => set({ ...spec, slot: { lengthMm: 25.4, widthMm: 4.7625 } })}>
                  Add a tongue slot
                </Button>
              </div>
            )
          )}
          <HoleList control={control} unit={unit} disabled={disabled} name={`${p}.flapHoles`} title="Holes through both layers" hint="Each is punched again where the fold brings it over the body." defaultDiameterMm={DEFAULT_HOLE_MM} />
          <HoleList control={control} unit={unit} disabled={disabled} name={`${p}.bodyHoles`} title="Holes through one layer" defaultDiameterMm={DEFAULT_HOLE_MM} />
        </>
      )}
      {spec.kind === 'adjustable' && <AdjustableHoleFields control={control} unit={unit} disabled={disabled} index={index} />}
      {spec.kind === 'plain' && <HoleList control={control} unit={unit} disabled={disabled} name={`${p}.holes`} title="Holes" defaultDiameterMm={DEFAULT_HOLE_MM} />}
      {spec.kind === 'fold-back' && (
        <>
          <LengthField control={control} name={`${p}.loopInnerMm`} label="Loop, inside length" unit={unit} disabled={disabled} />
          <LengthField control={control} name={`${p}.overlapMm`} label="Flap held down" unit={unit} disabled={disabled} hint="How much of the folded-back end lies on the strap." />
          <HoleList control={control} unit={unit} disabled={disabled} name={`${p}.flapHoles`} title="Holes through both layers" defaultDiameterMm={DEFAULT_HOLE_MM} />
        </>
      )}
      <EndShapeFields control={control} unit={unit} disabled={disabled} setValue={setValue} index={index} end={end} what={what} />
    </>
  );
}
