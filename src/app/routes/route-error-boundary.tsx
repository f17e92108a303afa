import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiError } from '@/lib/api-client.ts';
import { buttonClass } from '@/components/ui/button.tsx';
import { paths } from '../paths.ts';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error)) {
    if (error.status === 404) return { title: 'Nothing cut to this shape', detail: 'This page does not exist, or it is not in your shop.' };
    return { title: `The server answered ${error.status}`, detail: error.statusText || 'Try again in a moment.' };
  }
  if (error instanceof ApiError) {
    if (error.status === 404) return { title: 'Not in your shop', detail: error.message };
    if (error.status === 403) return { title: 'Your role cannot open this', detail: error.message };
    return { title: 'The server could not finish that', detail: error.message };
  }
  // Script errors (a failed chunk load after a deploy, a bug) never show their stack here.
  return { title: 'This screen came apart', detail: 'Reload the page; if it keeps happening, tell whoever runs Latchet for your shop.' };
}

/**
 * The error element of every layout route: an error inside a screen replaces only that
 * layout's outlet area, with a way back.
 */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const { title, detail } = describe(error);
  // Reloading cannot bring back what is not there.
  const missing = (isRouteErrorResponse(error) || error instanceof ApiError) && error.status === 404;
  return (
    <div role="alert" className="mx-auto my-16 max-w-lg rounded-lg border border-thread-500/40 bg-white/80 p-8 shadow-sm">
      <p className="text-xs font-semibold uppercase tracking-widest text-thread-500">Stopped</p>
      <h1 className="mt-2 text-xl font-semibold text-hide-900">{title}</h1>
      <p className="mt-2 text-hide-700">{detail}</p>
      <div className="mt-6 flex gap-3">
        {!missing && (
          <button type="button" className={buttonClass('primary')} onClick={() => window.location.reload()}>
            Reload
          </button>
        )}
        <Link to={paths.home.getHref()} className={buttonClass(missing ? 'primary' : 'secondary')}>
          Back to the library
        </Link>
      </div>
    </div>
  );
}
