import { sql } from 'drizzle-orm';
import { bigint, boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, unique, uniqueIndex, type AnyPgColumn } from 'drizzle-orm/pg-core';
import type { Design } from '../../shared/design/design-schema.ts';
import type { DesignSummary } from '../../shared/library/library-schemas.ts';

/**
 * Tables behind sign-in, in the shape better-auth (with its admin plugin) reads and writes.
 * Column names follow better-auth's field names; `units` is Canwright's own preference.
 * tests/api/auth-schema.test.ts compares these with better-auth's own table list.
 */
export const users = pgTable('users', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  email: text('email').notNull().unique(),
  emailVerified: boolean('email_verified').notNull().default(false),
  image: text('image'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  role: text('role').notNull().default('maker'),
  banned: boolean('banned').notNull().default(false),
  banReason: text('ban_reason'),
  banExpires: timestamp('ban_expires', { withTimezone: true }),
  units: text('units').notNull().default('in'),
  defaultPaper: text('default_paper').notNull().default('letter'),
  /** The maker's own drills (drill ids); empty means "the usual drills of my units". */
  drillSetIds: text('drill_set_ids').array().notNull().default(sql`'{}'::text[]`),
  /** Burn log units (g/oz, C/F, L/qt); null follows the length units. */
  massUnit: text('mass_unit'),
  temperatureUnit: text('temperature_unit'),
  volumeUnit: text('volume_unit'),
});

export const sessions = pgTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    token: text('token').notNull().unique(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    ipAddress: text('ip_address'),
    userAgent: text('user_agent'),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    impersonatedBy: text('impersonated_by'),
  },
  (table) => [index('sessions_user_id_idx').on(table.userId)],
);

