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
    /** The server's own page (not a client route): link to it with a plain <a>. */
    mail: { path: '/dev/mail', getHref: () => '/dev/mail' },
  },
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
