import { mailsTo, resetTokenFrom } from './helpers/mail';
import { bearer, signIn, signUpThroughMail, startTestApp, TestApp } from './helpers/test-app';

describe('access tokens end with their session', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(() => t.close());

  it('sign-out ends that session\'s access token at once; another session of the same person keeps working', async () => {
    const phone = await signIn(t.http, 'estimator@ironbark.test');
    const laptop = await signIn(t.http, 'estimator@ironbark.test');
    await t.http.get('/api/auth/me').set(...bearer(phone)).expect(200);

    await t.http.post('/api/auth/sign-out').send({ refreshToken: phone.refreshToken }).expect(204);

    const refused = await t.http.get('/api/auth/me').set(...bearer(phone)).expect(401);
    expect(refused.body.code).toBe('session_ended');
    expect(refused.body.message).toMatch(/Sign in again/);
    await t.http.get('/api/customers').set(...bearer(phone)).expect(401);
    await t.http.get('/api/auth/me').set(...bearer(laptop)).expect(200);
  });

  it('a refresh keeps the session: the earlier access token still works until it expires', async () => {
    const first = await signIn(t.http, 'counter@ironbark.test');
    const refreshed = await t.http.post('/api/auth/refresh').send({ refreshToken: first.refreshToken }).expect(200);
    await t.http.get('/api/auth/me').set(...bearer(first)).expect(200);
    await t.http.get('/api/auth/me').set(...bearer(refreshed.body)).expect(200);

    // Signing out with the newest refresh token ends both access tokens of that sign-in.
    await t.http.post('/api/auth/sign-out').send({ refreshToken: refreshed.body.refreshToken }).expect(204);
    await t.http.get('/api/auth/me').set(...bearer(first)).expect(401);
    await t.http.get('/api/auth/me').set(...bearer(refreshed.body)).expect(401);
  });

  it('a password reset ends every access token of that person, and only theirs', async () => {
    const email = 'revoke.me@example.test';
    const signedUp = { body: await signUpThroughMail(t.http, { email, password: 'first-password-1', name: 'Ines Farrowby', shopName: 'Farrowby Bay' }) };
    const other = await signIn(t.http, email, 'first-password-1');
    const bystander = await signIn(t.http, 'owner@ironbark.test');
    await t.http.get('/api/auth/me').set(...bearer(signedUp.body)).expect(200);

    await fetch(process.env.MAIL_FAKE_URL!, { method: 'DELETE' });
    await t.http.post('/api/auth/password-reset/request').send({ email }).expect(202);
    const token = resetTokenFrom((await mailsTo(email))[0]);
    await t.http.post('/api/auth/password-reset/confirm').send({ token, password: 'second-password-2' }).expect(204);

    for (const session of [signedUp.body, other]) {
      const refused = await t.http.get('/api/auth/me').set(...bearer(session)).expect(401);
      expect(refused.body.code).toBe('session_ended');
    }
    await t.http.get('/api/auth/me').set(...bearer(bystander)).expect(200);
    const fresh = await signIn(t.http, email, 'second-password-2');
    await t.http.get('/api/auth/me').set(...bearer(fresh)).expect(200);
  });

  it('refuses a correctly signed token that names no session (issued before revocation existed)', async () => {
    const session = await signIn(t.http, 'fabricator@ironbark.test');
    const claims = JSON.parse(Buffer.from(session.accessToken.split('.')[1], 'base64url').toString()) as Record<string, unknown>;
    const { sid: _sid, sv: _sv, iat: _iat, exp: _exp, ...legacy } = claims;
    const response = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${t.jwt.sign(legacy, { expiresIn: 60 })}`).expect(401);
    expect(response.body.code).toBe('session_ended');
    // The same claims with the session named still work.
    await t.http.get('/api/auth/me').set('Authorization', `Bearer ${t.jwt.sign({ ...legacy, sid: claims.sid, sv: claims.sv }, { expiresIn: 60 })}`).expect(200);
  });
});
