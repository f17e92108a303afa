import { Outlet, ScrollRestoration } from 'react-router-dom';
import { Wordmark } from '@/components/ui/brand-mark.tsx';

export function RootLayout() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Shown while the first route's module and data load. */
export function RootHydrateFallback() {
  return (
    <div className="grid min-h-screen place-items-center" role="status" aria-live="polite">
      <div className="flex flex-col items-center gap-3 text-hide-700">
        <Wordmark className="text-xl text-hide-900" />
        <span className="text-sm">Laying out the bench…</span>
      </div>
    </div>
  );
}
