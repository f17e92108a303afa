import { useEffect, useState } from 'react';
import type { OrderStage } from '@shared/schemas/orders.ts';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { CheckboxField } from '@/components/ui/checkbox-field.tsx';
import type { OrderFilters } from '../../api/queries.ts';
import { ORDER_STAGES, stageLabel } from '../../stages.ts';

/** Search, stage, due window, sort and "leave out handed over", written back to the address. */
export function OrderFiltersBar({ filters, onChange }: { filters: OrderFilters; onChange: (next: OrderFilters) => void }) {
  const [query, setQuery] = useState(filters.query ?? '');
  // Typing waits a moment before it becomes a request.
  useEffect(() => {
    const t = setTimeout(() => {
      if ((filters.query ?? '') !== query.trim()) onChange({ ...filters, query: query.trim() || undefined } as OrderFilters);
    }, 300);
    return () => clearTimeout(t);
  }, [query, filters, onChange]);
  const set = (patch: Partial<OrderFilters>) => {
    const next = { ...filters, ...patch };
    for (const k of Object.keys(next) as (keyof OrderFilters)[]) if (next[k] === undefined || next[k] === '') delete next[k];
    onChange(next);
  };
  return (
    <form role="search" aria-label="Filter orders" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[2fr_1.2fr_1fr_1fr_1fr]" onSubmit={(e) => e.preventDefault()}>
      <TextField label="Search orders" type="search" placeholder="Customer, wearer, pattern or number" value={query} onChange={(e) => setQuery(e.target.value)} />
      <SelectField
        label="Stage"
        value={filters.stage?.[0] ?? ''}
        onChange={(e) => set({ stage: e.target.value ? [e.target.value as OrderStage] : undefined })}
      >
        <option value="">Every stage</option>
        {ORDER_STAGES.map((s) => (
          <option key={s} value={s}>
            {stageLabel(s)}
          </option>
        ))}
      </SelectField>
      <TextField label="Due from" type="date" value={filters.dueFrom ?? ''} onChange={(e) => set({ dueFrom: e.target.value || undefined })} />
      <TextField label="Due to" type="date" value={filters.dueTo ?? ''} onChange={(e) => set({ dueTo: e.target.value || undefined })} />
      <SelectField label="Sort by" value={filters.sort ?? 'due'} onChange={(e) => set({ sort: e.target.value as OrderFilters['sort'] })}>
        <option value="due">Due date</option>
        <option value="updated">Last change</option>
        <option value="number">Order number</option>
      </SelectField>
      <CheckboxField
        wrapperClassName="sm:col-span-2 lg:col-span-5"
        label="Leave out handed-over orders"
        checked={filters.active ?? false}
        onChange={(e) => set({ active: e.target.checked || undefined })}
      />
    </form>
  );
}
