import type { CaughtMail, InvitationSummary, LoginResponse, UserSummary } from '@yardcall/shared';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { bearer, bodyOf, errorBody, expectFieldProblems, login, OTHER_ORG_ADMIN, signIn, suiteApp } from './helpers';

// Each run invites fresh addresses, so the suite also passes against a database kept from an earlier run.
const run = randomUUID().slice(0, 8);

function linkToken(mail: CaughtMail): string {
  const match = /http:\/\/yardcall\.example\.test\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match?.[1]) throw new Error(`no invite link in: ${mail.text}`);
  return match[1];
}

describe('users and invitations', () => {
  const { t, tokens } = suiteApp();

  async function invite(email: string, extra: Partial<{ role: string; isStudent: boolean; name: string }> = {}) {
    return request(t.url)
      .post('/api/users')
      .set(bearer(tokens.admin))
      .send({ email, name: 'Sam Whitfield', role: 'driver', ...extra });
  }

  async function caughtFor(email: string): Promise<CaughtMail> {
    const outbox = await request(t.url).get('/api/mail/outbox').set(bearer(tokens.admin));
    expect(outbox.status).toBe(200);
    const mail = (outbox.body as CaughtMail[]).find((m) => m.to.includes(email));
    if (!mail) throw new Error(`no mail caught for ${email}`);
    return mail;
  }

  it('invites by e-mail; the caught link sets a password that then signs in', async () => {
    const email = `sam.${run}@yardcall.test`;
    const created = await invite(email, { isStudent: true });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ email, role: 'driver', isStudent: true, status: 'invited' });

    // Not active yet: no password to sign in with.
    const early = await request(t.url).post('/api/auth/login').send({ email, password: 'anything-at-all' });
    expect(early.status).toBe(401);

    const mail = await caughtFor(email);
    expect(mail.subject).toBe('You are invited to Yardcall at Kestrel Valley Freight');
    // The link's end in the organisation's zone (the demo organisation keeps UTC).
    expect(mail.text).toMatch(/The link works until \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC and only once\./);
    const token = linkToken(mail);

    const summary = await request(t.url).get(`/api/invitations/${token}`);
    expect(summary.status).toBe(200);
    expect(summary.body as InvitationSummary).toMatchObject({
      email,
      name: 'Sam Whitfield',
      organizationName: 'Kestrel Valley Freight',
    });
    expect(new Date((summary.body as InvitationSummary).expiresAt).getTime()).toBeGreaterThan(Date.now());

    const short = await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'short' });
    expect(short.status).toBe(400);
    expect(errorBody(short).fields).toEqual([
      { field: 'password', message: 'Choose a password of at least 8 characters (at most 200).' },
    ]);

    const accepted = await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'brake-check-42' });
    expect(accepted.status).toBe(200);
    const session = bodyOf<LoginResponse>(accepted);
    expect(session.user).toMatchObject({ email, status: 'active' });
    const me = await request(t.url).get('/api/auth/me').set(bearer(session.accessToken));
    expect(bodyOf<UserSummary>(me).email).toBe(email);

    const signedIn = await login(t.url, email, 'brake-check-42');
    expect(signedIn.user.isStudent).toBe(true);

    const reused = await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'another-password' });
    expect(reused.status).toBe(410);
    expect(errorBody(reused).message).toBe(
      'This invitation was already used: sign in with your e-mail address and password.',
    );
    await expect(login(t.url, email, 'brake-check-42')).resolves.toHaveProperty('accessToken');
  });

  it('answers 410 for an expired invitation and 404 for an unknown one', async () => {
    const email = `late.${run}@yardcall.test`;
    expect((await invite(email)).status).toBe(201);
    const token = linkToken(await caughtFor(email));
    await t.dataSource.query(
      `UPDATE invitations SET expires_at = now() - interval '1 minute' WHERE user_id = (SELECT id FROM users WHERE email = $1)`,
      [email],
    );
    const expired = await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'brake-check-42' });
    expect(expired.status).toBe(410);
    expect(errorBody(expired).message).toMatch(
      /^This invitation expired on .+: ask your administrator to send a new one\.$/,
    );

    for (const unknown of ['A'.repeat(43), 'garbage', '..%2F..']) {
      const response = await request(t.url).get(`/api/invitations/${unknown}`);
      expect(response.status).toBe(404);
      expect(errorBody(response).message).toBe(
        'This invitation link is not valid: ask your administrator for a new one.',
      );
    }
  });

  it('answers 409 with a sentence for an e-mail address already taken, whatever its case', async () => {
    const response = await invite('DRIVER@yardcall.test');
    expect(response.status).toBe(409);
    expect(errorBody(response).message).toBe('A user with the e-mail address DRIVER@yardcall.test already exists.');
  });

  it('answers 400 naming each wrong field of an invitation', async () => {
    const response = await request(t.url)
      .post('/api/users')
      .set(bearer(tokens.admin))
      .send({ email: 'x', name: '', role: 'owner', isStudent: 'yes', organizationId: randomUUID() });
    expectFieldProblems(response, [
      { field: 'email', message: 'Enter an e-mail address, e.g. name@example.com.' },
      { field: 'name', message: 'Enter a name of 1 to 120 characters.' },
      { field: 'role', message: 'Choose a role: driver, mechanic, supervisor, trainer, admin.' },
      { field: 'isStudent', message: 'isStudent is true or false.' },
      { field: 'organizationId', message: 'This field is not allowed here: remove it.' },
    ]);
  });

  it('lets a trainer list only the students with ?student=true', async () => {
    const response = await request(t.url).get('/api/users?student=true').set(bearer(tokens.trainer));
    expect(response.status).toBe(200);
    const users = response.body as UserSummary[];
    expect(users.length).toBeGreaterThan(0);
    expect(users.every((u) => u.isStudent)).toBe(true);
    expect(users.map((u) => u.email)).toContain('student@yardcall.test');
    const bad = await request(t.url).get('/api/users?student=maybe').set(bearer(tokens.trainer));
    expect(bad.status).toBe(400);
    expect(errorBody(bad).fields).toEqual([{ field: 'student', message: 'student is true or false.' }]);
  });

  it("changes a user's role, name and student flag", async () => {
    const email = `change.${run}@yardcall.test`;
    const created = (await invite(email)).body as UserSummary;
    const patch = await request(t.url)
      .patch(`/api/users/${created.id}`)
      .set(bearer(tokens.admin))
      .send({ role: 'mechanic', name: 'Sam Whitfield-Ng', isStudent: false });
    expect(patch.status).toBe(200);
    expect(patch.body).toMatchObject({ id: created.id, role: 'mechanic', name: 'Sam Whitfield-Ng', isStudent: false });
    const listed = (await request(t.url).get('/api/users').set(bearer(tokens.admin))).body as UserSummary[];
    expect(listed.find((u) => u.id === created.id)?.role).toBe('mechanic');
  });

  it('does not let an admin take away their own admin role', async () => {
    const me = (await request(t.url).get('/api/auth/me').set(bearer(tokens.admin))).body as UserSummary;
    const response = await request(t.url)
      .patch(`/api/users/${me.id}`)
      .set(bearer(tokens.admin))
      .send({ role: 'driver' });
    expect(response.status).toBe(409);
  });

  it("shows an admin only the mail sent to their own organisation's users", async () => {
    const email = `private.${run}@yardcall.test`;
    expect((await invite(email)).status).toBe(201);
    const otherAdmin = await signIn(t.url, OTHER_ORG_ADMIN);
    const outbox = await request(t.url).get('/api/mail/outbox').set(bearer(otherAdmin));
    expect(outbox.status).toBe(200);
    expect((outbox.body as CaughtMail[]).some((m) => m.to.includes(email))).toBe(false);
  });
});
