import supertest from 'supertest';
import type { Express } from 'express';
import type { Role } from '@shared/schemas/auth';

let app: Express | undefined;

/** The app of this test file (one per file, on the file's own database). */
export async function testApp(): Promise<Express> {
  if (app) return app;
  const { createApp } = await import('@server/app');
  app = createApp();
  return app;
}

/** A cookie-keeping client that sends the session's CSRF token on every write, as the web client does. */
export class Client {
  readonly agent: ReturnType<typeof supertest.agent>;
  csrfToken = '';

  constructor(expressApp: Express) {
    this.agent = supertest.agent(expressApp);
  }

  async refreshCsrf(): Promise<string> {
    const res = await this.agent.get('/api/auth/me').expect(200);
    this.csrfToken = res.body.csrfToken;
    return this.csrfToken;
  }

  get(path: string) {
    return this.agent.get(path);
  }
  post(path: string, body?: object) {
    return this.agent.post(path).set('X-CSRF-Token', this.csrfToken).send(body);
  }
  patch(path: string, body?: object) {
    return this.agent.patch(path).set('X-CSRF-Token', this.csrfToken).send(body);
  }
  put(path: string, body?: object) {
    return this.agent.put(path).set('X-CSRF-Token', this.csrfToken).send(body);
  }
  delete(path: string) {
    return this.agent.delete(path).set('X-CSRF-Token', this.csrfToken);
  }

  async login(email: string, password: string) {
    if (!this.csrfToken) await this.refreshCsrf();
    const res = await this.post('/api/auth/login', { email, password });
    if (res.status === 200) this.csrfToken = res.body.csrfToken;
    return res;
  }
}

export async function anonymous(): Promise<Client> {
  const client = new Client(await testApp());
  await client.refreshCsrf();
  return client;
}

let counter = 0;
export const testPassword = 'correct horse battery staple 1';

/** Creates a user with a role straight in the database (fast: no e-mail). */
export async function createUser(role: Role = 'reader', overrides: { email?: string; displayName?: string } = {}) {
  const { User } = await import('@server/models');
  const { hashPassword } = await import('@server/auth/password');
  counter += 1;
  return User.create({
    email: overrides.email ?? `${role}${counter}-${Date.now()}@example.test`,
    displayName: overrides.displayName ?? `Test ${role} ${counter}`,
    passwordHash: await hashPassword(testPassword),
    role,
    emailVerifiedAt: new Date(),
  });
}

/** A signed-in client of a fresh user with the given role. */
export async function signedIn(role: Role = 'reader') {
  const user = await createUser(role);
  const client = await anonymous();
  const res = await client.login(user.email, testPassword);
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { client, user };
}
