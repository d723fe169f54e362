import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from '../helpers/axe.ts';
import { artifactPath, browserAvailability, launchBrowser } from '../helpers/browser.ts';
import { buildUser, createUser, firstLink, signedInClient, type TestUser } from '../helpers/factories.ts';
import { clientDir, startTestServer, type TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
const pint = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

async function signIn(page: Page, server: TestServer, user: Pick<TestUser, 'email' | 'password'>, next: string) {
  await page.goto(`${server.url}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel('E-mail').fill(user.email);
  await page.getByLabel('Password').fill(user.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

const overflowX = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

describe.skipIf(skip)('an instructor runs a workshop and a member takes part, in two browsers', () => {
  let server: TestServer;
  let teacherBrowser: BrowserContext;
  let memberBrowser: BrowserContext;
  let teacher: Page;
  let member: Page;
  let workshopUrl = '';
  const guest = buildUser({ name: 'Casey Newcomer' });

  beforeAll(async () => {
    server = await startTestServer({ clientDir });
    const instructor = await createUser(server, { role: 'instructor', name: 'Dana Teacher' });
    const api = await signedInClient(server, instructor);
    await api.post('/api/designs', { document: pint });
    teacherBrowser = await launchBrowser({ width: 1280, height: 900 });
    memberBrowser = await launchBrowser({ width: 390, height: 844 });
    teacher = await teacherBrowser.newPage();
    member = await memberBrowser.newPage();
    teacher.setDefaultTimeout(20_000);
    member.setDefaultTimeout(20_000);
    await signIn(teacher, server, instructor, '/workshops');
  });
  afterAll(async () => {
    await teacherBrowser?.close();
    await memberBrowser?.close();
    await server?.close();
  });

  it('the instructor creates the workshop and invites an address', async () => {
    await teacher.getByRole('heading', { name: 'New workshop' }).waitFor();
    await teacher.getByLabel('Title').fill('Saturday scout build');
    await teacher.getByLabel('Starts').fill('2026-12-12T10:00');
    await teacher.getByLabel('Place', { exact: true }).fill('Scout hut yard');
    await teacher.getByRole('button', { name: 'Create the workshop' }).click();
    await teacher.getByTestId('join-code').waitFor();
    workshopUrl = teacher.url();
    expect(await teacher.getByTestId('join-code').innerText()).toMatch(/^[A-Z2-9]{8}$/);
    await teacher.getByLabel(/Invite by e-mail/).fill(`${guest.email}\nnot-an-address`);
    await teacher.getByRole('button', { name: 'Send invitations' }).click();
    await teacher.getByText('must be an e-mail address').waitFor();
    await teacher.getByLabel(/Invite by e-mail/).fill(guest.email);
    await teacher.getByRole('button', { name: 'Send invitations' }).click();
    await teacher.getByText('Invited 1.').waitFor();
    await teacher.getByRole('cell', { name: 'Invited', exact: true }).waitFor();
    expect(await seriousViolations(teacher)).toEqual([]);
  });

  it('the invited person signs up from the link on a phone and lands in the workshop', async () => {
    const invitation = await server.mail.waitFor(guest.email);
    await member.goto(firstLink(invitation.text));
    await member.getByRole('link', { name: 'Make an account' }).click();
    await member.getByLabel('Name').fill(guest.name);
    await member.getByLabel('E-mail').fill(guest.email);
    await member.getByLabel('Password', { exact: true }).fill(guest.password);
    await member.getByLabel('Password again').fill(guest.password);
    const before = server.mail.list()[0]?.id ?? 0;
    await member.getByRole('button', { name: 'Create account' }).click();
    const verification = await server.mail.waitFor(guest.email, { after: before });
    await member.goto(firstLink(verification.text));
    // Confirmed: sign in, and the invitation link brings the person into the workshop.
    await member.getByText('your address is confirmed').waitFor();
    await member.getByRole('link', { name: 'Sign in' }).last().click();
    await member.getByLabel('E-mail').fill(guest.email);
    await member.getByLabel('Password').fill(guest.password);
    await member.getByRole('button', { name: 'Sign in' }).click();
    await member.getByRole('heading', { name: 'Saturday scout build' }).waitFor();
    await member.getByText('Dana Teacher sees the burns and photos you log in this workshop.').waitFor();
    expect(await overflowX(member)).toBeLessThanOrEqual(0);
    expect(await seriousViolations(member)).toEqual([]);
  });

  it('the member downloads the kit and logs a burn; the instructor sees it on the roster and chart', async () => {
    const [download] = await Promise.all([member.waitForEvent('download'), member.getByRole('link', { name: 'Download the kit (PDF)' }).click()]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    await member.getByLabel('Jets lit').fill('2:10');
    await member.getByLabel('Water boiling').fill('9:40');
    await member.getByLabel('Flame out (burn time)').fill('21:00');
    await member.getByRole('button', { name: 'Save the burn' }).click();
    await member.getByText('Saved. Open it above to add photos.').waitFor();
    await member.getByRole('table', { name: 'Burns in this workshop' }).getByRole('cell', { name: '9:40' }).waitFor();
    await member.screenshot({ path: artifactPath('workshop-member-390.png'), fullPage: true });

    await teacher.reload();
    await teacher.getByRole('cell', { name: 'Burned a stove' }).waitFor();
    await teacher.getByRole('table', { name: 'Burns in this workshop' }).getByRole('cell', { name: guest.name }).waitFor();
    expect(await teacher.getByTestId('group-chart').locator('.recharts-bar-rectangle').count()).toBe(3);
    await teacher.screenshot({ path: artifactPath('workshop-instructor-1280.png'), fullPage: true });
    expect(await seriousViolations(teacher)).toEqual([]);
  });

  it('the instructor downloads a class pack for the stoves asked for; a number out of range is explained', async () => {
    const stoves = teacher.getByLabel('Stoves to build');
    await stoves.fill('0');
    await teacher.getByText('Give a whole number of stoves from 1 to 200.').waitFor();
    expect(await teacher.getByRole('link', { name: 'Download the class pack (PDF)' }).count()).toBe(0);
    await stoves.fill('6');
    const [pack] = await Promise.all([teacher.waitForEvent('download'), teacher.getByRole('link', { name: 'Download the class pack (PDF)' }).click()]);
    expect(pack.suggestedFilename()).toMatch(/-class-pack\.pdf$/);
    const bytes = readFileSync((await pack.path())!);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(await seriousViolations(teacher)).toEqual([]);
  });

  it('the instructor sends the kit, and a removed member loses the workshop at once', async () => {
    const before = server.mail.list()[0]?.id ?? 0;
    await teacher.getByRole('button', { name: 'Send the kit to 1 member' }).click();
    await teacher.getByText('Sent the kit to 1 member.').waitFor();
    const mail = await server.mail.waitFor(guest.email, { after: before });
    expect(mail.attachments[0]?.contentType).toBe('application/pdf');
    await teacher.getByRole('button', { name: 'Remove' }).click();
    await teacher.getByRole('cell', { name: 'Invited', exact: true }).waitFor();
    await member.goto(workshopUrl);
    await member.getByRole('heading', { name: 'Workshop not found' }).waitFor();
  });
});
