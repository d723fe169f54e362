import { readFileSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildUser, createUser, firstLink, signedInClient, type TestUser } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

const pint = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

let server: TestServer;
let instructor: HttpClient;
let designId = '';
beforeAll(async () => {
  server = await startTestServer();
  const teacher = await createUser(server, { role: 'instructor', name: 'Alex Teacher' });
  instructor = await signedInClient(server, teacher);
  designId = (await instructor.post('/api/designs', { document: pint })).body.id;
  // Version 2 after the class kit was made: the workshop keeps version 1 until moved.
  await instructor.post(`/api/designs/${designId}/versions`, { document: { ...pint, notes: 'after the dry run' } });
});
afterAll(() => server.close());

async function signUpThroughInvitation(link: string, person: TestUser): Promise<HttpClient> {
  const http = new HttpClient(server.url);
  const before = server.mail.list()[0]?.id ?? 0;
  expect((await http.post('/api/auth/sign-up/email', { name: person.name, email: person.email, password: person.password, callbackURL: link.replace(server.url, '') })).status).toBe(200);
  const verification = await server.mail.waitFor(person.email, { after: before });
  expect((await http.get(firstLink(verification.text))).status).toBe(302);
  expect((await http.post('/api/auth/sign-in/email', { email: person.email, password: person.password })).status).toBe(200);
  return http;
}

