import { useState } from 'react';
import type { PresetName, StrapSpec } from '@shared/schemas/strap-spec.ts';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { fetchStartSpec } from '../../api/start-spec.ts';

type Source = 'standard' | 'preset';
const SOURCE_LABEL: Record<Source, string> = { standard: 'the shop’s standard', preset: 'the built-in preset' };

/**
 * "Start again" from the shop's standard or the built-in preset. An edited form asks first:
 * loading replaces every value, and the unsaved ones would be gone.
 */
export function StartValuesBar({ kind, kindName, dirty, onLoad }: { kind: PresetName; kindName: string; dirty: boolean; onLoad: (spec: StrapSpec) => void }) {
  const [asking, setAsking] = useState<Source | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();

  const load = async (source: Source) => {
    setError(undefined);
    setBusy(true);
    try {
      onLoad(source === 'preset' ? presetSpec(kind) : (await fetchStartSpec(kind)).spec);
      setAsking(null);
    } catch (err) {
      setError(err instanceof Error ? err.message : 'The shop’s standard could not be read.');
    } finally {
      setBusy(false);
    }
  };
  const choose = (source: Source) => (dirty ? setAsking(source) : void load(source));

  return (
    <div className="grid gap-2 rounded-lg border border-dashed border-hide-300 px-4 py-2 text-sm text-hide-700" data-testid="start-values">
      {asking ? (
        <div role="alertdialog" aria-label="Replace the form's values?" className="grid gap-2">
          <p className="font-medium text-hide-900">
            Replace every value in the form with {SOURCE_LABEL[asking]} for a {kindName}? Your unsaved changes will be lost; the saved revisions stay.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button size="sm" variant="danger" busy={busy} onClick={() => void load(asking)}>
              Replace the values
            </Button>
            <Button size="sm" variant="secondary" onClick={() => setAsking(null)}>
              Keep my changes
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap items-center justify-between gap-2">
          <span>Start again from:</span>
          <span className="flex flex-wrap gap-1">
            <Button size="sm" variant="ghost" busy={busy} onClick={() => choose('standard')}>
              Shop standard
            </Button>
            <Button size="sm" variant="ghost" onClick={() => choose('preset')}>
              Built-in preset
            </Button>
          </span>
        </div>
      )}
      {error && <Notice tone="danger">{error}</Notice>}
    </div>
  );
}
