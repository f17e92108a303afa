import { useWatch } from 'react-hook-form';
import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { EndShapeFields } from './end-shape-fields.tsx';
import { FormSection } from './form-section.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

/**
 * The strap piece's two ends: the buckle end's fold, slot and shape, and the tip's shape and
 * adjustment holes. Other constructions (plain ends, fold-back loops) keep the preset's
 * values apart from their shape until the editor grows their own fields.
 */
export function StrapEndsSection({ control, unit, disabled, setValue }: SectionProps & { setValue: SpecSetValue }) {
  const pieces = useWatch({ control, name: 'pieces' });
  const index = pieces.findIndex((p) => p.role === 'strap');
  const strap = pieces[index];
  if (!strap) return null;
  const start = strap.start;
  const end = strap.end;
  const i = index;
  const shapeProps = { control, unit, disabled, setValue, index: i };
  return (
    <>
      <FormSection title="Buckle end">
        {start.kind === 'fold-over' && (
          <>
            <LengthField control={control} name={`pieces.${i}.start.foldAtMm`} label="Fold from the end" unit={unit} disabled={disabled} />
            <LengthField control={control} name={`pieces.${i}.start.barDiameterMm`} label="Bar diameter" unit={unit} disabled={disabled} />
            {start.slot && (
              <>
                <LengthField control={control} name={`pieces.${i}.start.slot.lengthMm`} label="Tongue slot length" unit={unit} disabled={disabled} />
                <LengthField control={control} name={`pieces.${i}.start.slot.widthMm`} label="Tongue slot width" unit={unit} disabled={disabled} />
              </>
            )}
          </>
        )}
        <EndShapeFields {...shapeProps} end="start" what="Buckle end" />
      </FormSection>
      <FormSection title="Tip">
        <EndShapeFields {...shapeProps} end="end" what="Tip" />
        {end.kind === 'adjustable' && (
          <>
            <NumberField control={control} name={`pieces.${i}.end.holes.count`} label="Holes" unit="count" step={1} min={1} disabled={disabled} />
            <NumberField
              control={control}
              name={`pieces.${i}.end.holes.nominalIndex`}
              label="Nominal hole"
              unit="0 = nearest the buckle"
              step={1}
              min={0}
              disabled={disabled}
            />
            <LengthField control={control} name={`pieces.${i}.end.holes.spacingMm`} label="Spacing" unit={unit} disabled={disabled} />
            <LengthField control={control} name={`pieces.${i}.end.holes.diameterMm`} label="Hole diameter" unit={unit} disabled={disabled} />
            <LengthField
              control={control}
              name={`pieces.${i}.end.holes.firstFromTipMm`}
              label="Last hole to tip"
              unit={unit}
              disabled={disabled}
              wrapperClassName="col-span-2"
              hint="About 2.5 × the width is the saddler's rule."
            />
          </>
        )}
      </FormSection>
    </>
  );
}
