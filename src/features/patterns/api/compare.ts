import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { patternKeys } from './queries.ts';

// The shapes of GET /api/patterns/:id/compare, as the server's compare module answers them.

/** One changed spec value; `path` is the dotted field ("girthMm", "pieces.0.end.holes.count"). */
export interface ParamChange {
  path: string;
  from: unknown;
  to: unknown;
  /** "mm", "oz", "%" or null for counts, flags and names. */
  unit: string | null;
}

export interface FeatureRef {
  kind: string;
  label: string;
  atMm: number;
  yMm: number;
}

export interface MovedFeature {
  kind: string;
  label: string;
  from: { atMm: number; yMm: number };
  to: { atMm: number; yMm: number };
  /** to - from along the strap, mm (+ toward the tip). */
  deltaAtMm: number;
}

export interface PieceDiff {
  pieceId: string;
  name: string;
  status: 'changed' | 'added' | 'removed';
  blankLengthMm: { from: number | null; to: number | null; deltaMm: number | null };
  moved: MovedFeature[];
  added: FeatureRef[];
  removed: FeatureRef[];
}

export interface LayoutDiff {
  unit: 'mm';
  targetMm: { from: number; to: number };
  fitRangeMm: { from: [number, number] | null; to: [number, number] | null };
  pieces: PieceDiff[];
  warnings: { added: string[]; removed: string[] };
}

export interface Comparison {
  from: number;
  to: number;
  params: ParamChange[];
  layout: LayoutDiff | null;
  layoutError: string | null;
}

/** Two revisions compared by the server (both revisions are immutable, so never stale). */
export const compareQueryOptions = (id: number, from: number, to: number) =>
  queryOptions({
    queryKey: patternKeys.compare(id, from, to),
    queryFn: ({ signal }) => api.get<Comparison>(`/api/patterns/${id}/compare?from=${from}&to=${to}`, signal),
    staleTime: Infinity,
  });
