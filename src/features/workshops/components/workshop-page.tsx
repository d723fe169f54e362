import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import type { BurnFields } from '../../../../shared/burns/burn-schema.ts';
import { WORKSHOP_CAPACITY_MAX, type Workshop } from '../../../../shared/workshops/workshop-schema.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { SafetyNote } from '../../../components/safety-note.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { emptyFormValues } from '../../burns/burn-form-values.ts';
import { BurnEntryForm } from '../../burns/components/burn-entry-form.tsx';
import { BurnSafetyNote } from '../../burns/components/burn-safety-note.tsx';
import { useBurnUnits } from '../../burns/use-burn-units.ts';
import { formatWhen } from '../../library/format-when.ts';
import { useWorkshop } from '../api/get-workshop.ts';
import { useWorkshopBurns } from '../api/get-workshop-burns.ts';
import { useDeleteWorkshop, useInvite, useLogWorkshopBurn, useRemoveMember, useSendKit, useUpdateWorkshop } from '../api/workshop-mutations.ts';
import { GroupBurns } from './group-burns.tsx';

const statusWords = { invited: 'Invited', expired: 'Invitation expired', joined: 'Joined', printed: 'Printed the kit', burned: 'Burned a stove' } as const;
const panel = 'flex flex-col gap-3 rounded-lg border border-rule bg-white p-4';

