import { DEMO_MEMBERSHIP_IDS, DEMO_USER_IDS } from '@swapwright/seed-data';
import { JwtService } from '@nestjs/jwt';
import { createTestApp, resetData, TestApp } from '../../test/helpers/test-app';
import { AccessTokenPayload, ACCESS_TOKEN_TTL_SECONDS } from './auth.constants';
import { SessionsService } from './sessions.service';

// Against the real test database: the service's rules are about stored refresh tokens and session versions.
describe('SessionsService', () => {
  let t: TestApp;
  let sessions: SessionsService;
  let jwt: JwtService;

  beforeAll(async () => {
    t = await createTestApp();
    sessions = t.app.get(SessionsService);
    jwt = t.app.get(JwtService);
  });

  beforeEach(() => resetData(t.dataSource));

  afterAll(() => t.close());

  it('issues an access token that carries the member, its session and the user session version', async () => {
    const issued = await sessions.issue(DEMO_MEMBERSHIP_IDS.estimator);
    const payload = jwt.decode<AccessTokenPayload & { exp: number; iat: number }>(issued.accessToken);
    const [user] = await t.dataSource.query('SELECT sessionVersion FROM users WHERE id = ?', [DEMO_USER_IDS.estimator]);
    expect(payload).toMatchObject({ sub: DEMO_USER_IDS.estimator, mid: DEMO_MEMBERSHIP_IDS.estimator, sv: Number(user.sessionVersion) });
    expect(payload.exp - payload.iat).toBe(ACCESS_TOKEN_TTL_SECONDS);
    expect(issued.member).toMatchObject({ userId: DEMO_USER_IDS.estimator, role: 'estimator' });
    expect(issued.shop.id).toBe(issued.member.shopId);
    expect(await sessions.isCurrent(payload)).toBe(true);
  });

  it('rotation keeps the sign-in, and the presented refresh token stops working', async () => {
    const first = await sessions.issue(DEMO_MEMBERSHIP_IDS.owner);
    const second = await sessions.rotate(first.refreshToken);
    expect(second.refreshToken).not.toBe(first.refreshToken);
    expect(jwt.decode<AccessTokenPayload>(second.accessToken).sid).toBe(jwt.decode<AccessTokenPayload>(first.accessToken).sid);
    await expect(sessions.rotate(first.refreshToken)).rejects.toMatchObject({ status: 401 });
  });

  it('a rotated refresh token coming back ends every session of that user', async () => {
    const stolen = await sessions.issue(DEMO_MEMBERSHIP_IDS.owner);
    const other = await sessions.issue(DEMO_MEMBERSHIP_IDS.owner);
    const rotated = await sessions.rotate(stolen.refreshToken);
    await expect(sessions.rotate(stolen.refreshToken)).rejects.toMatchObject({ status: 401 });
    await expect(sessions.rotate(rotated.refreshToken)).rejects.toMatchObject({ status: 401 });
    await expect(sessions.rotate(other.refreshToken)).rejects.toMatchObject({ status: 401 });
    expect(await sessions.isCurrent(jwt.decode<AccessTokenPayload>(other.accessToken))).toBe(false);
  });

  it('sign-out ends that sign-in only', async () => {
    const ended = await sessions.issue(DEMO_MEMBERSHIP_IDS.fabricator);
    const kept = await sessions.issue(DEMO_MEMBERSHIP_IDS.fabricator);
    await sessions.revoke(ended.refreshToken);
    expect(await sessions.isCurrent(jwt.decode<AccessTokenPayload>(ended.accessToken))).toBe(false);
    expect(await sessions.isCurrent(jwt.decode<AccessTokenPayload>(kept.accessToken))).toBe(true);
  });

  it('a token of another session version or without a session id is not current', async () => {
    const issued = await sessions.issue(DEMO_MEMBERSHIP_IDS.counter);
    const payload = jwt.decode<AccessTokenPayload>(issued.accessToken);
    expect(await sessions.isCurrent({ ...payload, sv: payload.sv + 1 })).toBe(false);
    expect(await sessions.isCurrent({ sub: payload.sub, sv: payload.sv } as AccessTokenPayload)).toBe(false);
  });
});
