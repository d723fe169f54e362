import type { Finding } from '../layout-types.ts';
import type { Check } from './check-context.ts';
import { nameSource } from '../../design/name-source.ts';

/** Side-row positions dropped because they fell in a keep-out: a note, so the count is not a surprise. */
export const checkDroppedHoles: Check = ({ design, dropped }) => {
  const findings: Finding[] = [];
  for (const part of design.parts) {
    for (const row of part.sideRows) {
      const count = dropped.get(`${part.id}/${row.id}`);
      if (!count) continue;
      findings.push({
        rule: 'dropped-in-keep-out',
        severity: row.count - row.skip.length - count === 0 ? 'error' : 'note',
        pieceId: `${part.id}:wall`,
        message: `${count} of the ${row.count} positions of "${nameSource(design, row.id)}" fall in a keep-out and are left out${row.count - row.skip.length - count === 0 ? ': the row has no holes left' : ''}.`,
        numbers: { dropped: count, positions: row.count },
        holeIds: [],
      });
    }
  }
  return findings;
};
