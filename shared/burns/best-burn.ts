import type { Burn } from './burn-schema.ts';

export type BestBurnReason = 'boil' | 'burn-time' | 'flame-ring';

/**
 * The best burn of a design so far: the fastest boil per litre of water (the job a camp stove is
 * for); without any boil timed, the longest burn; without that, the best-closed flame ring.
 * Heavy smoke rules a burn out while any cleaner burn exists (common practice, no source).
 */
export function bestBurn(burns: readonly Burn[]): { burn: Burn; reason: BestBurnReason } | null {
  const clean = burns.filter((b) => b.smoke !== 'heavy');
  const pool = clean.length > 0 ? clean : burns;
  const boiled = pool.filter((b) => b.timeToBoilS);
  if (boiled.length > 0) {
    const perLitre = (b: Burn) => (b.timeToBoilS as number) / (b.boilWaterL ?? 1);
    return { burn: boiled.reduce((best, b) => (perLitre(b) < perLitre(best) ? b : best)), reason: 'boil' };
  }
  const timed = pool.filter((b) => b.burnTimeS);
  if (timed.length > 0) return { burn: timed.reduce((best, b) => ((b.burnTimeS as number) > (best.burnTimeS as number) ? b : best)), reason: 'burn-time' };
  const rated = pool.filter((b) => b.flameRing);
  if (rated.length > 0) return { burn: rated.reduce((best, b) => ((b.flameRing as number) > (best.flameRing as number) ? b : best)), reason: 'flame-ring' };
  return null;
}