describe('a workshop from start to the group results', () => {
  let workshopId = '';
  let member: HttpClient;
  let joinedUser: TestUser;
  const invitedA = buildUser({ name: 'Pat Builder' });
  const invitedB = buildUser({ name: 'Lee Builder' });

  it('is created from a pinned design version, answers 201 with id and code', async () => {
    const created = await instructor.post('/api/workshops', { title: 'Thursday stove night', designId, startsAt: '2026-12-10T18:30:00Z', version: 1 });
    expect(created.status).toBe(201);
    expect(created.body.id).toEqual(expect.any(String));
    expect(created.body.code).toMatch(/^[A-HJ-KM-NP-Z2-9]{8}$/);
    expect(created.body.kit).toMatchObject({ designId, version: 1, latestVersion: 2 });
    workshopId = created.body.id;
    const smallest = await instructor.post('/api/workshops', { title: 'Smallest body', designId, startsAt: '2026-12-11T18:30:00Z' });
    expect(smallest.status).toBe(201);
    expect(smallest.body.kit.version).toBe(2);
  });

  it('invites two addresses; the capture holds both invitations', async () => {
    const before = server.mail.list()[0]?.id ?? 0;
    const invited = await instructor.post(`/api/workshops/${workshopId}/invitations`, { emails: [invitedA.email, invitedB.email.toUpperCase(), invitedA.email] });
    expect(invited.status).toBe(201);
    expect(invited.body.invited.sort()).toEqual([invitedA.email, invitedB.email].sort());
    const mailA = await server.mail.waitFor(invitedA.email, { after: before });
    const mailB = await server.mail.waitFor(invitedB.email, { after: before });
    expect(mailA.subject).toContain('Thursday stove night');
    expect(firstLink(mailB.text)).toContain('/workshops/join?token=');
    const roster = (await instructor.get(`/api/workshops/${workshopId}`)).body.roster;
    expect(roster.map((r: { status: string }) => r.status)).toEqual(['invited', 'invited']);

    joinedUser = invitedA;
    const link = firstLink(mailA.text);
    member = await signUpThroughInvitation(link, invitedA);
    const token = new URL(link).searchParams.get('token');
    const joined = await member.post('/api/workshops/join', { token });
    expect(joined.status).toBe(201);
    expect(joined.body).toMatchObject({ id: workshopId, role: 'member', code: null, roster: null });
    expect((await member.post('/api/workshops/join', { token })).status).toBe(200);
  });

  it('an invitation works for its own address only', async () => {
    const mail = server.mail.list().find((m) => m.to.includes(invitedB.email))!;
    const stranger = await signedInClient(server, await createUser(server));
    const refused = await stranger.post('/api/workshops/join', { token: new URL(firstLink(mail.text)).searchParams.get('token') });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toContain('another e-mail address');
  });

  it('the member prints and logs a burn; the roster says invited, joined, printed, burned', async () => {
    let roster = (await instructor.get(`/api/workshops/${workshopId}`)).body.roster;
    expect(Object.fromEntries(roster.map((r: { email: string; status: string }) => [r.email, r.status]))).toEqual({ [invitedA.email]: 'joined', [invitedB.email]: 'invited' });

    const pdf = await member.bytes(`/api/workshops/${workshopId}/kit.pdf?paper=a4`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get('content-type')).toBe('application/pdf');
    const doc = await PDFDocument.load(pdf.bytes);
    // A4 is 210 x 297 mm = 595.3 x 841.9 pt (ISO 216; 1 pt = 25.4/72 mm).
    expect(doc.getPage(0).getWidth()).toBeCloseTo(595.28, 1);
    roster = (await instructor.get(`/api/workshops/${workshopId}`)).body.roster;
    expect(roster.find((r: { email: string }) => r.email === invitedA.email).status).toBe('printed');

    const burn = await member.post(`/api/workshops/${workshopId}/burns`, { date: '2026-12-12T15:00:00Z', timeToJetsS: 130, timeToBoilS: 560, burnTimeS: 1250 });
    expect(burn.status).toBe(201);
    expect(burn.body).toMatchObject({ version: 1, designId });
    roster = (await instructor.get(`/api/workshops/${workshopId}`)).body.roster;
    expect(Object.fromEntries(roster.map((r: { email: string; status: string }) => [r.email, r.status]))).toEqual({ [invitedA.email]: 'burned', [invitedB.email]: 'invited' });
    const group = (await instructor.get(`/api/workshops/${workshopId}/burns`)).body.burns;
    expect(group).toHaveLength(1);
    expect(group[0]).toMatchObject({ memberName: joinedUser.name, timeToJetsS: 130 });
  });

  it('sends the kit: each member gets a mail with a PDF that parses', async () => {
    const before = server.mail.list()[0]?.id ?? 0;
    const sent = await instructor.post(`/api/workshops/${workshopId}/send-kit`, {});
    expect(sent.status).toBe(200);
    expect(sent.body).toEqual({ sent: 1 });
    const mail = await server.mail.waitFor(invitedA.email, { after: before });
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]!.contentType).toBe('application/pdf');
    const doc = await PDFDocument.load(mail.attachments[0]!.content);
    expect(doc.getPageCount()).toBeGreaterThanOrEqual(2);
  });

  it('prints the class pack: cover and sign-off for the roster, then the kit', async () => {
    const kit = await instructor.bytes(`/api/workshops/${workshopId}/kit.pdf?paper=letter`);
    const pack = await instructor.bytes(`/api/workshops/${workshopId}/class-pack.pdf?paper=letter`);
    expect(pack.status).toBe(200);
    expect(pack.headers.get('content-type')).toBe('application/pdf');
    const sheets = Number(kit.headers.get('x-sheet-count'));
    // Cover + one sign-off page (two roster lines) + the kit's sheets, its sheet map and its build sheet.
    expect((await PDFDocument.load(pack.bytes)).getPageCount()).toBe(sheets + 4);
    expect(Number(pack.headers.get('x-page-count'))).toBe(sheets + 4);
    expect((await member.get(`/api/workshops/${workshopId}/class-pack.pdf`)).status).toBe(403);
    const refused = await instructor.get(`/api/workshops/${workshopId}/class-pack.pdf?builds=0`);
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.body)).not.toMatch(/too_small|Number must/);
  });

  it('moving the kit to a newer version tells the members', async () => {
    const moved = await instructor.patch(`/api/workshops/${workshopId}`, { version: 2 });
    expect(moved.status).toBe(200);
    expect(moved.body.kit.version).toBe(2);
    expect((await member.get(`/api/workshops/${workshopId}`)).body.you.kitChangedSinceJoined).toBe(true);
  });
});

