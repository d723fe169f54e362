import { z } from 'zod';
import { parseCanCode } from './can-code.ts';

/** One built-in can size from templates/catalogue/vessels.json. Lengths in millimetres. */

// The code fixes the size; allow for the JSON holding it rounded to 0.01 mm.
const CODE_TOLERANCE_MM = 0.01;

export const catalogueEntrySchema = z
  .object({
    id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'id must be kebab-case'),
    name: z.string().trim().min(1),
    kind: z.enum(['food', 'paint', 'metric']),
    code: z.string().optional(),
    diameterMm: z.number().positive().max(600),
    heightMm: z.number().positive().max(1000),
    wallThicknessMm: z.number().positive().max(5),
    bottomRimInsetMm: z.number().min(0),
    note: z.string().optional(),
  })
  .strict()
  .superRefine((entry, ctx) => {
    if (entry.code === undefined) return;
    const parsed = parseCanCode(entry.code);
    if (!parsed.ok) {
      ctx.addIssue({ code: 'custom', path: ['code'], message: parsed.error });
      return;
    }
    if (parsed.code !== entry.code) {
      ctx.addIssue({ code: 'custom', path: ['code'], message: `write the code as ${parsed.code}` });
    }
    if (Math.abs(parsed.diameterMm - entry.diameterMm) > CODE_TOLERANCE_MM) {
      ctx.addIssue({ code: 'custom', path: ['diameterMm'], message: `${entry.code} means ${parsed.diameterMm} mm` });
    }
    if (Math.abs(parsed.heightMm - entry.heightMm) > CODE_TOLERANCE_MM) {
      ctx.addIssue({ code: 'custom', path: ['heightMm'], message: `${entry.code} means ${parsed.heightMm} mm` });
    }
  });

export type CatalogueEntry = z.infer<typeof catalogueEntrySchema>;

const catalogueSchema = z.array(catalogueEntrySchema).superRefine((entries, ctx) => {
  const seen = new Set<string>();
  entries.forEach((entry, index) => {
    if (seen.has(entry.id)) ctx.addIssue({ code: 'custom', path: [index, 'id'], message: `duplicate id "${entry.id}"` });
    seen.add(entry.id);
  });
});

/** Validate catalogue data. It is our own file, so bad data is a bug: throw and say where. */
export function parseCatalogue(data: unknown, label = 'vessel catalogue'): readonly CatalogueEntry[] {
  const result = catalogueSchema.safeParse(data);
  if (!result.success) throw new Error(`The ${label} is invalid:\n${z.prettifyError(result.error)}`);
  return Object.freeze(result.data.map((entry) => Object.freeze(entry)));
}
