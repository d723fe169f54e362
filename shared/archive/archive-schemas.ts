import { z } from 'zod';
import { preferencesSchema } from '../account/preferences.ts';
import { burnFieldsSchema, MAX_PHOTOS_PER_BURN } from '../burns/burn-schema.ts';
import { createDesignInputSchema, designDocumentSchema, VERSION_NOTE_MAX } from '../library/library-schemas.ts';
import { printerProfileInputSchema } from '../print/printer-profile.ts';
import { ARCHIVE_PHOTO_NAME } from './archive-format.ts';

/**
 * What each JSON file of a library archive holds. An import checks every entry against these
 * before it writes anything: the same rules as the API's own (a design document passes
 * validateDesign, a burn the burn log's field limits), plus the references between files.
 * Ids are not carried: an import gives everything new ids. Designs are named by a key that is
 * only good inside the archive ("d1", "d2", ...).
 */

const time = z.iso.datetime({ offset: true, message: 'must be a date and time, e.g. 2026-11-30T10:00:00Z' });
const designKey = z.string().regex(/^[a-z0-9][a-z0-9-]{0,39}$/, 'must be a short key of lower-case letters, digits and dashes');

export const archivedVersionSchema = z
  .object({
    number: z.number().int().min(1),
    note: z.string().trim().max(VERSION_NOTE_MAX).nullable(),
    createdAt: time,
    document: designDocumentSchema,
  })
  .strict();

export const archivedDesignSchema = z
  .object({
    key: designKey,
    name: createDesignInputSchema.shape.name.unwrap(),
    tags: createDesignInputSchema.shape.tags.unwrap(),
    createdAt: time,
    updatedAt: time,
    lastPrintedAt: time.nullable(),
    /** Oldest first, numbered 1, 2, 3... as the design saved them. */
    versions: z.array(archivedVersionSchema).min(1),
  })
  .strict()
  .superRefine((design, ctx) => {
    design.versions.forEach((version, index) => {
      if (version.number !== index + 1) ctx.addIssue({ code: 'custom', path: ['versions', index, 'number'], message: `must be ${index + 1}: versions are numbered 1, 2, 3... oldest first` });
    });
  });
export type ArchivedDesign = z.output<typeof archivedDesignSchema>;

/**
 * designs.json. Its designs are checked one at a time (archivedDesignSchema), so a large library
 * does not hold the server for the whole file at once; keys are told apart by the import.
 */
export const designsFileSchema = z.object({ designs: z.array(z.unknown()) }).strict();

export const archivedPhotoSchema = z
  .object({
    /** Names of the entries in the archive. */
    image: z.string().regex(ARCHIVE_PHOTO_NAME, 'must name a photo in the archive, e.g. photos/1-1.jpg'),
    thumbnail: z.string().regex(ARCHIVE_PHOTO_NAME, 'must name a photo in the archive, e.g. photos/1-1-thumb.jpg'),
    contentType: z.enum(['image/jpeg', 'image/webp']),
    width: z.number().int().min(1),
    height: z.number().int().min(1),
    createdAt: time,
  })
  .strict();
export type ArchivedPhoto = z.infer<typeof archivedPhotoSchema>;

/** Every measured field is written, null where the maker left it out. */
export const archivedBurnSchema = burnFieldsSchema
  .extend({
    design: designKey,
    version: z.number().int().min(1),
    date: time,
    createdAt: time,
    updatedAt: time,
    photos: z.array(archivedPhotoSchema).max(MAX_PHOTOS_PER_BURN),
  })
  .strict();
export type ArchivedBurn = z.output<typeof archivedBurnSchema>;

export const burnsFileSchema = z.object({ burns: z.array(archivedBurnSchema) }).strict();

export const archivedPrinterProfileSchema = printerProfileInputSchema.extend({ isDefault: z.boolean(), createdAt: time }).strict();
export type ArchivedPrinterProfile = z.infer<typeof archivedPrinterProfileSchema>;

export const printerProfilesFileSchema = z
  .object({ profiles: z.array(archivedPrinterProfileSchema) })
  .strict()
  .refine((file) => file.profiles.filter((p) => p.isDefault).length <= 1, { message: 'at most one printer profile can be the default', path: ['profiles'] });

/** The account's preferences, every one the account has; an archive from an older Canwright may lack newer ones. */
export const preferencesFileSchema = z.object({ preferences: preferencesSchema }).strict();

/** The preference fields there are, read from the schema itself, so a new preference is exported without editing a list. */
export const preferenceKeys = Object.keys(preferencesSchema.shape) as (keyof z.infer<typeof preferencesSchema>)[];
