import type { PriceView } from '@shared/schemas/order-views.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { formatMoney } from '@/lib/format-money.ts';

const area = new Intl.NumberFormat(undefined, { maximumFractionDigits: 2 });

/** Leather (area with waste x price per sq ft), hardware lines, bench time: one piece, then the order. */
export function PriceBreakdown({ price }: { price: PriceView | null }) {
  if (!price) return <p className="text-sm text-hide-600">No price until the order has a girth.</p>;
  const m = (c: number) => formatMoney(c, price.currency);
  const { leather, bench } = price;
  return (
    <div className="grid gap-3">
      <table className="w-full text-sm" data-testid="price-breakdown">
        <tbody className="divide-y divide-hide-100">
          <tr>
            <th scope="row" className="py-1.5 pr-2 text-left font-normal">
              Leather{leather.name ? `: ${leather.name}` : ''}
              <span className="block text-xs text-hide-600">
                {area.format(leather.areaSqFt)} sq ft with waste ×{leather.wasteFactor}
                {leather.pricePerSqFtCents !== null && <> at {m(leather.pricePerSqFtCents)} per sq ft</>}
              </span>
            </th>
            <td className="py-1.5 text-right tabular-nums">{m(leather.cents)}</td>
          </tr>
          {price.hardware.map((h) => (
            <tr key={h.itemId}>
              <th scope="row" className="py-1.5 pr-2 text-left font-normal">
                {h.name}
                <span className="block text-xs text-hide-600">
                  {h.quantity} × {m(h.unitCostCents)}
                </span>
              </th>
              <td className="py-1.5 text-right tabular-nums">{m(h.cents)}</td>
            </tr>
          ))}
          <tr>
            <th scope="row" className="py-1.5 pr-2 text-left font-normal">
              Bench time
              <span className="block text-xs text-hide-600">
                {bench.minutes} min at {m(bench.hourlyRateCents)} an hour
              </span>
            </th>
            <td className="py-1.5 text-right tabular-nums">{m(bench.cents)}</td>
          </tr>
          <tr>
            <th scope="row" className="py-1.5 pr-2 text-left font-medium">
              One piece
            </th>
            <td className="py-1.5 text-right font-medium tabular-nums">{m(price.pieceCents)}</td>
          </tr>
          <tr className="border-t-2 border-hide-300">
            <th scope="row" className="py-1.5 pr-2 text-left font-semibold">
              Order ({price.quantity} {price.quantity === 1 ? 'piece' : 'pieces'})
            </th>
            <td className="py-1.5 text-right font-semibold tabular-nums" data-testid="price-total">
              {m(price.totalCents)}
            </td>
          </tr>
        </tbody>
      </table>
      {price.missing.length > 0 && (
        <Notice tone="warning" title="The price is not complete">
          <ul className="list-disc pl-5">
            {price.missing.map((x) => (
              <li key={x}>{x}</li>
            ))}
          </ul>
        </Notice>
      )}
    </div>
  );
}
