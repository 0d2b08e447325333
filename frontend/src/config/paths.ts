/** Every address of the client, in one place. */
export const paths = {
  signIn: '/sign-in',
  register: '/register',
  home: '/',
  codes: '/codes',
  code: (code: string) => `/codes/${encodeURIComponent(code)}`,
  jobs: '/jobs',
  vehicles: '/vehicles',
  imports: '/imports',
  reports: '/reports',
  review: '/review',
  knowledge: '/knowledge',
  shop: '/shop',
  insights: '/insights',
  adminUsers: '/admin/users',
  adminAudit: '/admin/audit',
} as const;
