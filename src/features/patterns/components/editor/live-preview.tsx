import { memo, useMemo } from 'react';
import type { Draft } from '@/components/pattern/draft.ts';
import type { SizeRunResult } from '@/components/pattern/grade-run.ts';
import { WarningsList } from '@/components/pattern/warnings-list.tsx';
import { FitTable } from '@/components/pattern/fit-table.tsx';
import { RuleVsFitPanel } from '@/components/pattern/rule-vs-fit.tsx';
import { CutListView } from '@/components/pattern/cut-list.tsx';
import { SizeRunTable } from '@/components/pattern/size-run.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { BenchCard } from './bench-card.tsx';
import { useLiveDraft, useSettledDraft } from './use-live-draft.ts';

/**
 * What the engine says of the form's values beyond the drawing: the size run, warnings, the
 * fit at each hole, the shop rule beside the fitted length, and the cut list. The drawing and
 * the summary live on the bench card above ({@link BenchCard}). It is given the keystroke's
 * draft and shows it deferred ({@link useSettledDraft}): the keystroke's render only passes
 * through here, and the tables follow in a render of this component alone.
 */
export const PreviewDetails = memo(function PreviewDetails({ draft }: { draft: Draft }) {
  const { settled, run } = useSettledDraft(draft);
  return useMemo(() => <DetailsBody draft={settled} run={run} />, [settled, run]);
});

function DetailsBody({ draft, run }: { draft: Draft; run: SizeRunResult | null }) {
  if (draft.status === 'stopped') return null;
  const { layout } = draft;
  const unit = layout.units;
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-4">
      {run && (
        <Panel title={`Size run (${draft.spec.sizes.length})`}>
          {run.status === 'graded' ? (
            <SizeRunTable report={run.report} unit={unit} />
          ) : (
            <Notice tone="danger" role="status">
              {run.message}
            </Notice>
          )}
        </Panel>
      )}
      <div id="warnings" className="scroll-mt-[var(--bench-h,0px)]">
        <WarningsList warnings={layout.warnings} />
      </div>
      {layout.fit && (
        <Panel title="Fit at each hole">
          <FitTable fit={layout.fit} unit={unit} />
        </Panel>
      )}
      <div className="grid gap-4 xl:grid-cols-2">
        <Panel title="Shop rule and fitted length">
          <RuleVsFitPanel value={layout.ruleVsFit} mode={layout.mode} unit={unit} />
        </Panel>
        <Panel title="Cut list">
          <CutListView list={layout.cutList} unit={unit} />
        </Panel>
      </div>
    </div>
  );
}

/** The drawing, summary and details of a spec that is only read (a saved revision's page). */
export function LivePreview({ values, revisionLabel }: { values: unknown; revisionLabel?: string }) {
  const live = useLiveDraft(values, revisionLabel);
  return (
    <div className="grid min-w-0 grid-cols-[minmax(0,1fr)] gap-4">
      <BenchCard draft={live.draft} lastSvg={live.lastSvg} />
      <PreviewDetails draft={live.draft} />
    </div>
  );
}
