import { randomBytes } from 'node:crypto';
import type { Role } from '../../shared/account/roles.ts';
import { HttpClient } from './http-client.ts';
import type { TestServer } from './test-server.ts';

export interface TestUser {
  name: string;
  email: string;
  password: string;
  role: Role;
}

/** A user with unique address and a valid password; override what the test cares about. */
export function buildUser(overrides: Partial<TestUser> = {}): TestUser {
  const id = randomBytes(4).toString('hex');
  return { name: `Test Maker ${id}`, email: `maker-${id}@workshop.example`, password: `burn-test-${id}`, role: 'maker', ...overrides };
}

/** Creates a confirmed account through better-auth's server API (as the demo seed does). */
export async function createUser(server: TestServer, overrides: Partial<TestUser> = {}): Promise<TestUser & { id: string }> {
  const user = buildUser(overrides);
  const { user: created } = await server.auth.api.createUser({
    body: { name: user.name, email: user.email, password: user.password, role: user.role, data: { emailVerified: true } },
  });
  return { ...user, id: created.id };
}

/** An HTTP client signed in as the user. */
export async function signedInClient(server: TestServer, user: Pick<TestUser, 'email' | 'password'>): Promise<HttpClient> {
  const client = new HttpClient(server.url);
  const response = await client.post('/api/auth/sign-in/email', { email: user.email, password: user.password });
  if (response.status !== 200) throw new Error(`sign-in failed: ${response.status} ${JSON.stringify(response.body)}`);
  return client;
}

/** The first http(s) link in a plain-text mail. */
export function firstLink(text: string): string {
  const match = /https?:\/\/\S+/.exec(text);
  if (!match) throw new Error(`no link in mail:\n${text}`);
  return match[0];
}
