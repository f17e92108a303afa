import { useWatch } from 'react-hook-form';
import { EndFields } from './end-fields.tsx';
import { FormSection } from './form-section.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

/**
 * The strap piece's two ends: the buckle end (where every measure starts) and the tip, each
 * with how it is made (fold, loop, plain holes or adjustment holes), its holes, hardware
 * and shape. Other pieces' ends are under Pieces.
 */
export function StrapEndsSection({ control, unit, disabled, setValue }: SectionProps & { setValue: SpecSetValue }) {
  const pieces = useWatch({ control, name: 'pieces' });
  const index = pieces.findIndex((p) => p.role === 'strap');
  if (index < 0) return null;
  const props = { control, unit, disabled, setValue, index };
  return (
    <>
      <FormSection title="Buckle end" note="Every position on the pattern is measured from this end.">
        <EndFields {...props} end="start" what="Buckle end" />
      </FormSection>
      <FormSection title="Tip">
        <EndFields {...props} end="end" what="Tip" />
      </FormSection>
    </>
  );
}
