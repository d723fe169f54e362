import { CALIBRATION_X_MM, CALIBRATION_Y_MM } from '../../../../shared/print/draw-calibration.ts';
import { printerScale, type PrinterProfileInput } from '../../../../shared/print/printer-profile.ts';
import { formatSignedPercent } from '../describe-size-error.ts';

/** What was measured on each ruler and how far off that is, as a short two-row list. */
export function ProfileMeasurements({ profile }: { profile: Pick<PrinterProfileInput, 'measuredXMm' | 'measuredYMm'> }) {
  const { scaleX, scaleY } = printerScale(profile);
  const rows = [
    { axis: 'Across', nominal: CALIBRATION_X_MM, measured: profile.measuredXMm, errorPercent: (scaleX - 1) * 100 },
    { axis: 'Down', nominal: CALIBRATION_Y_MM, measured: profile.measuredYMm, errorPercent: (scaleY - 1) * 100 },
  ];
  return (
    <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
      {rows.map((row) => (
        <div key={row.axis} className="contents">
          <dt className="text-ink-soft">{row.axis}</dt>
          <dd>
            {row.measured} mm of {row.nominal} <span className="text-ink-soft">·</span> <span className="tabular-nums">{formatSignedPercent(row.errorPercent)}</span>
          </dd>
        </div>
      ))}
    </dl>
  );
}
