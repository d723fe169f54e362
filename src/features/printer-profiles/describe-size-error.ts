/**
 * Words for how far a printer is off true size. The percent is (measured / nominal - 1) x 100,
 * so +1.5 prints 1.5 % long. One decimal: a ruler read to 0.5 mm over 150 mm is good to about
 * 0.3 % (worked arithmetic), so a second decimal would be noise.
 */
export function describeSizeError(errorPercent: number): string {
  const size = Math.abs(errorPercent).toFixed(1);
  if (size === '0.0') return 'true to size';
  return `${size} % ${errorPercent > 0 ? 'long' : 'short'}`;
}

/** "+1.5 %" / "−0.7 %" for compact lists, with a real minus sign. */
export function formatSignedPercent(errorPercent: number): string {
  const size = Math.abs(errorPercent).toFixed(1);
  if (size === '0.0') return '0.0 %';
  return `${errorPercent > 0 ? '+' : '\u2212'}${size} %`;
}

/**
 * Home printers usually print within about 1 % of true size; a page shrunk by "fit to page"
 * is typically off by 3 % or more (common practice, no source). Past 2 % we ask to check the dialog.
 */
export const DIALOG_SCALING_SUSPECT_PERCENT = 2;

export function suspectDialogScaling(errorPercent: number): boolean {
  return Math.abs(errorPercent) > DIALOG_SCALING_SUSPECT_PERCENT;
}
