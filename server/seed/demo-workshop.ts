import { createHash, randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { validateDesign } from '../../shared/design/index.ts';
import { INVITATION_DAYS } from '../../shared/workshops/workshop-schema.ts';
import type { BurnLog } from '../burns/burn-log.ts';
import type { DesignLibrary } from '../library/design-library.ts';
import type { WorkshopRepository } from '../workshops/workshop-repository.ts';
import { newJoinCode } from '../workshops/workshop-use-cases.ts';

/**
 * The demo instructor's invented Thursday evening at Alder Street Makerspace: a kit from their own
 * copy of the pint stove, the demo maker as a member who has printed and burned once, and two
 * invitations still open (to invented addresses; no mail is sent at seed time).
 */
export async function seedDemoWorkshop(deps: { library: DesignLibrary; workshops: WorkshopRepository; burnLog: BurnLog }, instructorId: string, makerId: string): Promise<void> {
  const template = validateDesign({ ...JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8')), name: 'Alder Street evening build stove' });
  if (!template.ok) throw new Error('templates/pint-can-stove.json is not a valid design');
  const design = await deps.library.createDesign(instructorId, { tags: ['workshop kit'], document: template.design });
  const found = await deps.workshops.findOwnVersion(instructorId, design.id);
  const workshopId = await deps.workshops.insert({
    ownerId: instructorId,
    title: 'Thursday evening stove build',
    startsAt: new Date('2026-12-10T18:30:00Z'),
    place: 'Alder Street Makerspace, back room',
    notes: 'Bring two clean cans (a 303x406 and a 401x411), gloves and safety glasses. Drills and clamps are on the bench.',
    capacity: 12,
    defaultPaper: 'letter',
    designId: design.id,
    versionId: found.versionId!,
    joinCode: newJoinCode(),
  });
  await deps.workshops.addMemberWithinCapacity(workshopId, makerId);
  await deps.workshops.markPrinted(workshopId, makerId);
  const expires = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
  for (const email of ['river.guest@alder-street.example', 'morgan.guest@alder-street.example']) {
    await deps.workshops.upsertInvitation(workshopId, email, createHash('sha256').update(randomBytes(24)).digest('hex'), expires);
  }
  await deps.burnLog.logKitBurn(
    makerId,
    { designId: design.id, versionId: found.versionId!, version: 1, workshopId },
    { date: '2026-11-26T19:40:00Z', fuelKind: 'softwood pellets', fuelMassG: 150, timeToJetsS: 150, timeToBoilS: 610, boilWaterL: 0.5, burnTimeS: 1190, smoke: 'none', flameRing: 4, notes: 'Test fire in the yard after the session.' },
  );
}
