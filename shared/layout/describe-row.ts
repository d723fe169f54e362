import type { SideRow } from '../design/design-schema.ts';
import { angularDistanceDeg } from './angles.ts';
import { placeSideRow } from './side-row.ts';

const plural = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

/** Where a position sits, as a maker would say it: "at the seam", "opposite the seam", or its angle. */
export function describePosition(angleDeg: number, seamAngleDeg: number, pitchDeg: number): string {
  const fromSeam = angularDistanceDeg(angleDeg, seamAngleDeg);
  if (fromSeam < pitchDeg / 2) return 'at the seam';
  if (180 - fromSeam < pitchDeg / 2) return 'opposite the seam';
  return `at ${Math.round(fromSeam)}° from the seam`;
}

/**
 * A side row in words: "8 positions, 7 holes: the one at the seam left out", or with keep-outs
 * "16 positions, 14 holes: 2 fall in a keep-out and are left out". Positions are counted from 1.
 */
export function describeRowPositions(row: SideRow, drillDiameterMm: number, wallDiameterMm: number, seamAngleDeg: number): string {
  const { positions, dropped } = placeSideRow(row, drillDiameterMm, wallDiameterMm);
  const pitchDeg = 360 / row.count;
  const skipped = [...new Set(row.skip)].filter((s) => s < row.count).sort((a, b) => a - b);
  const head = `${plural(row.count, 'position')}, ${plural(positions.length, 'hole')}`;
  const notes: string[] = [];
  if (skipped.length === 1) {
    const angle = row.startDeg + skipped[0]! * pitchDeg;
    notes.push(`the one ${describePosition(angle, seamAngleDeg, pitchDeg)} (position ${skipped[0]! + 1}) left out`);
  } else if (skipped.length > 1) notes.push(`positions ${skipped.map((s) => s + 1).join(', ')} left out`);
  if (dropped.length) notes.push(`${plural(dropped.length, 'position')} in a keep-out ${dropped.length === 1 ? 'is' : 'are'} left out`);
  if (row.keepOutPolicy === 'respace' && row.keepOuts.length) notes.push('spaced over the free wall');
  return notes.length ? `${head}: ${notes.join('; ')}` : head;
}
