/** Every address of the client, in one place. */
export const paths = {
  signIn: '/sign-in',
  register: '/register',
  home: '/',
  codes: '/codes',
  code: (code: string) => `/codes/${encodeURIComponent(code)}`,
  jobs: '/jobs',
  job: (id: string) => `/jobs/${encodeURIComponent(id)}`,
  jobEstimatePrint: (id: string, estimateId?: string) =>
    `/jobs/${encodeURIComponent(id)}/estimate/print${estimateId ? `?estimate=${encodeURIComponent(estimateId)}` : ''}`,
  publicEstimate: (token: string) => `/estimate/${encodeURIComponent(token)}`,
  vehicles: '/vehicles',
  vehicle: (id: string) => `/vehicles/${encodeURIComponent(id)}`,
  imports: '/imports',
  reports: '/reports',
  review: '/review',
  knowledge: '/knowledge',
  shop: '/shop',
  insights: '/insights',
  adminUsers: '/admin/users',
  adminAudit: '/admin/audit',
} as const;
