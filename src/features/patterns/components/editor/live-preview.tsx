import { useDeferredValue, useEffect, useMemo, useState } from 'react';
import { draftFrom } from '@/components/pattern/draft.ts';
import { DrawingView } from '@/components/pattern/drawing-view.tsx';
import { WarningsList } from '@/components/pattern/warnings-list.tsx';
import { FitTable } from '@/components/pattern/fit-table.tsx';
import { RuleVsFitPanel } from '@/components/pattern/rule-vs-fit.tsx';
import { CutListView } from '@/components/pattern/cut-list.tsx';
import { gradeRun } from '@/components/pattern/grade-run.ts';
import { SizeRunTable } from '@/components/pattern/size-run.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { formatLength } from '@shared/units/format-length.ts';

/**
 * The engine run in the browser on every change of the form: drawing, warnings, the fit at
 * each hole, rule against fit, and the cut list. Deferred so typing never waits for a draw.
 */
export function LivePreview({ values, revisionLabel }: { values: unknown; revisionLabel?: string }) {
  const deferred = useDeferredValue(values);
  const draft = useMemo(() => draftFrom(deferred, revisionLabel ? { revision: revisionLabel } : {}), [deferred, revisionLabel]);
  // While a value is being fixed, the last good drawing stays in view, faded, for orientation.
  const [lastSvg, setLastSvg] = useState<string | null>(null);
  // One layout per size: graded only when the drawn spec changes.
  const run = useMemo(() => (draft.status === 'drawn' ? gradeRun(draft.spec) : null), [draft]);
  useEffect(() => {
    if (draft.status === 'drawn') setLastSvg(draft.svg);
  }, [draft]);

  if (draft.status === 'stopped') {
    return (
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4">
        <Notice tone="danger" title="The preview stopped at a value the engine cannot draw" role="status">
          <ul className="list-disc pl-5" data-testid="draft-problems">
            {draft.problems.map((p) => (
              <li key={p.field + p.message}>
                <code className="text-xs">{p.field}</code>: {p.message}
              </li>
            ))}
          </ul>
        </Notice>
        {lastSvg && (
          <Panel title="Last drawing that worked">
            <div className="opacity-45 grayscale">
              <DrawingView svg={lastSvg} label="The last drawing before the value the engine refused" />
            </div>
          </Panel>
        )}
      </div>
    );
  }

  const { layout } = draft;
  const unit = layout.units;
  const strap = layout.pieces.find((p) => p.role === 'strap');
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-4">
      <Panel
        title="Preview"
        aside={
          strap && (
            <p className="text-sm tabular-nums text-hide-700" data-testid="strap-blank">
              Strap blank <strong className="text-hide-900">{formatLength(strap.blankLengthMm, unit)}</strong> ×{' '}
              {formatLength(strap.widthMm, unit)}
            </p>
          )
        }
      >
        <DrawingView svg={draft.svg} label={`Drawing of ${layout.name || 'the pattern'}`} />
      </Panel>
      {run && (
        <Panel title={`Size run (${draft.spec.sizes.length})`}>
          {run.status === 'graded' ? (
            <SizeRunTable report={run.report} unit={unit} />
          ) : (
            <Notice tone="danger" role="status">
              <code className="text-xs">{run.field}</code>: {run.message}
            </Notice>
          )}
        </Panel>
      )}
      <WarningsList warnings={layout.warnings} />
      {layout.fit && (
        <Panel title="Fit at each hole">
          <FitTable fit={layout.fit} unit={unit} />
        </Panel>
      )}
      <div className="grid gap-4 xl:grid-cols-2">
        <Panel title="Rule against fit">
          <RuleVsFitPanel value={layout.ruleVsFit} mode={layout.mode} unit={unit} />
        </Panel>
        <Panel title="Cut list">
          <CutListView list={layout.cutList} unit={unit} />
        </Panel>
      </div>
    </div>
  );
}
