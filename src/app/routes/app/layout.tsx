import { Suspense } from 'react';
import { Navigate, NavLink, Outlet, useLocation, useNavigate, type LoaderFunction } from 'react-router-dom';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { devMailQueryOptions } from '@/features/dev-mail/api/queries.ts';
import type { Role } from '@shared/schemas/auth.ts';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { useSignOut } from '@/features/auth/api/mutations.ts';
import { RoleBadge } from '@/features/auth/components/role-badge.tsx';
import { Wordmark } from '@/components/ui/brand-mark.tsx';
import { Button } from '@/components/ui/button.tsx';
import { cx } from '@/components/ui/cx.ts';
import { paths } from '../../paths.ts';
import { RouteErrorBoundary } from '../route-error-boundary.tsx';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  await queryClient.ensureQueryData(meQueryOptions());
  return null;
};

interface NavItem {
  to: string;
  label: string;
  end?: boolean;
}

function navItems(role: Role): NavItem[] {
  const items: NavItem[] = [{ to: paths.library.getHref(), label: 'Library', end: true }];
  if (can(role, 'orders.list')) items.push({ to: paths.orders.board.getHref(), label: 'Orders' });
  if (can(role, 'customers.list')) items.push({ to: paths.customers.list.getHref(), label: 'Customers' });
  // Everyone reads prices on orders; the settings screen is the owner's.
  if (can(role, 'pricing.update')) items.push({ to: paths.pricing.getHref(), label: 'Pricing' });
  if (can(role, 'members.list')) items.push({ to: paths.shop.members.getHref(), label: 'Shop' });
  return items;
}

/** The signed-in shell: who you are, which shop, what you may do, and the screens. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const location = useLocation();
  const navigate = useNavigate();
  const signOut = useSignOut();
  // The mailbox exists only where the server runs its fake SMTP server; ask before linking.
  const mailbox = useQuery({ ...devMailQueryOptions(), enabled: me ? can(me.role, 'devmail.read') : false });

  if (!me) return <Navigate to={paths.auth.signIn.getHref(location.pathname + location.search)} replace />;

  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-3 focus:z-50 focus:rounded focus:bg-paper focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-hide-800 bg-hide-900 text-hide-100">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6 md:h-16 md:flex-nowrap md:py-0">
          <Wordmark className="text-lg text-paper" />
          <nav aria-label="Main" className="order-last -mx-3 flex w-full items-center gap-1 overflow-x-auto md:order-none md:mx-0 md:w-auto">
            {navItems(me.role).map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.end ?? false}
                className={({ isActive }) =>
                  cx('rounded-md px-3 py-1.5 text-sm font-medium transition-colors', isActive ? 'bg-hide-700 text-paper' : 'text-hide-200 hover:bg-hide-800 hover:text-paper')
                }
              >
                {item.label}
              </NavLink>
            ))}
            {mailbox.isSuccess && (
              <a href={paths.shop.mail.getHref()} className="rounded-md px-3 py-1.5 text-sm font-medium text-hide-200 transition-colors hover:bg-hide-800 hover:text-paper">
                Mailbox <span className="text-xs text-hide-400">(dev)</span>
              </a>
            )}
          </nav>
          <div className="ml-auto flex min-w-0 items-center gap-3 sm:gap-4">
            <div className="min-w-0 text-right leading-tight" data-testid="shell-identity">
              <p className="max-w-[12rem] truncate text-sm font-semibold text-paper sm:max-w-none" data-testid="shop-name">
                {me.shop.name}
              </p>
              <p className="flex items-center justify-end gap-2 whitespace-nowrap text-xs text-hide-300">
                <span>{me.user.name}</span>
                <RoleBadge role={me.role} />
              </p>
            </div>
            <Button
              variant="secondary"
              size="sm"
              className="shrink-0"
              busy={signOut.isPending}
              onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.auth.signIn.getHref(), { replace: true }) })}
            >
              Sign out
            </Button>
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-8 sm:px-6">
        <Suspense fallback={<p role="status" className="text-hide-600">Loading…</p>}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}

export const ErrorBoundary = RouteErrorBoundary;
