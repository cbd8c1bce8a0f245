/** Every route of the web app. Links and redirects go through `getHref`, never hand-written strings. */

function withQuery(path: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) params.set(key, value);
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

function methodSegment(methodId: string): string {
  return encodeURIComponent(methodId).replace(/%3A/gi, ':');
}

export const paths = {
  root: { path: '/', getHref: () => '/' },
  auth: {
    signIn: {
      path: '/sign-in',
      getHref: (next?: string, email?: string) => withQuery('/sign-in', { next, email }),
    },
    forgotPassword: { path: '/forgot-password', getHref: (email?: string) => withQuery('/forgot-password', { email }) },
    // These two are also the targets of the links the server mails out.
    resetPassword: { path: '/reset-password', getHref: (token?: string) => withQuery('/reset-password', { token }) },
    acceptInvite: { path: '/accept-invite', getHref: (token?: string) => withQuery('/accept-invite', { token }) },
  },
  library: {
    home: { path: '/library', getHref: (q?: string) => withQuery('/library', { q }) },
    tagged: { path: '/library', getHref: (tag: string) => withQuery('/library', { tag }) },
    collection: {
      path: '/library/:collectionKey',
      getHref: (collectionKey: string, tag?: string) => withQuery(`/library/${encodeURIComponent(collectionKey)}`, { tag }),
    },
  },
  search: {
    path: '/search',
    getHref: (query: { q?: string; collection?: string; tag?: string } = {}) => withQuery('/search', query),
  },
  standards: {
    page: { path: '/standards/:documentNumber', getHref: (documentNumber: string) => `/standards/${encodeURIComponent(documentNumber)}` },
    create: { path: '/standards/new', getHref: () => '/standards/new' },
    edit: { path: '/standards/:documentNumber/edit', getHref: (documentNumber: string) => `/standards/${encodeURIComponent(documentNumber)}/edit` },
    history: { path: '/standards/:documentNumber/history', getHref: (documentNumber: string) => `/standards/${encodeURIComponent(documentNumber)}/history` },
    compare: {
      path: '/standards/:documentNumber/compare',
      getHref: (documentNumber: string, from?: string, to?: string) => withQuery(`/standards/${encodeURIComponent(documentNumber)}/compare`, { from, to }),
    },
  },
  records: {
    list: { path: '/records', getHref: () => '/records' },
    record: { path: '/records/:recordId', getHref: (recordId: string) => `/records/${encodeURIComponent(recordId)}` },
  },
  methods: {
    catalog: { path: '/methods', getHref: () => '/methods' },
    create: { path: '/methods/new', getHref: () => '/methods/new' },
    // In-house ids carry a colon (house:o-ring-squeeze); it is legal in a path segment and reads better unescaped.
    method: { path: '/methods/:methodId', getHref: (methodId: string) => `/methods/${methodSegment(methodId)}` },
    design: { path: '/methods/:methodId/design', getHref: (methodId: string) => `/methods/${methodSegment(methodId)}/design` },
    review: { path: '/methods/:methodId/review', getHref: (methodId: string) => `/methods/${methodSegment(methodId)}/review` },
    compare: {
      path: '/methods/:methodId/compare',
      getHref: (methodId: string, from?: string, to?: string) => withQuery(`/methods/${methodSegment(methodId)}/compare`, { from, to }),
    },
  },
  admin: {
    root: { path: '/admin', getHref: () => '/admin' },
    users: { path: '/admin/users', getHref: () => '/admin/users' },
    mail: { path: '/admin/mail', getHref: (id?: string) => withQuery('/admin/mail', { id }) },
    audit: { path: '/admin/audit', getHref: () => '/admin/audit' },
  },
} as const;

/** Only same-app paths may be used as a post-sign-in destination (no `//host` or absolute URLs). */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return paths.library.home.getHref();
  if (next.startsWith(paths.auth.signIn.path)) return paths.library.home.getHref();
  return next;
}
