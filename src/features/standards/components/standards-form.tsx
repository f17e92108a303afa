import { useState } from 'react';
import { useForm, useWatch, type FieldErrors, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { PRESET_NAMES, type PresetName } from '@shared/schemas/strap-spec.ts';
import { ShopStandardsSchema, type ShopStandards, type ShopStandardsInput, type ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import { isApiError } from '@/lib/api-client.ts';
import { formatWhen } from '@/lib/format-when.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { useSaveStandards } from '../api/mutations.ts';
import { HardwareList } from './hardware-list.tsx';
import { KindStandardFields } from './kind-standard-fields.tsx';
import { resolverInUnit } from './messages-in-unit.ts';
import { PunchList } from './punch-list.tsx';

export interface StandardsFormProps {
  view: ShopStandardsView;
  /** Owners edit; makers and apprentices read. */
  canEdit: boolean;
  kindLabels: Record<PresetName, string>;
}

const resolver = resolverInUnit(zodResolver(ShopStandardsSchema), (v: ShopStandardsInput) => v.units ?? 'in');

/** The kinds whose standard holds an error (to switch to and to name). */
const kindsWithErrors = (errors: FieldErrors<ShopStandardsInput>) => PRESET_NAMES.filter((k) => errors.kinds?.[k]);

/** The Shop page's standards: per-kind starting values, hardware and punches. */
export function StandardsForm({ view, canEdit, kindLabels }: StandardsFormProps) {
  const save = useSaveStandards();
  const [kind, setKind] = useState<PresetName>('collar');
  const [notice, setNotice] = useState<{ tone: 'danger' | 'success'; text: string }>();
  const form = useForm<ShopStandardsInput, unknown, ShopStandards>({ resolver, mode: 'onChange', defaultValues: view.standards });
  const { control, setValue, getValues, formState } = form;
  const unit = useWatch({ control, name: 'units' }) ?? 'in';
  const hardware = useWatch({ control, name: 'hardware' }) ?? [];
  const disabled = !canEdit;

  const onRemovedHardware = (id: string) => {
    // A kind that used the removed item goes back to the preset's own hardware.
    for (const k of PRESET_NAMES) {
      const std = getValues(`kinds.${k}`);
      if (std?.buckleId === id) setValue(`kinds.${k}.buckleId`, null, { shouldDirty: true });
      if (std?.ringId === id) setValue(`kinds.${k}.ringId`, null, { shouldDirty: true });
    }
  };

  const onSubmit = form.handleSubmit(
    async (standards) => {
      setNotice(undefined);
      try {
        const saved = await save.mutateAsync(standards);
        form.reset(saved.standards);
        setNotice({ tone: 'success', text: 'Saved. New patterns start from these standards.' });
      } catch (err) {
        if (isApiError(err, 400) && err.fields) {
          for (const [field, message] of Object.entries(err.fields)) form.setError(field as FieldPath<ShopStandardsInput>, { type: 'server', message });
          const bad = kindsWithErrors(form.formState.errors);
          if (bad[0]) setKind(bad[0]);
        }
        setNotice({ tone: 'danger', text: err instanceof Error ? err.message : 'The save did not go through.' });
      }
    },
    (errors) => {
      const bad = kindsWithErrors(errors);
      if (bad[0] && !bad.includes(kind)) setKind(bad[0]);
      const where = [...bad.map((k) => `the ${kindLabels[k].toLowerCase()} standard`), ...(errors.hardware ? ['the hardware list'] : []), ...(errors.punches ? ['the punches'] : [])];
      setNotice({ tone: 'danger', text: `Nothing was saved: check ${where.length > 0 ? where.join(', ') : 'the marked fields'}.` });
    },
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Shop standards" className="grid gap-6">
      <Panel title="What new patterns start from">
        <div className="grid gap-4">
          <p className="text-sm text-hide-700">
            Each kind of strap starts from these values when a maker makes a new pattern. A maker can still change any of them in the pattern.
          </p>
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
            <SelectField label="Kind of strap" value={kind} onChange={(e) => setKind(e.target.value as PresetName)}>
              {PRESET_NAMES.map((k) => (
                <option key={k} value={k}>
                  {kindLabels[k]}
                  {formState.errors.kinds?.[k] ? ' (needs a look)' : ''}
                </option>
              ))}
            </SelectField>
            <SelectField label="Show lengths in" value={unit} onChange={(e) => setValue('units', e.target.value as 'in' | 'mm', { shouldDirty: canEdit })}>
              <option value="in">Inches</option>
              <option value="mm">Millimetres</option>
            </SelectField>
          </div>
          {/* Readers switch kinds and units to read; only the values below are locked for them. */}
          <fieldset disabled={disabled} className="contents">
            <KindStandardFields key={kind} control={control} kind={kind} unit={unit} hardware={hardware as ShopStandards['hardware']} disabled={disabled} />
          </fieldset>
        </div>
      </Panel>
      <fieldset disabled={disabled} className="contents">
        <Panel title="Hardware the shop stocks">
          <HardwareList control={control} unit={unit} disabled={disabled} onRemoved={onRemovedHardware} />
        </Panel>
        <Panel title="Punches">
          <PunchList control={control} disabled={disabled} />
        </Panel>
      </fieldset>
      <div className={canEdit ? 'sticky bottom-0 z-10 -mx-1 grid gap-2 rounded-lg border border-hide-200 bg-paper/95 px-4 py-3 shadow-md backdrop-blur' : 'grid gap-2 px-1'}>
        {notice && (
          <Notice tone={notice.tone} role={notice.tone === 'danger' ? 'alert' : 'status'}>
            {notice.text}
          </Notice>
        )}
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-sm text-hide-700">
            {view.updatedAt ? `Last changed ${formatWhen(view.updatedAt)}${view.updatedBy ? ` by ${view.updatedBy.name}` : ''}.` : 'The built-in standards: nobody has changed them yet.'}
          </p>
          {canEdit ? (
            <Button type="submit" busy={save.isPending} disabled={!formState.isDirty}>
              Save standards
            </Button>
          ) : (
            <p className="text-sm text-hide-600">Only an owner changes the standards.</p>
          )}
        </div>
      </div>
    </form>
  );
}
