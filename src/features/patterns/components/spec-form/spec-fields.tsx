import { useWatch } from 'react-hook-form';
import { HardwareSection } from './hardware-section.tsx';
import { LeatherSection } from './leather-section.tsx';
import { MeasureSection } from './measure-section.tsx';
import { PiecesSection } from './pieces-section.tsx';
import { SizesSection } from './sizes-section.tsx';
import { StrapEndsSection } from './strap-ends-section.tsx';
import type { SpecControl, SpecSetValue } from './types.ts';

/** Every editable field of a strap spec, grouped as a maker thinks about the job. */
export function SpecFields({ control, setValue, disabled }: { control: SpecControl; setValue: SpecSetValue; disabled: boolean }) {
  const unit = useWatch({ control, name: 'units' });
  const props = { control, unit, disabled };
  return (
    <div className="grid gap-4">
      <MeasureSection {...props} setValue={setValue} />
      <LeatherSection {...props} setValue={setValue} />
      <StrapEndsSection {...props} setValue={setValue} />
      <HardwareSection {...props} setValue={setValue} />
      <PiecesSection {...props} setValue={setValue} />
      <SizesSection {...props} />
    </div>
  );
}
