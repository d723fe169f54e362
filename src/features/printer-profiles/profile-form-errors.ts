import type { z } from 'zod';
import { CALIBRATION_X_MM, CALIBRATION_Y_MM } from '../../../shared/print/draw-calibration.ts';
import { printerProfileInputSchema } from '../../../shared/print/printer-profile.ts';

// The bounds are products like 150 x 1.1 = 165.00000000000003; a tenth of a mm reads cleanly.
const tidy = (mm: number | null) => (mm === null ? '?' : String(Number(mm.toFixed(1))));

/** The range the shared input schema accepts for a ruler, read from the schema itself. */
function acceptedRange(schema: z.ZodNumber): string {
  return `${tidy(schema.minValue)} and ${tidy(schema.maxValue)} mm`;
}

const { measuredXMm, measuredYMm } = printerProfileInputSchema.shape;

const messages: Record<string, string> = {
  name: 'Give this printer a name of up to 80 characters, like “Office laser”.',
  measuredXMm: `Enter what the ${CALIBRATION_X_MM} mm ruler across the page measures, between ${acceptedRange(measuredXMm)}.`,
  measuredYMm: `Enter what the ${CALIBRATION_Y_MM} mm ruler down the page measures, between ${acceptedRange(measuredYMm)}.`,
};

/**
 * Plain messages for the shared printerProfileInputSchema, passed to the resolver per parse so
 * the form and the API check the very same rules. An empty number box arrives as NaN.
 */
export const profileFormErrors: z.core.$ZodErrorMap = (issue) => (issue.code === 'custom' ? `The name ${issue.message}` : messages[String(issue.path?.[0])]);
