import { z } from 'zod';

/**
 * A test burn: one fire of a stove built from one saved version of a design. Every measure is
 * stored in SI (grams, degrees Celsius, litres, seconds); the screens convert to the maker's units.
 * Only the date is required: a maker writes down what they had time to.
 */

export const windLevels = ['calm', 'light', 'moderate', 'strong'] as const;
export const smokeLevels = ['none', 'some', 'heavy'] as const;
/** How well the ring of jet flames closed, 1 to 5, with the words a maker sees beside the number. */
export const flameRingWords = ['1: separate jets, no ring', '2: a few jets joined', '3: a broken ring', '4: a ring with gaps now and then', '5: a closed, steady ring'] as const;

export const BURN_NOTES_MAX = 2000;
export const BURN_TEXT_MAX = 80;
/** Ten hours: longer than any can stove burns on one load. */
export const BURN_SECONDS_MAX = 36_000;

const text = z.string().trim().max(BURN_TEXT_MAX);
const seconds = z.number().min(0).max(BURN_SECONDS_MAX);

/** The measured fields, each optional; null clears one on a change. */
export const burnFieldsSchema = z.object({
  fuelKind: text.nullable(),
  fuelMassG: z.number().min(0).max(10_000).nullable(),
  starter: text.nullable(),
  ambientC: z.number().min(-60).max(60).nullable(),
  wind: z.enum(windLevels).nullable(),
  windscreen: z.boolean().nullable(),
  /** How the stove stood to the wind, in the maker's words ("intake row into the wind"). */
  windFacing: text.nullable(),
  timeToLightS: seconds.nullable(),
  timeToJetsS: seconds.nullable(),
  timeToBoilS: seconds.nullable(),
  boilWaterL: z.number().min(0.05).max(20).nullable(),
  boilStartC: z.number().min(-10).max(100).nullable(),
  burnTimeS: seconds.nullable(),
  charG: z.number().min(0).max(10_000).nullable(),
  smoke: z.enum(smokeLevels).nullable(),
  flameRing: z.number().int().min(1).max(5).nullable(),
  notes: z.string().trim().max(BURN_NOTES_MAX).nullable(),
});
export type BurnFields = z.infer<typeof burnFieldsSchema>;

const burnDate = z.iso.datetime({ offset: true, message: 'must be a date and time, e.g. 2026-11-30T10:00:00Z' });

/** POST /api/designs/:id/burns. The version defaults to the design's latest saved one. */
export const createBurnInputSchema = burnFieldsSchema
  .partial()
  .extend({ date: burnDate, version: z.number().int().min(1).optional() })
  .strict();
export type CreateBurnInput = z.input<typeof createBurnInputSchema>;

/** PATCH /api/burns/:burnId: any field; the version a burn tested never changes. */
export const updateBurnInputSchema = burnFieldsSchema
  .partial()
  .extend({ date: burnDate.optional() })
  .strict()
  .refine((change) => Object.values(change).some((value) => value !== undefined), 'Give at least one field to change');
export type UpdateBurnInput = z.input<typeof updateBurnInputSchema>;

export const burnPhotoSchema = z.object({
  id: z.string(),
  width: z.number().int(),
  height: z.number().int(),
  contentType: z.enum(['image/jpeg', 'image/webp']),
  url: z.string(),
  thumbnailUrl: z.string(),
  createdAt: z.string(),
});
export type BurnPhoto = z.infer<typeof burnPhotoSchema>;

export const burnSchema = burnFieldsSchema.extend({
  id: z.string(),
  designId: z.string(),
  /** The design version this burn tested. */
  version: z.number().int(),
  date: z.string(),
  photos: z.array(burnPhotoSchema),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Burn = z.infer<typeof burnSchema>;

export const burnListSchema = z.object({ burns: z.array(burnSchema) });
export type BurnList = z.infer<typeof burnListSchema>;

/** At most this many photos on one entry. */
export const MAX_PHOTOS_PER_BURN = 12;
/** Largest photo file taken, in bytes (15 MB). */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;
/** Largest picture taken, in pixels (50 megapixels): a small file may decode to a huge image. */
export const MAX_PHOTO_PIXELS = 50_000_000;
