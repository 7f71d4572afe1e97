/**
 * The precision of a measured order: a value compared with `observed ± tolerance` is written with
 * no more decimals than the finer of the two (a prediction of 0.5556 against 1.0 ± 0.1 reads 0.6),
 * so the same comparison never prints one value two ways in a message and on a page.
 */

/** Decimal places in the shortest text of a number (0.52 → 2, 1 → 0, 1.5e-3 → 4). */
export function decimalPlaces(x: number): number {
  if (!Number.isFinite(x)) return 0;
  const [mantissa, exponent] = Math.abs(x).toExponential().split('e') as [string, string];
  const digits = (mantissa.split('.')[1] ?? '').length;
  return Math.max(0, digits - Number(exponent));
}

/** The decimals of a measurement `observed ± tolerance`: the finer of the two (at most 6). */
export function measurementDecimals(observed: number, tolerance: number): number {
  return Math.min(6, Math.max(decimalPlaces(observed), decimalPlaces(tolerance)));
}
