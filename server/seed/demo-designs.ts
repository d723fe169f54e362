import { readFileSync } from 'node:fs';
import type { Design } from '../../shared/design/design-schema.ts';
import { validateDesign } from '../../shared/design/index.ts';
import type { DesignLibrary } from '../library/design-library.ts';

/** An example design from templates/, checked as any saved design is. */
function loadExample(file: string): Design {
  const result = validateDesign(JSON.parse(readFileSync(new URL(`../../templates/${file}`, import.meta.url), 'utf8')));
  if (!result.ok) throw new Error(`templates/${file} is not a valid design: ${result.problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`);
  return result.design;
}

/** The same design with a different number of holes in one side row. */
function withRowCount(design: Design, rowId: string, count: number): Design {
  const copy = structuredClone(design);
  for (const part of copy.parts) for (const row of part.sideRows) if (row.id === rowId) row.count = count;
  return copy;
}

/**
 * The demo maker's library at the invented Alder Street Makerspace: the class pint stove (with a
 * first version of 14 jets, shared and printed), the big No. 10 stove, the metric tin and the
 * stove with a concentrator. Written only when the demo account is first made.
 */
export async function seedDemoLibrary(library: DesignLibrary, ownerId: string): Promise<{ designs: number; classStoveId: string }> {
  const pint = loadExample('pint-can-stove.json');
  const classStove = await library.createDesign(ownerId, { tags: ['class kit', 'pint'], document: withRowCount(pint, 'jets', 14) });
  await library.saveVersion(ownerId, classStove.id, { document: pint, note: 'Two more jets after the first test burn smoked' });
  await library.shareDesign(ownerId, classStove.id);
  await library.markPrinted(ownerId, classStove.id);

  await library.createDesign(ownerId, { tags: ['big pot'], document: loadExample('no10-can-stove.json') });
  await library.createDesign(ownerId, { tags: ['metric'], document: loadExample('metric-tin-stove.json') });
  await library.createDesign(ownerId, { tags: ['concentrator'], document: loadExample('seam-keepout-concentrator.json') });
  return { designs: 4, classStoveId: classStove.id };
}
