import { useMemo, useState } from 'react';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import type { StrapSpec, StrapSpecInput } from '@shared/schemas/strap-spec.ts';
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
  // Every keystroke renders this component (the values feed the preview), so what does not
  // depend on them is kept in memoized elements below: the form's fields, the print, save and
  // share panels re-render only when their own inputs change, and the keystroke's render is
  // the bench card's drawing and little else.
  const values = useWatch({ control: form.control });
  const live = useLiveDraft(values, String(base.number));
  // The draft has parsed the values with StrapSpecSchema already: no second parse per keystroke.
  const blocked = live.draft.status === 'stopped' && live.draft.by === 'schema';
  // isDirty alone stays true after a save of a size run (see sameSpec); both must agree.
  const isDirty = form.formState.isDirty;
  const defaults = form.formState.defaultValues;
  const dirty = useMemo(() => isDirty && !sameSpec(values, defaults), [isDirty, values, defaults]);
  const sizeNames = JSON.stringify((values.sizes ?? []).map((s) => s?.name ?? ''));

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

  // Each slot lists what it reads that can change; `form`'s methods are stable.
  const kind = detail.pattern.kind;
  const actions = useMemo(
    () =>
      (canEdit || canShare) && (
        <>
          {canEdit && (
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
          )}
          {canShare && (
            <Panel title="Share read-only">
              <SharePanel patternId={id} headNumber={base.number} />
            </Panel>
          )}
        </>
      ),
    // onSave reads base, save and form; the rest are in the list.
    [canEdit, canShare, id, dirty, blocked, save.isPending, base, savedNumber, error, conflict],
  );
  // The fields themselves: rendered by their own subscriptions (useController, useWatch), never by this component's.
  const specForm = useMemo(
    () => (
      <form aria-label="Pattern spec" onSubmit={(e) => e.preventDefault()} noValidate>
        <fieldset disabled={!canEdit} className="contents">
          <SpecFields control={form.control} setValue={form.setValue} disabled={!canEdit} />
        </fieldset>
      </form>
    ),
    [canEdit, form],
  );
  const formSlot = useMemo(
    () =>
      canEdit ? (
        <>
          <StartValuesBar
            kind={kind}
            kindName={kindLabel(kind).toLowerCase()}
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
      ),
    [canEdit, kind, dirty, base.number, form, specForm],
  );
  const print = useMemo(
    () => (
      <Panel title="Print and download">
        <Downloads
          base={`/api/patterns/${id}/revisions/${base.number}`}
          kind={kind}
          revisionNumber={base.number}
          unit={savedSpec.units}
          sizes={savedSpec.sizes.map((s) => s.name)}
          dirty={canEdit && dirty}
          {...(canEdit ? { trial: { patternId: id, values: () => form.getValues(), sizes: JSON.parse(sizeNames) as string[], blocked, onSpecErrors: placeSpecErrors } } : {})}
        />
      </Panel>
    ),
    // placeSpecErrors reads only form.
    [id, kind, base.number, savedSpec, canEdit, dirty, sizeNames, blocked, form],
  );
  const benchActions = useMemo(
    () => (
      <>
        <a href="#print" className={buttonClass('primary', 'sm')} data-testid="bench-print">
          Print
        </a>
        <span className="text-xs text-hide-600" data-testid="bench-state">
          {!canEdit ? 'Your role can read and print this pattern. A maker or the owner changes it.' : dirty ? `Changed since revision ${base.number}, not saved` : `Revision ${base.number}`}
        </span>
      </>
    ),
    [canEdit, dirty, base.number],
  );

  return (
    <>
      <LeaveGuard dirty={canEdit && dirty} />
      <BenchLayout
        readOnly={!canEdit}
        bench={<BenchCard draft={live.draft} lastSvg={live.lastSvg} actions={benchActions} />}
        form={formSlot}
        print={print}
        actions={actions}
        details={<PreviewDetails draft={live.draft} />}
      />
    </>
  );
}
