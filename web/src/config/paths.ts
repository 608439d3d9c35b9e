/** Every route path of the web app. Build links with these, never with string literals. */
export const paths = {
  signIn: '/sign-in',
  signUp: '/sign-up',
  resetPassword: '/reset-password',
  acceptInvite: '/accept-invite',
  quoteAnswer: '/quote-answer/:token',

  home: '/',
  projects: '/projects',
  projectDetail: '/projects/:projectId',
  projectFit: '/projects/:projectId/fit',
  projectMeasurements: '/projects/:projectId/measurements',
  myProjects: '/my-projects',
  customers: '/customers',
  quoteDetail: '/quotes/:quoteId',
  workOrders: '/work-orders',
  workOrderDetail: '/work-orders/:workOrderId',
  partsCounter: '/parts-counter',
  catalog: '/catalog',
  members: '/members',
  shopSettings: '/settings/shop',
  backgroundWork: '/settings/background-work',
} as const;

export type AppPath = (typeof paths)[keyof typeof paths];

export const toProjectDetail = (projectId: string): string =>
  paths.projectDetail.replace(':projectId', encodeURIComponent(projectId));

export const toProjectFit = (projectId: string): string =>
  paths.projectFit.replace(':projectId', encodeURIComponent(projectId));

export const toProjectMeasurements = (projectId: string): string =>
  paths.projectMeasurements.replace(':projectId', encodeURIComponent(projectId));

export const toQuote = (quoteId: string): string => paths.quoteDetail.replace(':quoteId', encodeURIComponent(quoteId));

export const toWorkOrder = (workOrderId: string): string =>
  paths.workOrderDetail.replace(':workOrderId', encodeURIComponent(workOrderId));

export const toSignIn = (next?: string): string =>
  next && next !== paths.home ? `${paths.signIn}?next=${encodeURIComponent(next)}` : paths.signIn;

/** The catalog opened on one kind's tab (`/catalog?kind=engines`). */
export const toCatalogKind = (kind: string): string => `${paths.catalog}?kind=${encodeURIComponent(kind)}`;
