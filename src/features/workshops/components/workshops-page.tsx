import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { WORKSHOP_CAPACITY_DEFAULT, WORKSHOP_CAPACITY_MAX } from '../../../../shared/workshops/workshop-schema.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { useDesigns } from '../../library/api/get-designs.ts';
import { formatWhen } from '../../library/format-when.ts';
import { useWorkshops } from '../api/get-workshops.ts';
import { useCreateWorkshop } from '../api/workshop-mutations.ts';
import { JoinByCode } from './join-page.tsx';

const box = 'min-h-11 w-full rounded-md border border-rule bg-white px-3 py-2 text-base';

/** /workshops: the sessions someone runs or is in; instructors start one here. */
export function WorkshopsPage() {
  const { data: account } = useAccount();
  const list = useWorkshops();
  const runs = account?.role === 'instructor' || account?.role === 'admin';
  return (
    <Page title="Workshops" width="wide" intro={<p>Build sessions: one kit for the whole group, each person on their own printer, and the group’s burns in one place.</p>}>
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)]">
        <section aria-labelledby="list-heading" className="flex flex-col gap-3">
          <h2 id="list-heading" className="text-lg font-semibold">
            Your workshops
          </h2>
          {list.isPending && <p className="text-ink-soft">Loading…</p>}
          {list.isError && <Notice tone="error">{list.error.message}</Notice>}
          {list.data?.workshops.length === 0 && <p className="text-sm text-ink-soft">{runs ? 'None yet. Start one with the form.' : 'None yet. Join one with the code your instructor shows, or the link in your invitation.'}</p>}
          <ul className="flex flex-col gap-2">
            {list.data?.workshops.map((w) => (
              <li key={w.id} className="rounded-lg border border-rule bg-white p-4">
                <Link to={`/workshops/${w.id}`} className="font-medium text-ember-700 underline">
                  {w.title}
                </Link>
                <p className="text-sm text-ink-soft">
                  {formatWhen(w.startsAt)}
                  {w.place && ` · ${w.place}`} · {w.role === 'instructor' ? `you run it · ${w.members} of ${w.capacity} joined` : `run by ${w.instructorName}`} · kit: {w.kitName}
                  {w.closedAt && ' · closed'}
                </p>
              </li>
            ))}
          </ul>
        </section>
        <div className="flex flex-col gap-6">
          <JoinByCode />
          {runs && <NewWorkshopForm />}
        </div>
      </div>
    </Page>
  );
}

function NewWorkshopForm() {
  const designs = useDesigns({ sort: 'updated' });
  const create = useCreateWorkshop();
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string>();

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setProblem(undefined);
    const form = new FormData(event.currentTarget);
    const when = String(form.get('startsAt') ?? '');
    const date = new Date(when);
    if (!when || Number.isNaN(date.getTime())) return setProblem('Give the date and time the workshop starts.');
    try {
      const created = await create.mutateAsync({
        title: String(form.get('title') ?? ''),
        designId: String(form.get('designId') ?? ''),
        startsAt: date.toISOString(),
        place: String(form.get('place') ?? ''),
        notes: String(form.get('notes') ?? ''),
        capacity: Number(form.get('capacity') || WORKSHOP_CAPACITY_DEFAULT),
      });
      await navigate(`/workshops/${created.id}`);
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  const own = designs.data?.designs ?? [];
  return (
    <section aria-labelledby="new-heading" className="rounded-lg border border-rule bg-white p-4">
      <h2 id="new-heading" className="text-lg font-semibold">
        New workshop
      </h2>
      {designs.data && own.length === 0 ? (
        <p className="mt-2 text-sm">
          The kit is a saved design of yours. <Link to="/design" className="text-ember-700 underline">Save one</Link> first.
        </p>
      ) : (
        <form onSubmit={(e) => void submit(e)} className="mt-3 flex flex-col gap-3">
          <label className="flex flex-col gap-1 text-sm font-medium">
            Title
            <input name="title" required maxLength={120} className={box} />
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Kit (the design’s current version; it stays pinned)
            <select name="designId" className={box}>
              {own.map((d) => (
                <option key={d.id} value={d.id}>
                  {d.name} (version {d.currentVersion})
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Starts
            <input name="startsAt" type="datetime-local" required className={box} />
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Place
            <input name="place" maxLength={160} className={box} />
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Places
            <input name="capacity" type="number" min={1} max={WORKSHOP_CAPACITY_MAX} defaultValue={WORKSHOP_CAPACITY_DEFAULT} className={box} />
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Notes for the group
            <textarea name="notes" rows={3} maxLength={4000} className={box} />
          </label>
          {problem && <Notice tone="error">{problem}</Notice>}
          <Button type="submit" disabled={create.isPending} className="self-start">
            {create.isPending ? 'Creating…' : 'Create the workshop'}
          </Button>
        </form>
      )}
    </section>
  );
}