describe('who may do what', () => {
  let workshopId = '';
  let code = '';
  let memberA: HttpClient;
  let memberB: HttpClient;
  let userB: TestUser & { id: string };

  beforeAll(async () => {
    const created = await instructor.post('/api/workshops', { title: 'Scout troop build', designId, startsAt: '2026-12-20T10:00:00Z', capacity: 2 });
    workshopId = created.body.id;
    code = created.body.code;
    memberA = await signedInClient(server, await createUser(server));
    userB = await createUser(server);
    memberB = await signedInClient(server, userB);
    expect((await memberA.post('/api/workshops/join', { code: code.toLowerCase() })).status).toBe(201);
    expect((await memberB.post('/api/workshops/join', { code })).status).toBe(201);
    await memberB.post(`/api/workshops/${workshopId}/burns`, { date: '2026-12-20T12:00:00Z', notes: 'B only' });
  });

  it('a maker cannot create a workshop (403)', async () => {
    const maker = await signedInClient(server, await createUser(server));
    const { id } = (await maker.post('/api/designs', { document: pint })).body;
    expect((await maker.post('/api/workshops', { title: 'Mine', designId: id, startsAt: '2026-12-20T10:00:00Z' })).status).toBe(403);
  });

  it('capacity is enforced', async () => {
    const third = await signedInClient(server, await createUser(server));
    const full = await third.post('/api/workshops/join', { code });
    expect(full.status).toBe(409);
    expect(full.body.error.message).toContain('full');
  });

  it('a non-member gets 404 on every workshop route', async () => {
    const outsider = await signedInClient(server, await createUser(server, { role: 'instructor' }));
    const paths: [string, string, unknown?][] = [
      ['GET', `/api/workshops/${workshopId}`],
      ['PATCH', `/api/workshops/${workshopId}`, { title: 'x' }],
      ['DELETE', `/api/workshops/${workshopId}`],
      ['POST', `/api/workshops/${workshopId}/invitations`, { emails: ['a@b.example'] }],
      ['DELETE', `/api/workshops/${workshopId}/members/${userB.id}`],
      ['GET', `/api/workshops/${workshopId}/kit.pdf`],
      ['GET', `/api/workshops/${workshopId}/class-pack.pdf`],
      ['POST', `/api/workshops/${workshopId}/send-kit`, {}],
      ['GET', `/api/workshops/${workshopId}/burns`],
      ['POST', `/api/workshops/${workshopId}/burns`, { date: '2026-12-20T12:00:00Z' }],
    ];
    for (const [method, path, body] of paths) expect((await outsider.request(method, path, body)).status, `${method} ${path}`).toBe(404);
    expect((await outsider.get('/api/workshops')).body.workshops).toEqual([]);
  });

  it("a member sees neither another member's burns nor the invitation list", async () => {
    const seen = await memberA.get(`/api/workshops/${workshopId}`);
    expect(seen.body.roster).toBeNull();
    expect(seen.body.code).toBeNull();
    expect((await memberA.get(`/api/workshops/${workshopId}/burns`)).body.burns).toEqual([]);
    expect((await memberA.post(`/api/workshops/${workshopId}/invitations`, { emails: ['x@y.example'] })).status).toBe(403);
    expect((await memberA.patch(`/api/workshops/${workshopId}`, { title: 'Taken over' })).status).toBe(403);
    const burnOfB = (await memberB.get(`/api/workshops/${workshopId}/burns`)).body.burns[0];
    expect((await memberA.get(`/api/burns/${burnOfB.id}`)).status).toBe(404);
  });

  it('a removed member loses access at once', async () => {
    expect((await instructor.request('DELETE', `/api/workshops/${workshopId}/members/${userB.id}`)).status).toBe(204);
    expect((await memberB.get(`/api/workshops/${workshopId}`)).status).toBe(404);
    expect((await memberB.get(`/api/workshops/${workshopId}/kit.pdf`)).status).toBe(404);
  });

  it('a revoked code stops working; a closed workshop is read-only', async () => {
    const renewed = await instructor.patch(`/api/workshops/${workshopId}`, { joinCode: 'new' });
    expect(renewed.body.code).not.toBe(code);
    const late = await signedInClient(server, await createUser(server));
    expect((await late.post('/api/workshops/join', { code })).status).toBe(404);
    const closed = await instructor.patch(`/api/workshops/${workshopId}`, { closed: true });
    expect(closed.body.closedAt).not.toBeNull();
    expect(closed.body.code).toBeNull();
    expect((await instructor.patch(`/api/workshops/${workshopId}`, { title: 'Again' })).status).toBe(409);
    expect((await memberA.post(`/api/workshops/${workshopId}/burns`, { date: '2026-12-21T12:00:00Z' })).status).toBe(409);
    expect((await memberA.get(`/api/workshops/${workshopId}`)).status).toBe(200);
  });

  it('the design of a workshop is not deleted under it', async () => {
    const refused = await instructor.request('DELETE', `/api/designs/${designId}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain('Scout troop build');
  });

  it('bad bodies get plain words', async () => {
    const noDate = await instructor.post('/api/workshops', { title: 'x', designId });
    expect(noDate.status).toBe(400);
    expect(JSON.stringify(noDate.body)).not.toMatch(/invalid_type|Required/);
    expect((await instructor.post('/api/workshops/join', {})).status).toBe(400);
    expect((await instructor.post(`/api/workshops/${workshopId}/invitations`, { emails: ['not an address'] })).status).toBe(400);
  });
});
