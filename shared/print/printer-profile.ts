import { z } from 'zod';
import { CALIBRATION_X_MM, CALIBRATION_Y_MM } from './draw-calibration.ts';
import { refinePrintable } from './printable-text.ts';
import type { PrinterScale } from './plan-kit.ts';

/**
 * A printer profile: what the maker measured on the calibration sheet. A printer that prints the
 * 150 mm ruler as 152.25 mm is 1.5 % long in X; kits are then drawn 1/1.015 as long.
 */
export const printerProfileInputSchema = z.object({
  // The name prints on every sheet of a kit scaled for this printer.
  name: z.string().trim().min(1).max(80).superRefine(refinePrintable),
  measuredXMm: z.number().min(CALIBRATION_X_MM * 0.9).max(CALIBRATION_X_MM * 1.1),
  measuredYMm: z.number().min(CALIBRATION_Y_MM * 0.9).max(CALIBRATION_Y_MM * 1.1),
});
export type PrinterProfileInput = z.infer<typeof printerProfileInputSchema>;

export function printerScale(profile: Pick<PrinterProfileInput, 'measuredXMm' | 'measuredYMm'>): PrinterScale {
  return { scaleX: profile.measuredXMm / CALIBRATION_X_MM, scaleY: profile.measuredYMm / CALIBRATION_Y_MM };
}

/**
 * A saved profile as the API returns it (/api/printer-profiles). scaleX/Y are what the kit is
 * divided by; errorX/YPercent is how far the printer is off, +1.5 = prints 1.5 % long.
 */
export const printerProfileSchema = z.object({
  id: z.string(),
  name: z.string(),
  measuredXMm: z.number(),
  measuredYMm: z.number(),
  isDefault: z.boolean(),
  scaleX: z.number(),
  scaleY: z.number(),
  errorXPercent: z.number(),
  errorYPercent: z.number(),
  createdAt: z.string(),
});
export type PrinterProfile = z.infer<typeof printerProfileSchema>;

/** GET /api/printer-profiles: the default first, then the newest. */
export const printerProfileListSchema = z.object({ profiles: z.array(printerProfileSchema) });
export type PrinterProfileList = z.infer<typeof printerProfileListSchema>;
