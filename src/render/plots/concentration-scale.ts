/**
 * The concentration axis: a unit (M, mM, µM, nM, pM) that keeps its numbers between 0.1 and 1000,
 * and a power-of-ten magnification for curves that would otherwise lie flat on the time axis
 * (a catalyst-bound intermediate at 10⁻⁷ M beside a substrate at 10⁻¹ M). Magnified curves are
 * marked ×10ⁿ in the legend, at the curve's end and in the caption.
 */

/** A display unit: value shown = concentration in M × perMolar. */
export interface ConcentrationUnit {
  /** M, mM, µM, nM, pM; or the record's own unit (`10¹⁴ molecule cm⁻³`) when it writes another */
  symbol: string;
  perMolar: number;
}

const UNITS: readonly ConcentrationUnit[] = [
  { symbol: 'M', perMolar: 1 },
  { symbol: 'mM', perMolar: 1e3 },
  { symbol: 'µM', perMolar: 1e6 },
  { symbol: 'nM', perMolar: 1e9 },
  { symbol: 'pM', perMolar: 1e12 },
];

/** A curve whose peak is below this share of the tallest one is magnified. */
export const MAGNIFY_BELOW = 1 / 20;

/** The unit in which the largest concentration (M) reads between 0.1 and 100, or at most pM. */
export function concentrationUnit(largest: number): ConcentrationUnit {
  if (!(largest > 0)) return UNITS[0]!;
  return UNITS.find((u) => largest * u.perMolar >= 0.1) ?? UNITS[UNITS.length - 1]!;
}

/**
 * The exponent n of the magnification 10ⁿ that brings a curve peaking at `peak` up to between a
 * tenth of `tallest` and `tallest`; 0 when the curve is visible as it is.
 */
export function magnificationExponent(peak: number, tallest: number): number {
  if (!(peak > 0) || !(tallest > 0) || peak >= MAGNIFY_BELOW * tallest) return 0;
  return Math.floor(Math.log10(tallest / peak) + 1e-9);
}
