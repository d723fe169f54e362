/**
 * The cautions shown wherever stoves are made or printed. They defer to local rules:
 * Canwright draws hole layouts; it cannot make a fire safe.
 */
export const safetyLine =
  'Wear eye protection and clamp the can when drilling; cut edges are sharp. Burn off coatings outdoors and never heat galvanized metal. Never burn indoors or in a tent: carbon monoxide kills. Follow local fire rules and codes.';

export function SafetyNote({ className = '' }: { className?: string }) {
  return (
    <aside aria-label="Safety" className={`text-sm text-ink-soft ${className}`}>
      <strong className="font-medium text-ink">Safety: </strong>
      {safetyLine}
    </aside>
  );
}
