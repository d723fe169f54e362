/**
 * The field timer of a test burn. Its state is a handful of wall-clock times kept in the
 * browser's storage, so the timer runs on through a screen lock, a reload or a closed tab:
 * elapsed time is always worked out from the clock, never counted by a running interval.
 */

export const timerEvents = ['jets', 'boil', 'out'] as const;
export type TimerEvent = (typeof timerEvents)[number];

export interface TimerState {
  designId: string;
  designName: string;
  /** When the fire was lit (ms since the epoch). */
  startedAt: number;
  /** Set while paused. */
  pausedAt: number | null;
  /** Time spent paused before the current pause. */
  pausedMs: number;
  /** Seconds from lighting at which each event happened. */
  events: Partial<Record<TimerEvent, number>>;
}

const KEY = 'canwright.burn-timer.v1';

export function startTimer(designId: string, designName: string, now: number): TimerState {
  return { designId, designName, startedAt: now, pausedAt: null, pausedMs: 0, events: {} };
}

/** Seconds the fire has burned, leaving out paused time. */
export function elapsedSeconds(state: TimerState, now: number): number {
  const paused = state.pausedMs + (state.pausedAt === null ? 0 : now - state.pausedAt);
  return Math.max(0, (now - state.startedAt - paused) / 1000);
}

export const isFinished = (state: TimerState) => state.events.out !== undefined;

export function markEvent(state: TimerState, event: TimerEvent, now: number): TimerState {
  if (isFinished(state) || state.events[event] !== undefined) return state;
  const at = Math.round(elapsedSeconds(state, now));
  // "Out" ends the burn: a pause in progress ends with it.
  const resumed = event === 'out' && state.pausedAt !== null ? { pausedAt: null, pausedMs: state.pausedMs + (now - state.pausedAt) } : {};
  return { ...state, ...resumed, events: { ...state.events, [event]: at } };
}

/** Takes back the last event marked by mistake. */
export function undoEvent(state: TimerState, event: TimerEvent): TimerState {
  const events = { ...state.events };
  delete events[event];
  return { ...state, events };
}

export function togglePause(state: TimerState, now: number): TimerState {
  if (isFinished(state)) return state;
  if (state.pausedAt === null) return { ...state, pausedAt: now };
  return { ...state, pausedAt: null, pausedMs: state.pausedMs + (now - state.pausedAt) };
}

/** The fields of a burn entry the timer measured; the maker fills in the rest. */
export function timerSummary(state: TimerState, now: number) {
  return {
    date: new Date(state.startedAt).toISOString(),
    timeToJetsS: state.events.jets ?? null,
    timeToBoilS: state.events.boil ?? null,
    burnTimeS: state.events.out ?? Math.round(elapsedSeconds(state, now)),
  };
}

export function loadTimer(storage: Pick<Storage, 'getItem'> = localStorage): TimerState | null {
  try {
    const raw = storage.getItem(KEY);
    if (!raw) return null;
    const state = JSON.parse(raw) as TimerState;
    return typeof state.startedAt === 'number' && typeof state.designId === 'string' && typeof state.events === 'object' ? state : null;
  } catch {
    return null;
  }
}

export function saveTimer(state: TimerState | null, storage: Pick<Storage, 'setItem' | 'removeItem'> = localStorage): void {
  if (state === null) storage.removeItem(KEY);
  else storage.setItem(KEY, JSON.stringify(state));
}
