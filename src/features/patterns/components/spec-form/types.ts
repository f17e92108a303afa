import type { Control, UseFormSetValue } from 'react-hook-form';
import type { StrapSpec, StrapSpecInput } from '@shared/schemas/strap-spec.ts';

/** The spec form holds the schema's input shape and hands the parsed spec to submit. */
export type SpecControl = Control<StrapSpecInput, unknown, StrapSpec>;
export type SpecSetValue = UseFormSetValue<StrapSpecInput>;

export interface SectionProps {
  control: SpecControl;
  /** The display unit for lengths ("in" or "mm"). */
  unit: 'in' | 'mm';
  /** Read-only for roles that may not edit (apprentices). */
  disabled: boolean;
}
