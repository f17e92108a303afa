import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { cx } from '@/components/ui/cx.ts';

/**
 * The numbers a maker checks at the bench, in one line that stays in view: the strap's blank,
 * the inside length it fits from the first to the last hole (or its working length), the size
 * run's girths, and how many warnings wait below.
 */
export function BenchSummary({ layout, spec }: { layout: PatternLayout; spec: StrapSpec }) {
  const unit = layout.units;
  const strap = layout.pieces.find((p) => p.role === 'strap');
  const girths = spec.sizes.map((s) => s.girthMm);
  const warnings = layout.warnings.length;
  return (
    <dl className="flex flex-wrap items-baseline gap-x-4 gap-y-1 text-sm tabular-nums sm:gap-x-5" data-testid="bench-summary">
      {strap && (
        <div className="flex gap-1.5 whitespace-nowrap" data-testid="strap-blank">
          <dt className="text-hide-600">Blank</dt>
          <dd>
            <strong className="text-hide-900">{formatLength(strap.blankLengthMm, unit)}</strong> × {formatLength(strap.widthMm, unit)}
          </dd>
        </div>
      )}
      {layout.fit ? (
        <div className="flex gap-1.5 whitespace-nowrap" data-testid="bench-fit">
          <dt className="text-hide-600">Fits</dt>
          <dd className="text-hide-900">
            {formatLength(layout.fit.rangeMm[0], unit)} to {formatLength(layout.fit.rangeMm[1], unit)}
          </dd>
        </div>
      ) : (
        <div className="flex gap-1.5 whitespace-nowrap">
          <dt className="text-hide-600">{spec.closes ? 'Girth' : 'Working length'}</dt>
          <dd className="text-hide-900">{formatLength(spec.girthMm + spec.easeMm, unit)}</dd>
        </div>
      )}
      {girths.length > 0 && (
        <div className="flex gap-1.5 whitespace-nowrap">
          <dt className="text-hide-600">{girths.length} sizes</dt>
          <dd className="text-hide-900">
            {formatLength(Math.min(...girths), unit)} to {formatLength(Math.max(...girths), unit)}
          </dd>
        </div>
      )}
      <div className="flex gap-1.5 whitespace-nowrap">
        <dt className="sr-only">Warnings</dt>
        <dd>
          <a
            href="#warnings"
            data-testid="bench-warnings"
            className={cx('font-medium underline-offset-2 hover:underline', warnings > 0 ? 'text-thread-700' : 'text-moss-700')}
          >
            {warnings === 0 ? 'No warnings' : `${warnings} ${warnings === 1 ? 'warning' : 'warnings'} to check`}
          </a>
        </dd>
      </div>
    </dl>
  );
}