export const accounts = pgTable(
  'accounts',
  {
    id: text('id').primaryKey(),
    accountId: text('account_id').notNull(),
    providerId: text('provider_id').notNull(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    accessToken: text('access_token'),
    refreshToken: text('refresh_token'),
    idToken: text('id_token'),
    accessTokenExpiresAt: timestamp('access_token_expires_at', { withTimezone: true }),
    refreshTokenExpiresAt: timestamp('refresh_token_expires_at', { withTimezone: true }),
    scope: text('scope'),
    password: text('password'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('accounts_user_id_idx').on(table.userId)],
);

export const verifications = pgTable(
  'verifications',
  {
    id: text('id').primaryKey(),
    identifier: text('identifier').notNull(),
    value: text('value').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('verifications_identifier_idx').on(table.identifier)],
);

/**
 * A maker's printer profiles: what they measured on the calibration sheet's 150 mm and 200 mm
 * rulers. The partial unique index keeps at most one default per user even if two writes race.
 */
export const printerProfiles = pgTable(
  'printer_profiles',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    measuredXMm: doublePrecision('measured_x_mm').notNull(),
    measuredYMm: doublePrecision('measured_y_mm').notNull(),
    isDefault: boolean('is_default').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('printer_profiles_user_id_idx').on(table.userId),
    uniqueIndex('printer_profiles_one_default_idx').on(table.userId).where(sql`${table.isDefault}`),
  ],
);

/**
 * A maker's saved designs. The document itself lives in design_versions; current_version names
 * the newest one. share_token is set while the design is shared by link, and cleared to revoke it.
 */
export const designs = pgTable(
  'designs',
  {
    id: text('id').primaryKey(),
    ownerId: text('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    tags: text('tags').array().notNull().default(sql`'{}'::text[]`),
    shareToken: text('share_token').unique(),
    lastPrintedAt: timestamp('last_printed_at', { withTimezone: true }),
    currentVersion: integer('current_version').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('designs_owner_id_idx').on(table.ownerId)],
);

/** Every saved state of a design, numbered 1, 2, 3... per design; never edited once written. */
export const designVersions = pgTable(
  'design_versions',
  {
    id: text('id').primaryKey(),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    /** The validated design JSON (defaults filled in). */
    document: jsonb('document').$type<Design>().notNull(),
    summary: jsonb('summary').$type<DesignSummary>().notNull(),
    note: text('note'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [unique('design_versions_design_number_unique').on(table.designId, table.number)],
);

/**
 * Test burns. Each is pinned to the design version it tested (version_id), so later edits of the
 * design never rewrite what was tested. Measures are in SI; every one but the date is optional.
 */
export const burns = pgTable(
  'burns',
  {
    id: text('id').primaryKey(),
    ownerId: text('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    designId: text('design_id')
      .notNull()
      .references(() => designs.id, { onDelete: 'cascade' }),
    versionId: text('version_id')
      .notNull()
      .references(() => designVersions.id, { onDelete: 'cascade' }),
    burnedAt: timestamp('burned_at', { withTimezone: true }).notNull(),
    fuelKind: text('fuel_kind'),
    fuelMassG: doublePrecision('fuel_mass_g'),
    starter: text('starter'),
    ambientC: doublePrecision('ambient_c'),
    wind: text('wind'),
    windscreen: boolean('windscreen'),
    windFacing: text('wind_facing'),
    timeToLightS: doublePrecision('time_to_light_s'),
    timeToJetsS: doublePrecision('time_to_jets_s'),
    timeToBoilS: doublePrecision('time_to_boil_s'),
    boilWaterL: doublePrecision('boil_water_l'),
    boilStartC: doublePrecision('boil_start_c'),
    burnTimeS: doublePrecision('burn_time_s'),
    charG: doublePrecision('char_g'),
    smoke: text('smoke'),
    flameRing: integer('flame_ring'),
    notes: text('notes'),
    /** Set when a workshop member logged this burn of their stove built from the workshop's kit. */
    workshopId: text('workshop_id').references((): AnyPgColumn => workshops.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('burns_design_id_idx').on(table.designId), index('burns_owner_id_idx').on(table.ownerId), index('burns_workshop_id_idx').on(table.workshopId)],
);

/** Photos of a burn: the picture and its thumbnail live in the object store under these keys. */
export const burnPhotos = pgTable(
  'burn_photos',
  {
    id: text('id').primaryKey(),
    burnId: text('burn_id')
      .notNull()
      .references(() => burns.id, { onDelete: 'cascade' }),
    ownerId: text('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    imageKey: text('image_key').notNull(),
    thumbnailKey: text('thumbnail_key').notNull(),
    contentType: text('content_type').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    bytes: integer('bytes').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('burn_photos_burn_id_idx').on(table.burnId)],
);

/**
 * An instructor's build session. The kit is one saved version of one of the instructor's designs
 * (version_id, pinned; kit_moved_at is set when the instructor moves it). join_code is null while
 * joining by code is off; closed_at makes the workshop read-only.
 */
export const workshops = pgTable(
  'workshops',
  {
    id: text('id').primaryKey(),
    ownerId: text('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    title: text('title').notNull(),
    startsAt: timestamp('starts_at', { withTimezone: true }).notNull(),
    place: text('place').notNull().default(''),
    notes: text('notes').notNull().default(''),
    capacity: integer('capacity').notNull(),
    defaultPaper: text('default_paper').notNull().default('letter'),
    // No action (checked at the end of the statement): deleting the instructor's account takes the
    // workshop and the design together; deleting only the design is refused while a workshop uses it.
    designId: text('design_id')
      .notNull()
      .references(() => designs.id),
    versionId: text('version_id')
      .notNull()
      .references(() => designVersions.id),
    joinCode: text('join_code').unique(),
    kitMovedAt: timestamp('kit_moved_at', { withTimezone: true }),
    closedAt: timestamp('closed_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('workshops_owner_id_idx').on(table.ownerId), index('workshops_design_id_idx').on(table.designId)],
);

/** One invitation per address and workshop; only a hash of the link's token is kept. */
export const workshopInvitations = pgTable(
  'workshop_invitations',
  {
    id: text('id').primaryKey(),
    workshopId: text('workshop_id')
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    sentAt: timestamp('sent_at', { withTimezone: true }).notNull().defaultNow(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [unique('workshop_invitations_workshop_email_unique').on(table.workshopId, table.email)],
);

/** Who is in a workshop; printed_at is set when they print the kit from the workshop. */
export const workshopMembers = pgTable(
  'workshop_members',
  {
    workshopId: text('workshop_id')
      .notNull()
      .references(() => workshops.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    joinedAt: timestamp('joined_at', { withTimezone: true }).notNull().defaultNow(),
    printedAt: timestamp('printed_at', { withTimezone: true }),
  },
  (table) => [primaryKey({ columns: [table.workshopId, table.userId] }), index('workshop_members_user_id_idx').on(table.userId)],
);

/**
 * better-auth's rate-limit counts (its "database" storage), so that every server on one database
 * counts the same sign-in tries. last_request is a time in milliseconds since 1970, as better-auth keeps it.
 */
export const rateLimits = pgTable('rate_limits', {
  id: text('id').primaryKey(),
  key: text('key').notNull().unique(),
  count: integer('count').notNull(),
  lastRequest: bigint('last_request', { mode: 'number' }).notNull(),
});

/** Counts of Canwright's own rate limits (express-rate-limit) when several servers share a PostgreSQL database. */
export const requestCounts = pgTable('request_counts', {
  key: text('key').primaryKey(),
  hits: integer('hits').notNull(),
  resetAt: timestamp('reset_at', { withTimezone: true }).notNull(),
});

export const schema = { users, sessions, accounts, verifications, rateLimits, printerProfiles, designs, designVersions, burns, burnPhotos, requestCounts, workshops, workshopInvitations, workshopMembers };