/** /workshops/:id: the instructor runs it from here; a member finds the kit, the briefing and their burns. */
export function WorkshopPage() {
  const id = useParams().id ?? '';
  const workshop = useWorkshop(id);
  if (workshop.isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (workshop.isError) {
    const missing = workshop.error instanceof ApiError && workshop.error.status === 404;
    return (
      <Page title={missing ? 'Workshop not found' : 'Workshop not available'}>
        <p>{missing ? 'There is no such workshop, or you are not in it (an instructor may have removed you).' : workshop.error.message}</p>
        <p className="mt-4">
          <Link to="/workshops" className="text-ember-700 underline">
            Your workshops
          </Link>
        </p>
      </Page>
    );
  }
  const w = workshop.data;
  return (
    <Page
      title={w.title}
      width="wide"
      intro={
        <p>
          {formatWhen(w.startsAt)}
          {w.place && ` · ${w.place}`} · run by {w.instructorName} · {w.members} of {w.capacity} joined{w.closedAt && ' · closed'}
        </p>
      }
    >
      {w.role === 'instructor' ? <InstructorView workshop={w} /> : <MemberView workshop={w} />}
    </Page>
  );
}

function KitPanel({ workshop }: { workshop: Workshop }) {
  const { data: account } = useAccount();
  const [paper, setPaper] = useState<string>(account?.defaultPaper ?? workshop.defaultPaper);
  const kit = workshop.kit;
  return (
    <section aria-labelledby="kit-heading" className={panel}>
      <h2 id="kit-heading" className="font-semibold">
        The kit
      </h2>
      <p className="text-sm">
        {kit.designName}, version {kit.version}: {kit.summary.holes} holes, {kit.summary.parts.map((p) => p.vesselName).join(' and ')}
        {kit.summary.ratio !== null && `, air ratio ${kit.summary.ratio.toFixed(1)} : 1`}.
      </p>
      <div className="flex flex-wrap items-end gap-2">
        <label className="flex flex-col gap-1 text-sm font-medium">
          Paper
          <select value={paper} onChange={(e) => setPaper(e.target.value)} className="min-h-11 rounded-md border border-rule bg-white px-3 py-2 text-base font-normal">
            <option value="letter">Letter</option>
            <option value="legal">Legal</option>
            <option value="tabloid">Tabloid</option>
            <option value="a4">A4</option>
            <option value="a3">A3</option>
          </select>
        </label>
        <a href={`/api/workshops/${encodeURIComponent(workshop.id)}/kit.pdf?paper=${paper}`} className="inline-flex min-h-11 items-center rounded-md bg-ember-600 px-4 text-sm font-medium text-white hover:bg-ember-700">
          Download the kit (PDF)
        </a>
      </div>
      <p className="text-sm text-ink-soft">
        Scaled for your own printer profile (<Link to="/printer" className="underline">calibrate a printer</Link>). Print at 100 %, then check the calibration ruler with a real ruler before you cut.
      </p>
      {workshop.role === 'instructor' && <ClassPack workshop={workshop} paper={paper} />}
    </section>
  );
}

/** The instructor's class pack: materials and tools for the group, the briefing with a sign-off list, one kit. */
function ClassPack({ workshop, paper }: { workshop: Workshop; paper: string }) {
  const expected = workshop.roster?.filter((r) => r.status !== 'expired').length || workshop.capacity;
  const [builds, setBuilds] = useState(String(expected));
  const count = Number(builds);
  const valid = Number.isInteger(count) && count >= 1 && count <= WORKSHOP_CAPACITY_MAX;
  const href = `/api/workshops/${encodeURIComponent(workshop.id)}/class-pack.pdf?paper=${paper}${valid ? `&builds=${count}` : ''}`;
  return (
    <div className="flex flex-col gap-2 border-t border-rule pt-3">
      <h3 className="text-sm font-semibold">Class pack</h3>
      <p className="text-sm text-ink-soft">A cover with the cans, drills and pilot sizes for the whole group, the safety briefing with a line for each person to sign, then one kit.</p>
      <div className="flex flex-wrap items-end gap-2">
        <label className="flex flex-col gap-1 text-sm font-medium">
          Stoves to build
          <input
            type="number"
            inputMode="numeric"
            min={1}
            max={WORKSHOP_CAPACITY_MAX}
            value={builds}
            onChange={(e) => setBuilds(e.target.value)}
            aria-invalid={!valid}
            aria-describedby={valid ? undefined : 'builds-problem'}
            className="min-h-11 w-28 rounded-md border border-rule bg-white px-3 py-2 text-base font-normal"
          />
        </label>
        {valid ? (
          <a href={href} className="inline-flex min-h-11 items-center rounded-md border border-ember-600 px-4 text-sm font-medium text-ember-700 hover:bg-ember-50">
            Download the class pack (PDF)
          </a>
        ) : (
          <p id="builds-problem" role="alert" className="text-sm text-danger">
            Give a whole number of stoves from 1 to {WORKSHOP_CAPACITY_MAX}.
          </p>
        )}
      </div>
    </div>
  );
}

function Briefing({ workshop }: { workshop: Workshop }) {
  return (
    <section aria-labelledby="briefing-heading" className={panel}>
      <h2 id="briefing-heading" className="font-semibold">
        Safety briefing
      </h2>
      {workshop.notes && <p className="text-sm whitespace-pre-line">{workshop.notes}</p>}
      <SafetyNote />
      <BurnSafetyNote />
    </section>
  );
}

function MemberView({ workshop }: { workshop: Workshop }) {
  const burns = useWorkshopBurns(workshop.id);
  const log = useLogWorkshopBurn();
  const leave = useRemoveMember();
  const { data: account } = useAccount();
  const units = useBurnUnits();
  const navigate = useNavigate();
  const [formKey, setFormKey] = useState(0);
  async function save({ date, fields }: { date: string; fields: BurnFields }) {
    const input = { date, ...Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== null)) };
    await log.mutateAsync({ id: workshop.id, input }).catch(() => undefined);
    setFormKey((k) => k + 1);
  }
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-2">
      <div className="flex flex-col gap-4">
        {workshop.you?.kitChangedSinceJoined && <Notice tone="info">The instructor moved the kit to version {workshop.kit.version} since you joined. Print it again before you drill.</Notice>}
        <Notice tone="info">{workshop.instructorName} sees the burns and photos you log in this workshop.</Notice>
        <KitPanel workshop={workshop} />
        <Briefing workshop={workshop} />
        <Button
          variant="danger"
          className="self-start"
          disabled={leave.isPending}
          onClick={() => account && leave.mutate({ id: workshop.id, userId: account.id }, { onSuccess: () => void navigate('/workshops') })}
        >
          Leave the workshop
        </Button>
      </div>
      <section aria-labelledby="my-burns-heading" className="flex flex-col gap-4">
        <h2 id="my-burns-heading" className="text-lg font-semibold">
          Your burns of this kit
        </h2>
        {burns.data && <GroupBurns burns={burns.data.burns} showNames={false} />}
        {burns.data?.burns.map((b) => (
          <Link key={b.id} to={`/workshops/${workshop.id}/burns/${b.id}`} className="text-sm text-ember-700 underline">
            Open the burn of {new Date(b.date).toLocaleString()} (add photos, change it)
          </Link>
        ))}
        {workshop.closedAt ? (
          <p className="text-sm text-ink-soft">The workshop is closed: no more burns can be logged in it.</p>
        ) : (
          <div className={panel}>
            <h3 className="font-semibold">Log a burn of your stove</h3>
            {log.isSuccess && <Notice tone="success">Saved. Open it above to add photos.</Notice>}
            {log.isError && <Notice tone="error">{log.error.message}</Notice>}
            <BurnEntryForm key={formKey} initial={emptyFormValues()} units={units} submitLabel="Save the burn" busy={log.isPending} onSubmit={(entry) => void save(entry)} />
          </div>
        )}
      </section>
    </div>
  );
}

