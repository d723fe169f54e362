import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';
import { TextField } from '../../../components/text-field.tsx';
import { describeSizeError, suspectDialogScaling } from '../describe-size-error.ts';

interface RulerFieldProps {
  label: string;
  nominalMm: number;
  /** "across" or "down the page", as the feedback sentence ends. */
  direction: string;
  registration: UseFormRegisterReturn;
  error?: FieldError;
  /** How far off the printer is, from what is typed so far; undefined while it is not a valid length. */
  errorPercent?: number;
}

/** A measured-length input in mm with live words on what the number means. */
export function RulerField({ label, nominalMm, direction, registration, error, errorPercent }: RulerFieldProps) {
  return (
    <div className="flex flex-col gap-2">
      <TextField
        label={label}
        type="number"
        inputMode="decimal"
        step="any"
        autoComplete="off"
        hint={`Nominal ${nominalMm} mm: measure from the 0 mark to the ${nominalMm} mark.`}
        registration={registration}
        error={error}
      />
      <div aria-live="polite" className="min-h-5 text-sm">
        {errorPercent !== undefined && (
          <>
            <p className="font-medium">
              Your printer prints {describeSizeError(errorPercent)} {direction}.
            </p>
            {suspectDialogScaling(errorPercent) && (
              <p className="mt-1 text-danger">That is a lot for a printer: check the print dialog was set to 100 % or Actual size, then print and measure again.</p>
            )}
          </>
        )}
      </div>
    </div>
  );
}
