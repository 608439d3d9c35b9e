import { DemoRole } from '@swapwright/seed-data';

/**
 * Who may call each route: the one declared decision per route the access suites check the running app against.
 * Keys are `METHOD /path` exactly as the app registers them (Express patterns, `:param`). A route the app
 * registers that is missing here fails the access suite by itself: a new route needs a line here first.
 *
 * - `public`: no sign-in needed (anonymous gets through the gate; the route itself checks its token or signature).
 * - `signed-in`: any member of the shop, whatever the role.
 * - a list of roles: only those; every other role is refused with 403, anonymous with 401.
 */
export type Access = 'public' | 'signed-in' | readonly DemoRole[];

const OWNER = ['owner'] as const;
const ALL: readonly DemoRole[] = ['owner', 'estimator', 'fabricator', 'counter', 'customer'];
const STAFF: readonly DemoRole[] = ['owner', 'estimator', 'fabricator', 'counter'];
const SALES: readonly DemoRole[] = ['owner', 'estimator'];
const BUILDERS: readonly DemoRole[] = ['owner', 'estimator', 'fabricator'];
const STOCK_KEEPERS: readonly DemoRole[] = ['owner', 'estimator', 'counter'];
const COUNTER_DESK: readonly DemoRole[] = ['owner', 'counter'];
const MEASURERS: readonly DemoRole[] = ['owner', 'fabricator'];
const PHOTO_ADDERS: readonly DemoRole[] = ['owner', 'fabricator', 'customer'];
const CUSTOMER_ONLY: readonly DemoRole[] = ['customer'];

const CATALOG_KINDS = [
  'engines',
  'oil-pans',
  'oil-pickups',
  'oil-pumps',
  'transmissions',
  'chassis',
  'controllers',
  'mount-adapters',
  'bellhousing-adapters',
  'belts',
] as const;

const catalogRoutes = Object.fromEntries(
  CATALOG_KINDS.flatMap((kind) => [
    [`GET /api/catalog/${kind}`, STAFF],
    [`POST /api/catalog/${kind}`, STOCK_KEEPERS],
    [`GET /api/catalog/${kind}/:id`, STAFF],
    [`PATCH /api/catalog/${kind}/:id`, STOCK_KEEPERS],
    [`DELETE /api/catalog/${kind}/:id`, STOCK_KEEPERS],
  ]),
) as Record<string, Access>;

