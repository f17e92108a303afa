import { useNavigate, useParams, type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { patternQueryOptions } from '@/features/patterns/api/queries.ts';
import { PatternHeader } from '@/features/patterns/components/pattern-header.tsx';
import { PatternActions } from '@/features/patterns/components/pattern-actions.tsx';
import { PatternEditor } from '@/features/patterns/components/editor/pattern-editor.tsx';
import { PatternPhotos } from '@/features/patterns/components/pattern-photos.tsx';
import { paths } from '../../../paths.ts';
import { idFromParams, patternTabs } from './pattern-tabs.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(patternQueryOptions(idFromParams(params.id)));
  return null;
};

/** One pattern: its spec form beside the live preview, save, print; photos of pieces made from it. */
export function Component() {
  const id = idFromParams(useParams().id);
  const navigate = useNavigate();
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: detail } = useSuspenseQuery(patternQueryOptions(id));
  const canEdit = me ? can(me.role, 'revisions.create') : false;
  return (
    <div className="grid gap-6">
      <PatternHeader
        pattern={detail.pattern}
        head={detail.head}
        tabs={patternTabs(id)}
        actions={<PatternActions pattern={detail.pattern} headNumber={detail.head.number} canEdit={canEdit} onDuplicated={(copy) => navigate(paths.patterns.detail.getHref(copy))} />}
      />
      <PatternEditor key={id} detail={detail} canEdit={canEdit} canShare={me ? can(me.role, 'share.create') : false} />
      <PatternPhotos key={`photos-${id}`} patternId={id} canUpload={me ? can(me.role, 'patterns.photos.upload') : false} canDelete={me ? can(me.role, 'patterns.photos.delete') : false} />
    </div>
  );
}
