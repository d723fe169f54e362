import { useFormContext } from 'react-hook-form';
import type { Design, DesignInput } from '../../../../shared/design/design-schema.ts';
import { findDrill } from '../../../../shared/drills/index.ts';
import { solveJetCount } from '../../../../shared/layout/solve-jets.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { formatLength } from '../../../../shared/units/index.ts';
import { Button } from '../../../components/button.tsx';

/**
 * For each row of jets: the fewest holes that keep their flames joined (every gap within the
 * design's warning pitch, as the check measures it) on this can with this drill, and the most
 * that still leave the design's minimum metal between them.
 */
export function JetSolver({ design, units, stale }: { design: Design; units: UnitSystem; stale: boolean }) {
  const { setValue } = useFormContext<DesignInput>();
  const rows = design.parts.flatMap((part, p) => part.sideRows.map((row, r) => ({ part, p, row, r }))).filter(({ row }) => row.group === 'secondary');
  if (rows.length === 0) return null;
  return (
    <div className="flex flex-col gap-2 rounded-md border border-rule bg-white p-3 text-sm">
      <h3 className="font-medium">Jets for a closed flame ring</h3>
      <ul className="flex flex-col gap-2">
        {rows.map(({ part, p, row, r }) => {
          const drill = findDrill(row.drillId);
          if (!drill) return null;
          const answer = solveJetCount(row, drill.diameterMm, part.vessel.outerDiameterMm, design.rules);
          const name = row.label?.trim() || row.id;
          return (
            <li key={`${part.id}/${row.id}`} className="flex flex-wrap items-center justify-between gap-2">
              <span className="min-w-0 flex-1">
                <strong>{name}</strong> ({row.count} of {drill.label}):{' '}
                {answer.fewest
                  ? `at least ${answer.fewest.count} keep every gap within ${formatLength(design.rules.jetPitchWarnMm, units)} (widest ${formatLength(answer.fewest.pitchMm, units)})`
                  : `no count up to the row limit closes every gap within ${formatLength(design.rules.jetPitchWarnMm, units)}: narrow the keep-outs`}
                ; at most {answer.most} leave {formatLength(design.rules.minLigamentMm, units)} of metal between holes.
              </span>
              {answer.fewest && answer.fewest.count !== row.count && answer.fewest.count <= answer.most && (
                <Button variant="secondary" disabled={stale} onClick={() => setValue(`parts.${p}.sideRows.${r}.count`, answer.fewest!.count, { shouldDirty: true })}>
                  Use {answer.fewest.count}
                  <span className="sr-only"> jets in {name}</span>
                </Button>
              )}
            </li>
          );
        })}
      </ul>
    </div>
  );
}
