import { Link } from 'react-router-dom';
import { BODY_PART_LABELS, MEASURE_METHOD_LABELS, WEARER_KIND_LABELS, formatGirth, type BodyPart, type GirthUnit } from '@shared/schemas/orders.ts';
import type { WearerView } from '@shared/schemas/order-views.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { buttonClass } from '@/components/ui/button.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { GrowthChart } from './growth-chart.tsx';
import { MeasurementForm } from './measurement-form.tsx';

const PART_FOR_WEARER: Record<WearerView['kind'], BodyPart> = { dog: 'neck', cat: 'neck', horse: 'neck', person: 'wrist', other: 'other' };

/**
 * One wearer: their measurements over time (a chart per body part once there are two or
 * more, for puppies and kittens that outgrow a collar in weeks), a form for a new one, and a
 * way to start an order for them.
 */
export function WearerCard({ wearer, newOrderHref, canMeasure, canOrder }: { wearer: WearerView; newOrderHref: string; canMeasure: boolean; canOrder: boolean }) {
  const latest = wearer.measurements.at(-1);
  const unit: GirthUnit = latest?.unit ?? 'in';
  const parts = [...new Set(wearer.measurements.map((m) => m.part))];
  return (
    <Panel
      title={
        <span className="flex items-center gap-2">
          {wearer.name} <Badge>{WEARER_KIND_LABELS[wearer.kind]}</Badge>
        </span>
      }
      aside={
        canOrder ? (
          <Link to={newOrderHref} className={buttonClass('secondary', 'sm')}>
            New order
          </Link>
        ) : undefined
      }
    >
      <div className="grid gap-4" data-testid={`wearer-${wearer.id}`}>
        {wearer.measurements.length === 0 ? (
          <p className="text-sm text-hide-600">No measurements yet.</p>
        ) : (
          <>
            {parts.map((part) => (
              <GrowthChart
                key={part}
                points={wearer.measurements.filter((m) => m.part === part).map((m) => ({ at: m.takenAt, girthMm: m.girthMm }))}
                unit={unit === 'in' ? 'in' : 'mm'}
                label={`${BODY_PART_LABELS[part]} girth of ${wearer.name} over time`}
              />
            ))}
            <div className="overflow-x-auto">
              <table className="w-full text-left text-sm">
                <caption className="sr-only">Measurements of {wearer.name}, oldest first</caption>
                <thead className="text-xs uppercase tracking-wide text-hide-600">
                  <tr>
                    <th scope="col" className="py-1 pr-3">When</th>
                    <th scope="col" className="py-1 pr-3">Girth</th>
                    <th scope="col" className="py-1 pr-3">Where and how</th>
                    <th scope="col" className="py-1">By</th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-hide-100">
                  {wearer.measurements.map((m) => (
                    <tr key={m.id}>
                      <td className="py-1 pr-3">{formatWhen(m.takenAt)}</td>
                      <td className="whitespace-nowrap py-1 pr-3 font-medium tabular-nums">{formatGirth(m.girthMm, m.unit)}</td>
                      <td className="py-1 pr-3">
                        {BODY_PART_LABELS[m.part]}, {MEASURE_METHOD_LABELS[m.method].toLowerCase()}
                        {m.note && <span className="block text-xs text-hide-600">{m.note}</span>}
                      </td>
                      <td className="py-1">{m.takenBy?.name ?? m.takenByLabel}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </>
        )}
        {canMeasure && (
          <div className="border-t border-hide-100 pt-3">
            <MeasurementForm wearerId={wearer.id} defaultPart={latest?.part ?? PART_FOR_WEARER[wearer.kind]} defaultUnit={unit} />
          </div>
        )}
      </div>
    </Panel>
  );
}
