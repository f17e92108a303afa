import type { ComponentType } from 'react';
import { createBrowserRouter, type LoaderFunction } from 'react-router-dom';
import type { QueryClient } from '@tanstack/react-query';
import { paths } from './paths.ts';
import { RootLayout, RootHydrateFallback } from './routes/root.tsx';
import { RouteErrorBoundary } from './routes/route-error-boundary.tsx';

/**
 * What a lazy route module exports. `clientLoader` receives the query client and returns
 * the loader; loaders only warm the cache (`ensureQueryData`), components read it.
 */
export interface RouteModule {
  Component: ComponentType;
  ErrorBoundary?: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

interface LazyRoute {
  Component: ComponentType;
  ErrorBoundary?: ComponentType;
  loader?: LoaderFunction;
}

function convert(queryClient: QueryClient) {
  return (m: RouteModule): LazyRoute => ({
    Component: m.Component,
    ...(m.ErrorBoundary ? { ErrorBoundary: m.ErrorBoundary } : {}),
    ...(m.clientLoader ? { loader: m.clientLoader(queryClient) } : {}),
  });
}

export function createAppRouter(queryClient: QueryClient) {
  const load = convert(queryClient);
  return createBrowserRouter([
    {
      path: paths.home.path,
      Component: RootLayout,
      HydrateFallback: RootHydrateFallback,
      ErrorBoundary: RouteErrorBoundary,
      children: [
        {
          id: 'auth-layout',
          lazy: () => import('./routes/auth/layout.tsx').then(load),
          children: [
            { path: paths.auth.signIn.path, lazy: () => import('./routes/auth/sign-in.tsx').then(load) },
            { path: paths.auth.signUp.path, lazy: () => import('./routes/auth/sign-up.tsx').then(load) },
          ],
        },
        {
          id: 'app-layout',
          lazy: () => import('./routes/app/layout.tsx').then(load),
          children: [
            {
              // Errors inside a screen render here, inside the shell, so the way back stays in view.
              ErrorBoundary: RouteErrorBoundary,
              children: [
                { index: true, lazy: () => import('./routes/app/library.tsx').then(load) },
                { path: paths.patterns.new.path, lazy: () => import('./routes/app/new-pattern.tsx').then(load) },
                { path: paths.patterns.detail.path, lazy: () => import('./routes/app/pattern/editor.tsx').then(load) },
                { path: paths.patterns.history.path, lazy: () => import('./routes/app/pattern/history.tsx').then(load) },
                { path: paths.patterns.compare.path, lazy: () => import('./routes/app/pattern/compare.tsx').then(load) },
                { path: paths.patterns.revision.path, lazy: () => import('./routes/app/pattern/revision.tsx').then(load) },
                { path: paths.shop.members.path, lazy: () => import('./routes/app/members.tsx').then(load) },
                { path: paths.shop.standards.path, lazy: () => import('./routes/app/shop-standards.tsx').then(load) },
                { path: paths.orders.board.path, lazy: () => import('./routes/app/orders/board.tsx').then(load) },
                { path: paths.orders.table.path, lazy: () => import('./routes/app/orders/table.tsx').then(load) },
                { path: paths.orders.new.path, lazy: () => import('./routes/app/orders/new-order.tsx').then(load) },
                { path: paths.orders.detail.path, lazy: () => import('./routes/app/orders/order.tsx').then(load) },
                { path: paths.customers.list.path, lazy: () => import('./routes/app/customers/customers.tsx').then(load) },
                { path: paths.customers.detail.path, lazy: () => import('./routes/app/customers/customer.tsx').then(load) },
                { path: paths.pricing.path, lazy: () => import('./routes/app/pricing.tsx').then(load) },
              ],
            },
          ],
        },
        { path: paths.share.path, lazy: () => import('./routes/share.tsx').then(load) },
        { path: paths.invite.path, lazy: () => import('./routes/invite.tsx').then(load) },
        { path: paths.measure.path, lazy: () => import('./routes/measure.tsx').then(load) },
        { path: paths.proof.path, lazy: () => import('./routes/proof.tsx').then(load) },
        { path: '*', lazy: () => import('./routes/not-found.tsx').then(load) },
      ],
    },
  ]);
}
