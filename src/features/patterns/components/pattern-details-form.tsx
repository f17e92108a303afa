import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { PatternNameSchema, TagsSchema, type PatternView } from '@shared/schemas/library.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useUpdatePattern } from '../api/mutations.ts';

// The PATCH route's own field schemas; tags are typed as one comma-separated line.
const DetailsSchema = z.object({
  name: PatternNameSchema,
  tags: z.string().transform((s) => s.split(',').map((t) => t.trim()).filter(Boolean)).pipe(TagsSchema),
});

/** Renames a pattern and sets its tags (neither makes a new revision). */
export function PatternDetailsForm({ pattern, onDone }: { pattern: PatternView; onDone: () => void }) {
  const update = useUpdatePattern(pattern.id);
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(DetailsSchema),
    defaultValues: { name: pattern.name, tags: pattern.tags.join(', ') },
  });
  const onSubmit = handleSubmit(async (v) => {
    setFormError(undefined);
    try {
      await update.mutateAsync(v);
      onDone();
    } catch (err) {
      setFormError(applyServerErrors(err, setError, ['name', 'tags']));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Name and tags" className="grid w-full max-w-md gap-3 rounded-lg border border-hide-200 bg-white/80 p-4">
      {formError && (
        <Notice tone="danger" role="alert">
          {formError}
        </Notice>
      )}
      <TextField label="Pattern name" {...register('name')} error={formState.errors.name?.message} />
      <TextField label="Tags" hint="Separate with commas." {...register('tags')} error={formState.errors.tags?.message} />
      <div className="flex gap-2">
        <Button type="submit" size="sm" busy={formState.isSubmitting}>
          Save name and tags
        </Button>
        <Button size="sm" variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
