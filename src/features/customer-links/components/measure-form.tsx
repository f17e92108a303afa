import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { MEASURE_METHODS, MEASURE_METHOD_LABELS, formatGirth, measureAnswerSchema, type MeasureMethod } from '@shared/schemas/orders.ts';
import type { MeasureAnswered, MeasurePage } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { cx } from '@/components/ui/cx.ts';
import { girthTextToMm } from '@/components/form/girth-text.ts';
import { ApiError } from '@/lib/api-client.ts';
import { useAnswerMeasurement } from '../api/mutations.ts';

interface Values {
  unit: 'in' | 'cm';
  girth: string;
  confirmGirth: string;
  method: MeasureMethod;
  note: string;
}

/** The schema's and the server's names for the two readings, and the inputs they belong to. */
const RENAME: Record<string, keyof Values> = { girthMm: 'girth', confirmGirthMm: 'confirmGirth' };

/**
 * Two readings of the girth in inches or centimetres, checked with the same per-kind schema
 * the server uses (range and agreement), every message naming the field and the range in the
 * unit on screen.
 */
export function MeasureForm({ token, page, onAnswered }: { token: string; page: MeasurePage; onAnswered: (a: MeasureAnswered) => void }) {
  const answer = useAnswerMeasurement(token);
  const [problem, setProblem] = useState<string>();
  const { register, handleSubmit, setError, clearErrors, formState, watch } = useForm<Values>({
    defaultValues: { unit: page.unit, girth: '', confirmGirth: '', method: 'soft-tape', note: '' },
  });
  const unit = watch('unit');
  const range = `Between ${formatGirth(page.minMm, unit)} and ${formatGirth(page.maxMm, unit)}.`;
  const submit = handleSubmit(async (v) => {
    setProblem(undefined);
    const body = { unit: v.unit, girthMm: girthTextToMm(v.girth, v.unit), confirmGirthMm: girthTextToMm(v.confirmGirth, v.unit), method: v.method, note: v.note };
    const parsed = measureAnswerSchema(page.pieceKind).safeParse(body);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const key = String(issue.path[0] ?? '');
        setError(RENAME[key] ?? (key as keyof Values), { message: issue.message });
      }
      return;
    }
    try {
      onAnswered(await answer.mutateAsync(parsed.data));
    } catch (err) {
      if (err instanceof ApiError && err.fields) {
        for (const [k, message] of Object.entries(err.fields)) setError(RENAME[k] ?? (k as keyof Values), { message });
      }
      setProblem(err instanceof ApiError ? err.message : 'Your measurement was not sent. Try again.');
    }
  });
  return (
    <form onSubmit={submit} noValidate className="grid gap-4" aria-label="Your measurement">
      <fieldset className="grid gap-1">
        <legend className="text-sm font-medium text-hide-900">Your tape reads in</legend>
        <div className="inline-flex w-fit rounded-md ring-1 ring-hide-300">
          {(['in', 'cm'] as const).map((u) => (
            <label key={u} className={cx('cursor-pointer px-4 py-2 text-sm font-medium first:rounded-l-md last:rounded-r-md', unit === u ? 'bg-hide-800 text-paper' : 'text-hide-800')}>
              <input type="radio" value={u} className="sr-only" {...register('unit', { onChange: () => clearErrors(['girth', 'confirmGirth']) })} />
              {u === 'in' ? 'inches' : 'centimetres'}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label={`${page.where.charAt(0).toUpperCase()}${page.where.slice(1)} girth`} unit={unit} inputMode="decimal" autoComplete="off" hint={range} {...register('girth')} error={formState.errors.girth?.message} />
        <TextField label="Second reading" unit={unit} inputMode="decimal" autoComplete="off" hint="Measure again from the start." {...register('confirmGirth')} error={formState.errors.confirmGirth?.message} />
      </div>
      <SelectField label="How you measured" {...register('method')} error={formState.errors.method?.message}>
        {MEASURE_METHODS.filter((m) => m !== 'estimate').map((m) => (
          <option key={m} value={m}>
            {MEASURE_METHOD_LABELS[m]}
          </option>
        ))}
      </SelectField>
      <TextAreaField label="Anything we should know" hint="Still growing? Thick ruff? Wears it over a jumper?" {...register('note')} error={formState.errors.note?.message} />
      {problem && (
        <Notice tone="danger" role="alert">
          {problem}
        </Notice>
      )}
      <div>
        <Button type="submit" busy={formState.isSubmitting}>
          Send my measurement
        </Button>
      </div>
    </form>
  );
}
