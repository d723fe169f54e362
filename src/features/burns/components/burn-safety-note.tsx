/** The cautions shown where a test fire is timed or logged. */
export const burnSafetyLine =
  'Light test fires outdoors only, on bare ground or stone, clear of anything that burns, with water at hand. Never inside, in a tent or a car: carbon monoxide kills without warning. The can, the pot and the char stay hot long after the flame is out. Follow local fire rules and bans.';

export function BurnSafetyNote({ className = '' }: { className?: string }) {
  return (
    <aside aria-label="Fire safety" className={`text-sm text-ink-soft ${className}`}>
      <strong className="font-medium text-ink">Fire safety: </strong>
      {burnSafetyLine}
    </aside>
  );
}
