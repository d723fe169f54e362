import { useEffect, useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { formatDuration } from '../../../../shared/units/burn-units.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useDesign } from '../../library/api/get-design.ts';
import { elapsedSeconds, isFinished, loadTimer, markEvent, saveTimer, startTimer, togglePause, undoEvent, type TimerEvent, type TimerState } from '../burn-timer.ts';
import { BurnSafetyNote } from './burn-safety-note.tsx';

const eventWords: Record<TimerEvent, { button: string; done: string }> = {
  jets: { button: 'Jets lit', done: 'Jets lit at' },
  boil: { button: 'Water boiling', done: 'Boiling at' },
  out: { button: 'Flame out', done: 'Out at' },
};

/** The wall clock, read when a button is pressed. */
const at = () => Date.now();

/** Redraws a few times a second; the time itself always comes from the clock. */
function useNow(running: boolean): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!running) return;
    const tick = () => setNow(Date.now());
    const timer = setInterval(tick, 250);
    // Back from a locked screen or another tab: show the right time at once.
    document.addEventListener('visibilitychange', tick);
    return () => {
      clearInterval(timer);
      document.removeEventListener('visibilitychange', tick);
    };
  }, [running]);
  return now;
}

/** /library/:id/timer: a phone in one hand at the stove; large buttons, kept in the browser. */
export function BurnTimerPage() {
  const designId = useParams().id ?? '';
  const navigate = useNavigate();
  const design = useDesign(designId);
  const [timer, setTimer] = useState<TimerState | null>(() => loadTimer());
  const [replacing, setReplacing] = useState(false);
  const running = timer !== null && !isFinished(timer) && timer.pausedAt === null;
  const now = useNow(running);
  const name = design.data?.name ?? 'this design';

  function change(next: TimerState | null) {
    saveTimer(next);
    setTimer(next);
  }
  const otherDesign = timer !== null && timer.designId !== designId;

  const back = (
    <Link to={`/library/${encodeURIComponent(designId)}`} className="text-ember-700 underline">
      Back to {name}
    </Link>
  );

  if (timer === null || (otherDesign && replacing)) {
    return (
      <Page title="Burn timer" intro={<p>For {name}. {back}</p>}>
        <div className="flex flex-col gap-4">
          <p>Press start as you light the fire. The timer keeps running if the screen locks or the page reloads, and the times stay on this device until you save the entry.</p>
          <Button className="min-h-16 text-lg" onClick={() => change(startTimer(designId, name, at()))}>
            Start: fire lit
          </Button>
          <BurnSafetyNote />
        </div>
      </Page>
    );
  }

  if (otherDesign) {
    return (
      <Page title="Burn timer" intro={<p>{back}</p>}>
        <div className="flex flex-col gap-4">
          <Notice tone="info">A timer for “{timer.designName}” is still kept on this device.</Notice>
          <Link to={`/library/${encodeURIComponent(timer.designId)}/timer`} className="inline-flex min-h-12 items-center justify-center rounded-md bg-ember-600 px-4 text-white">
            Go to that timer
          </Link>
          <Button variant="danger" onClick={() => setReplacing(true)}>
            Drop it and time {name}
          </Button>
        </div>
      </Page>
    );
  }

  const elapsed = elapsedSeconds(timer, now);
  const finished = isFinished(timer);
  return (
    <Page title="Burn timer" intro={<p>{timer.designName}, lit at {new Date(timer.startedAt).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })}. {back}</p>}>
      <div className="flex flex-col gap-4">
        <p className="text-center font-mono text-6xl font-semibold tabular-nums" role="timer" aria-label="Time since lighting">
          {formatDuration(finished ? (timer.events.out as number) : elapsed)}
        </p>
        {timer.pausedAt !== null && <p className="text-center font-medium text-ember-700">Paused</p>}
        <div className="grid gap-3">
          {(['jets', 'boil', 'out'] as const).map((event) => {
            const marked = timer.events[event];
            return marked === undefined ? (
              <Button key={event} variant={event === 'out' ? 'danger' : 'primary'} className="min-h-16 text-lg" disabled={finished} onClick={() => change(markEvent(timer, event, at()))}>
                {eventWords[event].button}
              </Button>
            ) : (
              <div key={event} className="flex min-h-16 items-center justify-between rounded-md border border-rule bg-white px-4">
                <span className="text-lg">
                  {eventWords[event].done} <strong className="tabular-nums">{formatDuration(marked)}</strong>
                </span>
                <button type="button" onClick={() => change(undoEvent(timer, event))} className="min-h-10 px-2 text-sm text-ember-700 underline">
                  Undo
                </button>
              </div>
            );
          })}
        </div>
        {!finished && (
          <Button variant="secondary" className="min-h-12" onClick={() => change(togglePause(timer, at()))}>
            {timer.pausedAt === null ? 'Pause' : 'Resume'}
          </Button>
        )}
        <section aria-labelledby="summary-heading" className="rounded-lg border border-rule bg-white p-4">
          <h2 id="summary-heading" className="font-semibold">
            Summary
          </h2>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-ink-soft">Jets lit</dt>
            <dd>{timer.events.jets === undefined ? '—' : formatDuration(timer.events.jets)}</dd>
            <dt className="text-ink-soft">Boiling</dt>
            <dd>{timer.events.boil === undefined ? '—' : formatDuration(timer.events.boil)}</dd>
            <dt className="text-ink-soft">Burn time</dt>
            <dd>{finished ? formatDuration(timer.events.out as number) : `${formatDuration(elapsed)} so far`}</dd>
          </dl>
          <Button className="mt-4 min-h-12 w-full" onClick={() => void navigate(`/library/${encodeURIComponent(designId)}/burns/new?from=timer`)}>
            {finished ? 'Write up the entry' : 'Write up the entry now'}
          </Button>
        </section>
        <button type="button" onClick={() => window.confirm('Drop these times? They are not saved anywhere else.') && change(null)} className="min-h-10 self-start text-sm text-danger underline">
          Drop the timer
        </button>
        <BurnSafetyNote />
      </div>
    </Page>
  );
}
