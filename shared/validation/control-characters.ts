/**
 * C0 control characters and DEL (Unicode general category Cc, U+0000-U+001F and U+007F), except
 * tab, line feed and carriage return, which free text (notes) may hold. PostgreSQL refuses
 * U+0000 in text, and none of them is something a person types into a name, a tag or an id.
 */
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

export const hasControlCharacter = (text: string): boolean => CONTROL.test(text);

export const CONTROL_CHARACTER_MESSAGE = 'holds a control character (such as U+0000) that text cannot contain';

/**
 * The path of the first string inside `value` (at any depth, keys included) that holds a control
 * character, joined with dots as the API names fields; undefined when there is none.
 */
export function findControlCharacter(value: unknown, path: (string | number)[] = []): string | undefined {
  if (typeof value === 'string') return hasControlCharacter(value) ? path.join('.') || '(body)' : undefined;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = findControlCharacter(value[i], [...path, i]);
      if (found !== undefined) return found;
    }
    return undefined;
  }
  if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      if (hasControlCharacter(key)) return [...path, key].join('.');
      const found = findControlCharacter(item, [...path, key]);
      if (found !== undefined) return found;
    }
  }
  return undefined;
}
