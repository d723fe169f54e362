import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { describeProblem } from '../../../shared/design/describe-problem.ts';
import { validateDesign } from '../../../shared/design/validate-design.ts';

/** Far above any design (the pint stove is about 5 kB), far below what would stall the page. */
const MAX_FILE_BYTES = 1_000_000;

/** The file name a design downloads as: its name made safe for any disk, ".json" after it. */
export function designFileName(name: string | undefined): string {
  const base = (name ?? '')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${base || 'stove-design'}.json`;
}

/** The design file: the design schema's JSON, with every default filled in. */
export function designFileText(document: DesignInput): string | undefined {
  const valid = validateDesign(document);
  return valid.ok ? `${JSON.stringify(valid.design, null, 2)}\n` : undefined;
}

export type ReadDesignFile = { ok: true; design: DesignInput } | { ok: false; message: string; problems: string[] };

/**
 * A file the maker picked, read as a design: not JSON, not a design, or a design with problems
 * each get a plain answer, and nothing on screen is replaced until a file reads cleanly.
 */
export async function readDesignFile(file: Pick<File, 'name' | 'size' | 'text'>): Promise<ReadDesignFile> {
  if (file.size > MAX_FILE_BYTES) return { ok: false, message: `“${file.name}” is ${(file.size / 1_000_000).toFixed(1)} MB: too large to be a stove design (they are a few kB).`, problems: [] };
  let data: unknown;
  try {
    data = JSON.parse(await file.text());
  } catch {
    return { ok: false, message: `“${file.name}” is not a design file: it is not JSON text.`, problems: [] };
  }
  if (!data || typeof data !== 'object' || Array.isArray(data) || !('schemaVersion' in data) || !('parts' in data)) {
    return { ok: false, message: `“${file.name}” is JSON, but not a Canwright design (a design file has a schemaVersion and parts).`, problems: [] };
  }
  const valid = validateDesign(data);
  if (valid.ok) return { ok: true, design: valid.design as DesignInput };
  const problems = valid.problems.map((p) => describeProblem(data as DesignInput, p));
  return { ok: false, message: `“${file.name}” is a design file with ${problems.length === 1 ? 'a problem' : `${problems.length} problems`}; nothing was opened:`, problems: problems.slice(0, 6) };
}
