import { JwtService } from '@nestjs/jwt';
import { DEFAULT_DISPLAY_SETTINGS, type LoginResponse, type UserSummary } from '@yardcall/shared';
import request from 'supertest';
import type { AccessTokenPayload } from '../src/auth/auth-user';
import { DEMO_PASSWORD } from '../src/database/seed-data';
import { bearer, bodyOf, errorBody, expectFieldProblems, login, ROLE_EMAILS, startApp, type TestApp } from './helpers';

describe('sign-in and tokens', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startApp();
  });
  afterAll(async () => {
    await t.close();
  });

  it('signs in with e-mail and password and answers a token and the user', async () => {
    const response = await request(t.url)
      .post('/api/auth/login')
      .send({ email: 'Supervisor@Yardcall.test', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    const body = bodyOf<LoginResponse>(response);
    expect(body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(body.user).toMatchObject({
      email: ROLE_EMAILS.supervisor,
      role: 'supervisor',
      status: 'active',
      organizationName: 'Kestrel Valley Freight',
      settings: DEFAULT_DISPLAY_SETTINGS,
    });
    expect(body.user).not.toHaveProperty('passwordHash');
    const me = await request(t.url).get('/api/auth/me').set(bearer(body.accessToken));
    expect(me.status).toBe(200);
    expect(me.body).toEqual(body.user);
  });

  it('answers 401 with the same sentence for a wrong password and an unknown e-mail', async () => {
    const wrongPassword = await request(t.url)
      .post('/api/auth/login')
      .send({ email: ROLE_EMAILS.mechanic, password: 'not-the-password' });
    const unknown = await request(t.url)
      .post('/api/auth/login')
      .send({ email: 'nobody@yardcall.test', password: DEMO_PASSWORD });
    for (const response of [wrongPassword, unknown]) {
      expect(response.status).toBe(401);
      expect(response.body).toEqual({ statusCode: 401, error: 'Unauthorized', message: 'Email or password is wrong.' });
    }
  });

  it('throttles sign-in after 5 tries a minute for one e-mail and IP, with a sentence saying when to retry', async () => {
    const email = 'aiyana.brooks@yardcall.test';
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const response = await request(t.url)
        .post('/api/auth/login')
        .send({ email, password: `wrong-${attempt}` });
      expect(response.status).toBe(401);
    }
    const blocked = await request(t.url).post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(errorBody(blocked).message).toMatch(
      /^Too many sign-in attempts for this e-mail address\. Try again in \d+ seconds?\.$/,
    );
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    // Another person's sign-in from the same address is not blocked.
    await expect(login(t.url, 'tomas.reyes@yardcall.test')).resolves.toHaveProperty('accessToken');
  });

  it('answers 400 naming the fields for a malformed sign-in body', async () => {
    const response = await request(t.url)
      .post('/api/auth/login')
      .send({ email: 'not-an-email', password: 42, remember: true });
    expectFieldProblems(response, [
      { field: 'email', message: 'Enter your e-mail address, e.g. name@example.com.' },
      { field: 'password', message: 'Enter your password.' },
      { field: 'remember', message: 'This field is not allowed here: remove it.' },
    ]);
  });

  it('answers 401 for a garbage token, a token signed with another secret and an expired token', async () => {
    const garbage = await request(t.url).get('/api/auth/me').set(bearer('garbage'));
    expect(garbage.status).toBe(401);
    expect(errorBody(garbage).message).toBe('The access token is not valid: sign in again.');

    const { user } = await login(t.url, ROLE_EMAILS.driver);
    const payload: AccessTokenPayload = { sub: user.id, org: user.organizationId, role: user.role };
    const forged = new JwtService({ secret: 'some-other-secret' }).sign(payload);
    const forgedResponse = await request(t.url).get('/api/auth/me').set(bearer(forged));
    expect(forgedResponse.status).toBe(401);
    expect(errorBody(forgedResponse).message).toBe('The access token is not valid: sign in again.');

    const expired = await t.app.get(JwtService).signAsync(payload, { expiresIn: -60 });
    const expiredResponse = await request(t.url).get('/api/auth/me').set(bearer(expired));
    expect(expiredResponse.status).toBe(401);
    expect(errorBody(expiredResponse).message).toBe('Your session has expired: sign in again.');
  });

  it('refuses a valid token whose claimed role or organisation no longer matches the account', async () => {
    const { user } = await login(t.url, ROLE_EMAILS.driver);
    const wrongOrg = await t.app.get(JwtService).signAsync({
      sub: user.id,
      org: '00000000-0000-4000-8000-000000000000',
      role: 'admin',
    } satisfies AccessTokenPayload);
    const response = await request(t.url).get('/api/auth/me').set(bearer(wrongOrg));
    expect(response.status).toBe(401);
  });

  it('uses the role from the database, not from the token', async () => {
    const { user } = await login(t.url, ROLE_EMAILS.driver);
    const claimsAdmin = await t.app
      .get(JwtService)
      .signAsync({ sub: user.id, org: user.organizationId, role: 'admin' } satisfies AccessTokenPayload);
    const response = await request(t.url).get('/api/mail/outbox').set(bearer(claimsAdmin));
    expect(response.status).toBe(403);
  });
});

describe('display settings', () => {
  let t: TestApp;
  let token: string;
  beforeAll(async () => {
    t = await startApp();
    token = (await login(t.url, ROLE_EMAILS.trainer)).accessToken;
  });
  afterAll(async () => {
    // Leave the seeded trainer as it was for other runs against the same database.
    await t.dataSource.query(`UPDATE users SET settings = '{}' WHERE email = $1`, [ROLE_EMAILS.trainer]);
    await t.close();
  });

  it('round-trips changed settings and keeps the ones not sent', async () => {
    const patch = await request(t.url)
      .patch('/api/auth/me/settings')
      .set(bearer(token))
      .send({ textScale: 175, theme: 'night_red', gloveMode: true });
    expect(patch.status).toBe(200);
    expect((patch.body as UserSummary).settings).toEqual({
      textScale: 175,
      theme: 'night_red',
      gloveMode: true,
      locale: 'en',
    });

    const second = await request(t.url).patch('/api/auth/me/settings').set(bearer(token)).send({ locale: 'es' });
    expect(bodyOf<UserSummary>(second).settings).toEqual({
      textScale: 175,
      theme: 'night_red',
      gloveMode: true,
      locale: 'es',
    });

    const relogin = await login(t.url, ROLE_EMAILS.trainer);
    expect(relogin.user.settings).toEqual({ textScale: 175, theme: 'night_red', gloveMode: true, locale: 'es' });
  });

  it.each([
    [{ textScale: 250 }, 'textScale', 'Text size is a whole percentage from 100 to 200.'],
    [{ textScale: 99 }, 'textScale', 'Text size is a whole percentage from 100 to 200.'],
    [{ textScale: '150' }, 'textScale', 'Text size is a whole percentage from 100 to 200.'],
    [{ theme: 'neon' }, 'theme', 'Choose a theme: day, night, night_red.'],
    [{ gloveMode: 'yes' }, 'gloveMode', 'Glove mode is true or false.'],
    [{ locale: 'fr' }, 'locale', 'Choose a language: en, es.'],
    [{ fontFamily: 'Comic' }, 'fontFamily', 'This field is not allowed here: remove it.'],
  ])('answers 400 for %j naming %s', async (body, field, message) => {
    const response = await request(t.url).patch('/api/auth/me/settings').set(bearer(token)).send(body);
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({ statusCode: 400, error: 'Bad Request', fields: [{ field, message }] });
  });
});
