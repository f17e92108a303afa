/**
 * Every URL of the client, in one place. Route definitions read `path`; links and redirects
 * call `getHref(...)`, so a renamed screen changes here and nowhere else.
 */
function withRedirect(base: string, redirectTo?: string | null): string {
  return redirectTo && redirectTo !== '/' ? `${base}?redirectTo=${encodeURIComponent(redirectTo)}` : base;
}

export const paths = {
  home: { path: '/', getHref: () => '/' },
  library: { path: '/', getHref: (search?: string) => (search ? `/?${search}` : '/') },
  patterns: {
    new: { path: '/patterns/new', getHref: (kind?: string) => (kind ? `/patterns/new?kind=${encodeURIComponent(kind)}` : '/patterns/new') },
    detail: { path: '/patterns/:id', getHref: (id: number) => `/patterns/${id}` },
    history: { path: '/patterns/:id/history', getHref: (id: number) => `/patterns/${id}/history` },
    revision: { path: '/patterns/:id/revisions/:n', getHref: (id: number, n: number) => `/patterns/${id}/revisions/${n}` },
    compare: {
      // Under history so the History tab stays lit.
      path: '/patterns/:id/history/compare',
      getHref: (id: number, from: number, to: number) => `/patterns/${id}/history/compare?from=${from}&to=${to}`,
    },
  },
  shop: {
    members: { path: '/shop/members', getHref: () => '/shop/members' },
    standards: { path: '/shop/standards', getHref: () => '/shop/standards' },
    /** The server's own page (not a client route): link to it with a plain <a>. */
    mail: { path: '/dev/mail', getHref: () => '/dev/mail' },
  },
  orders: {
    board: { path: '/orders', getHref: () => '/orders' },
    table: { path: '/orders/table', getHref: (search?: string) => (search ? `/orders/table?${search}` : '/orders/table') },
    new: {
      path: '/orders/new',
      getHref: (from?: { customerId?: number; wearerId?: number }) => {
        const q = new URLSearchParams();
        if (from?.customerId) q.set('customerId', String(from.customerId));
        if (from?.wearerId) q.set('wearerId', String(from.wearerId));
        return q.size > 0 ? `/orders/new?${q.toString()}` : '/orders/new';
      },
    },
    detail: { path: '/orders/:id', getHref: (id: number) => `/orders/${id}` },
  },
  customers: {
    list: { path: '/customers', getHref: () => '/customers' },
    detail: { path: '/customers/:id', getHref: (id: number) => `/customers/${id}` },
  },
  pricing: { path: '/shop/pricing', getHref: () => '/shop/pricing' },
  /** The customer's public pages (links sent by e-mail). */
  measure: { path: '/measure/:token', getHref: (token: string) => `/measure/${encodeURIComponent(token)}` },
  proof: { path: '/proof/:token', getHref: (token: string) => `/proof/${encodeURIComponent(token)}` },
  invite: { path: '/invite/:token', getHref: (token: string) => `/invite/${encodeURIComponent(token)}` },
  share: { path: '/s/:token', getHref: (token: string) => `/s/${encodeURIComponent(token)}` },
  auth: {
    signIn: { path: '/sign-in', getHref: (redirectTo?: string | null) => withRedirect('/sign-in', redirectTo) },
    signUp: { path: '/sign-up', getHref: (redirectTo?: string | null) => withRedirect('/sign-up', redirectTo) },
  },
} as const;

/** Only same-site paths may be redirect targets (no open redirect through ?redirectTo=). */
export function safeRedirect(target: string | null | undefined, fallback: string = paths.home.getHref()): string {
  if (!target || !target.startsWith('/') || target.startsWith('//')) return fallback;
  return target;
}
