import { formatLength } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { specLabel } from '@shared/schemas/spec-labels.ts';
import { choiceWords } from '@shared/schemas/spec-messages.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import type { Comparison, ParamChange } from '@shared/schemas/library-views.ts';

/** A changed value as the form shows it: lengths in the display unit, choices in words, holes from 1. */
function value(p: ParamChange, v: unknown, display: LengthUnit): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'number' && p.unit === 'mm') return formatLength(v, display);
  // Hole numbers are stored from 0 and read from 1 (the drawings and PDFs number them so).
  if (typeof v === 'number' && p.path.endsWith('nominalIndex')) return String(v + 1); // older specs
  if (typeof v === 'number') return `${Math.round(v * 1000) / 1000}${p.unit ? ` ${p.unit}` : ''}`;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (typeof v === 'string') return p.path.endsWith('name') ? v : choiceWords(v);
  if (Array.isArray(v)) return v.length === 0 ? 'none' : `${v.length}`;
  return '—';
}

function signed(mm: number, unit: LengthUnit): string {
  if (Math.abs(mm) < 0.05) return '±0';
  return `${mm > 0 ? '+' : '−'}${formatLength(Math.abs(mm), unit)}`;
}

/** What changed between two revisions: the values typed, and where the features moved. */
export function CompareView({ comparison, unit, spec }: { comparison: Comparison; unit: LengthUnit; /** Names the pieces in the labels (the newer revision's spec). */ spec?: unknown }) {
  const { params, layout } = comparison;
  return (
    <div className="grid gap-4">
      <Panel title={`Changed values (${params.length})`} aside={<span className="text-xs text-hide-600">Lengths in {unit === 'in' ? 'inches' : 'millimetres'}</span>}>
        {params.length === 0 ? (
          <p className="text-sm text-hide-600">The two revisions hold the same spec.</p>
        ) : (
          <table className="w-full text-sm tabular-nums" data-testid="compare-params">
            <thead>
              <tr className="border-b border-hide-200 text-left text-xs uppercase tracking-wider text-hide-600">
                <th scope="col" className="py-1.5 pr-3 font-semibold">Field</th>
                <th scope="col" className="py-1.5 pr-3 font-semibold">Revision {comparison.from}</th>
                <th scope="col" className="py-1.5 font-semibold">Revision {comparison.to}</th>
              </tr>
            </thead>
            <tbody>
              {params.map((p) => (
                <tr key={p.path} className="border-b border-hide-100">
                  <th scope="row" className="py-1.5 pr-3 text-left font-normal text-hide-800">{specLabel(p.path, spec)}</th>
                  <td className="py-1.5 pr-3 text-hide-700">{value(p, p.from, unit)}</td>
                  <td className="py-1.5 font-semibold text-hide-900">{value(p, p.to, unit)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>
      {comparison.layoutError && (
        <Notice tone="warning" role="note" title="One revision no longer lays out">
          {comparison.layoutError}
        </Notice>
      )}
      {layout?.pieces.map((piece) => (
        <Panel key={piece.pieceId} title={`${piece.name}: ${piece.status}`}>
          <div className="grid gap-3 text-sm">
            {piece.blankLengthMm.deltaMm !== null && (
              <p>
                Blank {piece.blankLengthMm.from !== null && formatLength(piece.blankLengthMm.from, unit)} →{' '}
                <strong>{piece.blankLengthMm.to !== null && formatLength(piece.blankLengthMm.to, unit)}</strong> ({signed(piece.blankLengthMm.deltaMm, unit)})
              </p>
            )}
            {piece.moved.length > 0 && (
              <div>
                <h4 className="text-xs font-semibold uppercase tracking-wider text-hide-600">Moved</h4>
                <ul className="mt-1 space-y-0.5" data-testid="compare-moved">
                  {piece.moved.map((m, i) => (
                    <li key={`${m.label}-${i}`}>
                      {m.label}: {formatLength(m.from.atMm, unit)} → {formatLength(m.to.atMm, unit)} from the buckle end ({signed(m.deltaAtMm, unit)})
                    </li>
                  ))}
                </ul>
              </div>
            )}
            {piece.added.length > 0 && (
              <p>
                <span className="font-semibold text-moss-700">Added:</span> {piece.added.map((f) => `${f.label} at ${formatLength(f.atMm, unit)}`).join('; ')}
              </p>
            )}
            {piece.removed.length > 0 && (
              <p>
                <span className="font-semibold text-thread-700">Removed:</span> {piece.removed.map((f) => `${f.label} at ${formatLength(f.atMm, unit)}`).join('; ')}
              </p>
            )}
            {piece.moved.length + piece.added.length + piece.removed.length === 0 && piece.blankLengthMm.deltaMm === 0 && <p className="text-hide-600">Nothing on this piece moved.</p>}
          </div>
        </Panel>
      ))}
      {layout && (layout.warnings.added.length > 0 || layout.warnings.removed.length > 0) && (
        <Panel title="Warnings">
          {layout.warnings.added.length > 0 && <p className="text-sm">New: {layout.warnings.added.join(' ')}</p>}
          {layout.warnings.removed.length > 0 && <p className="text-sm">Gone: {layout.warnings.removed.join(' ')}</p>}
        </Panel>
      )}
    </div>
  );
}
