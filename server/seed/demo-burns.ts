import sharp from 'sharp';
import type { CreateBurnInput } from '../../shared/burns/burn-schema.ts';
import type { BurnLog } from '../burns/burn-log.ts';

/**
 * A picture of a flame ring seen from above, drawn here at seed time: the chamber's rim, the
 * char bed and `jets` flames, `joined` of which have run together into a ring.
 */
export async function drawFlameRing(jets: number, joined: number, seed: number): Promise<Buffer> {
  const size = 960;
  const c = size / 2;
  const flames = Array.from({ length: jets }, (_, i) => {
    const angle = (i / jets) * Math.PI * 2 + seed;
    const wobble = 0.8 + 0.4 * Math.abs(Math.sin(seed * 7 + i * 2.3));
    const length = (i < joined ? 90 : 55) * wobble;
    const x = c + Math.cos(angle) * 250;
    const y = c + Math.sin(angle) * 250;
    const tx = c + Math.cos(angle) * (250 - length);
    const ty = c + Math.sin(angle) * (250 - length);
    const width = i < joined ? 46 : 22;
    return `<line x1="${x.toFixed(1)}" y1="${y.toFixed(1)}" x2="${tx.toFixed(1)}" y2="${ty.toFixed(1)}" stroke="url(#flame)" stroke-width="${width}" stroke-linecap="round" opacity="0.9"/>`;
  }).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size * 0.75}" viewBox="0 ${size * 0.125} ${size} ${size * 0.75}">
    <defs>
      <radialGradient id="bed"><stop offset="0" stop-color="#ff9a3c"/><stop offset="0.6" stop-color="#7a2a0c"/><stop offset="1" stop-color="#1d1410"/></radialGradient>
      <linearGradient id="flame" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#fff3b0"/><stop offset="0.5" stop-color="#ffb347"/><stop offset="1" stop-color="#e2551b"/></linearGradient>
    </defs>
    <rect x="0" y="0" width="${size}" height="${size}" fill="#3b3a36"/>
    <circle cx="${c}" cy="${c}" r="300" fill="#8d8a82"/>
    <circle cx="${c}" cy="${c}" r="270" fill="#2a2623"/>
    <circle cx="${c}" cy="${c}" r="230" fill="url(#bed)"/>
    ${flames}
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 80 }).toBuffer();
}

interface DemoBurn {
  version: number;
  input: Omit<CreateBurnInput, 'version'>;
  photo?: { jets: number; joined: number };
}

/** The class stove's test burns at the invented Alder Street Makerspace: version 1 smoked, version 2's two extra jets closed the ring. */
const classStoveBurns: DemoBurn[] = [
  {
    version: 1,
    input: { date: '2026-11-07T15:20:00Z', fuelKind: 'softwood pellets', fuelMassG: 160, starter: 'cotton ball with wax', ambientC: 9, wind: 'light', windscreen: false, timeToLightS: 40, timeToJetsS: 215, timeToBoilS: 760, boilWaterL: 0.5, boilStartC: 12, burnTimeS: 1020, charG: 34, smoke: 'some', flameRing: 2, notes: 'Jets lit late and never joined; smoke whenever the wind dropped.' },
    photo: { jets: 14, joined: 3 },
  },
  {
    version: 1,
    input: { date: '2026-11-08T10:05:00Z', fuelKind: 'softwood pellets', fuelMassG: 155, starter: 'cotton ball with wax', ambientC: 6, wind: 'calm', windscreen: true, timeToLightS: 35, timeToJetsS: 190, timeToBoilS: 700, boilWaterL: 0.5, boilStartC: 11, burnTimeS: 1080, charG: 30, smoke: 'some', flameRing: 3 },
  },
  {
    version: 2,
    input: { date: '2026-11-14T14:40:00Z', fuelKind: 'softwood pellets', fuelMassG: 160, starter: 'cotton ball with wax', ambientC: 8, wind: 'light', windscreen: false, windFacing: 'intake row away from the wind', timeToLightS: 30, timeToJetsS: 125, timeToBoilS: 560, boilWaterL: 0.5, boilStartC: 12, burnTimeS: 1230, charG: 28, smoke: 'none', flameRing: 4 },
    photo: { jets: 16, joined: 12 },
  },
  {
    version: 2,
    input: { date: '2026-11-21T11:15:00Z', fuelKind: 'softwood pellets', fuelMassG: 165, starter: 'cotton ball with wax', ambientC: 4, wind: 'moderate', windscreen: true, timeToLightS: 45, timeToJetsS: 140, timeToBoilS: 590, boilWaterL: 0.5, boilStartC: 9, burnTimeS: 1290, charG: 31, smoke: 'none', flameRing: 4, notes: 'Windscreen kept the ring steady in the gusts.' },
  },
  {
    version: 2,
    input: { date: '2026-11-28T16:00:00Z', fuelKind: 'hardwood pellets', fuelMassG: 170, starter: 'cotton ball with wax', ambientC: 7, wind: 'calm', windscreen: false, timeToLightS: 30, timeToJetsS: 110, timeToBoilS: 530, boilWaterL: 0.5, boilStartC: 12, burnTimeS: 1350, charG: 26, smoke: 'none', flameRing: 5, notes: 'Closed ring within two minutes. Best so far.' },
    photo: { jets: 16, joined: 16 },
  },
];

/** Writes the class stove's burns with their drawn photos. */
export async function seedDemoBurns(log: BurnLog, ownerId: string, classStoveId: string): Promise<number> {
  let seed = 1;
  for (const burn of classStoveBurns) {
    const entry = await log.logBurn(ownerId, classStoveId, { ...burn.input, version: burn.version });
    if (burn.photo) await log.addPhoto(ownerId, entry.id, await drawFlameRing(burn.photo.jets, burn.photo.joined, seed++));
  }
  return classStoveBurns.length;
}
