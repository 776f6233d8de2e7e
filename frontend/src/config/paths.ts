/** Every route of the app and the builders of links to them. */

const withQuery = (path: string, query: Record<string, string | undefined>): string => {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) params.set(key, value);
  const search = params.toString();
  return search ? `${path}?${search}` : path;
};

export const paths = {
  home: {
    path: '/',
    getHref: () => '/',
  },
  auth: {
    signIn: {
      path: '/sign-in',
      /** `next` is where to go after signing in: a path inside the app. */
      getHref: (next?: string) => withQuery('/sign-in', { next: next && next !== '/' ? next : undefined }),
    },
    forgotPassword: {
      path: '/forgot-password',
      getHref: () => '/forgot-password',
    },
    resetPassword: {
      path: '/reset-password',
      getHref: (token?: string) => withQuery('/reset-password', { token }),
    },
    acceptInvite: {
      path: '/accept-invite',
      getHref: (token?: string) => withQuery('/accept-invite', { token }),
    },
    setup: {
      path: '/setup',
      getHref: (token?: string) => withQuery('/setup', { token }),
    },
  },
  preferences: {
    path: '/preferences',
    getHref: () => '/preferences',
  },
  users: {
    list: {
      path: '/users',
      getHref: (search?: URLSearchParams | string) => {
        const query = search ? search.toString() : '';
        return query ? `/users?${query}` : '/users';
      },
    },
    detail: {
      path: '/users/:id',
      getHref: (id: string) => `/users/${encodeURIComponent(id)}`,
    },
  },
  /** Server-rendered page of the e-mails a demo has sent; reached with a plain link, not the router. */
  demoMail: {
    href: '/demo/mail',
  },
} as const;

const AUTH_PATHS: readonly string[] = [
  paths.auth.signIn.path,
  paths.auth.forgotPassword.path,
  paths.auth.resetPassword.path,
  paths.auth.acceptInvite.path,
  paths.auth.setup.path,
];

/** The `next` target after signing in, if it is a safe path inside the app; otherwise home. */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return paths.home.getHref();
  const pathname = next.split(/[?#]/)[0] ?? '';
  if (AUTH_PATHS.includes(pathname)) return paths.home.getHref();
  return next;
}
