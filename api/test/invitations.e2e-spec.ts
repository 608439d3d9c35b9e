import { DEMO_CUSTOMER_IDS, DEMO_PROJECT_IDS, DemoRole } from '@swapwright/seed-data';
import { bearer, countRows, createTestApp, resetData, Session, signIn, signInAllRoles, TestApp } from './helpers/test-app';

/** The links of the invitation mails to an address used once, in the order sent (the fake lists the newest first; the background worker sends them: up to 5 s). */
async function invitationTokensFor(email: string, count: number): Promise<string[]> {
  let mails: Array<{ to: string[]; text: string }> = [];
  for (let attempt = 0; attempt < 50 && mails.length < count; attempt++) {
    mails = ((await (await fetch(process.env.MAIL_FAKE_URL!)).json()) as Array<{ to: string[]; text: string }>).filter((m) => m.to.includes(email)).reverse();
    if (mails.length < count) await new Promise((resolve) => setTimeout(resolve, 100));
  }
  if (mails.length < count) throw new Error(`${mails.length} invitation mails for ${email}, not ${count}`);
  return mails.slice(0, count).map((mail) => decodeURIComponent(/accept-invite\?token=([A-Za-z0-9_%-]+)/.exec(mail.text)![1]));
}

/** The link of the newest invitation mail to `email` (one sent by this run: the fake keeps earlier runs' mail, newest first). */
async function invitationTokenFor(email: string): Promise<string> {
  let mail: { to: string[]; text: string } | undefined;
  for (let attempt = 0; attempt < 50 && !mail; attempt++) {
    const mails = (await (await fetch(process.env.MAIL_FAKE_URL!)).json()) as Array<{ to: string[]; text: string }>;
    mail = mails.find((m) => m.to.includes(email));
    if (!mail) await new Promise((resolve) => setTimeout(resolve, 100));
  }
  const match = mail && /accept-invite\?token=([A-Za-z0-9_%-]+)/.exec(mail.text);
  if (!match) throw new Error(`no invitation mail for ${email}`);
  return decodeURIComponent(match[1]);
}

