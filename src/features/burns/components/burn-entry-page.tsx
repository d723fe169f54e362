import { useState } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router';
import type { BurnFields } from '../../../../shared/burns/burn-schema.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { useDesign } from '../../library/api/get-design.ts';
import { useVersions } from '../../library/api/get-versions.ts';
import { useBurn } from '../api/get-burn.ts';
import { useDeleteBurn } from '../api/delete-burn.ts';
import { useLogBurn } from '../api/log-burn.ts';
import { useUpdateBurn } from '../api/update-burn.ts';
import { emptyFormValues, formKeyOfField, formValuesOf, type BurnFormErrors, type BurnFormValues } from '../burn-form-values.ts';
import { loadTimer, saveTimer, timerSummary } from '../burn-timer.ts';
import { draftKey, dropUnsaved, keepUnsaved } from '../unsaved-burns.ts';
import { useBurnUnits } from '../use-burn-units.ts';
import { BurnEntryForm } from './burn-entry-form.tsx';
import { BurnPhotos } from './burn-photos.tsx';
import { BurnSafetyNote } from './burn-safety-note.tsx';

/** Server field problems, onto the boxes that hold them. */
function boxErrors(error: unknown): BurnFormErrors {
  if (!(error instanceof ApiError)) return {};
  return Object.fromEntries(error.fields.flatMap((f) => (formKeyOfField[f.path] ? [[formKeyOfField[f.path], f.message]] : [])));
}

/** No answer at all (no signal, server away): the entry stays on this device. */
const isOffline = (error: unknown) => error instanceof TypeError || (error instanceof ApiError && error.status >= 502);

/** /library/:id/burns/new: a new entry, from the timer's summary or from scratch. */
export function NewBurnPage() {
  const designId = useParams().id ?? '';
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const units = useBurnUnits();
  const design = useDesign(designId);
  const versions = useVersions(designId);
  const log = useLogBurn();
  const [version, setVersion] = useState<number>();
  const [kept, setKept] = useState(false);
  const [initial] = useState<BurnFormValues>(() => {
    const draft = localStorage.getItem(draftKey(designId));
    if (draft) {
      try {
        return { ...emptyFormValues(), ...(JSON.parse(draft) as Partial<BurnFormValues>) };
      } catch {
        // A broken draft is dropped; the form starts empty.
      }
    }
    const timer = search.get('from') === 'timer' ? loadTimer() : null;
    return timer && timer.designId === designId ? formValuesOf(timerSummary(timer, Date.now()), units) : emptyFormValues();
  });

  async function save({ date, fields }: { date: string; fields: BurnFields }) {
    const key = `${designId}:${date}`;
    const input = { date, ...(version ? { version } : {}), ...Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== null)) };
    keepUnsaved({ key, designId, input, keptAt: new Date().toISOString() });
    try {
      const burn = await log.mutateAsync({ designId, input });
      dropUnsaved(key);
      localStorage.removeItem(draftKey(designId));
      if (loadTimer()?.designId === designId && search.get('from') === 'timer') saveTimer(null);
      await navigate(`/library/${encodeURIComponent(designId)}/burns/${encodeURIComponent(burn.id)}?saved=1`);
    } catch (error) {
      if (isOffline(error)) {
        // Kept whole in the list of unsaved entries (the timer's times with it); neither the form's draft nor the timer is needed twice.
        localStorage.removeItem(draftKey(designId));
        if (loadTimer()?.designId === designId && search.get('from') === 'timer') saveTimer(null);
        setKept(true);
      } else dropUnsaved(key);
    }
  }

  const name = design.data?.name ?? 'this design';
  return (
    <Page title="Log a burn" width="wide" intro={<p>Test burn of <Link to={`/library/${encodeURIComponent(designId)}`} className="text-ember-700 underline">{name}</Link>. Write down what you measured; leave the rest empty.</p>}>
      <div className="flex flex-col gap-6">
        {design.isError && <Notice tone="error">{design.error instanceof ApiError && design.error.status === 404 ? 'There is no such design in your library.' : design.error.message}</Notice>}
        {versions.data && versions.data.versions.length > 1 && (
          <label className="flex flex-col gap-1 text-sm font-medium sm:max-w-xs">
            Version burned
            <select value={version ?? ''} onChange={(e) => setVersion(e.target.value ? Number(e.target.value) : undefined)} className="min-h-11 rounded-md border border-rule bg-white px-3 py-2 text-base font-normal">
              <option value="">The latest (version {versions.data.versions[0]?.number})</option>
              {versions.data.versions.slice(1).map((v) => (
                <option key={v.number} value={v.number}>
                  Version {v.number}
                </option>
              ))}
            </select>
          </label>
        )}
        {kept && (
          <Notice tone="info">
            The server could not be reached. This entry is kept on this device and nothing is lost: press “Save the entry” again when you have a connection, or find it on the design’s page.
          </Notice>
        )}
        {log.isError && !kept && <Notice tone="error">{log.error.message}</Notice>}
        <BurnEntryForm
          initial={initial}
          units={units}
          submitLabel="Save the entry"
          busy={log.isPending}
          serverErrors={boxErrors(log.error)}
          onChange={(values) => localStorage.setItem(draftKey(designId), JSON.stringify(values))}
          onSubmit={(entry) => void save(entry)}
        />
        <BurnSafetyNote />
      </div>
    </Page>
  );
}

