/**
 * Every URL of the client, in one place. Route definitions read `path`; links and redirects
 * call `getHref(...)`, so a renamed screen changes here and nowhere else.
 */
function withRedirect(base: string, redirectTo?: string | null): string {
  return redirectTo && redirectTo !== '/' ? `${base}?redirectTo=${encodeURIComponent(redirectTo)}` : base;
}

export const paths = {
  home: { path: '/', getHref: () => '/' },
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
