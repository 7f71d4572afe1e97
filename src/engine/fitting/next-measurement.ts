/**
 * What to measure next: for the rivals that survive a data set (not rejected), each with its
 * fitted constants, the concentration of one species — within a range a chemist could make up,
 * 0.1× the lowest to 10× the highest it had in the data (or of its fixed value) — where their
 * predicted initial rates differ most, measured in units of the data's scatter (the residual
 * standard deviation of ln r). Every other concentration stays at the middle of its measured
 * range. A separation under 2 σ anywhere means no single run in that range tells them apart.
 */

/** A surviving rival: its rate as a function of the concentrations by symbol, with its fitted constants. */
export interface SurvivingRival {
  record: string;
  rate(concentrations: ReadonlyMap<string, number>): number;
}

/** The suggested experiment. */
export interface NextMeasurement {
  /** the concentration symbol to vary, e.g. [L] */
  symbol: string;
  /** where the rivals differ most / M */
  concentration: number;
  /** the range searched / M */
  range: [number, number];
  /** the two rivals that differ most there */
  rivals: [string, string];
  /** |ln r₁ − ln r₂| / σ(ln r) there */
  separation: number;
  /** each rival's predicted rate there / M s^-1 */
  rates: [number, number];
}

const GRID = 61;

/**
 * Searches each symbol's range; `middle` holds every concentration at the centre of the data,
 * `spans` the lowest and highest value each symbol had. Undefined with fewer than two rivals.
 */
export function nextMeasurement(
  rivals: readonly SurvivingRival[],
  middle: ReadonlyMap<string, number>,
  spans: ReadonlyMap<string, [number, number]>,
  noise: number,
): NextMeasurement | undefined {
  if (rivals.length < 2 || !(noise > 0)) return undefined;
  let best: NextMeasurement | undefined;
  for (const [symbol, [low, high]] of spans) {
    if (!(low > 0) || !(high > 0)) continue;
    const range: [number, number] = [low / 10, high * 10];
    for (let g = 0; g < GRID; g++) {
      const c = range[0] * Math.pow(range[1] / range[0], g / (GRID - 1));
      const at = new Map(middle).set(symbol, c);
      const rates = rivals.map((r) => r.rate(at));
      for (let a = 0; a < rivals.length; a++)
        for (let b = a + 1; b < rivals.length; b++) {
          const [ra, rb] = [rates[a]!, rates[b]!];
          if (!(ra > 0) || !(rb > 0)) continue;
          const separation = Math.abs(Math.log(ra) - Math.log(rb)) / noise;
          if (!best || separation > best.separation + 1e-9)
            best = {
              symbol,
              concentration: Number(c.toPrecision(2)),
              range,
              rivals: [rivals[a]!.record, rivals[b]!.record],
              separation,
              rates: [ra, rb],
            };
        }
    }
  }
  return best;
}
