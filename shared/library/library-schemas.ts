import { z } from 'zod';
import { designSchema, holeGroupSchema, partRoleSchema, type DesignInput } from '../design/design-schema.ts';
import { validateDesign } from '../design/validate-design.ts';

/**
 * Shapes of the design library API (/api/designs and /api/shared). Dates travel as ISO strings.
 */

/** What a version holds at a glance, worked out from its layout when it is saved. */
export const designSummarySchema = z.object({
  /** Holes placed on the templates (after keep-outs and skips). */
  holes: z.number().int().min(0),
  /** Placed holes per group and drill, largest drill first within a group. */
  bySize: z.array(z.object({ group: holeGroupSchema, drillLabel: z.string(), count: z.number().int().min(0) })),
  /** canCode is the can trade's code for the vessel's size, or null when it has none. */
  parts: z.array(z.object({ id: z.string(), role: partRoleSchema, vesselName: z.string(), canCode: z.string().nullable() })),
  /** Primary : secondary open area, or null without jets. */
  ratio: z.number().nullable(),
  /** Centre-to-centre spacing of the burn chamber's jets round the wall; absent in summaries saved before it was kept. */
  jetPitchMm: z.number().nullable().optional(),
});
export type DesignSummary = z.infer<typeof designSummarySchema>;

/**
 * A design document checked with validateDesign (field rules and cross-field rules alike); each
 * problem keeps its path, so a request body reports `document.parts.0.vessel...`.
 */
export const designDocumentSchema = z.custom<DesignInput>(() => true).transform((input, ctx) => {
  const result = validateDesign(input);
  if (result.ok) return result.design;
  for (const problem of result.problems) {
    const path = problem.path === '(design)' ? [] : problem.path.split('.').map((key) => (/^\d+$/.test(key) ? Number(key) : key));
    ctx.addIssue({ code: 'custom', message: problem.message, path });
  }
  return z.NEVER;
});

/** Limits of the library's fields, counted after trimming; the client says them before the server refuses. */
export const MAX_TAGS = 20;
export const DESIGN_NAME_MAX = 120;
export const TAG_MAX = 40;
export const VERSION_NOTE_MAX = 500;
export const LIBRARY_SEARCH_MAX = 100;

const designName = z.string().trim().min(1).max(DESIGN_NAME_MAX);
/** Tags are compared in lower case, so "Pint" and "pint" are one tag; repeats are dropped. */
const tag = z.string().trim().toLowerCase().min(1).max(TAG_MAX);
const tags = z
  .array(tag)
  .max(MAX_TAGS)
  .transform((list) => [...new Set(list)]);
const note = z
  .string()
  .trim()
  .max(VERSION_NOTE_MAX)
  .transform((text) => text || undefined);

export const createDesignInputSchema = z.object({ name: designName.optional(), tags: tags.optional(), document: designDocumentSchema }).strict();
export type CreateDesignInput = z.input<typeof createDesignInputSchema>;

export const updateDesignInputSchema = z
  .object({ name: designName.optional(), tags: tags.optional() })
  .strict()
  .refine((change) => change.name !== undefined || change.tags !== undefined, 'Give a name or tags');
export type UpdateDesignInput = z.input<typeof updateDesignInputSchema>;

export const saveVersionInputSchema = z.object({ document: designDocumentSchema, note: note.optional() }).strict();
export type SaveVersionInput = z.input<typeof saveVersionInputSchema>;

export const designSortSchema = z.enum(['updated', 'name', 'lastPrinted']);
export type DesignSort = z.infer<typeof designSortSchema>;

/** GET /api/designs query: q matches a name or a tag (substring, any case); tag is one exact tag. */
export const designListQuerySchema = z.object({
  q: z.string().trim().max(LIBRARY_SEARCH_MAX).optional(),
  tag: tag.optional(),
  sort: designSortSchema.default('updated'),
});
export type DesignListQuery = z.input<typeof designListQuerySchema>;

export const designListItemSchema = z.object({
  id: z.string(),
  name: z.string(),
  tags: z.array(z.string()),
  updatedAt: z.string(),
  lastPrintedAt: z.string().nullable(),
  currentVersion: z.number().int().min(1),
  shared: z.boolean(),
  holeCount: z.number().int().min(0),
  parts: z.number().int().min(0),
});
export type DesignListItem = z.infer<typeof designListItemSchema>;

export const designListSchema = z.object({ designs: z.array(designListItemSchema) });
export type DesignList = z.infer<typeof designListSchema>;

/** One design with its current version's document; shareUrlPath only while sharing is on. */
export const designDetailSchema = designListItemSchema.extend({ document: designSchema, shareUrlPath: z.string().optional() });
export type DesignDetail = z.infer<typeof designDetailSchema>;

export const versionListItemSchema = z.object({
  number: z.number().int().min(1),
  createdAt: z.string(),
  note: z.string().nullable(),
  summary: designSummarySchema,
  /** What changed against the version before it, one short line each; empty for version 1. */
  changes: z.array(z.string()),
});
export type VersionListItem = z.infer<typeof versionListItemSchema>;

/** Newest first. */
export const versionListSchema = z.object({ versions: z.array(versionListItemSchema) });
export type VersionList = z.infer<typeof versionListSchema>;

/** GET /api/designs/:id/versions/:number: one version with its document. */
export const versionDetailSchema = versionListItemSchema.omit({ changes: true }).extend({ document: designSchema });
export type VersionDetail = z.infer<typeof versionDetailSchema>;

/** GET /api/shared/:token: what anyone with the link sees; nothing about the owner. */
export const sharedDesignSchema = z.object({ name: z.string(), document: designSchema, version: z.number().int().min(1), updatedAt: z.string() });
export type SharedDesign = z.infer<typeof sharedDesignSchema>;

/** The page a share link opens in the app, and the API route that page reads. */
export const sharedDesignPagePath = (token: string) => `/shared/${token}`;
export const sharedDesignApiPath = (token: string) => `/api/shared/${token}`;
