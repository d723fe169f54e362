/** English plural categories (CLDR): "one" for exactly 1, "other" for 0, 2, 1.5 and the rest. */
const rules = new Intl.PluralRules('en');

/** "1 account", "0 accounts", "2 accounts". */
export function countOf(count: number, forms: { one: string; other: string }): string {
  return `${count} ${rules.select(count) === 'one' ? forms.one : forms.other}`;
}
