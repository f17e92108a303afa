import { useEffect, useState } from 'react';
import { PRESET_NAMES } from '@shared/schemas/strap-spec.ts';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { CheckboxField } from '@/components/ui/checkbox-field.tsx';
import { KIND_LABELS } from '../../kinds.ts';
import type { LibraryFilters } from '../../api/queries.ts';

export interface LibraryFiltersProps {
  filters: LibraryFilters;
  onChange: (next: LibraryFilters) => void;
}

const norm = (f: LibraryFilters): LibraryFilters => ({ ...f, query: f.query?.trim() || undefined, tag: f.tag?.trim().toLowerCase() || undefined });
const same = (x: LibraryFilters, y: LibraryFilters) => {
  const a = norm(x);
  const b = norm(y);
  return (a.query ?? '') === (b.query ?? '') && a.kind === b.kind && (a.tag ?? '') === (b.tag ?? '') && (a.sort ?? 'updated') === (b.sort ?? 'updated') && Boolean(a.archived) === Boolean(b.archived);
};

/**
 * Search, kind, tag, sort and archived. The controls answer at once (the address follows
 * when the new page of results has loaded); typing waits for a pause before it asks.
 */
export function LibraryFiltersBar({ filters, onChange }: LibraryFiltersProps) {
  const [draft, setDraft] = useState<LibraryFilters>(filters);

  // Back and forward change the address: follow it.
  useEffect(() => {
    setDraft((d) => (same(d, filters) ? d : filters));
    // Listed by value: `filters` is a new object on every render.
  }, [filters.query, filters.kind, filters.tag, filters.sort, filters.archived]);

  useEffect(() => {
    const next = norm(draft);
    if (same(next, filters)) return;
    const typed = (next.query ?? '') !== (filters.query ?? '') || (next.tag ?? '') !== (filters.tag ?? '');
    const t = setTimeout(() => onChange(next), typed ? 300 : 0);
    return () => clearTimeout(t);
  }, [draft, filters, onChange]);

  const set = (patch: Partial<LibraryFilters>) => setDraft((d) => ({ ...d, ...patch }));

  return (
    <form role="search" aria-label="Filter the library" className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr_1fr]" onSubmit={(e) => e.preventDefault()}>
      <TextField label="Search names" type="search" value={draft.query ?? ''} onChange={(e) => set({ query: e.target.value })} placeholder="Juniper, bridle, 1 in…" />
      <SelectField label="Kind" value={draft.kind ?? ''} onChange={(e) => set({ kind: (e.target.value || undefined) as LibraryFilters['kind'] })}>
        <option value="">All kinds</option>
        {PRESET_NAMES.map((k) => (
          <option key={k} value={k}>
            {KIND_LABELS[k].label}
          </option>
        ))}
      </SelectField>
      <TextField label="Tag" value={draft.tag ?? ''} onChange={(e) => set({ tag: e.target.value })} placeholder="e.g. dogs" />
      <SelectField label="Sort by" value={draft.sort ?? 'updated'} onChange={(e) => set({ sort: e.target.value as 'updated' | 'name' })}>
        <option value="updated">Last saved</option>
        <option value="name">Name</option>
      </SelectField>
      <CheckboxField
        label="Show archived patterns"
        checked={draft.archived ?? false}
        onChange={(e) => set({ archived: e.target.checked || undefined })}
        wrapperClassName="sm:col-span-4"
      />
    </form>
  );
}
