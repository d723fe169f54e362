import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildUser, firstLink } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

describe('sign-up, e-mail verification, sign-in and password reset over HTTP', () => {
  const user = buildUser({ name: 'Kit Ashby' });
  const browser = () => new HttpClient(server.url);
  let newPassword = '';

  it('signs up without a session until the address is confirmed', async () => {
    const http = browser();
    const response = await http.post('/api/auth/sign-up/email', { name: user.name, email: user.email, password: user.password, callbackURL: '/verify?verified=1' });
    expect(response.status).toBe(200);
    expect(http.signedIn).toBe(false);

    const refused = await http.post('/api/auth/sign-in/email', { email: user.email, password: user.password });
    expect(refused.status).toBe(403);
    expect(refused.body.code).toBe('EMAIL_NOT_VERIFIED');
    expect(http.signedIn).toBe(false);
  });

  it('confirms the address through the link in the captured mail', async () => {
    const mail = await server.mail.waitFor(user.email);
    expect(mail.subject).toMatch(/confirm/i);
    // The refused sign-in sent a second link; it lands on the same page.
    const resent = await server.mail.waitFor(user.email, { after: mail.id });
    expect(new URL(firstLink(resent.text)).searchParams.get('callbackURL')).toBe('/verify?verified=1');
    expect(mail.text).toContain(user.name);
    const link = firstLink(mail.text);
    expect(link.startsWith(`${server.url}/api/auth/verify-email?token=`)).toBe(true);

    const response = await browser().get(link);
    expect(response.status).toBe(302);
    expect(response.headers.get('location')).toBe('/verify?verified=1');
  });

  it('rejects a wrong password and signs in with the right one', async () => {
    const http = browser();
    const wrong = await http.post('/api/auth/sign-in/email', { email: user.email, password: 'not-the-password' });
    expect(wrong.status).toBe(401);

    const right = await http.post('/api/auth/sign-in/email', { email: user.email, password: user.password });
    expect(right.status).toBe(200);
    const account = await http.get('/api/account');
    expect(account.status).toBe(200);
    expect(account.body).toMatchObject({ email: user.email, name: user.name, role: 'maker', emailVerified: true, units: 'in' });
  });

  it('resets the password through the mailed link and ends the old sessions', async () => {
    const oldSession = browser();
    await oldSession.post('/api/auth/sign-in/email', { email: user.email, password: user.password });
    expect((await oldSession.get('/api/account')).status).toBe(200);

    const lastMail = server.mail.list()[0]?.id ?? 0;
    const asked = await browser().post('/api/auth/request-password-reset', { email: user.email, redirectTo: '/reset-password' });
    expect(asked.status).toBe(200);
    const mail = await server.mail.waitFor(user.email, { after: lastMail });
    expect(mail.subject).toMatch(/reset/i);

    const landing = await browser().get(firstLink(mail.text));
    expect(landing.status).toBe(302);
    const location = new URL(landing.headers.get('location')!, server.url);
    expect(location.pathname).toBe('/reset-password');
    const token = location.searchParams.get('token');
    expect(token).toBeTruthy();

    newPassword = `${user.password}-new`;
    const reset = await browser().post('/api/auth/reset-password', { newPassword, token });
    expect(reset.status).toBe(200);

    expect((await oldSession.get('/api/account')).status).toBe(401);
    expect((await browser().post('/api/auth/sign-in/email', { email: user.email, password: user.password })).status).toBe(401);
    expect((await browser().post('/api/auth/sign-in/email', { email: user.email, password: newPassword })).status).toBe(200);
  });

  it('does not accept a reset token twice', async () => {
    const lastMail = server.mail.list()[0]?.id ?? 0;
    await browser().post('/api/auth/request-password-reset', { email: user.email, redirectTo: '/reset-password' });
    const mail = await server.mail.waitFor(user.email, { after: lastMail });
    const token = new URL(firstLink(mail.text)).pathname.split('/').pop();
    expect((await browser().post('/api/auth/reset-password', { newPassword: 'first-reset-pw', token })).status).toBe(200);
    expect((await browser().post('/api/auth/reset-password', { newPassword: 'second-reset-pw', token })).status).toBe(400);
  });

  it('refuses a cookie-carrying request from a foreign or missing Origin (CSRF protection)', async () => {
    const http = browser();
    const signIn = await fetch(new URL('/api/auth/sign-in/email', server.url), {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: JSON.stringify({ email: user.email, password: 'first-reset-pw' }),
    });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const attempt = (origin?: string) =>
      fetch(new URL('/api/auth/change-password', server.url), {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Cookie: cookie, ...(origin ? { Origin: origin } : {}) },
        body: JSON.stringify({ currentPassword: 'first-reset-pw', newPassword: 'hijacked-password' }),
      });
    expect((await attempt('https://evil.example')).status).toBe(403);
    expect((await attempt()).status).toBe(403);
    expect((await http.post('/api/auth/sign-in/email', { email: user.email, password: 'first-reset-pw' })).status).toBe(200);
  });
});
