import { accountSchema, type Account } from '../../shared/account/account.ts';
import { unitSystemSchema, type Preferences } from '../../shared/account/preferences.ts';
import { roleSchema } from '../../shared/account/roles.ts';
import { notFound } from '../http/app-error.ts';
import type { AccountRepository } from './account-repository.ts';

// Values written outside the app (older rows, manual SQL) fall back to safe defaults.
const storedAccountSchema = accountSchema.extend({ role: roleSchema.catch('maker'), units: unitSystemSchema.catch('in') });

export function createAccountUseCases(accounts: AccountRepository) {
  async function getAccount(userId: string): Promise<Account> {
    const row = await accounts.findById(userId);
    if (!row) throw notFound('Your account');
    return storedAccountSchema.parse(row);
  }

  return {
    getAccount,
    async updatePreferences(userId: string, preferences: Preferences): Promise<Account> {
      await accounts.setUnits(userId, preferences.units);
      return getAccount(userId);
    },
  };
}

export type AccountUseCases = ReturnType<typeof createAccountUseCases>;
