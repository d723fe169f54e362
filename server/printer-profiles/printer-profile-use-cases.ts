import { printerScale, type PrinterProfile, type PrinterProfileInput, type PrinterProfileList } from '../../shared/print/printer-profile.ts';
import { AppError, notFound } from '../http/app-error.ts';
import type { PrinterProfileRepository, PrinterProfileRow } from './printer-profile-repository.ts';

/** Enough for every printer in a shared workshop; a cap keeps one account from filling the table. */
export const MAX_PRINTER_PROFILES = 20;

const missing = () => notFound('That printer profile');

/** Percent off true size, to 0.01 %: far finer than a ruler read to 0.5 mm over 150 mm (0.33 %). */
function errorPercent(scale: number): number {
  return Math.round((scale - 1) * 100 * 100) / 100;
}

function toPrinterProfile(row: PrinterProfileRow): PrinterProfile {
  const { scaleX, scaleY } = printerScale(row);
  return {
    id: row.id,
    name: row.name,
    measuredXMm: row.measuredXMm,
    measuredYMm: row.measuredYMm,
    isDefault: row.isDefault,
    scaleX,
    scaleY,
    errorXPercent: errorPercent(scaleX),
    errorYPercent: errorPercent(scaleY),
    createdAt: row.createdAt.toISOString(),
  };
}

/** A signed-in maker's own printer profiles; exactly one is the default while any exist. */
export function createPrinterProfileUseCases(profiles: PrinterProfileRepository) {
  return {
    async listProfiles(userId: string): Promise<PrinterProfileList> {
      return { profiles: (await profiles.list(userId)).map(toPrinterProfile) };
    },

    async createProfile(userId: string, input: PrinterProfileInput): Promise<PrinterProfile> {
      const row = await profiles.withUserLock(userId, async (queries) => {
        const existing = await queries.countFor(userId);
        if (existing >= MAX_PRINTER_PROFILES) {
          throw new AppError(
            409,
            'PRINTER_PROFILE_LIMIT',
            `You already have ${MAX_PRINTER_PROFILES} printer profiles, the most one account can keep. Delete one you no longer use, then add this one.`,
          );
        }
        // The first profile is the one prints use until the maker picks another.
        return queries.insert(userId, input, existing === 0);
      });
      return toPrinterProfile(row);
    },

    async updateProfile(userId: string, id: string, change: Partial<PrinterProfileInput>): Promise<PrinterProfile> {
      const row = await profiles.update(userId, id, change);
      if (!row) throw missing();
      return toPrinterProfile(row);
    },

    async setDefaultProfile(userId: string, id: string): Promise<PrinterProfile> {
      const row = await profiles.withUserLock(userId, async (queries) => {
        // Checked before the old default is cleared, so a foreign id changes nothing.
        if (!(await queries.find(userId, id))) throw missing();
        const updated = await queries.makeDefault(userId, id);
        if (!updated) throw missing();
        return updated;
      });
      return toPrinterProfile(row);
    },

    async deleteProfile(userId: string, id: string): Promise<void> {
      await profiles.withUserLock(userId, async (queries) => {
        const removed = await queries.remove(userId, id);
        if (!removed) throw missing();
        if (!removed.isDefault) return;
        // Prints should keep a default: the newest remaining profile takes over.
        const newest = await queries.findNewest(userId);
        if (newest) await queries.makeDefault(userId, newest.id);
      });
    },
  };
}

export type PrinterProfileUseCases = ReturnType<typeof createPrinterProfileUseCases>;
