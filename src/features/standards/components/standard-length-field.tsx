import type { ReactNode } from 'react';
import type { Control, FieldPath } from 'react-hook-form';
import type { LengthUnit } from '@shared/units/length.ts';
import type { ShopStandards, ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import { LengthField } from '@/components/form/length-field.tsx';

export type StandardsControl = Control<ShopStandardsInput, unknown, ShopStandards>;

/**
 * A length over a mm field of the standards form, in the Shop page's unit: the editor's own
 * LengthField (same parsing and wording). `optional` fields (a buckle's tongue, a rivet's post)
 * go back to "not given" when emptied.
 */
export function StandardLengthField(props: {
  control: StandardsControl;
  name: FieldPath<ShopStandardsInput>;
  label: ReactNode;
  unit: LengthUnit;
  hint?: ReactNode;
  optional?: boolean;
  disabled?: boolean;
  wrapperClassName?: string;
}) {
  return <LengthField {...props} />;
}
