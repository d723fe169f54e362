import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { WorkshopBurns } from '../../../../shared/workshops/workshop-schema.ts';
import { formatDuration } from '../../../../shared/units/burn-units.ts';

const minutes = (s: number | null) => (s === null ? null : Math.round((s / 60) * 10) / 10);

/** The group's burns: one bar group per burn (jets, boiling, burn time), and the same as a table. */
export function GroupBurns({ burns, showNames }: { burns: WorkshopBurns['burns']; showNames: boolean }) {
  if (burns.length === 0) return <p className="text-sm text-ink-soft">No burns logged yet.</p>;
  const ordered = [...burns].sort((a, b) => a.date.localeCompare(b.date));
  const data = ordered.map((b) => ({
    label: `${showNames ? b.memberName.split(' ')[0] + ', ' : ''}${new Date(b.date).toLocaleDateString(undefined, { month: 'short', day: 'numeric' })}`,
    jets: minutes(b.timeToJetsS),
    boil: minutes(b.timeToBoilS),
    burn: minutes(b.burnTimeS),
  }));
  const time = (s: number | null) => (s === null ? '—' : formatDuration(s));
  return (
    <div className="flex flex-col gap-3">
      <div className="h-64 w-full rounded-lg border border-rule bg-white p-2" aria-hidden="true" data-testid="group-chart">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} accessibilityLayer={false} maxBarSize={56} margin={{ top: 8, right: 8, bottom: 4, left: 0 }}>
            <CartesianGrid stroke="#d9d3c7" strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" />
            <YAxis unit=" min" width={60} />
            <Tooltip />
            <Legend />
            <Bar dataKey="jets" name="Jets lit" fill="#b34d1c" isAnimationActive={false} />
            <Bar dataKey="boil" name="Boiling" fill="#2f6b3a" isAnimationActive={false} />
            <Bar dataKey="burn" name="Burn time" fill="#3d4f8f" isAnimationActive={false} />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[28rem] border-collapse text-sm">
          <caption className="mb-1 text-left font-medium">Burns in this workshop</caption>
          <thead>
            <tr className="border-b border-rule text-left">
              {showNames && <th scope="col" className="py-1 pr-3">Who</th>}
              <th scope="col" className="py-1 pr-3">Date</th>
              <th scope="col" className="py-1 pr-3">Jets lit</th>
              <th scope="col" className="py-1 pr-3">Boiling</th>
              <th scope="col" className="py-1 pr-3">Burn time</th>
              <th scope="col" className="py-1 pr-3">Photos</th>
            </tr>
          </thead>
          <tbody>
            {ordered.map((b) => (
              <tr key={b.id} className="border-b border-rule/60">
                {showNames && <td className="py-1 pr-3">{b.memberName}</td>}
                <td className="py-1 pr-3">{new Date(b.date).toLocaleDateString()}</td>
                <td className="py-1 pr-3 tabular-nums">{time(b.timeToJetsS)}</td>
                <td className="py-1 pr-3 tabular-nums">{time(b.timeToBoilS)}</td>
                <td className="py-1 pr-3 tabular-nums">{time(b.burnTimeS)}</td>
                <td className="py-1 pr-3">
                  <span className="flex gap-1">
                    {b.photos.map((p, i) => (
                      <a key={p.id} href={p.url} target="_blank" rel="noreferrer">
                        <img src={p.thumbnailUrl} alt={`Photo ${i + 1} of ${b.memberName}'s burn`} width={40} height={40} className="h-10 w-10 rounded object-cover" />
                      </a>
                    ))}
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
