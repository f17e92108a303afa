import { PRESET_NAMES, type PresetName } from '@shared/schemas/strap-spec.ts';
import type { LibraryFilters } from './queries.ts';

/** Reads the library's filters from the address bar, dropping anything the API would refuse. */
export function filtersFromSearch(params: URLSearchParams): LibraryFilters {
  const filters: LibraryFilters = {};
  const query = params.get('query')?.trim();
  if (query) filters.query = query;
  const kind = params.get('kind');
  if (kind && (PRESET_NAMES as readonly string[]).includes(kind)) filters.kind = kind as PresetName;
  const tag = params.get('tag')?.trim().toLowerCase();
  if (tag) filters.tag = tag;
  const sort = params.get('sort');
  filters.sort = sort === 'name' ? 'name' : 'updated';
  if (params.get('archived') === 'all') filters.archived = true;
  return filters;
}