describe('memberships and invitations', () => {
  let t: TestApp;
  let s: Record<DemoRole, Session>;

  beforeAll(async () => {
    t = await createTestApp();
    await resetData(t.dataSource);
    s = await signInAllRoles(t.http);
  });

  afterAll(() => t.close());

  it('invites a customer login linked to a customer record; accepting shows their projects only', async () => {
    // An address of this run's own: the mail fake keeps the mail of earlier runs.
    const email = `odile.login.${Date.now()}@example.test`;
    const invitation = await t.http
      .post('/api/invitations')
      .set(...bearer(s.owner))
      .send({ email, role: 'customer', customerId: DEMO_CUSTOMER_IDS.odile })
      .expect(201);
    expect(invitation.body).toMatchObject({ email, role: 'customer', customerId: DEMO_CUSTOMER_IDS.odile, acceptedAt: null });

    const token = await invitationTokenFor(email);
    const session = await t.http.post('/api/invitations/accept').send({ token, name: 'Odile Straker', password: 'odile-pass-1' }).expect(200);
    expect(session.body.user).toMatchObject({ role: 'customer', customerId: DEMO_CUSTOMER_IDS.odile });

    const projects = await t.http.get('/api/projects').set(...bearer(session.body)).expect(200);
    expect(projects.body.items.map((p: { id: string }) => p.id)).toEqual([DEMO_PROJECT_IDS.stag]);

    const again = await t.http.post('/api/invitations/accept').send({ token, name: 'Twice', password: 'odile-pass-2' }).expect(400);
    expect(again.body.code).toBe('invitation_invalid');

    const listed = await t.http.get('/api/invitations').set(...bearer(s.owner)).expect(200);
    expect(listed.body.find((i: { email: string }) => i.email === email).acceptedAt).not.toBeNull();
  });

  it('refuses customerId for a staff role, and an existing member', async () => {
    await t.http
      .post('/api/invitations')
      .set(...bearer(s.owner))
      .send({ email: 'staff@example.test', role: 'estimator', customerId: DEMO_CUSTOMER_IDS.caspar })
      .expect(400);
    const member = await t.http.post('/api/invitations').set(...bearer(s.owner)).send({ email: 'counter@ironbark.test', role: 'counter' }).expect(409);
    expect(member.body.code).toBe('already_member');
  });

  it('refuses an expired invitation and creates no user', async () => {
    const email = `late.${Date.now()}@example.test`;
    await t.http.post('/api/invitations').set(...bearer(s.owner)).send({ email, role: 'fabricator' }).expect(201);
    const token = await invitationTokenFor(email);
    await t.dataSource.query('UPDATE invitations SET expiresAt = NOW(3) - INTERVAL 1 MINUTE WHERE email = ?', [email]);
    const users = await countRows(t.dataSource, 'users');
    await t.http.post('/api/invitations/accept').send({ token, name: 'Late Comer', password: 'late-pass-1' }).expect(400);
    expect(await countRows(t.dataSource, 'users')).toBe(users);
  });

  it('lists members, changes a role, and keeps the last owner', async () => {
    const members = await t.http.get('/api/memberships').set(...bearer(s.owner)).expect(200);
    const counter = members.body.find((m: { email: string }) => m.email === 'counter@ironbark.test');
    expect(counter).toMatchObject({ role: 'counter', name: expect.any(String), userId: expect.any(String) });

    const changed = await t.http.patch(`/api/memberships/${counter.id}`).set(...bearer(s.owner)).send({ role: 'estimator' }).expect(200);
    expect(changed.body.role).toBe('estimator');
    // The role counts from the next request on, with the same token.
    await t.http.post('/api/customers').set(...bearer(s.counter)).send({ name: 'Created by the new estimator' }).expect(201);

    const owner = members.body.find((m: { role: string }) => m.role === 'owner');
    const last = await t.http.patch(`/api/memberships/${owner.id}`).set(...bearer(s.owner)).send({ role: 'counter' }).expect(409);
    expect(last.body.code).toBe('last_owner');
    await t.http.delete(`/api/memberships/${owner.id}`).set(...bearer(s.owner)).expect(409);
    await t.http.patch(`/api/memberships/${counter.id}`).set(...bearer(s.owner)).send({ role: 'boss' }).expect(400);
  });

  it('removes a member: their token stops working at once', async () => {
    const members = await t.http.get('/api/memberships').set(...bearer(s.owner)).expect(200);
    const fabricator = members.body.find((m: { email: string }) => m.email === 'fabricator@ironbark.test');
    await t.http.delete(`/api/memberships/${fabricator.id}`).set(...bearer(s.owner)).expect(204);
    const response = await t.http.get('/api/auth/me').set(...bearer(s.fabricator)).expect(401);
    expect(response.body.code).toBe('membership_revoked');
    await t.http.post('/api/auth/sign-in').send({ email: 'fabricator@ironbark.test', password: 'swap-demo-2026' }).expect(403);
    await signIn(t.http, 'owner@ironbark.test');
  });

  it('sends a pending invitation again with a new link (the old one stops working), withdraws one, and logs both', async () => {
    // Addresses of this run's own: the mail fake keeps the mail of earlier runs.
    const email = `again.${Date.now()}@example.test`;
    const invited = await t.http.post('/api/invitations').set(...bearer(s.owner)).send({ email, role: 'fabricator' }).expect(201);
    const [first] = await invitationTokensFor(email, 1);
    const resent = await t.http.post(`/api/invitations/${invited.body.id}/resend`).set(...bearer(s.owner)).expect(200);
    expect(resent.body).toMatchObject({ id: invited.body.id, email, role: 'fabricator', acceptedAt: null });
    expect(Date.parse(resent.body.expiresAt)).toBeGreaterThanOrEqual(Date.parse(invited.body.expiresAt));
    const [, second] = await invitationTokensFor(email, 2);
    expect(second).not.toBe(first);
    expect((await t.http.post('/api/invitations/accept').send({ token: first, name: 'Old Link', password: 'old-link-pass' }).expect(400)).body.code).toBe('invitation_invalid');
    await t.http.post('/api/invitations/accept').send({ token: second, name: 'New Link', password: 'new-link-pass' }).expect(200);
    // Accepted: nothing left to send again or withdraw.
    const accepted = await t.http.post(`/api/invitations/${invited.body.id}/resend`).set(...bearer(s.owner)).expect(409);
    expect(accepted.body.code).toBe('invitation_accepted');
    await t.http.delete(`/api/invitations/${invited.body.id}`).set(...bearer(s.owner)).expect(409);

    const withdrawnEmail = `withdrawn.${Date.now()}@example.test`;
    const withdrawn = await t.http.post('/api/invitations').set(...bearer(s.owner)).send({ email: withdrawnEmail, role: 'counter' }).expect(201);
    const [token] = await invitationTokensFor(withdrawnEmail, 1);
    await t.http.delete(`/api/invitations/${withdrawn.body.id}`).set(...bearer(s.owner)).expect(204);
    const users = await countRows(t.dataSource, 'users');
    await t.http.post('/api/invitations/accept').send({ token, name: 'Too Late', password: 'too-late-pass' }).expect(400);
    expect(await countRows(t.dataSource, 'users')).toBe(users);
    const listed = await t.http.get('/api/invitations').set(...bearer(s.owner)).expect(200);
    expect(listed.body.map((i: { id: string }) => i.id)).not.toContain(withdrawn.body.id);
    expect((await t.http.delete(`/api/invitations/${withdrawn.body.id}`).set(...bearer(s.owner)).expect(404)).body.code).toBe('invitation_not_found');

    const log = await t.http.get('/api/audit-events?kind=membership&pageSize=100').set(...bearer(s.owner)).expect(200);
    const actions = (log.body.items as { action: string; subjectId: string; actorName: string }[]).filter((event) => [invited.body.id, withdrawn.body.id].includes(event.subjectId));
    expect(actions.map((event) => event.action).sort()).toEqual(['invitation.resent', 'invitation.sent', 'invitation.sent', 'invitation.withdrawn']);
  });
});
