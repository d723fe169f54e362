import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { accounts, burnPhotos, burns, designs, designVersions, printerProfiles, sessions, users } from '../../server/db/schema.ts';
import { developmentLimits } from '../../server/http/rate-limits.ts';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { buildUser, createUser, firstLink, signedInClient, type TestUser } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { photoStores, type OpenStore } from '../helpers/photo-stores.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/** Changing the display name and the e-mail address (the new one confirmed by mail), and deleting the account with everything in it. */

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('display name and e-mail address', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  it('changes the display name, trimmed, and refuses an empty, long or odd one in plain words, keeping the old', async () => {
    const user = await createUser(server, { name: 'Kit Ashby' });
    const http = await signedInClient(server, user);
    const changed = await http.patch('/api/account', { name: '  Kit Ashby-Moor  ' });
    expect(changed.status).toBe(200);
    expect(changed.body.name).toBe('Kit Ashby-Moor');
    expect((await http.get('/api/auth/get-session')).body.user.name).toBe('Kit Ashby-Moor');

    const cases: [unknown, string, string][] = [
      [{}, 'name', 'is required: give the name others should see'],
      [{ name: '   ' }, 'name', 'must not be empty: give the name others should see'],
      [{ name: 'x'.repeat(101) }, 'name', 'must have at most 100 characters'],
      [{ name: null }, 'name', 'must be text (your name as others see it)'],
      [{ name: 'Kit', role: 'admin' }, '(body)', 'is not a field this takes: role'],
      [{ name: 'Kit\u0000' }, 'name', 'holds a control character (such as U+0000) that text cannot contain'],
    ];
    for (const [body, path, message] of cases) {
      const answer = await http.patch('/api/account', body);
      expect(answer.status, JSON.stringify(body)).toBe(400);
      expect(answer.body.error.details.fields[0], JSON.stringify(body)).toEqual({ path, message });
    }
    // better-auth's own route keeps the same limit.
    const viaAuth = await http.post('/api/auth/update-user', { name: 'y'.repeat(101) });
    expect(viaAuth.status).toBe(400);
    expect(viaAuth.body.message).toBe('name must have at most 100 characters.');
    expect((await http.get('/api/account')).body).toMatchObject({ name: 'Kit Ashby-Moor', role: 'maker' });
    expect((await new HttpClient(server.url).patch('/api/account', { name: 'Anyone' })).status).toBe(401);
  });

  it('changes the e-mail address only once the link mailed to the new address is opened', async () => {
    const user = await createUser(server);
    const http = await signedInClient(server, user);
    const newEmail = buildUser().email;
    const asked = await http.post('/api/auth/change-email', { newEmail, callbackURL: '/account?email=changed' });
    expect(asked.status).toBe(200);
    const mail = await server.mail.waitFor(newEmail);
    expect(mail.subject).toBe('Confirm your new e-mail address for Canwright');
    expect(mail.text).toContain('Until you do, the account keeps its old address.');
    // Until then, the old address stands.
    expect((await http.get('/api/account')).body.email).toBe(user.email);

    const landing = await new HttpClient(server.url).get(firstLink(mail.text));
    expect(landing.status).toBe(302);
    expect(landing.headers.get('location')).toBe('/account?email=changed');
    expect((await http.get('/api/account')).body).toMatchObject({ email: newEmail, emailVerified: true });
    expect((await new HttpClient(server.url).post('/api/auth/sign-in/email', { email: newEmail, password: user.password })).status).toBe(200);
    expect((await new HttpClient(server.url).post('/api/auth/sign-in/email', { email: user.email, password: user.password })).status).toBe(401);
  });

  it('answers an address taken by another account as any other, and mails nothing to it', async () => {
    const user = await createUser(server);
    const other = await createUser(server);
    const http = await signedInClient(server, user);
    const before = server.mail.list().length;
    const asked = await http.post('/api/auth/change-email', { newEmail: other.email, callbackURL: '/account?email=changed' });
    expect(asked.status).toBe(200);
    await pause(500);
    expect(server.mail.list().length).toBe(before);
    expect((await http.get('/api/account')).body.email).toBe(user.email);
    const bad = await http.post('/api/auth/change-email', { newEmail: 'not an address' });
    expect(bad.status).toBe(400);
  });

  it('keeps the old address when the new one was taken by a new account before the link was opened', async () => {
    const user = await createUser(server);
    const http = await signedInClient(server, user);
    const newEmail = buildUser().email;
    expect((await http.post('/api/auth/change-email', { newEmail, callbackURL: '/account?email=changed' })).status).toBe(200);
    const mail = await server.mail.waitFor(newEmail);
    await createUser(server, { email: newEmail });
    const landing = await new HttpClient(server.url).get(firstLink(mail.text));
    expect(landing.status, JSON.stringify(landing.body)).toBe(302);
    expect(landing.headers.get('location')).toBe('/account?email=taken');
    expect((await http.get('/api/account')).body.email).toBe(user.email);
  });
});