/** /library/:id/burns/:burnId (or /workshops/:id/burns/:burnId, `inWorkshop`): one entry, its photos; change or delete it. */
export function BurnEntryPage({ inWorkshop = false }: { inWorkshop?: boolean }) {
  const { id: parentId = '', burnId = '' } = useParams();
  const parentPath = inWorkshop ? `/workshops/${encodeURIComponent(parentId)}` : `/library/${encodeURIComponent(parentId)}`;
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const units = useBurnUnits();
  const burn = useBurn(burnId);
  const update = useUpdateBurn();
  const remove = useDeleteBurn();
  const [confirming, setConfirming] = useState(false);
  const back = (
    <Link to={parentPath} className="text-ember-700 underline">
      {inWorkshop ? 'Back to the workshop' : 'Back to the design'}
    </Link>
  );

  if (burn.isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (burn.isError) {
    const missing = burn.error instanceof ApiError && burn.error.status === 404;
    return (
      <Page title={missing ? 'Entry not found' : 'Entry not available'}>
        <p>{missing ? 'There is no such burn entry in your library. It may have been deleted.' : burn.error.message}</p>
        <p className="mt-4">{back}</p>
      </Page>
    );
  }
  const entry = burn.data;

  return (
    <Page title={`Burn of ${new Date(entry.date).toLocaleDateString()}`} width="wide" intro={<p>Version {entry.version} · {back}</p>}>
      <div className="mb-4 flex flex-col gap-2" aria-live="polite">
        {search.get('saved') && !update.isSuccess && <Notice tone="success">Saved. Add photos of the burn if you have them.</Notice>}
        {update.isSuccess && <Notice tone="success">Changes saved.</Notice>}
        {update.isError && <Notice tone="error">{update.error.message}</Notice>}
      </div>
      {/* On a phone the photos come first (the next thing after saving); on a wide screen they sit beside the form. */}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1.5fr)_minmax(0,1fr)] lg:grid-rows-[auto_1fr] lg:items-start">
        <div className="lg:col-start-2 lg:row-start-1">
          <BurnPhotos burn={entry} />
        </div>
        <div className="lg:col-start-1 lg:row-span-2 lg:row-start-1">
          <BurnEntryForm
            key={entry.updatedAt}
            initial={formValuesOf(entry, units)}
            units={units}
            submitLabel="Save changes"
            busy={update.isPending}
            serverErrors={boxErrors(update.error)}
            onSubmit={({ date, fields }) => update.mutate({ burnId, change: { date, ...fields } })}
          />
        </div>
        <div className="flex flex-col gap-4 lg:col-start-2 lg:row-start-2">
          <section className="flex flex-col gap-2 rounded-lg border border-rule bg-white p-4">
            <h2 className="font-semibold">Delete this entry</h2>
            {confirming ? (
              <div className="flex flex-wrap gap-2">
                <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(burnId, { onSuccess: () => void navigate(parentPath) })}>
                  Delete the entry and its {entry.photos.length} photo{entry.photos.length === 1 ? '' : 's'}
                </Button>
                <Button variant="secondary" onClick={() => setConfirming(false)}>
                  Keep it
                </Button>
              </div>
            ) : (
              <Button variant="danger" className="self-start" onClick={() => setConfirming(true)}>
                Delete entry…
              </Button>
            )}
            {remove.isError && <Notice tone="error">{remove.error.message}</Notice>}
          </section>
          <BurnSafetyNote />
        </div>
      </div>
    </Page>
  );
}
