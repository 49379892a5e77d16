import { describe, it, expect } from 'vitest';
import { anonymous, createUser, signedIn, testApp, testPassword, Client } from '../../support/http';
import { waitForMail } from '../../support/mail';

describe('POST /api/auth/register', () => {
  it('creates a signed-in reader and sends a verification e-mail that works once', async () => {
    const client = await anonymous();
    const email = `new-${Date.now()}@example.test`;
    const res = await client.post('/api/auth/register', { email, displayName: 'Ada Newcomer', password: testPassword });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, role: 'reader', emailVerifiedAt: null });
    expect(res.body.user).not.toHaveProperty('passwordHash');
    client.csrfToken = res.body.csrfToken;
    const me = await client.get('/api/auth/me');
    expect(me.body.user.email).toBe(email);

    const mail = await waitForMail(email, /Confirm your e-mail/);
    const token = /token=([\w-]+)/.exec(mail.text)![1];
    expect(mail.html).toContain(token);
    await client.post('/api/auth/verify-email', { token }).expect(204);
    await client.post('/api/auth/verify-email', { token }).expect(400);
    expect((await client.get('/api/auth/me')).body.user.emailVerifiedAt).not.toBeNull();
  });

  it('refuses a short or common password and names the field', async () => {
    const client = await anonymous();
    const short = await client.post('/api/auth/register', { email: 'a@example.test', displayName: 'A', password: 'short' });
    expect(short.status).toBe(400);
    // ASVS 2.1.1: passwords of at least 12 characters.
    expect(short.body.error.fields.password).toMatch(/at least 12/);
    // ASVS 2.1.7: passwords checked against a list of breached or common passwords.
    const common = await client.post('/api/auth/register', { email: 'b@example.test', displayName: 'B', password: 'password1234' });
    expect(common.body.error.fields.password).toMatch(/too common/);
  });

  it('answers 409 for an address already registered', async () => {
    const user = await createUser('reader');
    const client = await anonymous();
    const res = await client.post('/api/auth/register', { email: user.email, displayName: 'Again', password: testPassword });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.email).toBeTruthy();
  });
});

describe('POST /api/auth/login', () => {
  it('signs in, changes the session id, and sets HttpOnly SameSite=Lax cookies', async () => {
    const user = await createUser('contributor');
    const client = await anonymous();
    const before = (await client.get('/api/auth/me')).headers['set-cookie'];
    const res = await client.login(user.email, testPassword);
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('contributor');
    const cookie = String(res.headers['set-cookie']);
    // ASVS 3.2.1: a new session token at authentication; ASVS 3.4.2/3.4.3: HttpOnly and SameSite.
    expect(cookie).toMatch(/windway\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toBe(String(before));
  });

  it('answers 401 with the same message for a wrong password and an unknown address', async () => {
    const user = await createUser('reader');
    const client = await anonymous();
    const wrong = await client.login(user.email, 'not the password at all');
    const unknown = await client.login('nobody@example.test', 'not the password at all');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('throttles repeated failures for one account (ASVS 2.2.1)', async () => {
    const user = await createUser('reader');
    const client = await anonymous();
    const limit = Number(process.env.LOGIN_MAX_ATTEMPTS);
    for (let i = 0; i < limit; i += 1) expect((await client.login(user.email, 'wrong password here')).status).toBe(401);
    const blocked = await client.login(user.email, testPassword);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
  });

  it('refuses a deactivated account', async () => {
    const user = await createUser('reader');
    await user.update({ active: false });
    expect((await (await anonymous()).login(user.email, testPassword)).status).toBe(401);
  });
});

describe('POST /api/auth/logout', () => {
  it('destroys the session so the old cookie no longer signs in (ASVS 3.3.1)', async () => {
    const { client } = await signedIn('reader');
    const cookie = (await client.get('/api/auth/me')).request.cookies;
    await client.post('/api/auth/logout').expect(204);
    expect((await client.get('/api/auth/me')).body.user).toBeNull();
    const replay = new Client(await testApp());
    const res = await replay.agent.get('/api/auth/me').set('Cookie', cookie);
    expect(res.body.user).toBeNull();
  });
});

describe('sessions', () => {
  it('survive an app restart because they live in MariaDB', async () => {
    const { client } = await signedIn('editor');
    const cookie = (await client.get('/api/auth/me')).request.cookies;
    const { createApp } = await import('@server/app');
    const restarted = new Client(createApp());
    const res = await restarted.agent.get('/api/auth/me').set('Cookie', cookie);
    expect(res.body.user?.role).toBe('editor');
  });
});

describe('CSRF protection (ASVS 4.2.2)', () => {
  it('refuses a state-changing request without the token', async () => {
    const { client } = await signedIn('reader');
    const res = await client.agent.post('/api/auth/logout');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('refuses a token from another session', async () => {
    const a = await anonymous();
    const b = await anonymous();
    const res = await a.agent.post('/api/auth/password-reset').set('X-CSRF-Token', b.csrfToken).send({ email: 'x@example.test' });
    expect(res.status).toBe(403);
  });
});

describe('password reset', () => {
  it('mails a single-use link that sets a new password and ends old sessions', async () => {
    const user = await createUser('reader');
    const { client: oldSession } = { client: await anonymous() };
    await oldSession.login(user.email, testPassword);
    const client = await anonymous();
    await client.post('/api/auth/password-reset', { email: user.email }).expect(202);
    const mail = await waitForMail(user.email, /Reset your Windway password/);
    const token = /token=([\w-]+)/.exec(mail.text)![1];
    const newPassword = 'a new and long passphrase 2';
    await client.post('/api/auth/password-reset/confirm', { token, password: newPassword }).expect(204);
    const again = await client.post('/api/auth/password-reset/confirm', { token, password: newPassword });
    expect(again.status).toBe(400);
    expect((await oldSession.get('/api/auth/me')).body.user).toBeNull();
    expect((await (await anonymous()).login(user.email, newPassword)).status).toBe(200);
  });

  it('answers 202 for an unknown address too', async () => {
    await (await anonymous()).post('/api/auth/password-reset', { email: 'ghost@example.test' }).expect(202);
  });
});
