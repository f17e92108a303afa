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

/** Search, kind, tag and sort; search waits for a pause in typing before it asks the server. */
export function LibraryFiltersBar({ filters, onChange }: LibraryFiltersProps) {
  const [query, setQuery] = useState(filters.query ?? '');
  const [tag, setTag] = useState(filters.tag ?? '');

  useEffect(() => {
    const t = setTimeout(() => {
      if ((filters.query ?? '') !== query.trim() || (filters.tag ?? '') !== tag.trim().toLowerCase()) {
        onChange({ ...filters, query: query.trim() || undefined, tag: tag.trim().toLowerCase() || undefined });
      }
    }, 300);
    return () => clearTimeout(t);
  }, [query, tag, filters, onChange]);

  return (
    <form role="search" aria-label="Filter the library" className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr_1fr]" onSubmit={(e) => e.preventDefault()}>
      <TextField label="Search names" type="search" value={query} onChange={(e) => setQuery(e.target.value)} placeholder="Juniper, bridle, 1 in…" />
      <SelectField label="Kind" value={filters.kind ?? ''} onChange={(e) => onChange({ ...filters, kind: (e.target.value || undefined) as LibraryFilters['kind'] })}>
        <option value="">All kinds</option>
        {PRESET_NAMES.map((k) => (
          <option key={k} value={k}>
            {KIND_LABELS[k].label}
          </option>
        ))}
      </SelectField>
      <TextField label="Tag" value={tag} onChange={(e) => setTag(e.target.value)} placeholder="e.g. dogs" />
      <SelectField label="Sort by" value={filters.sort ?? 'updated'} onChange={(e) => onChange({ ...filters, sort: e.target.value as 'updated' | 'name' })}>
        <option value="updated">Last saved</option>
        <option value="name">Name</option>
      </SelectField>
      <CheckboxField
        label="Show archived patterns"
        checked={filters.archived ?? false}
        onChange={(e) => onChange({ ...filters, archived: e.target.checked || undefined })}
        wrapperClassName="sm:col-span-4"
      />
    </form>
  );
}
