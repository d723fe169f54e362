import { z } from 'zod';
import { refinePrintable } from '../print/printable-text.ts';
import { paperPreferenceSchema } from '../account/preferences.ts';
import { burnSchema } from '../burns/burn-schema.ts';
import { designSummarySchema } from '../library/library-schemas.ts';

/**
 * Workshops: an instructor's build session. One pinned kit (a saved version of one of their
 * designs), invitations by e-mail and a join code, a roster, and the group's burns.
 */

export const WORKSHOP_TITLE_MAX = 120;
export const WORKSHOP_PLACE_MAX = 160;
export const WORKSHOP_NOTES_MAX = 4000;
/** A school year group or a troop; more than this is several sessions (common practice, no source). */
export const WORKSHOP_CAPACITY_MAX = 200;
export const WORKSHOP_CAPACITY_DEFAULT = 20;
/** Addresses taken in one go: a class list pasted at once. */
export const INVITATIONS_PER_REQUEST_MAX = 200;
/** An invitation lasts two weeks, long enough for a session booked ahead (common practice, no source). */
export const INVITATION_DAYS = 14;

/** The title and place print on the class pack's cover: only characters its fonts carry (shared/print/printable-text.ts). */
const printable = refinePrintable;
const title = z.string().trim().min(1).max(WORKSHOP_TITLE_MAX).superRefine(printable);
const place = z.string().trim().max(WORKSHOP_PLACE_MAX).superRefine(printable);
const notes = z.string().trim().max(WORKSHOP_NOTES_MAX);
const startsAt = z.iso.datetime({ offset: true, message: 'must be a date and time, e.g. 2026-12-10T18:30:00Z' });
const capacity = z.number().int().min(1).max(WORKSHOP_CAPACITY_MAX);

/** POST /api/workshops. The kit is the design's latest saved version unless `version` pins another. */
export const createWorkshopInputSchema = z
  .object({
    title,
    designId: z.string().trim().min(1).max(100),
    startsAt,
    version: z.number().int().min(1).optional(),
    place: place.optional(),
    notes: notes.optional(),
    capacity: capacity.optional(),
    defaultPaper: paperPreferenceSchema.optional(),
  })
  .strict();
export type CreateWorkshopInput = z.input<typeof createWorkshopInputSchema>;

/**
 * PATCH /api/workshops/:id. `version` moves the kit (members are told); `joinCode` "new" makes a
 * fresh code (the old one stops working), null switches joining by code off; `closed` true closes
 * the workshop for good (read-only afterwards).
 */
export const updateWorkshopInputSchema = z
  .object({
    title: title.optional(),
    startsAt: startsAt.optional(),
    place: place.optional(),
    notes: notes.optional(),
    capacity: capacity.optional(),
    defaultPaper: paperPreferenceSchema.optional(),
    version: z.number().int().min(1).optional(),
    joinCode: z.union([z.literal('new'), z.null()]).optional(),
    closed: z.literal(true).optional(),
  })
  .strict()
  .refine((change) => Object.values(change).some((value) => value !== undefined), 'Give at least one field to change');
export type UpdateWorkshopInput = z.input<typeof updateWorkshopInputSchema>;

/** POST /api/workshops/:id/invitations: addresses, each invited once (repeats and case ignored). */
export const invitationsInputSchema = z
  .object({
    emails: z
      .array(z.email({ message: 'must be an e-mail address, e.g. sam@example.org' }).trim().toLowerCase().max(254))
      .min(1)
      .max(INVITATIONS_PER_REQUEST_MAX)
      .transform((list) => [...new Set(list)]),
  })
  .strict();
export type InvitationsInput = z.input<typeof invitationsInputSchema>;

/** POST /api/workshops/join: the code shown on the screen, or the token of an invitation link. */
export const joinWorkshopInputSchema = z
  .object({ code: z.string().trim().min(1).max(40).optional(), token: z.string().trim().min(1).max(200).optional() })
  .strict()
  .refine((input) => (input.code === undefined) !== (input.token === undefined), 'Give the join code or the invitation token, one of them');
export type JoinWorkshopInput = z.input<typeof joinWorkshopInputSchema>;

export const rosterEntrySchema = z.object({
  /** Present once the person has an account in the workshop. */
  userId: z.string().nullable(),
  name: z.string().nullable(),
  email: z.string(),
  status: z.enum(['invited', 'expired', 'joined', 'printed', 'burned']),
  invitedAt: z.string().nullable(),
  joinedAt: z.string().nullable(),
  printedAt: z.string().nullable(),
  burns: z.number().int(),
});
export type RosterEntry = z.infer<typeof rosterEntrySchema>;

export const workshopKitSchema = z.object({
  designId: z.string(),
  designName: z.string(),
  version: z.number().int(),
  /** The design's newest version; above `version` the instructor may move the kit. Owner only. */
  latestVersion: z.number().int().nullable(),
  summary: designSummarySchema,
  /** When the instructor last moved the kit to another version. */
  movedAt: z.string().nullable(),
});

export const workshopSchema = z.object({
  id: z.string(),
  title: z.string(),
  startsAt: z.string(),
  place: z.string(),
  notes: z.string(),
  capacity: z.number().int(),
  defaultPaper: paperPreferenceSchema,
  closedAt: z.string().nullable(),
  instructorName: z.string(),
  /** What the caller is to this workshop. */
  role: z.enum(['instructor', 'member']),
  members: z.number().int(),
  kit: workshopKitSchema,
  /** The join code; only the instructor sees it (null when joining by code is off). */
  code: z.string().nullable(),
  /** Instructor only: everybody invited or joined. */
  roster: z.array(rosterEntrySchema).nullable(),
  /** Member only: their own place in it. */
  you: z.object({ joinedAt: z.string(), printedAt: z.string().nullable(), kitChangedSinceJoined: z.boolean() }).nullable(),
  createdAt: z.string(),
});
export type Workshop = z.infer<typeof workshopSchema>;

export const workshopListItemSchema = workshopSchema.pick({ id: true, title: true, startsAt: true, place: true, closedAt: true, role: true, members: true, capacity: true, instructorName: true }).extend({
  kitName: z.string(),
});
export const workshopListSchema = z.object({ workshops: z.array(workshopListItemSchema) });
export type WorkshopList = z.infer<typeof workshopListSchema>;

/** The group's burns (instructor: everybody's; member: their own), with who made each. */
export const workshopBurnsSchema = z.object({ burns: z.array(burnSchema.extend({ memberName: z.string() })) });
export type WorkshopBurns = z.infer<typeof workshopBurnsSchema>;

export const invitationResultSchema = z.object({
  invited: z.array(z.string()),
  /** Already in the workshop: not invited again. */
  alreadyMembers: z.array(z.string()),
  /** More than the capacity leaves room for. */
  overCapacity: z.array(z.string()),
});
export type InvitationResult = z.infer<typeof invitationResultSchema>;
