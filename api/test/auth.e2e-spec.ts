import { DEMO_PASSWORD } from '@swapwright/seed-data';
import { mailsNowTo, mailsTo, resetTokenFrom, signUpTokenFor } from './helpers/mail';
import { bearer, countRows, createTestApp, jobsSettled, resetData, Session, signIn, signUpThroughMail, TestApp } from './helpers/test-app';

describe('auth', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
  });

  afterAll(() => t.close());

  describe('sign-up', () => {
    it('creates the user, a one-person shop and the owner membership once the mailed link is opened', async () => {
      const users = await countRows(t.dataSource, 'users');
      const asked = await t.http
        .post('/api/auth/sign-up')
        .send({ email: 'Wren.Halloway@Example.test', password: 'long-enough-1', name: 'Wren Halloway', shopName: 'Wren Garage' })
        .expect(202);
      expect(asked.body.message).toMatch(/Check your e-mail/);
      expect(await countRows(t.dataSource, 'users')).toBe(users);
      const token = await signUpTokenFor('wren.halloway@example.test');
      const response = await t.http.post('/api/auth/sign-up/confirm').send({ token }).expect(201);
      expect(response.body.user).toMatchObject({
        email: 'wren.halloway@example.test',
        name: 'Wren Halloway',
        role: 'owner',
        customerId: null,
        shop: { name: 'Wren Garage', unitSystem: 'in' },
      });
      expect(response.body.expiresIn).toBe(900);
      const me = await t.http.get('/api/auth/me').set(...bearer(response.body)).expect(200);
      expect(me.body.shop.id).toBe(response.body.user.shop.id);
    });

    it('answers a taken e-mail exactly like a new one, writes nothing and mails the owner a notice', async () => {
      const before = { shops: await countRows(t.dataSource, 'shops'), users: await countRows(t.dataSource, 'users') };
      const response = await t.http
        .post('/api/auth/sign-up')
        .send({ email: 'owner@ironbark.test', password: 'long-enough-1', name: 'Someone Else', shopName: 'Second Garage' })
        .expect(202);
      const fresh = await t.http
        .post('/api/auth/sign-up')
        .send({ email: 'nobody.yet@example.test', password: 'long-enough-1', name: 'Someone Else', shopName: 'Second Garage' })
        .expect(202);
      expect(response.body).toEqual({ message: fresh.body.message.replace('nobody.yet@example.test', 'owner@ironbark.test') });
      expect(await countRows(t.dataSource, 'shops')).toBe(before.shops);
      expect(await countRows(t.dataSource, 'users')).toBe(before.users);
      await jobsSettled(t.dataSource);
      const [notice] = await mailsTo('owner@ironbark.test');
      expect(notice.subject).toMatch(/tried to create a Swapwright account with your address/);
      expect(notice.text).toMatch(/reset-password/);
      expect(notice.text).not.toMatch(/sign-up\?token=/);
    });

    it('opens a sign-up link once, and not after 24 hours', async () => {
      const email = 'once.only@example.test';
      await t.http.post('/api/auth/sign-up').send({ email, password: 'long-enough-1', name: 'Odran Pell', shopName: 'Pell Works' }).expect(202);
      const token = await signUpTokenFor(email);
      await t.http.post('/api/auth/sign-up/confirm').send({ token }).expect(201);
      const again = await t.http.post('/api/auth/sign-up/confirm').send({ token }).expect(400);
      expect(again.body.code).toBe('sign_up_link_invalid');

      const late = 'late.comer@example.test';
      await t.http.post('/api/auth/sign-up').send({ email: late, password: 'long-enough-1', name: 'Tess Marrow', shopName: 'Marrow Yard' }).expect(202);
      await t.dataSource.query('UPDATE pending_sign_ups SET expiresAt = NOW(3) - INTERVAL 1 MINUTE WHERE email = ?', [late]);
      const expired = await t.http.post('/api/auth/sign-up/confirm').send({ token: await signUpTokenFor(late) }).expect(400);
      expect(expired.body.message).toMatch(/older than 24 hours/);
      await t.http.post('/api/auth/sign-in').send({ email: late, password: 'long-enough-1' }).expect(401);
    });
  });

  describe('sign-in', () => {
    it('returns a session for the right password', async () => {
      const session = await signIn(t.http, 'estimator@ironbark.test');
      expect(session.user.role).toBe('estimator');
      expect(session.user.shop.name).toBe('Ironbark Swap Works');
    });

    it('answers a wrong password with 401 and a readable message', async () => {
      const response = await t.http.post('/api/auth/sign-in').send({ email: 'owner@ironbark.test', password: 'not-the-password' }).expect(401);
      expect(response.body).toMatchObject({ statusCode: 401, code: 'invalid_credentials' });
      expect(response.body.message).toMatch(/e-mail or password is not right/);
      expect(response.body.correlationId).toEqual(expect.any(String));
    });

    it('answers an unknown e-mail exactly like a wrong password', async () => {
      const response = await t.http.post('/api/auth/sign-in').send({ email: 'nobody@ironbark.test', password: DEMO_PASSWORD }).expect(401);
      expect(response.body.code).toBe('invalid_credentials');
    });
  });

  describe('access tokens', () => {
    let session: Session;

    beforeAll(async () => {
      session = await signIn(t.http, 'owner@ironbark.test');
    });

    it('refuses a request without a token', async () => {
      const response = await t.http.get('/api/auth/me').expect(401);
      expect(response.body.code).toBe('unauthorized');
    });

    it('refuses an expired token with 401 session_expired', async () => {
      const expired = t.jwt.sign(
        { sub: session.user.id, mid: '5a0b1c2d-0000-4000-8000-000000000201', exp: Math.floor(Date.now() / 1000) - 60 },
      );
      const response = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${expired}`).expect(401);
      expect(response.body.code).toBe('session_expired');
      expect(response.body.message).toMatch(/expired/);
    });

    it('refuses a token with a changed signature', async () => {
      const [header, payload, signature] = session.accessToken.split('.');
      const flipped = signature.startsWith('A') ? `B${signature.slice(1)}` : `A${signature.slice(1)}`;
      await t.http.get('/api/auth/me').set('Authorization', `Bearer ${header}.${payload}.${flipped}`).expect(401);
    });

    it('refuses a token whose payload was edited (another member id)', async () => {
      const [header, , signature] = session.accessToken.split('.');
      const forged = Buffer.from(JSON.stringify({ sub: session.user.id, mid: '5a0b1c2d-0000-4000-8000-000000000205' })).toString('base64url');
      await t.http.get('/api/auth/me').set('Authorization', `Bearer ${header}.${forged}.${signature}`).expect(401);
    });

    it('refuses a token signed with another secret', async () => {
      const foreign = t.jwt.sign({ sub: session.user.id, mid: '5a0b1c2d-0000-4000-8000-000000000201' }, { secret: 'some-other-secret-value' });
      await t.http.get('/api/auth/me').set('Authorization', `Bearer ${foreign}`).expect(401);
    });

    it('answers /auth/me with the current user', async () => {
      const response = await t.http.get('/api/auth/me').set(...bearer(session)).expect(200);
      expect(response.body).toEqual({
        id: session.user.id,
        email: 'owner@ironbark.test',
        name: session.user.name,
        role: 'owner',
        shop: { id: session.user.shop.id, name: 'Ironbark Swap Works', unitSystem: 'in' },
        customerId: null,
      });
    });
  });

  describe('refresh and sign-out', () => {
    it('rotates the refresh token; the old one is refused', async () => {
      const first = await signIn(t.http, 'counter@ironbark.test');
      const second = await t.http.post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(200);
      expect(second.body.refreshToken).not.toBe(first.refreshToken);
      await t.http.get('/api/auth/me').set(...bearer(second.body)).expect(200);

      const third = await t.http.post('/api/auth/refresh').send({ refreshToken: second.body.refreshToken }).expect(200);
      const reused = await t.http.post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(401);
      expect(reused.body.code).toBe('refresh_token_invalid');
      // Reuse of a rotated token ends every session of that user, the newest included.
      await t.http.post('/api/auth/refresh').send({ refreshToken: third.body.refreshToken }).expect(401);
    });

    it('refuses an unknown refresh token', async () => {
      await t.http.post('/api/auth/refresh').send({ refreshToken: 'made-up-token' }).expect(401);
    });

    it('signs out: the refresh token stops working', async () => {
      const session = await signIn(t.http, 'fabricator@ironbark.test');
      await t.http.post('/api/auth/sign-out').send({ refreshToken: session.refreshToken }).expect(204);
      await t.http.post('/api/auth/refresh').send({ refreshToken: session.refreshToken }).expect(401);
    });
  });

  describe('password reset', () => {
    const email = 'reset.me@example.test';

    beforeAll(async () => {
      await signUpThroughMail(t.http, { email, password: 'first-password', name: 'Rhea Calloway', shopName: 'Calloway Shed' });
      await fetch(process.env.MAIL_FAKE_URL!, { method: 'DELETE' });
    });

    it('answers 202 for an unknown e-mail and sends nothing', async () => {
      await t.http.post('/api/auth/password-reset/request').send({ email: 'ghost@example.test' }).expect(202);
      await jobsSettled(t.dataSource);
      expect(await mailsNowTo('ghost@example.test')).toHaveLength(0);
    });

    it('mails a link that works once', async () => {
      const session = await signIn(t.http, email, 'first-password');
      await t.http.post('/api/auth/password-reset/request').send({ email }).expect(202);
      const [mail] = await mailsTo(email);
      expect(mail.subject).toMatch(/Reset your Swapwright password/);
      const token = resetTokenFrom(mail);

      await t.http.post('/api/auth/password-reset/confirm').send({ token, password: 'second-password' }).expect(204);
      await signIn(t.http, email, 'second-password');
      await t.http.post('/api/auth/sign-in').send({ email, password: 'first-password' }).expect(401);
      // Open sessions end with the old password.
      await t.http.post('/api/auth/refresh').send({ refreshToken: session.refreshToken }).expect(401);

      const again = await t.http.post('/api/auth/password-reset/confirm').send({ token, password: 'third-password' }).expect(400);
      expect(again.body.code).toBe('reset_token_invalid');
    });

    it('refuses an expired link', async () => {
      await fetch(process.env.MAIL_FAKE_URL!, { method: 'DELETE' });
      await t.http.post('/api/auth/password-reset/request').send({ email }).expect(202);
      const token = resetTokenFrom((await mailsTo(email))[0]);
      await t.dataSource.query(
        'UPDATE password_reset_tokens SET expiresAt = NOW(3) - INTERVAL 1 MINUTE WHERE usedAt IS NULL',
      );
      const response = await t.http.post('/api/auth/password-reset/confirm').send({ token, password: 'fourth-password' }).expect(400);
      expect(response.body.message).toMatch(/expired/);
      await signIn(t.http, email, 'second-password');
    });

    it('refuses a made-up token', async () => {
      await t.http.post('/api/auth/password-reset/confirm').send({ token: 'abc', password: 'whatever-123' }).expect(400);
    });

    it('shows captured mail through GET /api/dev/mail to a signed-in owner when enabled', async () => {
      const owner = await signIn(t.http, email, 'second-password');
      const response = await t.http.get('/api/dev/mail').set(...bearer(owner)).expect(200);
      expect(response.body[0]).toMatchObject({ to: [email], subject: expect.any(String) });
    });

    it('keeps captured mail (reset links) from anyone signed out or not an owner', async () => {
      const anonymous = await t.http.get('/api/dev/mail').expect(401);
      expect(JSON.stringify(anonymous.body)).not.toMatch(/reset-password/);
      for (const role of ['estimator', 'fabricator', 'counter', 'customer'] as const) {
        const member = await signIn(t.http, `${role}@ironbark.test`);
        const refused = await t.http.get('/api/dev/mail').set(...bearer(member)).expect(403);
        expect(refused.body.code).toBe('forbidden');
      }
    });
  });
});
