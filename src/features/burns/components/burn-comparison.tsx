import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from 'recharts';
import type { Burn } from '../../../../shared/burns/burn-schema.ts';
import type { VersionListItem } from '../../../../shared/library/library-schemas.ts';
import { formatLength, type UnitSystem } from '../../../../shared/units/index.ts';
import { formatDuration } from '../../../../shared/units/burn-units.ts';

/** The three times each burn is compared by, each drawn with its own colour and marker shape (no meaning in colour alone). */
const series = [
  { key: 'timeToJetsS', name: 'Jets lit', colour: '#b34d1c', shape: 'circle' },
  { key: 'timeToBoilS', name: 'Boiling', colour: '#2f6b3a', shape: 'square' },
  { key: 'burnTimeS', name: 'Burn time', colour: '#3d4f8f', shape: 'triangle' },
] as const;

const minutes = (seconds: number) => Math.round((seconds / 60) * 10) / 10;

export const ratioText = (ratio: number | null | undefined) => (ratio === null || ratio === undefined ? '—' : `${ratio.toFixed(1)} : 1`);
export const pitchText = (pitch: number | null | undefined, units: UnitSystem) => (pitch === null || pitch === undefined ? '—' : formatLength(pitch, units));

/**
 * Each burn as a point over the version it tested, beside what changed between versions, their
 * air ratio and jet pitch; the same numbers as a table for screen readers and for copying.
 */
export function BurnComparison({ burns, versions, lengthUnits }: { burns: Burn[]; versions: VersionListItem[]; lengthUnits: UnitSystem }) {
  const numbers = versions.map((v) => v.number);
  const lowest = Math.min(...numbers, ...burns.map((b) => b.version));
  const highest = Math.max(...numbers, ...burns.map((b) => b.version));
  const ticks = Array.from({ length: highest - lowest + 1 }, (_, i) => lowest + i);
  const byVersion = new Map(versions.map((v) => [v.number, v]));
  const ordered = [...burns].sort((a, b) => a.version - b.version || a.date.localeCompare(b.date));
  const tested = [...new Set(ordered.map((b) => b.version))];

  return (
    <div className="flex flex-col gap-4">
      <figure className="flex flex-col gap-2">
        <figcaption className="text-sm text-ink-soft">Minutes from lighting, each point one burn, over the version it tested. The table below has the same numbers.</figcaption>
        <div className="h-72 w-full rounded-lg border border-rule bg-white p-2" aria-hidden="true" data-testid="burn-chart">
          <ResponsiveContainer width="100%" height="100%">
            <ScatterChart accessibilityLayer={false} margin={{ top: 8, right: 12, bottom: 4, left: 0 }}>
              <CartesianGrid stroke="#d9d3c7" strokeDasharray="3 3" />
              <XAxis type="number" dataKey="version" name="Version" domain={[lowest - 0.5, highest + 0.5]} ticks={ticks} tickFormatter={(v: number) => `v${v}`} allowDecimals={false} />
              <YAxis type="number" dataKey="minutes" name="Minutes" unit=" min" width={64} />
              <Tooltip formatter={(value) => [`${String(value)} min`]} labelFormatter={() => ''} />
              <Legend />
              {series.map((s) => (
                <Scatter
                  key={s.key}
                  name={s.name}
                  fill={s.colour}
                  shape={s.shape}
                  legendType={s.shape}
                  isAnimationActive={false}
                  data={ordered.flatMap((b) => {
                    const value = b[s.key];
                    // A small sideways shift keeps the three times of one version apart.
                    return value === null ? [] : [{ version: b.version + (series.indexOf(s) - 1) * 0.12, minutes: minutes(value) }];
                  })}
                />
              ))}
            </ScatterChart>
          </ResponsiveContainer>
        </div>
      </figure>

      <ol aria-label="What each tested version changed" className="grid gap-2 sm:grid-cols-2">
        {tested.map((number) => {
          const version = byVersion.get(number);
          return (
            <li key={number} className="rounded-md border border-rule bg-white p-3 text-sm">
              <p className="font-medium">
                Version {number}: air ratio {ratioText(version?.summary.ratio)}, jet pitch {pitchText(version?.summary.jetPitchMm, lengthUnits)}
              </p>
              {version && version.changes.length > 0 ? (
                <ul className="mt-1 list-disc pl-5">
                  {version.changes.map((line, i) => (
                    <li key={i}>{line}</li>
                  ))}
                </ul>
              ) : (
                <p className="mt-1 text-ink-soft">{number === 1 ? 'First saved version.' : 'No change to the layout.'}</p>
              )}
            </li>
          );
        })}
      </ol>

      <div className="overflow-x-auto">
        <table className="w-full min-w-[36rem] border-collapse text-sm">
          <caption className="mb-2 text-left font-medium">Burns by version</caption>
          <thead>
            <tr className="border-b border-rule text-left">
              <th scope="col" className="py-1 pr-3">Version</th>
              <th scope="col" className="py-1 pr-3">Date</th>
              <th scope="col" className="py-1 pr-3">Air ratio</th>
              <th scope="col" className="py-1 pr-3">Jet pitch</th>
              <th scope="col" className="py-1 pr-3">Jets lit</th>
              <th scope="col" className="py-1 pr-3">Boiling</th>
              <th scope="col" className="py-1 pr-3">Burn time</th>
            </tr>
          </thead>
          <tbody>
            {ordered.map((b) => {
              const version = byVersion.get(b.version);
              const time = (s: number | null) => (s === null ? '—' : formatDuration(s));
              return (
                <tr key={b.id} className="border-b border-rule/60">
                  <th scope="row" className="py-1 pr-3 text-left font-normal">
                    {b.version}
                  </th>
                  <td className="py-1 pr-3">{new Date(b.date).toLocaleDateString()}</td>
                  <td className="py-1 pr-3">{ratioText(version?.summary.ratio)}</td>
                  <td className="py-1 pr-3">{pitchText(version?.summary.jetPitchMm, lengthUnits)}</td>
                  <td className="py-1 pr-3 tabular-nums">{time(b.timeToJetsS)}</td>
                  <td className="py-1 pr-3 tabular-nums">{time(b.timeToBoilS)}</td>
                  <td className="py-1 pr-3 tabular-nums">{time(b.burnTimeS)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
