import { Fragment } from 'react';
import type { SizeJoin, SizeRunReport } from '@shared/pattern/index.ts';
import { formatLength } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { cx } from '@/components/ui/cx.ts';

function JoinRow({ join, unit }: { join: SizeJoin; unit: LengthUnit }) {
  const [a, b] = join.between;
  const text =
    join.kind === 'gap'
      ? `Gap of ${formatLength(join.mm, unit)} between ${a} and ${b}: no hole of either size fits in between.`
      : join.kind === 'overlap'
        ? `${a} and ${b} overlap by ${formatLength(join.mm, unit)}.`
        : `${a} and ${b} meet.`;
  return (
    <tr data-testid="size-join" data-kind={join.kind}>
      <td colSpan={4} className={cx('py-1 pl-4 text-xs', join.kind === 'gap' ? 'bg-thread-50 font-semibold text-thread-700' : 'text-hide-600')}>
        {join.kind === 'gap' && (
          <span aria-hidden="true" className="mr-1.5 inline-block rounded-sm bg-thread-500 px-1 text-[0.65rem] text-white">
            GAP
          </span>
        )}
        {text}
      </td>
    </tr>
  );
}

/**
 * Each size of the run: its blank, the inside lengths from the tightest to the loosest hole,
 * and how neighbouring ranges meet. A gap means some girths fit no size: the maker must see it.
 */
export function SizeRunTable({ report, unit }: { report: SizeRunReport; unit: LengthUnit }) {
  const gaps = report.joins.filter((j) => j.kind === 'gap').length;
  return (
    <div className="overflow-x-auto">
      <table className="w-full whitespace-nowrap text-sm tabular-nums" data-testid="size-run">
        <caption className={cx('mb-2 text-left text-xs', gaps > 0 ? 'font-semibold text-thread-700' : 'text-hide-600')}>
          {gaps > 0
            ? `${gaps} ${gaps === 1 ? 'gap' : 'gaps'} in the run: move a girth or add holes so every girth fits a size.`
            : 'Every girth from the smallest to the largest fits a size.'}
        </caption>
        <thead>
          <tr className="border-b border-hide-200 text-left text-xs uppercase tracking-wider text-hide-600">
            <th scope="col" className="py-1.5 pr-3 font-semibold">Size</th>
            <th scope="col" className="py-1.5 pr-3 font-semibold">Girth</th>
            <th scope="col" className="py-1.5 pr-3 font-semibold">Blank</th>
            <th scope="col" className="py-1.5 font-semibold">Fits (inside, tightest to loosest)</th>
          </tr>
        </thead>
        <tbody>
          {report.sizes.map((s, i) => {
            const join = i > 0 ? report.joins[i - 1] : undefined;
            const [lo, hi] = s.rangeMm[0] <= s.rangeMm[1] ? s.rangeMm : [s.rangeMm[1], s.rangeMm[0]];
            return (
              <Fragment key={s.name}>
                {join && <JoinRow join={join} unit={unit} />}
                <tr className="border-b border-hide-100" data-testid="size-run-row">
                  <th scope="row" className="py-1.5 pr-3 text-left font-semibold">
                    {s.name}
                    {s.warnings.length > 0 && (
                      <span className="ml-1.5 text-xs font-normal text-brass-700" title={s.warnings.map((w) => w.message).join('\n')}>
                        {s.warnings.length} {s.warnings.length === 1 ? 'warning' : 'warnings'}
                      </span>
                    )}
                  </th>
                  <td className="py-1.5 pr-3">{formatLength(s.girthMm, unit)}</td>
                  <td className="py-1.5 pr-3">{formatLength(s.blankLengthMm, unit)}</td>
                  <td className="py-1.5">
                    {formatLength(lo, unit)} – {formatLength(hi, unit)}
                  </td>
                </tr>
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
