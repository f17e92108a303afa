import type { RuleVsFit } from '@shared/pattern/layout-types.ts';
import { formatLength } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { cx } from '@/components/ui/cx.ts';

function Column({ title, active, blankMm, nominalAtMm, innerMm, unit }: { title: string; active: boolean; blankMm: number; nominalAtMm: number | undefined; innerMm: number | undefined; unit: LengthUnit }) {
  return (
    <div className={cx('rounded-md border px-3 py-2', active ? 'border-hide-500 bg-hide-50' : 'border-hide-200')}>
      <p className="text-xs font-semibold uppercase tracking-wider text-hide-600">
        {title} {active && <span className="normal-case tracking-normal text-hide-800">(in use)</span>}
      </p>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 whitespace-nowrap text-sm tabular-nums">
        <dt className="text-hide-600">Blank</dt>
        <dd className="font-semibold">{formatLength(blankMm, unit)}</dd>
        {nominalAtMm !== undefined && (
          <>
            <dt className="text-hide-600">Middle hole at</dt>
            <dd>{formatLength(nominalAtMm, unit)}</dd>
          </>
        )}
        {innerMm !== undefined && (
          <>
            <dt className="text-hide-600">Inside there</dt>
            <dd>{formatLength(innerMm, unit)}</dd>
          </>
        )}
      </dl>
    </div>
  );
}

/** The shop's rule of thumb beside the length fitted to girth + ease, so a maker sees what the rule gives. */
export function RuleVsFitPanel({ value, mode, unit }: { value: RuleVsFit; mode: 'rule' | 'fit'; unit: LengthUnit }) {
  return (
    <div data-testid="rule-vs-fit">
      <div className="grid grid-cols-[repeat(auto-fit,minmax(10.5rem,1fr))] gap-3">
        <Column title="Rule" active={mode === 'rule'} blankMm={value.rule.blankLengthMm} nominalAtMm={value.rule.nominalAtMm} innerMm={value.rule.nominalInnerMm} unit={unit} />
        <Column title="Fit" active={mode === 'fit'} blankMm={value.fit.blankLengthMm} nominalAtMm={value.fit.nominalAtMm} innerMm={value.fit.nominalInnerMm} unit={unit} />
      </div>
      <p className="mt-2 text-xs text-hide-600">Rule: the shop&rsquo;s rule of thumb (girth + allowance). Fit: holes placed so the middle one closes on girth + ease.</p>
      <p className="mt-2 text-sm text-hide-700">{value.summary}</p>
    </div>
  );
}