export const ROUTE_POLICY: Record<string, Access> = {
  // The API's own documentation and the load balancer's probe.
  'GET /api/docs': 'public',
  'GET /api/docs/': 'public',
  'GET /api/docs/index.html': 'public',
  'GET /api/docs/LICENSE': 'public',
  'GET /api/docs/swagger-ui-init.js': 'public',
  'GET /api/docs/docs/swagger-ui-init.js': 'public',
  'GET /api/docs-json': 'public',
  'GET /api/docs-yaml': 'public',
  'GET /api/health': 'public',

  // Sign-in and sign-up: public by nature; each checks its own token, password or link.
  'POST /api/auth/sign-up': 'public',
  'POST /api/auth/sign-up/confirm': 'public',
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/refresh': 'public',
  'POST /api/auth/sign-out': 'public',
  'POST /api/auth/password-reset/request': 'public',
  'POST /api/auth/password-reset/confirm': 'public',
  'POST /api/invitations/accept': 'public',
  'GET /api/auth/me': 'signed-in',

  // The shop and its people.
  'GET /api/shops/current': 'signed-in',
  'PATCH /api/shops/current': OWNER,
  'GET /api/memberships': OWNER,
  'PATCH /api/memberships/:id': OWNER,
  'DELETE /api/memberships/:id': OWNER,
  'GET /api/invitations': OWNER,
  'POST /api/invitations': OWNER,
  'POST /api/invitations/:id/resend': OWNER,
  'DELETE /api/invitations/:id': OWNER,
  'GET /api/dev/mail': OWNER,
  'GET /api/audit-events': OWNER,
  'GET /api/jobs': OWNER,
  'POST /api/jobs/:id/retry': OWNER,

  'GET /api/customers': STAFF,
  'POST /api/customers': SALES,
  'GET /api/customers/:id': STAFF,
  'PATCH /api/customers/:id': SALES,
  'DELETE /api/customers/:id': SALES,

  // Projects: customers read their own (the service scopes them; another's is not found).
  'GET /api/projects': ALL,
  'POST /api/projects': SALES,
  'GET /api/projects/:id': ALL,
  'PATCH /api/projects/:id': BUILDERS,
  'DELETE /api/projects/:id': SALES,

  ...catalogRoutes,
  // Starting a shop's catalog from the sample: the owner's decision for the whole shop.
  'POST /api/catalog/sample': OWNER,

  // Fit checks.
  'POST /api/projects/:id/fit-reports': BUILDERS,
  'GET /api/projects/:id/fit-reports': ALL,
  'GET /api/fit-reports/compare': ALL,
  'POST /api/fit-reports/what-if': STAFF,
  'GET /api/fit-reports/:id': ALL,
  'GET /api/projects/:id/fit-selections': STAFF,
  'PUT /api/projects/:id/fit-selections': BUILDERS,
  'PATCH /api/projects/:id/fit-selections': BUILDERS,
  'GET /api/fit-settings': STAFF,
  'PUT /api/fit-settings': OWNER,

  // Measurement sheets and photos.
  'GET /api/projects/:id/measurement-sheet': ALL,
  'PUT /api/projects/:id/measurement-sheet/values/:pointId': MEASURERS,
  'POST /api/projects/:id/measurement-sheet/sign-off': MEASURERS,
  'POST /api/projects/:id/measurement-sheet/photos': PHOTO_ADDERS,
  'GET /api/measurement-photos/:id/file': ALL,
  'DELETE /api/measurement-photos/:id': PHOTO_ADDERS,
  'POST /api/measurement-photos/:id/accept': MEASURERS,
  'GET /api/chassis/:chassisId/measurement-template': STAFF,
  'PUT /api/chassis/:chassisId/measurement-template': MEASURERS,
  'GET /api/measurement-settings': STAFF,
  'PUT /api/measurement-settings': OWNER,

  // Parts, stock and the counter.
  'GET /api/parts': STAFF,
  'GET /api/parts/export.csv': STAFF,
  'POST /api/parts/import/preview': STOCK_KEEPERS,
  'POST /api/parts/import': STOCK_KEEPERS,
  'POST /api/parts': STOCK_KEEPERS,
  'GET /api/parts/:id': STAFF,
  'PATCH /api/parts/:id': STOCK_KEEPERS,
  'PUT /api/parts/:id/stock': STOCK_KEEPERS,
  'DELETE /api/parts/:id': STOCK_KEEPERS,
  'GET /api/suppliers': STAFF,
  'POST /api/suppliers': STOCK_KEEPERS,
  'PATCH /api/suppliers/:id': STOCK_KEEPERS,
  'DELETE /api/suppliers/:id': STOCK_KEEPERS,
  'POST /api/projects/:projectId/parts-plans': SALES,
  // Customers read their own projects' plans, in the customer's view (the service scopes them; another's is not found).
  'GET /api/projects/:projectId/parts-plans': ALL,
  'GET /api/parts-plans': STAFF,
  'GET /api/parts-plans/:id': ALL,
  'POST /api/parts-plans/:id/lock': SALES,
  'GET /api/parts-plans/:id/counter-lines': STAFF,
  'GET /api/parts-plans/:id/pick-list.csv': STAFF,
  'POST /api/counter-lines/:id/reserve': COUNTER_DESK,
  'POST /api/counter-lines/:id/release': COUNTER_DESK,
  'POST /api/counter-lines/:id/issue': COUNTER_DESK,
  'POST /api/counter-lines/:id/return': COUNTER_DESK,
  'POST /api/parts-plans/:id/issue': COUNTER_DESK,
  'POST /api/counter-lines/:id/mark': COUNTER_DESK,
  'POST /api/counter-lines/:id/receive': COUNTER_DESK,

  // Labor, quotes and payments.
  'GET /api/labor-operations': STAFF,
  'POST /api/labor-operations': SALES,
  'PATCH /api/labor-operations/:id': SALES,
  'DELETE /api/labor-operations/:id': SALES,
  'GET /api/projects/:projectId/quotes': ALL,
  'POST /api/projects/:projectId/quotes': SALES,
  'GET /api/quotes': SALES,
  'GET /api/quotes/notifications': SALES,
  'GET /api/quotes/:id': ALL,
  'PATCH /api/quotes/:id': SALES,
  'POST /api/quotes/:id/send': SALES,
  'POST /api/quotes/:id/start-own-build': SALES,
  'POST /api/quotes/:id/answer': CUSTOMER_ONLY,
  'GET /api/quotes/:id/compare': ALL,
  'GET /api/quotes/:id/pdf': ALL,
  'POST /api/quotes/:id/deposit': CUSTOMER_ONLY,
  'GET /api/quote-settings': SALES,
  'PUT /api/quote-settings': OWNER,
  // The link in the customer's e-mail is the credential: a signed, expiring token in the path.
  'GET /api/quote-links/:token': 'public',
  'POST /api/quote-links/:token/answer': 'public',
  'GET /api/quote-links/:token/pdf': 'public',
  'POST /api/quote-links/:token/deposit': 'public',
  // Signed by the payment provider (checked against PAYMENT_WEBHOOK_SECRET).
  'POST /api/payments/webhook': 'public',

  // Work orders: the people who build (start, record checks, finish) read and run them.
  'GET /api/work-orders': BUILDERS,
  'GET /api/work-orders/:id': BUILDERS,
  'POST /api/work-orders/:id/start': BUILDERS,
  'POST /api/work-orders/:id/checks': BUILDERS,
  'POST /api/work-orders/:id/checks/:checkKey/photos': BUILDERS,
  'POST /api/work-orders/:id/finish': BUILDERS,
  'GET /api/work-order-photos/:id/file': ALL,
  // A wrong check photo is removed by the people who add them (a finished work order keeps its photos).
  'DELETE /api/work-order-photos/:id': BUILDERS,
  'GET /api/projects/:projectId/work-order': BUILDERS,
};

export const DEMO_ROLES: readonly DemoRole[] = ALL;

export function allowedRoles(access: Access): readonly DemoRole[] {
  if (access === 'public' || access === 'signed-in') return ALL;
  return access;
}