describe.each(photoStores)('deleting the account: $name', ({ open }) => {
  let server: TestServer;
  let store: OpenStore;

  beforeAll(async () => {
    store = await open();
    server = await startTestServer({ storage: store.target, rateLimits: { ...developmentLimits, failedConfirmationsPerAccount: 3 } });
  });
  afterAll(async () => {
    await server.close();
    await store.close();
  });

  /** A maker with a design (two versions), a burn with two photos and a printer profile. */
  async function makerWithLibrary(overrides: Partial<TestUser> = {}) {
    const user = await createUser(server, overrides);
    const http = await signedInClient(server, user);
    const design = await http.post('/api/designs', { document: structuredClone(pintCanStove) });
    await http.post(`/api/designs/${design.body.id}/versions`, { document: { ...structuredClone(pintCanStove), notes: 'second' } });
    const burn = await http.post(`/api/designs/${design.body.id}/burns`, { date: '2026-11-30T10:00:00Z' });
    for (const colour of ['#a0522d', '#334455']) {
      const photo = await sharp({ create: { width: 320, height: 240, channels: 3, background: colour } }).jpeg().toBuffer();
      expect((await http.upload(`/api/burns/${burn.body.id}/photos`, 'photo', photo, 'stove.jpg', 'image/jpeg')).status).toBe(201);
    }
    expect((await http.post('/api/printer-profiles', { name: 'Laser', measuredXMm: 150, measuredYMm: 200 })).status).toBe(201);
    return { user, http };
  }

  async function rowsOf(userId: string) {
    const db = server.database.db;
    const mine = await db.select({ id: designs.id }).from(designs).where(eq(designs.ownerId, userId));
    const versions = mine.length ? (await db.select().from(designVersions).where(eq(designVersions.designId, mine[0]!.id))).length : 0;
    return {
      users: (await db.select().from(users).where(eq(users.id, userId))).length,
      sessions: (await db.select().from(sessions).where(eq(sessions.userId, userId))).length,
      accounts: (await db.select().from(accounts).where(eq(accounts.userId, userId))).length,
      designs: mine.length,
      versions,
      burns: (await db.select().from(burns).where(eq(burns.ownerId, userId))).length,
      photos: (await db.select().from(burnPhotos).where(eq(burnPhotos.ownerId, userId))).length,
      profiles: (await db.select().from(printerProfiles).where(eq(printerProfiles.userId, userId))).length,
    };
  }
  const filesOf = async (userId: string) => (await store.keys()).filter((key) => key.includes(`photos/${userId}/`));

  it('asks for the password, then deletes designs, versions, burns, photos in the store, printer profiles and sessions', async () => {
    const { user, http } = await makerWithLibrary();
    const bystander = await makerWithLibrary();
    const phone = await signedInClient(server, user);
    const before = await rowsOf(user.id);
    expect(before).toMatchObject({ users: 1, designs: 1, versions: 2, burns: 1, photos: 2, profiles: 1 });
    expect(before.sessions).toBeGreaterThanOrEqual(2);
    expect(await filesOf(user.id)).toHaveLength(4);

    const wrong = await http.post('/api/account/delete', { password: 'not-my-password' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.message).toBe('That is not your password, so the account was not deleted.');
    const empty = await http.post('/api/account/delete', {});
    expect(empty.status).toBe(400);
    expect(empty.body.error.details.fields[0]).toEqual({ path: 'password', message: 'is required: type your password to confirm' });
    expect(await rowsOf(user.id)).toEqual(before);
    expect(await filesOf(user.id)).toHaveLength(4);

    const deleted = await http.post('/api/account/delete', { password: user.password });
    expect(deleted.status).toBe(200);
    expect(deleted.body).toEqual({ deleted: true });
    expect(deleted.headers.getSetCookie().some((cookie) => /session_token=;/.test(cookie))).toBe(true);
    expect(await rowsOf(user.id)).toEqual({ users: 0, sessions: 0, accounts: 0, designs: 0, versions: 0, burns: 0, photos: 0, profiles: 0 });
    expect(await filesOf(user.id)).toEqual([]);
    expect((await phone.get('/api/account')).status).toBe(401);
    expect((await new HttpClient(server.url).post('/api/auth/sign-in/email', { email: user.email, password: user.password })).status).toBe(401);
    // Another maker's library is untouched.
    expect(await rowsOf(bystander.user.id)).toMatchObject({ users: 1, designs: 1, burns: 1, photos: 2, profiles: 1 });
    expect(await filesOf(bystander.user.id)).toHaveLength(4);
  });

  it('stops after a few wrong passwords, and refuses to delete the only administrator', async () => {
    const { user, http } = await makerWithLibrary();
    for (let i = 0; i < 3; i++) expect((await http.post('/api/account/delete', { password: `guess-${i}` })).status).toBe(400);
    const limited = await http.post('/api/account/delete', { password: 'guess-4' });
    expect(limited.status).toBe(429);
    expect(limited.body.error.message).toMatch(/^Too many tries in a short time/);
    expect((await rowsOf(user.id)).users).toBe(1);

    const admin = await createUser(server, { role: 'admin' });
    const adminHttp = await signedInClient(server, admin);
    const last = await adminHttp.post('/api/account/delete', { password: admin.password });
    expect(last.status).toBe(409);
    expect(last.body.error.message).toBe('You are the only administrator of this Canwright site. Make another account an administrator first, then delete yours.');
    expect((await rowsOf(admin.id)).users).toBe(1);
    await createUser(server, { role: 'admin' });
    expect((await adminHttp.post('/api/account/delete', { password: admin.password })).status).toBe(200);
  });
});
