import { randomUUID } from 'node:crypto';
import { DEMO_CUSTOMER_IDS, DEMO_MEMBERSHIP_IDS, DEMO_PROJECT_IDS, DEMO_SHOP_ID, DemoRole } from '@swapwright/seed-data';
import { bearer, createTestApp, resetData, Session, signInAllRoles, TestApp } from './helpers/test-app';

type Method = 'get' | 'post' | 'patch' | 'delete';

interface RouteCase {
  group: string;
  method: Method;
  /** Builds the path (and any record it needs) fresh for each role, so one role's delete cannot hide another's answer. */
  path: (t: TestApp) => Promise<string> | string;
  body?: () => object;
  allowed: DemoRole[];
}

const ROLES: DemoRole[] = ['owner', 'estimator', 'fabricator', 'counter', 'customer'];
const STAFF: DemoRole[] = ['owner', 'estimator', 'fabricator', 'counter'];

async function freshCustomer(t: TestApp): Promise<string> {
  const id = randomUUID();
  await t.dataSource.query('INSERT INTO customers (id, shopId, name) VALUES (?, ?, ?)', [id, DEMO_SHOP_ID, 'Matrix Test Customer']);
  return id;
}

async function freshProject(t: TestApp): Promise<string> {
  const id = randomUUID();
  await t.dataSource.query('INSERT INTO projects (id, shopId, customerId, title) VALUES (?, ?, ?, ?)', [
    id,
    DEMO_SHOP_ID,
    DEMO_CUSTOMER_IDS.juno,
    'Matrix test project',
  ]);
  return id;
}

async function freshMember(t: TestApp): Promise<string> {
  const userId = randomUUID();
  const membershipId = randomUUID();
  await t.dataSource.query('INSERT INTO users (id, email, name, passwordHash) VALUES (?, ?, ?, ?)', [
    userId,
    `member-${userId}@ironbark.test`,
    'Matrix Member',
    'x',
  ]);
  await t.dataSource.query('INSERT INTO memberships (id, shopId, userId, role) VALUES (?, ?, ?, ?)', [
    membershipId,
    DEMO_SHOP_ID,
    userId,
    'counter',
  ]);
  return membershipId;
}

// The table of role-matrix.ts, route by route.
const CASES: RouteCase[] = [
  { group: 'me', method: 'get', path: () => '/api/auth/me', allowed: ROLES },
  { group: 'shop', method: 'get', path: () => '/api/shops/current', allowed: ROLES },
  { group: 'shop settings', method: 'patch', path: () => '/api/shops/current', body: () => ({ laborRatePerHour: 140 }), allowed: ['owner'] },
  { group: 'members', method: 'get', path: () => '/api/memberships', allowed: ['owner'] },
  {
    group: 'members',
    method: 'patch',
    path: () => `/api/memberships/${DEMO_MEMBERSHIP_IDS.counter}`,
    body: () => ({ role: 'counter' }),
    allowed: ['owner'],
  },
  { group: 'members', method: 'delete', path: async (t) => `/api/memberships/${await freshMember(t)}`, allowed: ['owner'] },
  { group: 'invitations', method: 'get', path: () => '/api/invitations', allowed: ['owner'] },
  {
    group: 'invitations',
    method: 'post',
    path: () => '/api/invitations',
    body: () => ({ email: `invitee-${randomUUID()}@example.test`, role: 'counter' }),
    allowed: ['owner'],
  },
  { group: 'customers', method: 'get', path: () => '/api/customers', allowed: STAFF },
  { group: 'customers', method: 'get', path: () => `/api/customers/${DEMO_CUSTOMER_IDS.odile}`, allowed: STAFF },
  { group: 'customers', method: 'post', path: () => '/api/customers', body: () => ({ name: 'Posted Customer' }), allowed: ['owner', 'estimator'] },
  {
    group: 'customers',
    method: 'patch',
    path: () => `/api/customers/${DEMO_CUSTOMER_IDS.tamsin}`,
    body: () => ({ notes: 'Called back.' }),
    allowed: ['owner', 'estimator'],
  },
  { group: 'customers', method: 'delete', path: async (t) => `/api/customers/${await freshCustomer(t)}`, allowed: ['owner', 'estimator'] },
  { group: 'projects', method: 'get', path: () => '/api/projects', allowed: ROLES },
  { group: 'projects', method: 'get', path: () => `/api/projects/${DEMO_PROJECT_IDS.ridgeback}`, allowed: ROLES },
  {
    group: 'projects',
    method: 'post',
    path: () => '/api/projects',
    body: () => ({ customerId: DEMO_CUSTOMER_IDS.caspar, title: 'Posted project' }),
    allowed: ['owner', 'estimator'],
  },
  {
    group: 'projects (placement)',
    method: 'patch',
    path: () => `/api/projects/${DEMO_PROJECT_IDS.ridgeback}`,
    body: () => ({ placement: { setbackMm: 550, heightMm: 600, tiltDeg: 2.5 } }),
    allowed: ['owner', 'estimator', 'fabricator'],
  },
  {
    group: 'projects (other fields)',
    method: 'patch',
    path: () => `/api/projects/${DEMO_PROJECT_IDS.ridgeback}`,
    body: () => ({ title: 'Harlan Ridgeback 1978: Kestrel 5.3 V8 swap' }),
    allowed: ['owner', 'estimator'],
  },
  { group: 'projects', method: 'delete', path: async (t) => `/api/projects/${await freshProject(t)}`, allowed: ['owner', 'estimator'] },
];

const TABLE = CASES.flatMap((route) =>
  ROLES.map((role) => ({ ...route, role, expected: route.allowed.includes(role) ? 'allowed' : 'refused' })),
);

describe('role matrix', () => {
  let t: TestApp;
  let sessions: Record<DemoRole, Session>;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    sessions = await signInAllRoles(t.http);
  });

  afterAll(() => t.close());

  it.each(TABLE)('$method $group as $role is $expected', async ({ method, path, body, role, expected }) => {
    let call = t.http[method](await path(t)).set(...bearer(sessions[role]));
    if (body) call = call.send(body());
    const response = await call;
    if (expected === 'allowed') {
      expect([200, 201, 204]).toContain(response.status);
    } else {
      expect(response.status).toBe(403);
      expect(response.body.code).toMatch(/forbidden/);
    }
  });

  it('shows the shop rates to staff only; a customer gets id, name, units, currency and the time zone its quotes are dated in', async () => {
    const customer = await t.http.get('/api/shops/current').set(...bearer(sessions.customer)).expect(200);
    expect(Object.keys(customer.body).sort()).toEqual(['currency', 'id', 'name', 'timeZone', 'unitSystem', 'view']);
    expect(customer.body.view).toBe('summary');
    for (const role of STAFF) {
      const staff = await t.http.get('/api/shops/current').set(...bearer(sessions[role])).expect(200);
      expect(staff.body).toMatchObject({ view: 'full', id: customer.body.id, laborRatePerHour: expect.any(Number), taxRatePercent: expect.any(Number) });
    }
  });

  it('refuses every non-public route without a token', async () => {
    for (const route of CASES) {
      const response = await t.http[route.method](await route.path(t));
      expect(response.status).toBe(401);
    }
  });
});
