import { createHash, randomBytes, randomInt } from 'node:crypto';
import type { Burn, CreateBurnInput } from '../../shared/burns/burn-schema.ts';
import {
  INVITATION_DAYS,
  WORKSHOP_CAPACITY_DEFAULT,
  type CreateWorkshopInput,
  type InvitationResult,
  type InvitationsInput,
  type JoinWorkshopInput,
  type RosterEntry,
  type UpdateWorkshopInput,
  type Workshop,
  type WorkshopBurns,
  type WorkshopList,
} from '../../shared/workshops/workshop-schema.ts';
import type { BurnLog } from '../burns/burn-log.ts';
import type { BurnRepository } from '../burns/burn-repository.ts';
import { AppError, notFound } from '../http/app-error.ts';
import type { SessionUser } from '../http/session.ts';
import type { Mailer } from '../mail/mailer.ts';
import { kitMail, when, workshopInvitationMail } from '../mail/workshop-messages.ts';
import type { RenderPool } from '../render/render-pool.ts';
import type { WorkshopRepository, WorkshopWithKit } from './workshop-repository.ts';

/** Letters and digits that cannot be misread on a projector: no 0/O, 1/I/L. */
const CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const newJoinCode = () => Array.from({ length: 8 }, () => CODE_ALPHABET[randomInt(CODE_ALPHABET.length)]).join('');
const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
/** The join page of the app; the token or code travels in the query. */
export const joinPath = '/workshops/join';

const missingWorkshop = () => notFound('That workshop');
const closedWorkshop = () => new AppError(409, 'WORKSHOP_CLOSED', 'This workshop is closed: it can be looked at, not changed.');

interface Deps {
  workshops: WorkshopRepository;
  burns: BurnRepository;
  burnLog: BurnLog;
  mailer: Mailer;
  renderPool: RenderPool;
  /** The site's address, for links in mail. */
  publicUrl: string;
}

type Access = { row: WorkshopWithKit; as: 'instructor' | 'member' };

