import { useState } from 'react';
import { Link } from 'react-router';
import { bestBurn, type BestBurnReason } from '../../../../shared/burns/best-burn.ts';
import { compareWithLog, MIN_BURNS_TO_CORRECT } from '../../../../shared/burns/burn-estimates.ts';
import type { Burn } from '../../../../shared/burns/burn-schema.ts';
import type { Design } from '../../../../shared/design/design-schema.ts';
import type { VersionListItem } from '../../../../shared/library/library-schemas.ts';
import type { UnitSystem } from '../../../../shared/units/index.ts';
import { formatDuration, formatMeasure, massToShown, volumeToShown, type BurnUnits } from '../../../../shared/units/burn-units.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { useBurns } from '../api/get-burns.ts';
import { useLogBurn } from '../api/log-burn.ts';
import { loadTimer } from '../burn-timer.ts';
import { dropUnsaved, listUnsaved } from '../unsaved-burns.ts';
import { useBurnUnits } from '../use-burn-units.ts';
import { BurnComparison } from './burn-comparison.tsx';

const reasonWords: Record<BestBurnReason, string> = {
  boil: 'the fastest boil for its water',
  'burn-time': 'the longest burn (no boil timed yet)',
  'flame-ring': 'the best-closed flame ring (no times yet)',
};

const link = 'inline-flex min-h-11 items-center justify-center rounded-md px-4 py-2 text-sm font-medium';

/** A design's burn log on its page: what to do next, the best burn, estimates against the log, the comparison and the entries. */
export function BurnLogSection({ designId, document, versions, lengthUnits }: { designId: string; document: Design; versions: VersionListItem[]; lengthUnits: UnitSystem }) {
  const burns = useBurns(designId);
  const units = useBurnUnits();
  const timer = loadTimer();
  const timing = timer?.designId === designId;
  const base = `/library/${encodeURIComponent(designId)}`;

  return (
    <section aria-labelledby="burns-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="burns-heading" className="text-lg font-semibold">
          Burn log
        </h2>
        <div className="flex flex-wrap gap-2">
          <Link to={`${base}/timer`} className={`${link} bg-ember-600 text-white hover:bg-ember-700`}>
            {timing ? 'Back to the running timer' : 'Start the burn timer'}
          </Link>
          <Link to={`${base}/burns/new`} className={`${link} border border-rule bg-white hover:bg-ember-50`}>
            Log a burn
          </Link>
        </div>
      </div>
      <UnsavedEntries designId={designId} />
      {burns.isPending && <p className="text-ink-soft">Loading the burn log…</p>}
      {burns.isError && <Notice tone="error">The burn log could not be loaded: {burns.error.message}</Notice>}
      {burns.data && burns.data.burns.length === 0 && (
        <p className="text-sm text-ink-soft">No burns logged yet. Build the stove, light it outdoors and time it: each entry is kept with the version it tested, so you can see what each change did.</p>
      )}
      {burns.data && burns.data.burns.length > 0 && (
        <>
          <div className="grid gap-4 md:grid-cols-2">
            <BestBurn burns={burns.data.burns} units={units} base={base} />
            <Estimates document={document} burns={burns.data.burns} units={units} />
          </div>
          <BurnComparison burns={burns.data.burns} versions={versions} lengthUnits={lengthUnits} />
          <EntryList burns={burns.data.burns} base={base} />
        </>
      )}
    </section>
  );
}

function BestBurn({ burns, units, base }: { burns: Burn[]; units: BurnUnits; base: string }) {
  const best = bestBurn(burns);
  return (
    <div className="rounded-lg border border-rule bg-white p-4" data-testid="best-burn">
      <h3 className="font-semibold">Best burn so far</h3>
      {best ? (
        <>
          <p className="mt-1 text-sm text-ink-soft">By {reasonWords[best.reason]}.</p>
          <p className="mt-2">
            <Link to={`${base}/burns/${encodeURIComponent(best.burn.id)}`} className="text-ember-700 underline">
              {new Date(best.burn.date).toLocaleDateString()}, version {best.burn.version}
            </Link>
          </p>
          <p className="mt-1 text-sm">{describeBurn(best.burn, units)}</p>
        </>
      ) : (
        <p className="mt-1 text-sm text-ink-soft">Time a boil or a burn to see one here.</p>
      )}
    </div>
  );
}

/** One line of what a burn measured, in the maker's units. */
export function describeBurn(burn: Burn, units: BurnUnits): string {
  const parts = [
    burn.timeToJetsS !== null ? `jets at ${formatDuration(burn.timeToJetsS)}` : '',
    burn.timeToBoilS !== null ? `boiled ${burn.boilWaterL ? formatMeasure(volumeToShown(burn.boilWaterL, units.volume), units.volume) + ' ' : ''}at ${formatDuration(burn.timeToBoilS)}` : '',
    burn.burnTimeS !== null ? `burned ${formatDuration(burn.burnTimeS)}` : '',
    burn.fuelMassG !== null ? `${formatMeasure(massToShown(burn.fuelMassG, units.mass), units.mass)} of ${burn.fuelKind ?? 'fuel'}` : '',
    burn.flameRing !== null ? `flame ring ${burn.flameRing} of 5` : '',
  ].filter(Boolean);
  return parts.length > 0 ? parts.join(', ') : 'Nothing measured yet.';
}