/** "“sam@” must be an e-mail address", naming the pasted address a problem is about. */
function invitationProblem(error: Error, list: string[]): string {
  if (!(error instanceof ApiError) || error.fields.length === 0) return error.message;
  return error.fields
    .map((f) => {
      const index = /^emails\.(\d+)$/.exec(f.path)?.[1];
      return index !== undefined && list[Number(index)] !== undefined ? `“${list[Number(index)]}” ${f.message}` : f.message;
    })
    .join('; ');
}

function InstructorView({ workshop }: { workshop: Workshop }) {
  const burns = useWorkshopBurns(workshop.id);
  const update = useUpdateWorkshop();
  const invite = useInvite();
  const remove = useRemoveMember();
  const sendKit = useSendKit();
  const del = useDeleteWorkshop();
  const navigate = useNavigate();
  const [emails, setEmails] = useState('');
  const [sentList, setSentList] = useState<string[]>([]);
  const [confirmClose, setConfirmClose] = useState(false);
  const closed = workshop.closedAt !== null;
  const joinLink = workshop.code ? `${window.location.origin}/workshops/join?code=${workshop.code}` : null;

  function sendInvitations(event: FormEvent) {
    event.preventDefault();
    const list = emails.split(/[\s,;]+/).map((e) => e.trim()).filter(Boolean);
    if (list.length === 0) return;
    setSentList(list);
    invite.mutate({ id: workshop.id, input: { emails: list } }, { onSuccess: () => setEmails('') });
  }

  return (
    <div className="flex flex-col gap-6">
      {update.isError && <Notice tone="error">{update.error.message}</Notice>}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-3">
        <section aria-labelledby="code-heading" className={panel}>
          <h2 id="code-heading" className="font-semibold">
            Join code
          </h2>
          {workshop.code ? (
            <>
              <p className="text-center font-mono text-4xl font-semibold tracking-[0.2em]" data-testid="join-code">
                {workshop.code}
              </p>
              <p className="text-sm [overflow-wrap:anywhere]">Or the link: {joinLink}</p>
              <div className="flex flex-wrap gap-2">
                <Button variant="secondary" disabled={closed || update.isPending} onClick={() => update.mutate({ id: workshop.id, change: { joinCode: 'new' } })}>
                  New code
                </Button>
                <Button variant="secondary" disabled={closed || update.isPending} onClick={() => update.mutate({ id: workshop.id, change: { joinCode: null } })}>
                  Turn the code off
                </Button>
              </div>
            </>
          ) : (
            <>
              <p className="text-sm text-ink-soft">{closed ? 'The workshop is closed.' : 'Joining by code is off; invitations still work.'}</p>
              {!closed && (
                <Button variant="secondary" className="self-start" onClick={() => update.mutate({ id: workshop.id, change: { joinCode: 'new' } })}>
                  Make a code
                </Button>
              )}
            </>
          )}
        </section>
        <KitPanel workshop={workshop} />
        <section aria-labelledby="manage-heading" className={panel}>
          <h2 id="manage-heading" className="font-semibold">
            Run it
          </h2>
          {workshop.kit.latestVersion !== null && workshop.kit.latestVersion > workshop.kit.version && !closed && (
            <Button variant="secondary" onClick={() => update.mutate({ id: workshop.id, change: { version: workshop.kit.latestVersion! } })}>
              Move the kit to version {workshop.kit.latestVersion} (members are told)
            </Button>
          )}
          <Button variant="secondary" disabled={closed || sendKit.isPending || workshop.members === 0} onClick={() => sendKit.mutate(workshop.id)}>
            {sendKit.isPending ? 'Sending…' : `Send the kit to ${workshop.members} member${workshop.members === 1 ? '' : 's'}`}
          </Button>
          {sendKit.isSuccess && <Notice tone="success">Sent the kit to {sendKit.data.sent} member{sendKit.data.sent === 1 ? '' : 's'}.</Notice>}
          {sendKit.isError && <Notice tone="error">{sendKit.error.message}</Notice>}
          {!closed &&
            (confirmClose ? (
              <div className="flex flex-wrap gap-2">
                <Button variant="danger" onClick={() => update.mutate({ id: workshop.id, change: { closed: true } })}>
                  Close it for good
                </Button>
                <Button variant="secondary" onClick={() => setConfirmClose(false)}>
                  Keep it open
                </Button>
              </div>
            ) : (
              <Button variant="secondary" onClick={() => setConfirmClose(true)}>
                Close the workshop…
              </Button>
            ))}
          <Button variant="danger" disabled={del.isPending} onClick={() => window.confirm('Delete this workshop, its roster and invitations? Members keep their burns.') && del.mutate(workshop.id, { onSuccess: () => void navigate('/workshops') })}>
            Delete the workshop
          </Button>
        </section>
      </div>

      <section aria-labelledby="roster-heading" className={panel}>
        <h2 id="roster-heading" className="font-semibold">
          Roster
        </h2>
        {!closed && (
          <form onSubmit={sendInvitations} className="flex flex-col gap-2">
            <label className="flex flex-col gap-1 text-sm font-medium">
              Invite by e-mail (paste a list: one per line, or separated by commas)
              <textarea value={emails} onChange={(e) => setEmails(e.target.value)} rows={3} className="rounded-md border border-rule bg-white px-3 py-2 text-base font-normal" />
            </label>
            <Button type="submit" disabled={invite.isPending} className="self-start">
              {invite.isPending ? 'Sending…' : 'Send invitations'}
            </Button>
            {invite.isError && <Notice tone="error">{invitationProblem(invite.error, sentList)}</Notice>}
            {invite.data && (
              <Notice tone="success">
                Invited {invite.data.invited.length}.{invite.data.alreadyMembers.length > 0 && ` Already in: ${invite.data.alreadyMembers.join(', ')}.`}
                {invite.data.overCapacity.length > 0 && ` No room for: ${invite.data.overCapacity.join(', ')} (raise the number of places first).`}
              </Notice>
            )}
          </form>
        )}
        <div className="overflow-x-auto">
          <table className="w-full min-w-[32rem] border-collapse text-sm">
            <thead>
              <tr className="border-b border-rule text-left">
                <th scope="col" className="py-1 pr-3">Who</th>
                <th scope="col" className="py-1 pr-3">Where they are</th>
                <th scope="col" className="py-1 pr-3">Burns</th>
                <th scope="col" className="py-1 pr-3">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {(workshop.roster ?? []).map((r) => (
                <tr key={r.email} className="border-b border-rule/60">
                  <td className="py-1 pr-3">
                    {r.name && <span className="block">{r.name}</span>}
                    <span className="text-ink-soft [overflow-wrap:anywhere]">{r.email}</span>
                  </td>
                  <td className="py-1 pr-3">{statusWords[r.status]}</td>
                  <td className="py-1 pr-3">{r.burns}</td>
                  <td className="py-1 pr-3">
                    {r.userId ? (
                      <button type="button" disabled={closed} onClick={() => remove.mutate({ id: workshop.id, userId: r.userId! })} className="min-h-10 text-danger underline disabled:opacity-50">
                        Remove
                      </button>
                    ) : (
                      <button type="button" disabled={closed} onClick={() => invite.mutate({ id: workshop.id, input: { emails: [r.email] } })} className="min-h-10 text-ember-700 underline disabled:opacity-50">
                        Send again
                      </button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {remove.isError && <Notice tone="error">{remove.error.message}</Notice>}
      </section>

      <section aria-labelledby="results-heading" className="flex flex-col gap-3">
        <h2 id="results-heading" className="text-lg font-semibold">
          The group’s burns
        </h2>
        {burns.isError && <Notice tone="error">{burns.error.message}</Notice>}
        {burns.data && <GroupBurns burns={burns.data.burns} showNames />}
      </section>
      <Briefing workshop={workshop} />
    </div>
  );
}
