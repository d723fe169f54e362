import { describe, expect, it } from 'vitest';
import type { AdminUser } from '../../../shared/account/account.ts';
import { describeConfirm, describeCount, describeOutcome } from '../../../src/features/admin/describe-change.ts';
import { countOf } from '../../../src/features/admin/plural.ts';

const dana: AdminUser = { id: 'u1', name: 'Dana Reyes', email: 'dana@alder-street.example', emailVerified: true, role: 'maker', disabled: false, createdAt: '2026-03-01T18:00:00.000Z' };

describe('countOf', () => {
  // CLDR plural rules for English: category "one" is exactly 1 (no visible fraction); 0, 2 and
  // 1.5 are "other".
  it.each([
    [0, '0 accounts'],
    [1, '1 account'],
    [2, '2 accounts'],
    [21, '21 accounts'],
    [1.5, '1.5 accounts'],
  ])('%s -> %s', (n, words) => {
    expect(countOf(n, { one: 'account', other: 'accounts' })).toBe(words);
  });
});

describe('the admin page’s words', () => {
  it('counts accounts, matches and a first page of many, with the plural right', () => {
    expect(describeCount(1, 1, false)).toBe('1 account.');
    expect(describeCount(3, 3, false)).toBe('3 accounts.');
    expect(describeCount(1, 1, true)).toBe('1 account matches.'); // English agreement: singular subject, "matches"
    expect(describeCount(0, 0, true)).toBe('0 accounts match.');
    expect(describeCount(200, 201, false)).toBe('Showing 200 of 201 accounts. Search to find the others.');
  });

  it('asks before a change and says what happened, with "an" before a vowel sound (English usage, from memory)', () => {
    expect(describeConfirm(dana, { role: 'instructor' })).toMatchObject({ question: 'Make Dana Reyes an instructor?', confirm: 'Make instructor' });
    expect(describeConfirm(dana, { role: 'admin' }).question).toBe('Make Dana Reyes an admin?');
    expect(describeConfirm({ ...dana, role: 'admin' }, { role: 'maker' })).toMatchObject({ question: 'Make Dana Reyes a maker?', detail: 'They lose this page and can no longer change other accounts.' });
    expect(describeConfirm(dana, { disabled: true })).toMatchObject({ question: 'Disable Dana Reyes?', confirm: 'Disable account' });
    expect(describeOutcome(dana, { role: 'instructor' })).toBe('Dana Reyes is now an instructor.');
    expect(describeOutcome(dana, { disabled: true })).toBe('Account disabled: Dana Reyes is signed out and cannot sign in.');
    expect(describeOutcome(dana, { disabled: false })).toBe('Account enabled: Dana Reyes can sign in again.');
  });
});
