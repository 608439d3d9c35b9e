import { randomUUID } from 'node:crypto';
import { JwtService } from '@nestjs/jwt';
import { DEMO_SHOP_ID, DemoRole } from '@swapwright/seed-data';
import * as bcrypt from 'bcryptjs';
import { allowedRoles, DEMO_ROLES, ROUTE_POLICY } from './access/route-policy';
import { bearer, Session, signIn, startSignedInApp, TestApp } from './helpers/test-app';
import { seedCatalog } from '../src/database/seed/seed-catalog';
import { inParallel, RegisteredRoute, registeredRoutes, tableChecksums } from './helpers/routes';

/**
 * Generated from the running app: every route its router registers × every demo role × anonymous, against the one
 * declared decision per route in access/route-policy.ts. Path parameters name no record (a fresh id), and write
 * bodies are empty, so an allowed caller is let through the gate (and then answered 400 or 404) while a refused one
 * is stopped there; nothing is written, which the table checksums at the end prove.
 */
const PARALLEL = 8;
const SLOW = 120_000;

/** Through the gate: not refused by the sign-in or role check (a public route may still refuse its own link token). */
const GATE_REFUSALS = ['unauthorized', 'session_expired', 'session_ended', 'membership_revoked'];
function passedGate(response: { status: number; body?: { code?: string } }): boolean {
  if (response.status === 403 || response.status >= 500) return false;
  return response.status !== 401 || !GATE_REFUSALS.includes(response.body?.code ?? 'unauthorized');
}

function concrete(route: RegisteredRoute): string {
  return route.path.replace(/:(\w+)/g, (_match, name: string) => (name === 'token' ? 'not-a-link-token' : name === 'pointId' ? 'front-crossmember.top' : randomUUID()));
}

