import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { NoteSchema, PatternKindSchema, PatternNameSchema, TagsSchema } from '@shared/schemas/library.ts';
import { PRESET_NAMES, type PresetName } from '@shared/schemas/strap-spec.ts';
import { presetVariant } from '@shared/pattern/presets/index.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { cx } from '@/components/ui/cx.ts';
import { useCreatePattern } from '../../api/mutations.ts';
import { fetchStartSpec } from '../../api/start-spec.ts';
import { KIND_LABELS } from '../../kinds.ts';

// The create route's own field schemas; tags arrive as one comma-separated line.
const NewPatternSchema = z.object({
  kind: PatternKindSchema,
  name: PatternNameSchema,
  tags: z.string().transform((s) => s.split(',').map((t) => t.trim()).filter(Boolean)).pipe(TagsSchema),
  note: NoteSchema,
});

const DEFAULT_NOTE = 'Started from the shop’s standard.';

/**
 * Starts a pattern: pick the kind, name it, and revision 1 is saved from the shop's standard
 * for that kind (the built-in preset where the shop has set none).
 */
export function NewPatternForm({ initialKind, onCreated }: { initialKind: PresetName; onCreated: (id: number) => void }) {
  const create = useCreatePattern();
  const [formError, setFormError] = useState<string>();
  // A bag strap is made at one length or with a buckle to adjust it; the adjustable one starts
  // from the built-in adjustable preset (the shop's standard describes the fixed one).
  const [bagStrap, setBagStrap] = useState<'fixed' | 'adjustable'>('fixed');
  const { register, handleSubmit, setError, formState, control } = useForm({
    resolver: zodResolver(NewPatternSchema),
    defaultValues: { kind: initialKind, name: '', tags: '', note: DEFAULT_NOTE },
  });
  const kind = useWatch({ control, name: 'kind' });

  const onSubmit = handleSubmit(async (v) => {
    setFormError(undefined);
    try {
      const start = v.kind === 'bag-strap' && bagStrap === 'adjustable' ? presetVariant('bag-strap', 'adjustable') : (await fetchStartSpec(v.kind)).spec;
      const spec = { ...start, name: v.name };
      const note = v.note === DEFAULT_NOTE && v.kind === 'bag-strap' && bagStrap === 'adjustable' ? 'Started from the built-in adjustable bag strap.' : v.note;
      const created = await create.mutateAsync({ name: v.name, kind: v.kind, spec, note, tags: v.tags });
      onCreated(created.pattern.id);
    } catch (err) {
      setFormError(applyServerErrors(err, setError, ['name', 'kind', 'tags', 'note']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-6" aria-label="New pattern">
      {formError && (
        <Notice tone="danger" role="alert">
          {formError}
        </Notice>
      )}
      <fieldset>
        <legend className="mb-2 text-sm font-medium text-hide-900">Start from</legend>
        <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
          {PRESET_NAMES.map((k) => (
            <label
              key={k}
              className={cx(
                'flex cursor-pointer flex-col gap-1 rounded-lg border p-3 transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-brass-500',
                kind === k ? 'border-hide-600 bg-hide-50 shadow-sm' : 'border-hide-200 bg-white/70 hover:border-hide-400',
              )}
            >
              <span className="flex items-center gap-2 font-semibold text-hide-900">
                <input type="radio" value={k} className="accent-hide-700" {...register('kind')} />
                {KIND_LABELS[k].label}
              </span>
              <span className="text-xs text-hide-700">{KIND_LABELS[k].blurb}</span>
            </label>
          ))}
        </div>
      </fieldset>
      {kind === 'bag-strap' && (
        <fieldset>
          <legend className="mb-2 text-sm font-medium text-hide-900">Bag strap length</legend>
          <div className="flex flex-wrap gap-4 text-sm text-hide-900">
            <label className="flex items-center gap-2">
              <input type="radio" name="bag-strap-length" className="accent-hide-700" checked={bagStrap === 'fixed'} onChange={() => setBagStrap('fixed')} />
              One length (the shop’s standard)
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" name="bag-strap-length" className="accent-hide-700" checked={bagStrap === 'adjustable'} onChange={() => setBagStrap('adjustable')} />
              Adjustable: buckle and holes, swivel snaps at the ends
            </label>
          </div>
        </fieldset>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Pattern name" placeholder="Collar for Juniper" {...register('name')} error={formState.errors.name?.message} />
        <TextField label="Tags" hint="Separate with commas." placeholder="dogs, bridle" {...register('tags')} error={formState.errors.tags?.message} />
        <TextField label="Note for revision 1" wrapperClassName="sm:col-span-2" {...register('note')} error={formState.errors.note?.message} />
      </div>
      <div>
        <Button type="submit" busy={formState.isSubmitting}>
          Create pattern
        </Button>
      </div>
    </form>
  );
}