function Estimates({ document, burns, units }: { document: Design; burns: Burn[]; units: BurnUnits }) {
  const result = compareWithLog(document, burns);
  const mass = (g: number) => formatMeasure(massToShown(g, units.mass), units.mass);
  const mins = (m: number) => formatDuration(m * 60);
  return (
    <div className="rounded-lg border border-rule bg-white p-4" data-testid="estimates">
      <h3 className="font-semibold">Estimate and log</h3>
      {result ? (
        <>
          <table className="mt-2 w-full text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th scope="col" className="font-normal" />
                <th scope="col" className="font-normal">Estimated</th>
                <th scope="col" className="font-normal">Logged (median)</th>
              </tr>
            </thead>
            <tbody>
              <tr>
                <th scope="row" className="pr-2 text-left font-normal">Full load of pellets</th>
                <td>{mass(result.estimate.fuelMassG)}</td>
                <td>{result.measured.fuelMassG === null ? '—' : mass(result.measured.fuelMassG)}</td>
              </tr>
              <tr>
                <th scope="row" className="pr-2 text-left font-normal">Burn time</th>
                <td>{mins(result.estimate.burnMinutes)}</td>
                <td>{result.measured.burnMinutes === null ? '—' : mins(result.measured.burnMinutes)}</td>
              </tr>
              <tr>
                <th scope="row" className="pr-2 text-left font-normal">Burn rate</th>
                <td>{mass(result.estimate.burnRateGPerMin)}/min</td>
                <td>{result.measured.burnRate.medianGPerMin === null ? '—' : `${mass(result.measured.burnRate.medianGPerMin)}/min`}</td>
              </tr>
            </tbody>
          </table>
          {result.corrected ? (
            <p className="mt-2 text-sm">
              From this stove’s own burn rate ({result.measured.burnRate.burns} burns), a full load should last about <strong>{mins(result.corrected.burnMinutes)}</strong>.
            </p>
          ) : (
            <p className="mt-2 text-sm text-ink-soft">
              With {MIN_BURNS_TO_CORRECT} burns that have both a fuel weight and a burn time ({result.measured.burnRate.burns} so far), the estimate is corrected from this stove’s own burn rate.
            </p>
          )}
        </>
      ) : (
        <p className="mt-1 text-sm text-ink-soft">This design has no burn chamber with room under its jets, so there is no fuel estimate.</p>
      )}
    </div>
  );
}

function EntryList({ burns, base }: { burns: Burn[]; base: string }) {
  return (
    <ol aria-label="Burn entries" className="flex flex-col gap-2">
      {burns.map((burn) => (
        <li key={burn.id} className="flex items-center gap-3 rounded-lg border border-rule bg-white p-3">
          {burn.photos[0] && <img src={burn.photos[0].thumbnailUrl} alt="" width={56} height={56} className="h-14 w-14 rounded object-cover" />}
          <div className="min-w-0 flex-1">
            <Link to={`${base}/burns/${encodeURIComponent(burn.id)}`} className="font-medium text-ember-700 underline">
              {new Date(burn.date).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' })}
            </Link>
            <p className="text-sm text-ink-soft">
              Version {burn.version}
              {burn.photos.length > 0 && ` · ${burn.photos.length} photo${burn.photos.length === 1 ? '' : 's'}`}
              {burn.notes && ` · ${burn.notes.slice(0, 80)}${burn.notes.length > 80 ? '…' : ''}`}
            </p>
          </div>
        </li>
      ))}
    </ol>
  );
}

/** Entries written while the server could not be reached, still on this device. */
function UnsavedEntries({ designId }: { designId: string }) {
  const [unsaved, setUnsaved] = useState(() => listUnsaved().filter((u) => u.designId === designId));
  const log = useLogBurn();
  const [problem, setProblem] = useState<string>();
  if (unsaved.length === 0) return null;

  async function sendAll() {
    setProblem(undefined);
    for (const entry of unsaved) {
      try {
        await log.mutateAsync({ designId, input: entry.input });
        dropUnsaved(entry.key);
      } catch (error) {
        setProblem((error as Error).message);
        break;
      }
    }
    setUnsaved(listUnsaved().filter((u) => u.designId === designId));
  }

  return (
    <Notice tone="info">
      <p>
        {unsaved.length} entr{unsaved.length === 1 ? 'y is' : 'ies are'} kept on this device and not yet saved.
      </p>
      <Button className="mt-2" disabled={log.isPending} onClick={() => void sendAll()}>
        {log.isPending ? 'Sending…' : 'Save them now'}
      </Button>
      {problem && <p className="mt-2 text-danger">{problem}</p>}
    </Notice>
  );
}
