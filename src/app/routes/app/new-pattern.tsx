import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { useSuspenseQuery } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { PRESET_NAMES, type PresetName } from '@shared/schemas/strap-spec.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { NewPatternForm } from '@/features/patterns/components/library/new-pattern-form.tsx';
import { paths } from '../../paths.ts';

export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const asked = params.get('kind');
  const kind: PresetName = asked && (PRESET_NAMES as readonly string[]).includes(asked) ? (asked as PresetName) : 'collar';
  if (!me || !can(me.role, 'patterns.create')) return <Navigate to={paths.library.getHref()} replace />;
  return (
    <div className="grid max-w-5xl gap-6">
      <div>
        <h1 className="text-3xl font-semibold tracking-tight text-hide-900">New pattern</h1>
        <p className="mt-1 text-hide-700">
          Each kind starts from the shop&rsquo;s standard (set by an owner under Shop, Standards); change any value in the editor next.
        </p>
      </div>
      <NewPatternForm initialKind={kind} onCreated={(id) => navigate(paths.patterns.detail.getHref(id))} />
    </div>
  );
}
