import { accountSchema, type Account } from '../../shared/account/account.ts';
import { massUnitSchema, paperPreferenceSchema, temperatureUnitSchema, unitSystemSchema, volumeUnitSchema, type Preferences } from '../../shared/account/preferences.ts';
import { defaultBurnUnits } from '../../shared/units/burn-units.ts';
import { findDrill } from '../../shared/drills/index.ts';
import { AppError } from '../http/app-error.ts';
import { roleSchema } from '../../shared/account/role-schema.ts';
import { notFound } from '../http/app-error.ts';
import type { AccountRepository } from './account-repository.ts';

// Values written outside the app (older rows, manual SQL) fall back to safe defaults.
const storedAccountSchema = accountSchema.extend({ role: roleSchema.catch('maker'), units: unitSystemSchema.catch('in'), defaultPaper: paperPreferenceSchema.catch('letter') });

export function createAccountUseCases(accounts: AccountRepository) {
  async function getAccount(userId: string): Promise<Account> {
    const row = await accounts.findById(userId);
    if (!row) throw notFound('Your account');
    const units = unitSystemSchema.catch('in').parse(row.units);
    const fallback = defaultBurnUnits(units);
    return storedAccountSchema.parse({
      ...row,
      massUnit: massUnitSchema.catch(fallback.mass).parse(row.massUnit ?? fallback.mass),
      temperatureUnit: temperatureUnitSchema.catch(fallback.temperature).parse(row.temperatureUnit ?? fallback.temperature),
      volumeUnit: volumeUnitSchema.catch(fallback.volume).parse(row.volumeUnit ?? fallback.volume),
    });
  }

  return {
    getAccount,
    /** The display name; the session reads the user row on every request, so it shows at once. */
    async changeName(userId: string, name: string): Promise<Account> {
      await accounts.setName(userId, name);
      return getAccount(userId);
    },
    async updatePreferences(userId: string, preferences: Preferences): Promise<Account> {
      const unknown = preferences.drillSetIds?.find((id) => !findDrill(id));
      if (unknown) throw new AppError(400, 'INVALID_INPUT', 'Some fields are not valid.', { fields: [{ path: 'drillSetIds', message: `Unknown drill "${unknown}"` }] });
      await accounts.setPreferences(userId, { ...preferences, drillSetIds: preferences.drillSetIds ? [...new Set(preferences.drillSetIds)] : undefined });
      return getAccount(userId);
    },
  };
}

export type AccountUseCases = ReturnType<typeof createAccountUseCases>;
