import type { Account } from '../../../shared/account/account.ts';
import { defaultBurnUnits, type BurnUnits } from '../../../shared/units/burn-units.ts';
import { useAccount } from '../account/api/get-account.ts';

export const burnUnitsOf = (account: Account | null | undefined): BurnUnits =>
  account ? { mass: account.massUnit, temperature: account.temperatureUnit, volume: account.volumeUnit } : defaultBurnUnits('in');

/** The units the signed-in maker reads burn measurements in. */
export function useBurnUnits(): BurnUnits {
  return burnUnitsOf(useAccount().data);
}
