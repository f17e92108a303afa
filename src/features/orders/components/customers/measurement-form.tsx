import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { BODY_PARTS, BODY_PART_LABELS, MEASURE_METHODS, MEASURE_METHOD_LABELS, MeasurementSchema, type BodyPart, type GirthUnit, type MeasureMethod } from '@shared/schemas/orders.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { girthTextToMm } from '@/components/form/girth-text.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { useAddMeasurement } from '../../api/mutations.ts';
import { parseInto } from '../zod-to-form.ts';

interface Values {
  girth: string;
  unit: GirthUnit;
  part: BodyPart;
  method: MeasureMethod;
  note: string;
}

/** A girth taken at the bench: value in in, cm or mm, where on the body, and how. */
export function MeasurementForm({ wearerId, defaultPart, defaultUnit }: { wearerId: number; defaultPart: BodyPart; defaultUnit: GirthUnit }) {
  const add = useAddMeasurement(wearerId);
  const [problem, setProblem] = useState<string>();
  const { register, handleSubmit, setError, formState, reset, watch } = useForm<Values>({
    defaultValues: { girth: '', unit: defaultUnit, part: defaultPart, method: 'soft-tape', note: '' },
  });
  const unit = watch('unit');
  const submit = handleSubmit(async (v) => {
    setProblem(undefined);
    const body = parseInto(MeasurementSchema, { girthMm: girthTextToMm(v.girth, v.unit), unit: v.unit, part: v.part, method: v.method, note: v.note }, setError, '', { girthMm: 'girth' });
    if (!body) return;
    try {
      await add.mutateAsync(body);
      reset({ ...v, girth: '', note: '' });
    } catch (err) {
      if (err && typeof err === 'object' && 'fields' in err && (err as { fields?: Record<string, string> }).fields?.girthMm) {
        setError('girth', { message: (err as { fields: Record<string, string> }).fields.girthMm! });
        return;
      }
      setProblem(applyServerErrors(err, setError, ['unit', 'part', 'method', 'note']));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-4 sm:items-start" aria-label={`Add a measurement for wearer ${wearerId}`}>
      <TextField label="Girth" unit={unit} inputMode="decimal" autoComplete="off" {...register('girth')} error={formState.errors.girth?.message} />
      <SelectField label="Unit" {...register('unit')}>
        <option value="in">in</option>
        <option value="cm">cm</option>
        <option value="mm">mm</option>
      </SelectField>
      <SelectField label="Measured at" {...register('part')} error={formState.errors.part?.message}>
        {BODY_PARTS.map((p) => (
          <option key={p} value={p}>
            {BODY_PART_LABELS[p]}
          </option>
        ))}
      </SelectField>
      <SelectField label="How it was measured" {...register('method')} error={formState.errors.method?.message}>
        {MEASURE_METHODS.map((m) => (
          <option key={m} value={m}>
            {MEASURE_METHOD_LABELS[m]}
          </option>
        ))}
      </SelectField>
      <TextField label="Note" wrapperClassName="sm:col-span-3" {...register('note')} error={formState.errors.note?.message} />
      <Button type="submit" variant="secondary" busy={formState.isSubmitting} className="sm:mt-6">
        Add measurement
      </Button>
      {problem && (
        <Notice tone="danger" role="alert" className="sm:col-span-4">
          {problem}
        </Notice>
      )}
    </form>
  );
}
