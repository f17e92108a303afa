import { useMemo } from 'react';
import { useController, useFieldArray, useWatch } from 'react-hook-form';
import { SIZES_MAX, SIZE_NAME_MAX_CHARS, StrapSpecSchema } from '@shared/schemas/strap-spec.ts';
import { describeSpecIssue } from '@shared/schemas/spec-messages.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import type { SectionProps, SpecControl } from './types.ts';

// A new size steps up from the last one by a common grading step (2 in or 50 mm; common practice).
const STEP_MM = { in: 50.8, mm: 50 } as const;
const NAMES = ['XS', 'S', 'M', 'L', 'XL', 'XXL'];

function SizeName({ control, index, disabled }: { control: SpecControl; index: number; disabled: boolean }) {
  const { field, fieldState } = useController({ control, name: `sizes.${index}.name` });
  return (
    <TextField
      label={`Size ${index + 1} name`}
      error={fieldState.error?.message}
      name={field.name}
      ref={field.ref}
      value={field.value}
      maxLength={SIZE_NAME_MAX_CHARS}
      disabled={disabled}
      autoComplete="off"
      onChange={(e) => field.onChange(e.target.value)}
      onBlur={field.onBlur}
    />
  );
}

type SizeOverrides = { widthMm?: unknown; holes?: { count?: unknown; spacingMm?: unknown } | null; hardware?: { buckleInsideWidthMm?: unknown } | null };
const given = (v: unknown) => v !== undefined && v !== null && v !== '';
/**
 * Whether the size overrides anything. A saved size comes back with empty override groups
 * ({ holes: {} }), so the groups' values are what count: opening every size's grading after a
 * save, empty or not, buried the run under closed-looking-but-open boxes.
 */
const hasGrading = (s: SizeOverrides | undefined) => !!s && (given(s.widthMm) || given(s.holes?.count) || given(s.holes?.spacingMm) || given(s.hardware?.buckleInsideWidthMm));

/**
 * What this size grades besides its girth: width, tip holes and buckle. Left empty, a value
 * comes from the pattern (the buckle and D-rings follow a graded width).
 */
function SizeGrading({ control, index: i, unit, disabled, open }: { control: SpecControl; index: number; unit: SectionProps['unit']; disabled: boolean; open: boolean }) {
  const n = i + 1;
  return (
    <details className="col-span-3 rounded-md border border-hide-100 px-3 py-2" open={open}>
      <summary className="cursor-pointer text-sm text-hide-700">Width, holes and buckle of size {n}</summary>
      <p className="mt-1 text-xs text-hide-600">Empty: as the pattern. The buckle and D-rings follow the width unless set here.</p>
      <div className="mt-2 grid grid-cols-2 gap-3">
        <LengthField control={control} name={`sizes.${i}.widthMm`} label={`Size ${n} width`} unit={unit} disabled={disabled} optional />
        <NumberField control={control} name={`sizes.${i}.holes.count`} label={`Size ${n} holes`} unit="count" step={1} min={1} disabled={disabled} optional />
        <LengthField control={control} name={`sizes.${i}.holes.spacingMm`} label={`Size ${n} hole spacing`} unit={unit} disabled={disabled} optional />
        <LengthField control={control} name={`sizes.${i}.hardware.buckleInsideWidthMm`} label={`Size ${n} buckle inside width`} unit={unit} disabled={disabled} optional />
      </div>
    </details>
  );
}

/**
 * The size run graded from this pattern: named girths, printed one at a time or all
 * together. The run's fit ranges are shown beside the preview.
 */
export function SizesSection({ control, unit, disabled }: SectionProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'sizes' });
  const sizes = useWatch({ control, name: 'sizes' }) ?? [];
  const girth = useWatch({ control, name: 'girthMm' });
  // The run's own refusals (unique names, at most 12) belong to no row: ask the shared schema
  // for the array's issues directly, since the resolver files them under no input.
  const rootError = useMemo(() => {
    const r = StrapSpecSchema.shape.sizes.safeParse(sizes);
    const issue = r.success ? undefined : r.error.issues.find((i) => i.path.length === 0);
    return issue ? describeSpecIssue({ ...issue, path: ['sizes'] }, { sizes }) : undefined;
  }, [sizes]);

  const addSize = () => {
    const last = sizes[sizes.length - 1];
    const girthMm = last && Number.isFinite(last.girthMm) ? last.girthMm + STEP_MM[unit] : Number.isFinite(girth) ? girth : 300;
    const taken = new Set(sizes.map((s) => s.name.toLowerCase()));
    const name = NAMES.find((n) => !taken.has(n.toLowerCase())) ?? `Size ${sizes.length + 1}`;
    append({ name, girthMm: Math.round(girthMm * 1000) / 1000 });
  };

  return (
    <fieldset className="rounded-lg border border-hide-200 bg-white/70 px-4 pt-2 pb-4">
      <legend className="px-1.5 text-xs font-semibold uppercase tracking-widest text-hide-600">Sizes</legend>
      <p className="mb-3 text-xs text-hide-600">
        The same pattern graded to other girths (at most {SIZES_MAX}). Each prints on its own, or all together.
      </p>
      {fields.length === 0 && <p className="mb-3 text-sm text-hide-700">No size run: the pattern prints at its own girth.</p>}
      <ol className="grid gap-3">
        {fields.map((f, i) => (
          <li key={f.id} className="grid grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] items-start gap-3" data-testid="size-row">
            <SizeName control={control} index={i} disabled={disabled} />
            <LengthField control={control} name={`sizes.${i}.girthMm`} label={`Size ${i + 1} girth`} unit={unit} disabled={disabled} />
            <Button
              size="sm"
              variant="ghost"
              className="mt-6"
              disabled={disabled}
              aria-label={`Remove size ${sizes[i]?.name || i + 1}`}
              onClick={() => remove(i)}
            >
              Remove
            </Button>
            <SizeGrading control={control} index={i} unit={unit} disabled={disabled} open={hasGrading(sizes[i])} />
          </li>
        ))}
      </ol>
      {rootError && (
        <p role="alert" className="mt-2 text-sm font-medium text-thread-700">
          {rootError}
        </p>
      )}
      <div className="mt-3">
        <Button size="sm" variant="secondary" disabled={disabled || fields.length >= SIZES_MAX} onClick={addSize}>
          Add a size
        </Button>
      </div>
    </fieldset>
  );
}
