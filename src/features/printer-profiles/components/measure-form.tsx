import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch, type UseFormSetError } from 'react-hook-form';
import { SignInLink } from '../../../components/sign-in-link.tsx';
import { CALIBRATION_X_MM, CALIBRATION_Y_MM } from '../../../../shared/print/draw-calibration.ts';
import { printerProfileInputSchema, printerScale, type PrinterProfileInput } from '../../../../shared/print/printer-profile.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { useCreatePrinterProfile } from '../api/create-printer-profile.ts';
import { saveBrowserProfile } from '../browser-profile.ts';
import { profileFormErrors } from '../profile-form-errors.ts';
import { RulerField } from './ruler-field.tsx';

type Result = { tone: 'success' | 'error'; text: string; extra?: string[] };

const formFields: readonly string[] = Object.keys(printerProfileInputSchema.shape);
const { measuredXMm: xSchema, measuredYMm: ySchema } = printerProfileInputSchema.shape;

/** A value the schema would accept, else undefined (empty boxes arrive as NaN). */
const acceptedOrUndefined = (schema: typeof xSchema, value: unknown) => (schema.safeParse(value).success ? (value as number) : undefined);

/** Puts the API's field problems beside their fields; returns the ones no field shows. */
function showFieldProblems(error: ApiError, setError: UseFormSetError<PrinterProfileInput>): string[] {
  const unplaced: string[] = [];
  for (const field of error.fields) {
    if (formFields.includes(field.path)) setError(field.path as keyof PrinterProfileInput, { message: field.message });
    else unplaced.push(`${field.path}: ${field.message}`);
  }
  return unplaced;
}

/** Step 2: the two measured lengths and a name; saved to the account, or to this browser for a visitor. */
export function MeasureForm({ signedIn }: { signedIn: boolean | undefined }) {
  const create = useCreatePrinterProfile();
  const [result, setResult] = useState<Result>();
  const { register, handleSubmit, formState, setError, reset, control } = useForm<PrinterProfileInput>({
    resolver: zodResolver(printerProfileInputSchema, { error: profileFormErrors }),
  });
  const [typedX, typedY] = useWatch({ control, name: ['measuredXMm', 'measuredYMm'] });
  const x = acceptedOrUndefined(xSchema, typedX);
  const y = acceptedOrUndefined(ySchema, typedY);
  const scale = printerScale({ measuredXMm: x ?? CALIBRATION_X_MM, measuredYMm: y ?? CALIBRATION_Y_MM });

  async function onSubmit(input: PrinterProfileInput) {
    setResult(undefined);
    if (!signedIn) {
      try {
        saveBrowserProfile(input);
      } catch {
        return setResult({ tone: 'error', text: 'This browser would not store the profile (storage is blocked or full). Sign in to keep it with your account instead.' });
      }
      reset();
      return setResult({ tone: 'success', text: `Saved “${input.name}” in this browser.` });
    }
    try {
      const saved = await create.mutateAsync(input);
      reset();
      setResult({ tone: 'success', text: `Saved “${saved.name}” to your account${saved.isDefault ? ' as your default printer' : ''}.` });
    } catch (error) {
      if (!(error instanceof ApiError)) return setResult({ tone: 'error', text: 'The server could not be reached. Try again in a moment.' });
      setResult({ tone: 'error', text: error.message, extra: showFieldProblems(error, setError) });
    }
  }

  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <RulerField
          label="Across the page (mm)"
          nominalMm={CALIBRATION_X_MM}
          direction="across"
          registration={register('measuredXMm', { valueAsNumber: true })}
          error={formState.errors.measuredXMm}
          errorPercent={x === undefined ? undefined : (scale.scaleX - 1) * 100}
        />
        <RulerField
          label="Down the page (mm)"
          nominalMm={CALIBRATION_Y_MM}
          direction="down the page"
          registration={register('measuredYMm', { valueAsNumber: true })}
          error={formState.errors.measuredYMm}
          errorPercent={y === undefined ? undefined : (scale.scaleY - 1) * 100}
        />
      </div>
      <div className="sm:max-w-sm">
        <TextField label="Printer name" autoComplete="off" placeholder="Office laser" registration={register('name')} error={formState.errors.name} />
      </div>
      {signedIn === false && (
        <p className="text-sm text-ink-soft">
          You are not signed in, so this profile is kept in this browser only, and saving again replaces it.{' '}
          <SignInLink className="text-ember-700 underline">Sign in</SignInLink>{' '}
          to keep printer profiles with your account, on any device.
        </p>
      )}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-center">
        <Button type="submit" disabled={signedIn === undefined || formState.isSubmitting}>
          {formState.isSubmitting ? 'Saving…' : signedIn === false ? 'Save in this browser' : 'Save profile'}
        </Button>
        {result && (
          <Notice tone={result.tone}>
            {result.text}
            {result.extra?.map((line) => (
              <span key={line} className="block">
                {line}
              </span>
            ))}
          </Notice>
        )}
      </div>
    </form>
  );
}
