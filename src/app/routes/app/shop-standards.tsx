import { type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { PRESET_NAMES, type PresetName } from '@shared/schemas/strap-spec.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { standardsQueryOptions } from '@/features/standards/api/queries.ts';
import { StandardsForm } from '@/features/standards/components/standards-form.tsx';
import { KIND_LABELS } from '@/features/patterns/kinds.ts';
import { ShopNav } from './shop-nav.tsx';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(standardsQueryOptions());
  return null;
};

const kindLabels = Object.fromEntries(PRESET_NAMES.map((k) => [k, KIND_LABELS[k]?.label ?? k])) as Record<PresetName, string>;

/** The shop's standards: owners set them, everyone in the shop reads them. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: view } = useSuspenseQuery(standardsQueryOptions());
  if (!me) return null;
  const canEdit = can(me.role, 'standards.update');
  return (
    <div className="grid max-w-5xl gap-6">
      <div className="grid gap-3">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me.shop.name}</p>
          <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">Shop standards</h1>
          <p className="mt-1 text-hide-700">
            How this shop makes each kind of strap, the hardware it stocks and the punches on the bench.{' '}
            {canEdit ? 'Owners change them here.' : 'An owner sets them; you can read them here.'}
          </p>
        </div>
        <ShopNav />
      </div>
      <StandardsForm view={view} canEdit={canEdit} kindLabels={kindLabels} />
    </div>
  );
}
