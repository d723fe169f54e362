import { useId, useState } from 'react';
import type { PaperId } from '../../../../shared/print/imposition-types.ts';
import { paperIds, paperSizes } from '../../../../shared/print/paper.ts';
import { guessPaper } from '../guess-paper.ts';
import { StepSection } from './step-section.tsx';

const isoPapers: readonly PaperId[] = ['a4', 'a3'];
// 1 in = 25.4 mm exactly (NIST SP 811); rounded so 215.9 mm reads 8.5, not 8.4999….
const inches = (mm: number) => Number((mm / 25.4).toFixed(2));

/** Sizes as people say them: mm for ISO 216 papers, inches for the North American ones. */
function describePaper(id: PaperId): string {
  const { name, widthMm, heightMm } = paperSizes[id];
  if (isoPapers.includes(id)) return `${name} (${widthMm} × ${heightMm} mm)`;
  return `${name} (${inches(widthMm)} × ${inches(heightMm)} in)`;
}

function calibrationSheetUrl(paper: PaperId): string {
  return `/api/render/calibration.pdf?${new URLSearchParams({ paper })}`;
}

export function CalibrationSheetStep() {
  const selectId = useId();
  const [paper, setPaper] = useState<PaperId>(() => guessPaper());
  return (
    <StepSection step={1} title="Print the calibration sheet" intro="One page with a long ruler across it and another down it. Print it on the printer you will print templates with.">
      <div className="flex flex-col gap-4 sm:flex-row sm:items-end">
        <div className="flex flex-col gap-1">
          <label htmlFor={selectId} className="text-sm font-medium">
            Paper
          </label>
          <select
            id={selectId}
            value={paper}
            onChange={(event) => setPaper(event.target.value as PaperId)}
            className="min-h-10 rounded-md border border-rule bg-white px-3 py-2 text-base sm:w-64"
          >
            {paperIds.map((id) => (
              <option key={id} value={id}>
                {describePaper(id)}
              </option>
            ))}
          </select>
        </div>
        <a
          href={calibrationSheetUrl(paper)}
          download="canwright-calibration.pdf"
          className="inline-flex min-h-10 items-center justify-center rounded-md bg-ember-600 px-4 py-2 text-sm font-medium text-white hover:bg-ember-700"
        >
          Download the calibration sheet (PDF)
        </a>
      </div>
      <ul className="mt-4 list-disc space-y-1 pl-5 text-sm">
        <li>
          In the print dialog choose <strong className="font-medium">100 %</strong> or <strong className="font-medium">Actual size</strong>; turn off “Fit to page” and “Shrink oversized pages”.
        </li>
        <li>Use plain paper and let the page lie flat for a minute before you measure.</li>
      </ul>
    </StepSection>
  );
}
