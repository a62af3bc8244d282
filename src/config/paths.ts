/** Every client URL, built in one place (bulletproof-react's paths.getHref pattern). */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string | null) =>
      redirectTo && redirectTo !== '/' ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}` : '/sign-in',
  },
  signUp: { path: '/sign-up', getHref: () => '/sign-up' },
  workshops: { path: '/workshops', getHref: () => '/workshops' },
  workshop: { path: '/w/:workshopId', getHref: (workshopId: number) => `/w/${workshopId}` },
  designs: { path: '/w/:workshopId/designs', getHref: (workshopId: number) => `/w/${workshopId}/designs` },
  design: {
    path: '/w/:workshopId/designs/:designId',
    getHref: (workshopId: number, designId: number) => `/w/${workshopId}/designs/${designId}`,
  },
  members: { path: '/w/:workshopId/members', getHref: (workshopId: number) => `/w/${workshopId}/members` },
  workshopSettings: { path: '/w/:workshopId/settings', getHref: (workshopId: number) => `/w/${workshopId}/settings` },
  stock: { path: '/w/:workshopId/stock', getHref: (workshopId: number) => `/w/${workshopId}/stock` },
  invitations: { path: '/w/:workshopId/invitations', getHref: (workshopId: number) => `/w/${workshopId}/invitations` },
  sentMail: { path: '/w/:workshopId/sent-mail', getHref: (workshopId: number) => `/w/${workshopId}/sent-mail` },
  checklists: { path: '/w/:workshopId/checklists', getHref: (workshopId: number) => `/w/${workshopId}/checklists` },
  checklist: {
    path: '/w/:workshopId/cut-plans/:planId/checklist',
    getHref: (workshopId: number, planId: number) => `/w/${workshopId}/cut-plans/${planId}/checklist`,
  },
  sharePlan: {
    path: '/w/:workshopId/cut-plans/:planId/share',
    getHref: (workshopId: number, planId: number) => `/w/${workshopId}/cut-plans/${planId}/share`,
  },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  resetPassword: { path: '/reset-password/:token', getHref: (token: string) => `/reset-password/${token}` },
  invite: { path: '/invite/:token', getHref: (token: string) => `/invite/${token}` },
  sharedPlan: { path: '/share/:token', getHref: (token: string) => `/share/${token}` },
  builds: { path: '/w/:workshopId/builds', getHref: (workshopId: number) => `/w/${workshopId}/builds` },
  build: {
    path: '/w/:workshopId/builds/:buildId',
    getHref: (workshopId: number, buildId: number) => `/w/${workshopId}/builds/${buildId}`,
  },
  cutPlan: {
    path: '/w/:workshopId/cut-plans/:planId',
    getHref: (workshopId: number, planId: number) => `/w/${workshopId}/cut-plans/${planId}`,
  },
} as const;

/** Only same-site relative paths may be used as a redirect target (no `//evil.example`). */
export function safeRedirect(target: string | null | undefined, fallback = '/'): string {
  if (!target || !target.startsWith('/') || target.startsWith('//') || target.startsWith('/\\')) return fallback;
  if (target.startsWith(paths.signIn.path) || target.startsWith(paths.signUp.path)) return fallback;
  return target;
}
