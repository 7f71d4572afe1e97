/**
 * The time axis of a concentration–time plot: decades on a log axis (with minor ticks at 2…9 ×
 * 10ⁿ where there is room), or round values on a linear axis in the unit that keeps the
 * numbers short (s, min, h, d).
 */
import { superscript } from '../words/index.ts';
import { niceTicks } from './axis-ticks.ts';

/** A labelled tick at `value` (in the axis unit). */
export interface Tick {
  value: number;
  label: string;
}

/** The ticks of an axis: labelled major ticks and unlabelled minor ones. */
export interface AxisTicks {
  major: Tick[];
  minor: number[];
}

/** 10ⁿ with superscript digits and a true minus: `10⁻³`. */
export function powerOfTen(n: number): string {
  return `10${superscript(String(n))}`;
}

/** Decade ticks over [lo, hi] (both > 0): every decade, or every second one beyond 8 decades. */
export function logTicks(lo: number, hi: number): AxisTicks {
  if (!(lo > 0) || !(hi > lo) || !Number.isFinite(hi)) return { major: [], minor: [] };
  const first = Math.ceil(Math.log10(lo) - 1e-9);
  const last = Math.floor(Math.log10(hi) + 1e-9);
  const every = last - first > 8 ? 2 : 1;
  const major: Tick[] = [];
  const minor: number[] = [];
  for (let n = first - 1; n <= last; n++) {
    const value = Number(`1e${n}`);
    if (n >= first && (n - first) % every === 0) major.push({ value, label: powerOfTen(n) });
    else if (n >= first) minor.push(value);
    if (last - first > 6) continue;
    for (let m = 2; m <= 9; m++) {
      const v = Number(`${m}e${n}`);
      if (v > lo && v < hi) minor.push(v);
    }
  }
  return { major, minor: minor.sort((a, b) => a - b) };
}

/** The unit of a linear time axis reaching `end` seconds, and seconds per unit. */
export function timeUnit(end: number): { unit: 's' | 'min' | 'h' | 'd'; seconds: number } {
  if (end <= 600) return { unit: 's', seconds: 1 };
  if (end <= 36_000) return { unit: 'min', seconds: 60 };
  if (end <= 432_000) return { unit: 'h', seconds: 3600 };
  return { unit: 'd', seconds: 86_400 };
}

/** Round ticks over [0, end] with labels printed to the decimals their spacing needs. */
export function linearTicks(end: number, target = 6): AxisTicks {
  const values = niceTicks(0, end, target);
  const step = values.length > 1 ? values[1]! - values[0]! : 1;
  return { major: values.map((value) => ({ value, label: tickLabel(value, step) })), minor: [] };
}

/** A tick value with as many decimals as the tick spacing needs, never in exponent form. */
export function tickLabel(value: number, step: number): string {
  const decimals = step >= 1 ? 0 : Math.min(6, Math.ceil(-Math.log10(step) - 1e-9));
  return value.toFixed(decimals);
}
