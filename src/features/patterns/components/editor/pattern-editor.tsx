import { useState } from 'react';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import { StrapSpecSchema, type StrapSpec, type StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { isApiError } from '@/lib/api-client.ts';
import { specResolver } from '@/lib/spec-resolver.ts';
import { kindLabel } from '../../kinds.ts';
import { Panel } from '@/components/ui/panel.tsx';
import { buttonClass } from '@/components/ui/button.tsx';
import { useFetchLatest, useSaveRevision } from '../../api/mutations.ts';
import type { PatternDetail } from '../../api/queries.ts';
import { SpecFields } from '../spec-form/spec-fields.tsx';
import { StartValuesBar } from '../spec-form/start-values-bar.tsx';
import { Downloads } from './downloads.tsx';
import { PreviewDetails } from './live-preview.tsx';
import { BenchCard } from './bench-card.tsx';
import { BenchLayout } from './bench-layout.tsx';
import { useLiveDraft } from './use-live-draft.ts';
import { SavePanel, type Conflict } from './save-panel.tsx';
import { SharePanel } from './share-panel.tsx';
import { LeaveGuard } from './leave-guard.tsx';
import { sameSpec } from './same-spec.ts';

export interface PatternEditorProps {
  detail: PatternDetail;
  canEdit: boolean;
  /** Makers and owners create share links. */
  canShare: boolean;
}

/**
 * The pattern page's working area: the spec form beside the live preview, the save with a
 * note (compare-and-set on the ETag the form started from), and the downloads.
 */
export function PatternEditor({ detail, canEdit, canShare }: PatternEditorProps) {
  const id = detail.pattern.id;
  const spec = detail.head.spec as StrapSpec;
  // The revision this form started from; only a save or an explicit choice moves it.
  const [base, setBase] = useState({ etag: detail.etag, number: detail.head.number });
  const [conflict, setConflict] = useState<(Conflict & { detail: PatternDetail }) | null>(null);
  const [error, setError] = useState<string>();
  const [savedNumber, setSavedNumber] = useState<number | null>(null);
  // The files are of the revision the form is based on: its unit and its size run.
  const [savedSpec, setSavedSpec] = useState<{ units: StrapSpec['units']; sizes: StrapSpec['sizes'] }>({ units: spec.units, sizes: spec.sizes ?? [] });
  const save = useSaveRevision(id);
  const fetchLatest = useFetchLatest(id);

  const form = useForm<StrapSpecInput, unknown, StrapSpec>({ resolver: specResolver, mode: 'onChange', defaultValues: spec });
  const values = useWatch({ control: form.control });
  const blocked = !StrapSpecSchema.safeParse(values).success;
  const live = useLiveDraft(values, String(base.number));
  // isDirty alone stays true after a save of a size run (see sameSpec); both must agree.
  const dirty = form.formState.isDirty && !sameSpec(values, form.formState.defaultValues);

  // The server's messages already name the field by its label ("Size L (10 in): Tip holes: ...");
  // a save's or a trial print's refusal of `spec.<path>` goes beside that field.
  const placeSpecErrors = (fields: Record<string, string>) => {
    for (const [field, message] of Object.entries(fields)) {
      if (field.startsWith('spec.')) form.setError(field.slice('spec.'.length) as FieldPath<StrapSpecInput>, { type: 'server', message });
    }
  };

  const onSave = async (note: string): Promise<boolean> => {
    setError(undefined);
    const ok = await form.trigger();
    if (!ok) return false;
    try {
      const saved = await save.mutateAsync({ spec: form.getValues() as StrapSpec, note, etag: base.etag });
      setBase({ etag: saved.etag, number: saved.head.number });
      form.reset(saved.head.spec as StrapSpecInput);
      setSavedNumber(saved.head.number);
      const head = saved.head.spec as StrapSpec;
      setSavedSpec({ units: head.units, sizes: head.sizes ?? [] });
      return true;
    } catch (err) {
      if (isApiError(err, 412)) {
        const latest = await fetchLatest();
        setConflict({ number: latest.head.number, author: latest.head.author?.name ?? null, note: latest.head.note, detail: latest });
      } else {
        // A refused spec value (e.g. a size too short for its tip holes) goes beside its field too.
        if (isApiError(err, 400)) placeSpecErrors(err.fields ?? {});
        setError(err instanceof Error ? err.message : 'The save did not go through.');
      }
      return false;
    }
  };

  const savePanel = canEdit && (
    <Panel title="Save">
      <SavePanel
        dirty={dirty}
        blocked={blocked}
        saving={save.isPending}
        baseNumber={base.number}
        savedNumber={savedNumber}
        error={error}
        conflict={conflict}
        onSave={onSave}
        onKeepMine={() => {
          if (!conflict) return;
          setBase({ etag: conflict.detail.etag, number: conflict.number });
          const head = conflict.detail.head.spec as StrapSpec;
          setSavedSpec({ units: head.units, sizes: head.sizes ?? [] });
          setConflict(null);
        }}
        onTakeTheirs={() => {
          if (!conflict) return;
          setBase({ etag: conflict.detail.etag, number: conflict.number });
          const theirs = conflict.detail.head.spec as StrapSpec;
          setSavedSpec({ units: theirs.units, sizes: theirs.sizes ?? [] });
          form.reset(conflict.detail.head.spec as StrapSpecInput);
          setConflict(null);
        }}
      />
    </Panel>
  );
  const specForm = (
    <form aria-label="Pattern spec" onSubmit={(e) => e.preventDefault()} noValidate>
      <fieldset disabled={!canEdit} className="contents">
        <SpecFields control={form.control} setValue={form.setValue} disabled={!canEdit} />
      </fieldset>
    </form>
  );

  return (
    <>
      <LeaveGuard dirty={canEdit && dirty} />
      <BenchLayout
        readOnly={!canEdit}
        bench={
          <BenchCard
            live={live}
            actions={
              <>
                <a href="#print" className={buttonClass('primary', 'sm')} data-testid="bench-print">
                  Print
                </a>
                <span className="text-xs text-hide-600" data-testid="bench-state">
                  {!canEdit
                    ? 'Your role can read and print this pattern. A maker or the owner changes it.'
                    : dirty
                      ? `Changed since revision ${base.number}, not saved`
                      : `Revision ${base.number}`}
                </span>
              </>
            }
          />
        }
        form={
          canEdit ? (
            <>
              <StartValuesBar
                kind={detail.pattern.kind}
                kindName={kindLabel(detail.pattern.kind).toLowerCase()}
                dirty={dirty}
                // Keep the maker's name for the piece; everything else comes from the standard or preset.
                onLoad={(start) => form.reset({ ...start, name: form.getValues('name') ?? start.name }, { keepDefaultValues: true })}
              />
              {specForm}
            </>
          ) : (
            <details className="rounded-lg border border-hide-200 bg-white/70 px-4 py-3" data-testid="read-only-values">
              <summary className="cursor-pointer text-sm font-semibold text-hide-900">All values of revision {base.number}</summary>
              <div className="mt-3">{specForm}</div>
            </details>
          )
        }
        print={
          <Panel title="Print and download">
            <Downloads
              base={`/api/patterns/${id}/revisions/${base.number}`}
              kind={detail.pattern.kind}
              revisionNumber={base.number}
              unit={savedSpec.units}
              sizes={savedSpec.sizes.map((s) => s.name)}
              dirty={canEdit && dirty}
              {...(canEdit ? { trial: { patternId: id, values: () => form.getValues(), sizes: (values.sizes ?? []).map((s) => s?.name ?? ''), blocked, onSpecErrors: placeSpecErrors } } : {})}
            />
          </Panel>
        }
        actions={
          (savePanel || canShare) && (
            <>
              {savePanel}
              {canShare && (
                <Panel title="Share read-only">
                  <SharePanel patternId={id} headNumber={base.number} />
                </Panel>
              )}
            </>
          )
        }
        details={<PreviewDetails live={live} />}
      />
    </>
  );
}
