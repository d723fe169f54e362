import { z } from 'zod';

/**
 * The library archive: one ZIP holding a maker's whole library, so it can move to another account
 * or another Canwright server. These are its names and limits; archive-schemas.ts says what each
 * JSON file holds.
 *
 *   manifest.json          format name, schema version, when and by what it was written, counts
 *   designs.json           designs with every version (the documents) and their tags
 *   burns.json             burn entries, each naming its design (by key) and the version it tested
 *   printer-profiles.json  the printer profiles
 *   preferences.json       the account's preferences (units, paper, drills, burn log units)
 *   photos/...             each burn photo as stored (JPEG or WebP) and its thumbnail
 */
export const LIBRARY_ARCHIVE_FORMAT = 'canwright-library';
/** Raised when a file's meaning changes; an import refuses a version it does not know. */
export const LIBRARY_ARCHIVE_SCHEMA_VERSION = 1;

export const archiveFileNames = {
  manifest: 'manifest.json',
  designs: 'designs.json',
  burns: 'burns.json',
  printerProfiles: 'printer-profiles.json',
  preferences: 'preferences.json',
} as const;

/** photos/<burn>-<photo>.jpg and photos/<burn>-<photo>-thumb.jpg (or .webp), as an export names them. */
export const ARCHIVE_PHOTO_NAME = /^photos\/[a-z0-9][a-z0-9-]{0,63}\.(jpg|webp)$/;
export const archivePhotoExtension = { 'image/jpeg': 'jpg', 'image/webp': 'webp' } as const;

const MiB = 1024 * 1024;

/**
 * What an import reads at most. Our own limits (common practice, no source): far above a
 * lifetime's library (500 designs, thousands of photos at about 1 MB each), far below what would
 * tire a small server. A ZIP can lie about sizes, so the bytes are also counted while inflating.
 */
export const archiveLimits = {
  /** The uploaded file itself. */
  maxArchiveBytes: 512 * MiB,
  /** Entries in the ZIP's central directory, read before any entry is. */
  maxEntries: 10_000,
  /** All entries together, unpacked: declared sizes first, then the real bytes. */
  maxUnpackedBytes: 1024 * MiB,
  /** One JSON file, unpacked. */
  maxJsonBytes: 64 * MiB,
} as const;

/** The manifest's format and version are read on their own first, so a foreign file gets a plain answer. */
export const manifestHeadSchema = z.object({ format: z.unknown(), schemaVersion: z.unknown() });

export const archiveCountsSchema = z
  .object({
    designs: z.number().int().min(0),
    versions: z.number().int().min(0),
    burns: z.number().int().min(0),
    photos: z.number().int().min(0),
    printerProfiles: z.number().int().min(0),
  })
  .strict();
export type ArchiveCounts = z.infer<typeof archiveCountsSchema>;

export const manifestSchema = z
  .object({
    format: z.literal(LIBRARY_ARCHIVE_FORMAT),
    schemaVersion: z.literal(LIBRARY_ARCHIVE_SCHEMA_VERSION),
    exportedAt: z.iso.datetime({ offset: true }),
    /** The program that wrote it, e.g. "Canwright 0.1.0". */
    writtenBy: z.string().trim().max(80),
    counts: archiveCountsSchema,
  })
  .strict();
export type Manifest = z.infer<typeof manifestSchema>;

/** POST /api/library/import answers what it added (201), and whether the preferences were taken. */
export const importSummarySchema = archiveCountsSchema.extend({ preferences: z.enum(['taken', 'kept']) });
export type ImportSummary = z.infer<typeof importSummarySchema>;

/** The multipart fields of an import beside the file: take the archive's preferences, or keep the account's (the default). */
export const importOptionsSchema = z.object({ preferences: z.enum(['take', 'keep']).default('keep') }).strict();

/** The form field that carries the ZIP. */
export const ARCHIVE_FIELD = 'archive';

/** canwright-library-2026-11-30.zip, dated in UTC. */
export const archiveFileName = (at: Date) => `canwright-library-${at.toISOString().slice(0, 10)}.zip`;