/** Workshops: the instructor's build session with one pinned kit, its invitations, roster and burns. */
export function createWorkshopUseCases({ workshops, burnLog, mailer, renderPool, publicUrl }: Deps) {
  /** The instructor who runs it and admins manage it; members see it; anyone else is told it does not exist. */
  async function access(viewer: SessionUser, id: string): Promise<Access> {
    const row = await workshops.find(id);
    if (!row) throw missingWorkshop();
    if (row.workshop.ownerId === viewer.id || viewer.role === 'admin') return { row, as: 'instructor' };
    if (await workshops.findMember(id, viewer.id)) return { row, as: 'member' };
    throw missingWorkshop();
  }

  async function manage(viewer: SessionUser, id: string, { open = true } = {}): Promise<WorkshopWithKit> {
    const { row, as } = await access(viewer, id);
    if (as !== 'instructor') throw new AppError(403, 'FORBIDDEN', 'Only the workshop’s instructor can do this.');
    if (open && row.workshop.closedAt) throw closedWorkshop();
    return row;
  }

  async function roster(row: WorkshopWithKit): Promise<RosterEntry[]> {
    const [members, invitations] = await Promise.all([workshops.members(row.workshop.id), workshops.invitations(row.workshop.id)]);
    const byEmail = new Map(invitations.map((i) => [i.email, i]));
    const now = Date.now();
    const joined: RosterEntry[] = members.map((m) => ({
      userId: m.userId,
      name: m.name,
      email: m.email,
      status: m.burns > 0 ? 'burned' : m.printedAt ? 'printed' : 'joined',
      invitedAt: byEmail.get(m.email.toLowerCase())?.sentAt.toISOString() ?? null,
      joinedAt: m.joinedAt.toISOString(),
      printedAt: m.printedAt?.toISOString() ?? null,
      burns: m.burns,
    }));
    const memberEmails = new Set(members.map((m) => m.email.toLowerCase()));
    const waiting: RosterEntry[] = invitations
      .filter((i) => !memberEmails.has(i.email))
      .map((i) => ({ userId: null, name: null, email: i.email, status: i.expiresAt.getTime() < now ? 'expired' : 'invited', invitedAt: i.sentAt.toISOString(), joinedAt: null, printedAt: null, burns: 0 }));
    return [...joined, ...waiting];
  }

  async function view(viewer: SessionUser, { row, as }: Access): Promise<Workshop> {
    const w = row.workshop;
    const member = as === 'member' ? await workshops.findMember(w.id, viewer.id) : undefined;
    return {
      id: w.id,
      title: w.title,
      startsAt: w.startsAt.toISOString(),
      place: w.place,
      notes: w.notes,
      capacity: w.capacity,
      defaultPaper: w.defaultPaper as Workshop['defaultPaper'],
      closedAt: w.closedAt?.toISOString() ?? null,
      instructorName: row.instructorName,
      role: as,
      members: await workshops.memberCount(w.id),
      kit: { designId: w.designId, designName: row.designName, version: row.version, latestVersion: as === 'instructor' ? row.latestVersion : null, summary: row.summary, movedAt: w.kitMovedAt?.toISOString() ?? null },
      code: as === 'instructor' ? w.joinCode : null,
      roster: as === 'instructor' ? await roster(row) : null,
      you: member ? { joinedAt: member.joinedAt.toISOString(), printedAt: member.printedAt?.toISOString() ?? null, kitChangedSinceJoined: Boolean(w.kitMovedAt && w.kitMovedAt > member.joinedAt) } : null,
      createdAt: w.createdAt.toISOString(),
    };
  }

  async function kitVersion(ownerId: string, designId: string, number?: number) {
    const found = await workshops.findOwnVersion(ownerId, designId, number);
    if (!found.design) throw notFound('That design');
    if (!found.versionId) throw new AppError(404, 'NOT_FOUND', `This design has no version ${number}.`);
    return found.versionId;
  }

  /** The kit's PDF as one person prints it: their paper (or the workshop's), their printer profile. */
  async function renderKitFor(row: WorkshopWithKit, userId: string, paper?: string, signal?: AbortSignal) {
    const person = await workshops.userEmail(userId);
    const printer = await workshops.printerOf(userId);
    const result = await renderPool.run(
      { kind: 'pdf', request: { design: row.document, print: { paper: (paper ?? person?.defaultPaper ?? row.workshop.defaultPaper) as 'letter' }, printer, version: String(row.version) } },
      signal,
    );
    if (result.kind !== 'pdf') throw new Error('The render pool answered something other than a PDF');
    return result;
  }

  return {
    async list(viewer: SessionUser): Promise<WorkshopList> {
      const rows = await workshops.listFor(viewer.id);
      const counts = await Promise.all(rows.map((r) => workshops.memberCount(r.workshop.id)));
      return {
        workshops: rows.map((r, i) => ({
          id: r.workshop.id,
          title: r.workshop.title,
          startsAt: r.workshop.startsAt.toISOString(),
          place: r.workshop.place,
          closedAt: r.workshop.closedAt?.toISOString() ?? null,
          role: r.member ? 'member' : 'instructor',
          members: counts[i] ?? 0,
          capacity: r.workshop.capacity,
          instructorName: r.instructorName,
          kitName: r.designName,
        })),
      };
    },

    async create(viewer: SessionUser, input: CreateWorkshopInput): Promise<Workshop> {
      const versionId = await kitVersion(viewer.id, input.designId, input.version);
      const id = await workshops.insert({
        ownerId: viewer.id,
        title: input.title,
        startsAt: new Date(input.startsAt),
        place: input.place ?? '',
        notes: input.notes ?? '',
        capacity: input.capacity ?? WORKSHOP_CAPACITY_DEFAULT,
        defaultPaper: input.defaultPaper ?? 'letter',
        designId: input.designId,
        versionId,
        joinCode: newJoinCode(),
      });
      const row = await workshops.find(id);
      if (!row) throw missingWorkshop();
      return view(viewer, { row, as: 'instructor' });
    },

    async get(viewer: SessionUser, id: string): Promise<Workshop> {
      return view(viewer, await access(viewer, id));
    },

    async update(viewer: SessionUser, id: string, change: UpdateWorkshopInput): Promise<Workshop> {
      const row = await manage(viewer, id);
      const w = row.workshop;
      if (change.capacity !== undefined && change.capacity < (await workshops.memberCount(id))) {
        throw new AppError(409, 'CAPACITY_BELOW_MEMBERS', 'The workshop already has more members than that. Remove members first, or choose a larger number.');
      }
      const moved = change.version !== undefined && change.version !== row.version ? await kitVersion(w.ownerId, w.designId, change.version) : undefined;
      await workshops.update(id, {
        ...(change.title !== undefined ? { title: change.title } : {}),
        ...(change.startsAt !== undefined ? { startsAt: new Date(change.startsAt) } : {}),
        ...(change.place !== undefined ? { place: change.place } : {}),
        ...(change.notes !== undefined ? { notes: change.notes } : {}),
        ...(change.capacity !== undefined ? { capacity: change.capacity } : {}),
        ...(change.defaultPaper !== undefined ? { defaultPaper: change.defaultPaper } : {}),
        ...(moved ? { versionId: moved, kitMovedAt: new Date() } : {}),
        ...(change.joinCode !== undefined ? { joinCode: change.joinCode === 'new' ? newJoinCode() : null } : {}),
        ...(change.closed ? { closedAt: new Date(), joinCode: null } : {}),
      });
      return this.get(viewer, id);
    },

    async remove(viewer: SessionUser, id: string): Promise<void> {
      await manage(viewer, id, { open: false });
      await workshops.remove(id);
    },

    /** Mails each address a join link of its own; an address already in the workshop is left out, as are those past the capacity. */
    async invite(viewer: SessionUser, id: string, input: InvitationsInput): Promise<InvitationResult> {
      const row = await manage(viewer, id);
      const members = await workshops.members(id);
      const inside = new Set(members.map((m) => m.email.toLowerCase()));
      const pending = (await workshops.invitations(id)).filter((i) => !inside.has(i.email) && !i.acceptedAt && i.expiresAt.getTime() > Date.now());
      const result: InvitationResult = { invited: [], alreadyMembers: [], overCapacity: [] };
      let room = row.workshop.capacity - members.length - pending.filter((i) => !input.emails.includes(i.email)).length;
      for (const email of input.emails) {
        if (inside.has(email)) {
          result.alreadyMembers.push(email);
          continue;
        }
        if (room <= 0) {
          result.overCapacity.push(email);
          continue;
        }
        room -= 1;
        const token = randomBytes(24).toString('base64url');
        const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
        await workshops.upsertInvitation(id, email, hashToken(token), expiresAt);
        const link = `${publicUrl}${joinPath}?token=${encodeURIComponent(token)}`;
        await mailer.send(workshopInvitationMail(email, { title: row.workshop.title, instructor: row.instructorName, startsAt: row.workshop.startsAt, place: row.workshop.place, link, days: INVITATION_DAYS }));
        result.invited.push(email);
      }
      return result;
    },

    /** Joins by the code on the screen or an invitation's token; answers whether the person is new to it. */
    async join(viewer: SessionUser, input: JoinWorkshopInput): Promise<{ workshop: Workshop; joined: boolean }> {
      let workshopId: string;
      let invitationId: string | undefined;
      if (input.token) {
        const invitation = await workshops.findInvitation(hashToken(input.token));
        if (!invitation) throw new AppError(404, 'INVITATION_NOT_FOUND', 'This invitation link is not valid (it may have been sent again since). Ask the instructor for a new one.');
        if (invitation.email !== viewer.email.toLowerCase()) {
          throw new AppError(403, 'INVITATION_FOR_ANOTHER_ADDRESS', 'This invitation was sent to another e-mail address. Sign in with the address it was sent to, or ask the instructor to invite this one.');
        }
        workshopId = invitation.workshopId;
        if (!(await workshops.findMember(workshopId, viewer.id)) && invitation.expiresAt.getTime() < Date.now()) {
          throw new AppError(410, 'INVITATION_EXPIRED', 'This invitation has expired. Ask the instructor to send it again.');
        }
        invitationId = invitation.id;
      } else {
        const found = await workshops.findByCode((input.code ?? '').toUpperCase().replace(/[\s-]/g, ''));
        if (!found) throw new AppError(404, 'JOIN_CODE_NOT_FOUND', 'No workshop has that code. Check it with the instructor: codes have eight letters and digits.');
        workshopId = found.id;
      }
      const row = await workshops.find(workshopId);
      if (!row) throw missingWorkshop();
      if (row.workshop.ownerId === viewer.id) return { workshop: await view(viewer, { row, as: 'instructor' }), joined: false };
      const already = await workshops.findMember(workshopId, viewer.id);
      if (!already && row.workshop.closedAt) throw closedWorkshop();
      const outcome = already ? 'already' : await workshops.addMemberWithinCapacity(workshopId, viewer.id, invitationId);
      if (outcome === 'full') throw new AppError(409, 'WORKSHOP_FULL', 'This workshop is full. Ask the instructor whether there is room.');
      return { workshop: await view(viewer, { row, as: 'member' }), joined: outcome === 'joined' };
    },

    /** The instructor removes a member, or a member leaves. */
    async removeMember(viewer: SessionUser, id: string, userId: string): Promise<void> {
      const { as } = await access(viewer, id);
      if (as === 'member' && userId !== viewer.id) throw new AppError(403, 'FORBIDDEN', 'Only the workshop’s instructor can remove other members.');
      if (!(await workshops.removeMember(id, userId))) throw notFound('That member');
    },

    /** The kit's PDF for the caller; a member's print is marked on the roster. */
    async kitPdf(viewer: SessionUser, id: string, paper: string | undefined, signal?: AbortSignal) {
      const { row, as } = await access(viewer, id);
      const result = await renderKitFor(row, viewer.id, paper, signal);
      if (as === 'member') await workshops.markPrinted(id, viewer.id);
      return result;
    },

    /** Mails every member the kit as a PDF on their own paper and printer profile. */
    async sendKit(viewer: SessionUser, id: string): Promise<{ sent: number }> {
      const row = await manage(viewer, id);
      const members = await workshops.members(id);
      for (const member of members) {
        const pdf = await renderKitFor(row, member.userId);
        await mailer.send(kitMail(member.email, { name: member.name, title: row.workshop.title, instructor: row.instructorName, link: `${publicUrl}/workshops/${id}`, fileName: pdf.fileName, pdf: Buffer.from(pdf.bytes) }));
      }
      return { sent: members.length };
    },

    /**
     * The instructor's class pack on their own paper: materials for the group's builds (the members
     * and open invitations, or the places when nobody is invited yet, unless a number is asked for),
     * the sign-off list of the roster, then the kit.
     */
    async classPack(viewer: SessionUser, id: string, options: { paper?: string; builds?: number }, signal?: AbortSignal) {
      const row = await manage(viewer, id, { open: false });
      const people = (await roster(row)).filter((r) => r.status !== 'expired').map((r) => r.name || r.email);
      const builds = options.builds ?? (people.length || row.workshop.capacity);
      const names = [...people, ...Array.from({ length: Math.max(0, builds - people.length) }, () => '')];
      const person = await workshops.userEmail(viewer.id);
      const printer = await workshops.printerOf(viewer.id);
      const result = await renderPool.run(
        {
          kind: 'class-pack',
          request: { design: row.document, print: { paper: (options.paper ?? person?.defaultPaper ?? row.workshop.defaultPaper) as 'letter' }, printer, version: String(row.version) },
          meta: { title: row.workshop.title, when: when(row.workshop.startsAt), place: row.workshop.place, instructor: row.instructorName, builds, names },
        },
        signal,
      );
      if (result.kind !== 'class-pack') throw new Error('The render pool answered something other than a class pack');
      return result;
    },

    async burns(viewer: SessionUser, id: string): Promise<WorkshopBurns> {
      const { as } = await access(viewer, id);
      const rows = await workshops.burns(id, as === 'member' ? viewer.id : undefined);
      const views = await burnLog.views(rows);
      return { burns: views.map((burn, i) => ({ ...burn, memberName: rows[i]?.memberName ?? '' })) };
    },

    /** A member (or the instructor, for the stove they built alongside) logs a burn of a stove from the kit, pinned to the kit's version. */
    async logBurn(viewer: SessionUser, id: string, input: Omit<CreateBurnInput, 'version'>): Promise<Burn> {
      const { row } = await access(viewer, id);
      if (row.workshop.closedAt) throw closedWorkshop();
      return burnLog.logKitBurn(viewer.id, { designId: row.workshop.designId, versionId: row.workshop.versionId, version: row.version, workshopId: id }, input);
    },

    /** Titles of the workshops whose kit is this design (a design in use is not deleted). */
    workshopsUsing: (designId: string) => workshops.usesDesign(designId),
  };
}

export type WorkshopUseCases = ReturnType<typeof createWorkshopUseCases>;
