/**
 * JSON with object keys in sorted order, so two documents compare equal whatever order their
 * keys came in (PostgreSQL's jsonb, for one, stores keys in its own order).
 */
export function stableJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

/** The same design, field for field. */
export const sameDocument = (a: unknown, b: unknown): boolean => stableJson(a) === stableJson(b);
