/**
 * The energetic span model (Kozuch & Shaik, J. Phys. Chem. A 2008, 112, 6032; Acc. Chem. Res.
 * 2011, 44, 101 — formulas written from memory and checked against the exact steady state of the
 * same cycles in tests/reference/energetic-span.test.ts):
 *
 *   TOF = (k_B T/h) (e^{−ΔG_r/RT} − 1) / Σ_ij e^{(T_i − I_j − δG'_ij)/RT},
 *   δG'_ij = ΔG_r if transition state i comes after intermediate j, else 0.
 *
 * The largest term names the TOF-determining transition state (TDTS) and intermediate (TDI);
 * δE = T − I if the TDTS comes after the TDI, T − I + ΔG_r if before, and TOF ≈ (k_B T/h) e^{−δE/RT}.
 */
import { GAS_CONSTANT } from '../units/physical-constants.ts';
import { thermalFrequency } from './eyring.ts';

/** One turnover's minima and transition states, in route order. */
export interface SpanInput {
  /** minima of one turnover / J mol^-1: minima[0] the start, minima[N] the end (N + 1 values) */
  minima: readonly number[];
  /** transition states / J mol^-1: transitions[i − 1] is TS i, between minima i − 1 and i (N values) */
  transitions: readonly number[];
  /** temperature / K */
  T: number;
  /** a cycle returns to its start lowered by ΔG_r; a sequence is passed once and drained at the end */
  kind: 'cycle' | 'sequence';
}

/** The determining states, the span and the turnover frequencies of one turnover. */
export interface SpanResult {
  /** δE / J mol^-1 */
  span: number;
  /** TS index (1-based) of the TDTS and minimum index of the TDI */
  tdts: number;
  tdi: number;
  /** turnover frequency from the full expression / s^-1 (negative when the cycle runs backwards) */
  tof: number;
  /** (k_B T/h) e^{−δE/RT} / s^-1 */
  tofSpan: number;
  /**
   * Degree of TOF control of TS i (at i − 1) and of intermediate j (at j, j = 0…N−1): exactly
   * −∂ln TOF/∂(T_i/RT) and +∂ln TOF/∂(I_j/RT); each list sums to 1.
   */
  controlTransitions: number[];
  controlIntermediates: number[];
  /** ΔG_r of one turnover / J mol^-1 */
  reactionEnergy: number;
}

/** Applies the energetic span model to one turnover; undefined when the lists do not fit together. */
export function energeticSpan(input: SpanInput): SpanResult | undefined {
  const { minima, transitions, T, kind } = input;
  const n = transitions.length;
  if (n === 0 || minima.length !== n + 1 || !(T > 0)) return undefined;
  const RT = GAS_CONSTANT * T;
  const dG = minima[n]! - minima[0]!;
  // The intermediates are minima 0…N−1: the last minimum is the first one of the next turnover.
  const terms: { i: number; j: number; exponent: number; span: number }[] = [];
  for (let i = 1; i <= n; i++) {
    for (let j = 0; j < n; j++) {
      const after = i > j;
      // A sequence is drained at its end, so no later pass makes a TS "before" an intermediate
      // count: that is the cycle with ΔG_r → −∞, where those terms vanish against the rest.
      if (kind === 'sequence' && !after) continue;
      const gap = transitions[i - 1]! - minima[j]!;
      const exponent = (gap - (after && kind === 'cycle' ? dG : 0)) / RT;
      terms.push({ i, j, exponent, span: after ? gap : gap + dG });
    }
  }
  const top = terms.reduce((best, t) => (t.exponent > best.exponent ? t : best), terms[0]!);
  const shifted = terms.map((t) => Math.exp(t.exponent - top.exponent));
  const total = shifted.reduce((a, b) => a + b, 0);
  const lnSum = top.exponent + Math.log(total);
  const frequency = thermalFrequency(T);
  const controlTransitions = new Array<number>(n).fill(0);
  const controlIntermediates = new Array<number>(n).fill(0);
  terms.forEach((t, k) => {
    controlTransitions[t.i - 1]! += shifted[k]! / total;
    controlIntermediates[t.j]! += shifted[k]! / total;
  });
  return {
    span: top.span,
    tdts: top.i,
    tdi: top.j,
    tof: kind === 'cycle' ? frequency * drivingFactor(-dG / RT, lnSum) : frequency * Math.exp(-lnSum),
    tofSpan: frequency * Math.exp(-top.span / RT),
    controlTransitions,
    controlIntermediates,
    reactionEnergy: dG,
  };
}

// (e^a − 1)/e^{lnSum} without overflowing e^a for a strongly exergonic cycle; the sign carries
// the direction (a < 0: endergonic, the cycle runs backwards at standard state).
function drivingFactor(a: number, lnSum: number): number {
  if (a === 0) return 0;
  const lnAbs = a > 0 ? a + Math.log1p(-Math.exp(-a)) : Math.log(-Math.expm1(a));
  return Math.sign(a) * Math.exp(lnAbs - lnSum);
}
