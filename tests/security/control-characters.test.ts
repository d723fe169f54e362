import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { databaseRefusal } from '../../server/http/error-handler.ts';
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

const pint = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

/**
 * A NUL (U+0000) or another control character anywhere in an address, a query or a body is
 * refused at the door with 400 naming the field, on every route (better-auth's included); before,
 * PostgreSQL refused it deep inside and the person got a 500 (PostgreSQL manual 8.3: "the
 * character with code zero cannot be stored").
 */
describe('control characters and missing values are bad input, never a server fault', () => {
  let server: TestServer;
  let api: HttpClient;
  const errors = vi.spyOn(console, 'error');

  beforeAll(async () => {
    server = await startTestServer();
    const maker = await createUser(server);
    api = await signedInClient(server, maker);
    errors.mockClear();
  });
  afterAll(async () => {
    await server.close();
    errors.mockRestore();
  });

  const field = (body: { error?: { details?: { fields?: { path: string }[] } } }) => body.error?.details?.fields?.[0]?.path;

  it('in a query value', async () => {
    const response = await api.get('/api/designs?q=a%00b');
    expect(response.status).toBe(400);
    expect(field(response.body)).toBe('q');
    expect((await api.get('/api/admin/users?q=a%01b')).status).toBe(400);
  });

  it('in an id in the address', async () => {
    const response = await api.get('/api/designs/x%00');
    expect(response.status).toBe(400);
    expect(field(response.body)).toBe('(address)');
    expect((await api.get('/api/designs/x%zz')).status).toBe(400);
  });

  it('in a string of a body, at any depth', async () => {
    const named = await api.post('/api/designs', { document: { ...pint, name: 'Pint\u0000stove' } });
    expect(named.status).toBe(400);
    expect(field(named.body)).toBe('document.name');
    const deep = await api.post('/api/designs', { document: { ...pint, parts: [{ ...pint.parts[0], name: 'Chamber\u001b' }, ...pint.parts.slice(1)] } });
    expect(deep.status).toBe(400);
    expect(field(deep.body)).toBe('document.parts.0.name');
    // Tabs and line breaks are text: a note may have them.
    expect((await api.post('/api/designs', { document: { ...pint, notes: 'Line one\nline two\tindented' } })).status).toBe(201);
  });

  it('on better-auth routes: the profile name, sign-in and sign-up', async () => {
    const nul = await api.post('/api/auth/update-user', { name: 'Rowan\u0000' });
    expect(nul.status).toBe(400);
    expect(JSON.stringify(nul.body)).toContain('name');
    const none = await api.post('/api/auth/update-user', { name: null });
    expect(none.status).toBe(400);
    expect(JSON.stringify(none.body)).toContain('name must be text');
    expect((await api.post('/api/auth/sign-in/email', { email: 'someone\u0000@workshop.example', password: 'burn-test-1234' })).status).toBe(400);
    expect((await api.post('/api/auth/sign-up/email', { name: 'A\u0000', email: 'new-one@workshop.example', password: 'burn-test-1234' })).status).toBe(400);
    // The name still works as before.
    expect((await api.post('/api/auth/update-user', { name: 'Rowan Birch' })).status).toBe(200);
  });

  it('logged no server error for any of it', () => {
    expect(errors).not.toHaveBeenCalled();
  });
});

describe('databaseRefusal', () => {
  // SQLSTATE codes from the PostgreSQL manual, appendix A (errcodes).
  it('maps data exceptions (class 22) and not-null violations (23502) to bad input, also when wrapped', () => {
    expect(databaseRefusal({ code: '22P05' })).toMatch(/could not be stored/); // untranslatable_character
    expect(databaseRefusal({ code: '22021' })).toMatch(/could not be stored/); // character_not_in_repertoire
    expect(databaseRefusal({ message: 'Failed query', cause: { code: '23502' } })).toBe('A required value is missing.'); // not_null_violation
  });

  it('leaves other failures (unique violation 23505, connection failure 08006, plain errors) as server faults', () => {
    expect(databaseRefusal({ code: '23505' })).toBeUndefined();
    expect(databaseRefusal({ code: '08006' })).toBeUndefined();
    expect(databaseRefusal(new Error('boom'))).toBeUndefined();
  });
});
