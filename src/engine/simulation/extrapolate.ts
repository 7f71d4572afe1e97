/**
 * A rate extrapolated to zero conversion from readings at a few small extents: the value at ξ = 0
 * of the polynomial through them, by Neville's scheme — Richardson's extrapolation for readings at
 * any extents (e.g. W. H. Press et al., Numerical Recipes, sections 3.1 and 16.4; from memory).
 * Through readings at 1, 2, 3 and 4 % of the extent the cubic leaves an error of about
 * r⁗(0)/24 × 2.4e-7 in fractions of the extent; it is exact for a rate polynomial in the extent of
 * degree three or less, as mass action makes that of one autocatalytic step A + P → 2P,
 * r = k([A]₀ − ξ)([P]₀ + ξ).
 */

/** One reading: the extent reached (M) and the rate there (M s^-1). */
export interface RateReading {
  extent: number;
  rate: number;
}

/** The interpolating polynomial's value at zero extent; the extents must be distinct. */
export function extrapolateToZero(readings: readonly RateReading[]): number {
  // Neville: p[i] holds the value at 0 of the polynomial through readings i … i + level.
  const p = readings.map((r) => r.rate);
  for (let level = 1; level < readings.length; level++) {
    for (let i = 0; i + level < readings.length; i++) {
      const near = readings[i]!.extent;
      const far = readings[i + level]!.extent;
      p[i] = (far * p[i]! - near * p[i + 1]!) / (far - near);
    }
  }
  return p[0]!;
}
