import { Navigate, Outlet, useSearchParams, type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { Wordmark } from '@/components/ui/brand-mark.tsx';
import { TemplateSketch } from '@/features/auth/components/template-sketch.tsx';
import { safeRedirect } from '../../paths.ts';
import { RouteErrorBoundary } from '../route-error-boundary.tsx';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  await queryClient.ensureQueryData(meQueryOptions());
  return null;
};

/** Sign-in and sign-up: a signed-in visitor goes straight on to where they were heading. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [params] = useSearchParams();
  if (me) return <Navigate to={safeRedirect(params.get('redirectTo'))} replace />;

  return (
    <div className="grid min-h-screen lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <aside className="relative hidden overflow-hidden bg-hide-900 text-hide-100 lg:flex lg:flex-col lg:justify-between lg:p-12">
        <Wordmark className="text-xl text-paper" />
        <div>
          <TemplateSketch className="w-full max-w-md text-hide-300" />
          <p className="mt-10 max-w-sm text-2xl leading-snug font-medium text-paper">
            Measure once. Draft the blank, the fold and every hole measured from the buckle end, and print it true to scale.
          </p>
          <p className="mt-4 max-w-sm text-sm text-hide-300">
            For shops that make collars, belts, watch straps and bag straps to measure, and hand proven
            patterns to the next pair of hands.
          </p>
        </div>
        <p className="text-xs text-hide-400">Templates print at 100 %, with a calibration square on every page.</p>
      </aside>
      <main className="flex flex-col items-center justify-center px-6 py-12">
        <Wordmark className="mb-8 text-xl text-hide-900 lg:hidden" />
        <div className="w-full max-w-md">
          <Outlet />
        </div>
      </main>
    </div>
  );
}

export const ErrorBoundary = RouteErrorBoundary;
