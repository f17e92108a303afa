import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { LEATHERS_MAX, ShopPricingSchema } from '@shared/schemas/orders.ts';
import type { ShopPricingView } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { centsToMoneyText, moneyTextToCents } from '@/lib/format-money.ts';
import { useSavePricing } from '../../api/mutations.ts';
import { parseInto } from '../zod-to-form.ts';

interface Values {
  currency: string;
  wasteFactor: string;
  hourlyRate: string;
  leathers: { id: string; name: string; price: string }[];
}

/** A leather's id from its name the first time it is saved ("Bridle, chestnut" -> "bridle-chestnut"). */
function slug(name: string, taken: Set<string>): string {
  const base = name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'leather';
  let id = base;
  for (let n = 2; taken.has(id); n++) id = `${base}-${n}`;
  taken.add(id);
  return id;
}

/** The owner's prices: waste factor, bench rate and price per square foot of each leather. */
export function PricingForm({ pricing, canEdit }: { pricing: ShopPricingView; canEdit: boolean }) {
  const save = useSavePricing();
  const [result, setResult] = useState<{ tone: 'success' | 'danger'; text: string }>();
  const { register, control, handleSubmit, setError, formState } = useForm<Values>({
    defaultValues: {
      currency: pricing.currency,
      wasteFactor: String(pricing.wasteFactor),
      hourlyRate: centsToMoneyText(pricing.hourlyRateCents),
      leathers: pricing.leathers.map((l) => ({ id: l.id, name: l.name, price: centsToMoneyText(l.pricePerSqFtCents) })),
    },
  });
  const rows = useFieldArray({ control, name: 'leathers' });
  const submit = handleSubmit(async (v) => {
    setResult(undefined);
    const taken = new Set(v.leathers.map((l) => l.id).filter(Boolean));
    const body = {
      currency: v.currency,
      wasteFactor: v.wasteFactor.trim() === '' ? Number.NaN : Number(v.wasteFactor),
      hourlyRateCents: moneyTextToCents(v.hourlyRate),
      leathers: v.leathers.map((l) => ({ id: l.id || slug(l.name, taken), name: l.name, pricePerSqFtCents: moneyTextToCents(l.price) })),
    };
    // Ids are ours, not the owner's: a clash lands beside the leather's name.
    const rename: Record<string, string> = { hourlyRateCents: 'hourlyRate' };
    v.leathers.forEach((_, i) => Object.assign(rename, { [`leathers.${i}.id`]: `leathers.${i}.name`, [`leathers.${i}.pricePerSqFtCents`]: `leathers.${i}.price` }));
    const parsed = parseInto(ShopPricingSchema, body, setError, '', rename);
    if (!parsed) return;
    try {
      await save.mutateAsync(parsed);
      setResult({ tone: 'success', text: 'Prices saved. Open orders show the new prices.' });
    } catch (err) {
      const rest = applyServerErrors(err, setError, ['currency', 'wasteFactor']);
      if (rest) setResult({ tone: 'danger', text: rest });
    }
  });
  const e = formState.errors;
  return (
    <form onSubmit={submit} noValidate className="grid gap-5" aria-label="Pricing">
      <fieldset disabled={!canEdit} className="grid gap-5">
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Currency" hint="Three letters, e.g. USD, GBP, EUR." maxLength={3} {...register('currency')} error={e.currency?.message} />
          <TextField label="Waste factor" hint="1.3 buys 30 % more leather than the blank." inputMode="decimal" {...register('wasteFactor')} error={e.wasteFactor?.message} />
          <TextField label="Hourly bench rate" unit={pricing.currency} inputMode="decimal" {...register('hourlyRate')} error={e.hourlyRate?.message} />
        </div>
        <fieldset className="grid gap-2">
          <legend className="mb-1 text-sm font-semibold text-hide-900">Leathers and their price per square foot</legend>
          {rows.fields.length === 0 && <p className="text-sm text-hide-600">No leathers yet.</p>}
          {rows.fields.map((f, i) => (
            <div key={f.id} className="grid grid-cols-[minmax(0,1fr)_7rem_auto] items-start gap-2">
              <TextField label="Leather" {...register(`leathers.${i}.name`)} error={e.leathers?.[i]?.name?.message} />
              <TextField label="Per sq ft" unit={pricing.currency} inputMode="decimal" {...register(`leathers.${i}.price`)} error={e.leathers?.[i]?.price?.message} />
              {canEdit && (
                <Button variant="ghost" size="sm" className="mt-7" onClick={() => rows.remove(i)} aria-label={`Remove leather ${i + 1}`}>
                  Remove
                </Button>
              )}
            </div>
          ))}
          {e.leathers?.message && <p className="text-sm font-medium text-thread-700">{e.leathers.message}</p>}
          {canEdit && rows.fields.length < LEATHERS_MAX && (
            <div>
              <Button variant="secondary" size="sm" onClick={() => rows.append({ id: '', name: '', price: '' })}>
                Add a leather
              </Button>
            </div>
          )}
        </fieldset>
      </fieldset>
      {result && (
        <Notice tone={result.tone} role={result.tone === 'danger' ? 'alert' : 'status'}>
          {result.text}
        </Notice>
      )}
      {canEdit ? (
        <div>
          <Button type="submit" busy={formState.isSubmitting}>
            Save prices
          </Button>
        </div>
      ) : (
        <p className="text-sm text-hide-700">Only the owner changes prices.</p>
      )}
    </form>
  );
}
