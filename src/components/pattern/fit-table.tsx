import type { FitReport } from '@shared/pattern/layout-types.ts';
import { formatLength } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { cx } from '@/components/ui/cx.ts';

function signed(mm: number, unit: LengthUnit): string {
  if (Math.abs(mm) < 0.05) return '±0';
  return `${mm > 0 ? '+' : '−'}${formatLength(Math.abs(mm), unit)}`;
}

/**
 * How the strap fits at each adjustment hole: where the hole is from the buckle end, the
 * length round the closed strap (through the middle of the leather, and inside), and how far
 * the inside is from girth + ease.
 */
export function FitTable({ fit, unit }: { fit: FitReport; unit: LengthUnit }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full whitespace-nowrap text-sm tabular-nums" data-testid="fit-table">
        <caption className="mb-2 text-left text-xs text-hide-600">
          Girth + ease: {formatLength(fit.targetMm, unit)} inside. Buckled, the strap fits from {formatLength(fit.rangeMm[0], unit)} to{' '}
          {formatLength(fit.rangeMm[1], unit)} inside. Holes are measured from the buckle end (the buckle bar in the fold).
        </caption>
        <thead>
          <tr className="border-b border-hide-200 text-left text-xs uppercase tracking-wider text-hide-600">
            <th scope="col" className="py-1.5 pr-3 font-semibold">Hole</th>
            <th scope="col" className="py-1.5 pr-3 font-semibold">From buckle end</th>
            <th scope="col" className="py-1.5 pr-3 font-semibold" title="Measured along the middle of the leather's thickness">Round the middle</th>
            <th scope="col" className="py-1.5 pr-3 font-semibold">Inside</th>
            <th scope="col" className="py-1.5 font-semibold">Inside vs girth + ease</th>
          </tr>
        </thead>
        <tbody>
          {fit.holes.map((h, i) => {
            const nominal = i === fit.nominalIndex;
            return (
              <tr key={i} className={cx('border-b border-hide-100', nominal && 'bg-brass-100/70 font-semibold')} aria-current={nominal ? 'true' : undefined}>
                <th scope="row" className="py-1.5 pr-3 text-left font-medium">
                  {i + 1}
                  {nominal && <span className="ml-1.5 text-xs font-normal text-brass-700">middle hole</span>}
                </th>
                <td className="py-1.5 pr-3">{formatLength(h.atMm, unit)}</td>
                <td className="py-1.5 pr-3">{formatLength(h.loopMm, unit)}</td>
                <td className="py-1.5 pr-3">{formatLength(h.innerMm, unit)}</td>
                <td className="py-1.5">{signed(h.innerMm - fit.targetMm, unit)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
