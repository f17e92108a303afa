import { queryOptions } from '@tanstack/react-query';
import type { Drawing } from '@shared/render/drawing.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { api } from '@/lib/api-client.ts';

/** `GET /api/s/:token`: one revision, read-only, with nothing else of the shop. */
export interface SharedPattern {
  shopName: string;
  pattern: { name: string; kind: string };
  revision: { number: number; spec: StrapSpec; engineVersion: string; createdAt: string };
  layout: PatternLayout;
  drawing: Drawing;
  downloads: { pdf: string; svg: string; cutterSvg: string };
}

export const shareKeys = {
  all: ['share'] as const,
  detail: (token: string) => [...shareKeys.all, token] as const,
};

export const sharedPatternQueryOptions = (token: string) =>
  queryOptions({
    queryKey: shareKeys.detail(token),
    queryFn: ({ signal }) => api.get<SharedPattern>(`/api/s/${encodeURIComponent(token)}`, signal),
    retry: false,
  });
