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
  register: {
    path: '/register',
    /** The register view; its filters, sort, page and columns live in the query string. */
    getHref: (search?: URLSearchParams | string) => {
      const query = search ? search.toString() : '';
      return query ? `/register?${query}` : '/register';
    },
  },
  find: {
    path: '/find',
    getHref: () => '/find',
  },
  assemblies: {
    detail: { path: '/assemblies/:id', getHref: (id: string) => `/assemblies/${encodeURIComponent(id)}` },
    create: { path: '/assemblies/new', getHref: (query: { siteId?: string; constructionId?: string; next?: string } = {}) => withQuery('/assemblies/new', query) },
    replace: { path: '/assemblies/:id/replace', getHref: (id: string) => `/assemblies/${encodeURIComponent(id)}/replace` },
  },
  positions: {
    detail: { path: '/positions/:id', getHref: (id: string) => `/positions/${encodeURIComponent(id)}` },
    create: { path: '/positions/new', getHref: (query: { equipmentId?: string } = {}) => withQuery('/positions/new', query) },
  },
  catalogue: {
    constructions: { path: '/catalogue/constructions', getHref: () => '/catalogue/constructions' },
    construction: { path: '/catalogue/constructions/:id', getHref: (id: string) => `/catalogue/constructions/${encodeURIComponent(id)}` },
    fittings: { path: '/catalogue/fittings', getHref: () => '/catalogue/fittings' },
    fitting: { path: '/catalogue/fittings/:id', getHref: (id: string) => `/catalogue/fittings/${encodeURIComponent(id)}` },
    services: { path: '/catalogue/services', getHref: (siteId?: string) => withQuery('/catalogue/services', { siteId }) },
    places: { path: '/sites', getHref: (siteId?: string) => withQuery('/sites', { siteId }) },
  },
  importCsv: {
    path: '/import',
    getHref: (jobId?: string) => withQuery('/import', { job: jobId }),
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
