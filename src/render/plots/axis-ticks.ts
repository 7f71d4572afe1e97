/** Axis ticks at round numbers: steps of 1, 2 or 5 times a power of ten. */

/** Tick values covering [lo, hi] with about `target` intervals; empty for an empty or bad range. */
export function niceTicks(lo: number, hi: number, target = 5): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || hi <= lo || target < 1) return [];
  const raw = (hi - lo) / target;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const ticks: number[] = [];
  // Counting in whole steps keeps ticks free of accumulated rounding (0.30000000000000004).
  for (let k = Math.ceil(lo / step - 1e-9); k * step <= hi + step * 1e-9; k++)
    ticks.push(Number((k * step).toPrecision(12)));
  return ticks;
}