describe('access matrix, generated from the router', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;
  let routes: RegisteredRoute[];
  let tables: string[];
  let checksumsBefore: Record<string, string>;

  beforeAll(async () => {
    ({ t, s } = await startSignedInApp());
    routes = registeredRoutes(t.app);
    tables = t.dataSource.entityMetadatas.map((entity) => entity.tableName);
    // Settings that a first read creates with their defaults are made now, so the probes below write nothing.
    await inParallel(routes.filter((route) => route.method === 'get' && route.params.length === 0), PARALLEL, (route) =>
      t.http.get(route.path).set(...bearer(s.owner)).then(() => undefined),
    );
    // The demo shop's catalog is the sample catalog: loaded now, the owner's probe of POST /api/catalog/sample adds nothing.
    await seedCatalog(t.dataSource);
    checksumsBefore = await tableChecksums((sql) => t.dataSource.query(sql), tables);
  });

  afterAll(() => t.close());

  const send = (route: RegisteredRoute, header?: [string, string]) => {
    let call = t.http[route.method](concrete(route));
    if (header) call = call.set(...header);
    if (route.method !== 'get' && route.method !== 'delete') call = call.send({});
    return call;
  };

  it('reads every route of the app, and the policy names each of them (a new route needs a decision first)', () => {
    expect(routes.length).toBeGreaterThan(120);
    const registered = new Set(routes.map((route) => route.key));
    const undecided = [...registered].filter((key) => !(key in ROUTE_POLICY));
    const stale = Object.keys(ROUTE_POLICY).filter((key) => !registered.has(key));
    expect({ undecided, stale }).toEqual({ undecided: [], stale: [] });
  });

  it('answers every route × role as the policy says: allowed roles pass the gate, the others get 403', async () => {
    const cases = routes.flatMap((route) => DEMO_ROLES.map((role) => ({ route, role })));
    const wrong = (
      await inParallel(cases, PARALLEL, async ({ route, role }) => {
        const access = ROUTE_POLICY[route.key];
        const allowed = allowedRoles(access).includes(role);
        const response = await send(route, bearer(s[role]));
        const ok = allowed ? passedGate(response) : response.status === 403;
        return ok ? null : `${route.key} as ${role}: expected ${allowed ? 'through the gate' : '403'}, got ${response.status} ${response.body?.code ?? ''}`;
      })
    ).filter(Boolean);
    expect(wrong).toEqual([]);
    expect(cases.length).toBeGreaterThan(600);
  }, SLOW);

  it('answers 401 to anonymous calls of every non-public route, and lets anonymous through the public ones', async () => {
    const wrong = (
      await inParallel(routes, PARALLEL, async (route) => {
        const isPublic = ROUTE_POLICY[route.key] === 'public';
        const response = await send(route);
        const ok = isPublic ? passedGate(response) : response.status === 401;
        return ok ? null : `${route.key} anonymous: expected ${isPublic ? 'through the gate' : '401'}, got ${response.status}`;
      })
    ).filter(Boolean);
    expect(wrong).toEqual([]);
  }, SLOW);

  describe('tokens that must not open any route', () => {
    const claimsOf = (session: Session) => JSON.parse(Buffer.from(session.accessToken.split('.')[1], 'base64url').toString()) as Record<string, unknown>;
    const fresh = (claims: Record<string, unknown>) => {
      const { iat: _iat, exp: _exp, ...rest } = claims;
      return rest;
    };

    async function refusedEverywhere(token: string): Promise<string[]> {
      const guarded = routes.filter((route) => ROUTE_POLICY[route.key] !== 'public');
      return (
        await inParallel(guarded, PARALLEL, async (route) => {
          const response = await send(route, ['Authorization', `Bearer ${token}`]);
          return response.status === 401 ? null : `${route.key}: ${response.status}`;
        })
      ).filter((line): line is string => line !== null);
    }

    it('refuses a token with alg "none" (no signature)', async () => {
      const header = Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url');
      const payload = Buffer.from(JSON.stringify({ ...claimsOf(s.owner), exp: Math.floor(Date.now() / 1000) + 600 })).toString('base64url');
      expect(await refusedEverywhere(`${header}.${payload}.`)).toEqual([]);
    });

    it('refuses a token signed with another key', async () => {
      const forged = new JwtService({ secret: `not-the-key-${randomUUID()}`, signOptions: { algorithm: 'HS256' } });
      expect(await refusedEverywhere(forged.sign(fresh(claimsOf(s.owner)), { expiresIn: 600 }))).toEqual([]);
    });

    it('refuses a correctly signed token that has expired', async () => {
      const now = Math.floor(Date.now() / 1000);
      const expired = t.jwt.sign({ ...fresh(claimsOf(s.owner)), iat: now - 7200, exp: now - 3600 });
      expect(await refusedEverywhere(expired)).toEqual([]);
      const response = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${expired}`).expect(401);
      expect(response.body.message).toMatch(/sign in/i);
    });

    it('refuses the token of a person whose account was deleted, and of a member removed from the shop', async () => {
      const password = 'gone-tomorrow-2026';
      const make = async (role: DemoRole) => {
        const userId = randomUUID();
        const email = `leaver-${userId}@ironbark.test`;
        await t.dataSource.query('INSERT INTO users (id, email, name, passwordHash) VALUES (?, ?, ?, ?)', [userId, email, 'Leaver', await bcrypt.hash(password, 4)]);
        const membershipId = randomUUID();
        await t.dataSource.query('INSERT INTO memberships (id, shopId, userId, role) VALUES (?, ?, ?, ?)', [membershipId, DEMO_SHOP_ID, userId, role]);
        const session = await signIn(t.http, email, password);
        await t.http.get('/api/auth/me').set(...bearer(session)).expect(200);
        return { userId, membershipId, session };
      };
      const deleted = await make('estimator');
      await t.dataSource.query('DELETE FROM users WHERE id = ?', [deleted.userId]);
      expect(await refusedEverywhere(deleted.session.accessToken)).toEqual([]);

      const removed = await make('counter');
      await t.http.delete(`/api/memberships/${removed.membershipId}`).set(...bearer(s.owner)).expect(204);
      expect(await refusedEverywhere(removed.session.accessToken)).toEqual([]);
    });

    it('refuses the token of a session that signed out', async () => {
      const session = await signIn(t.http, 'fabricator@ironbark.test');
      await t.http.get('/api/auth/me').set(...bearer(session)).expect(200);
      await t.http.post('/api/auth/sign-out').send({ refreshToken: session.refreshToken }).expect(204);
      expect(await refusedEverywhere(session.accessToken)).toEqual([]);
    });
  });

  it('wrote nothing outside the sign-in bookkeeping while probing every route', async () => {
    const after = await tableChecksums((sql) => t.dataSource.query(sql), tables);
    // Sign-ins, sign-outs and the two leavers made in the token cases touch only these (the removal of the second
    // is audited; sign-in attempts are counted in the shared rate-limit store); the owner's empty
    // PUT /api/quote-settings is a valid update that stores the same settings again.
    const bookkeeping = new Set(['refresh_tokens', 'users', 'memberships', 'audit_events', 'throttle_counters', 'quote_settings']);
    const changed = tables.filter((table) => !bookkeeping.has(table) && after[table] !== checksumsBefore[table]);
    expect(changed).toEqual([]);
  });
});
