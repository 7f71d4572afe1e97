/**
 * Consistency with the recorded observations (DESIGN.md item 6), three-valued: each observed order
 * ± its uncertainty (± 0.1 when none is given — common practice) passes or fails against the order
 * predicted at the observation's conditions (constants known) or against an order the law fixes
 * whatever the constants; where the order depends on constants that are unknown, the observation
 * fails only outside every order the law allows (order-bounds.ts), and is otherwise not excluded —
 * never a pass. With no prediction at all the status is unknown, with the reason.
 */
import type { MechanismRecord, Status } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { DIMENSIONLESS, sameDimension } from '../units/dimension.ts';
import { parseQuantity } from '../units/quantity.ts';
import { measurementDecimals } from './measurement-precision.ts';
import type { OrderRange, RateLawMethod } from '../rate-law/rate-law.ts';
import type { Rational } from '../exact/rational.ts';

/** The tolerance on an observed order when the record gives none (common practice). */
export const DEFAULT_ORDER_TOLERANCE = 0.1;

/** The outcome of one check: `not_excluded` — the law allows the order for some constants, which are unknown. */
export type Verdict = 'pass' | 'fail' | 'not_excluded' | 'unknown';

export interface ObservationCheck {
  observation: string;
  species: string;
  method: RateLawMethod;
  observed: number;
  tolerance: number;
  /** the order at the observation's conditions, or the order the law fixes whatever the constants */
  predicted?: number;
  /** where the order depends on unknown constants: the orders the law allows at these conditions */
  range?: [number, number];
  /** the limiting orders as [X] → 0 and [X] → ∞, where they differ (for display; they bound nothing) */
  limits?: [number, number];
  basis: 'conditions' | 'limits' | 'none';
  status: Verdict;
  /** why there is no prediction, or why the constants leave it open */
  reason?: string;
}

/** What the rate law predicts for one species of one observation. */
export interface Prediction {
  atConditions?: number;
  limits?: OrderRange;
  /** every order the law allows for some constants, or 'unbounded' (terms of both signs) */
  bounds?: [Rational, Rational] | 'unbounded';
  /** why nothing could be predicted */
  missing?: string;
  /** why the constants leave the order open where `bounds` is 'unbounded' */
  openReason?: string;
}

/** Compares one observed order with its prediction. */
export function judgeOrder(
  observation: string,
  species: string,
  method: RateLawMethod,
  observed: number,
  tolerance: number,
  prediction: Prediction,
): ObservationCheck {
  const base = { observation, species, method, observed, tolerance };
  const within = (x: number) => Math.abs(x - observed) <= tolerance + 1e-12;
  const limits = prediction.limits && ([prediction.limits.low.toNumber(), prediction.limits.high.toNumber()] as const);
  const shown = limits && limits[0] !== limits[1] ? { limits: [limits[0], limits[1]] as [number, number] } : {};
  const p = prediction.atConditions;
  if (p !== undefined && Number.isFinite(p))
    return { ...base, predicted: round(p), basis: 'conditions', status: within(p) ? 'pass' : 'fail', ...shown };
  const bounds = prediction.bounds;
  if (bounds && bounds !== 'unbounded') {
    const [lo, hi] = [bounds[0].toNumber(), bounds[1].toNumber()];
    if (bounds[0].equals(bounds[1]))
      return { ...base, predicted: lo, basis: 'limits', status: within(lo) ? 'pass' : 'fail' };
    const inside = observed >= lo - tolerance - 1e-12 && observed <= hi + tolerance + 1e-12;
    return { ...base, range: [lo, hi], basis: 'limits', status: inside ? 'not_excluded' : 'fail', ...shown };
  }
  if (bounds === 'unbounded' && limits)
    return {
      ...base,
      basis: 'limits',
      status: 'not_excluded',
      reason: prediction.openReason ?? 'the law has terms of both signs, so without constants it allows any order',
      ...shown,
    };
  return { ...base, basis: 'none', status: 'unknown', reason: prediction.missing ?? 'no rate law predicts it' };
}

/** Reads an observed order: a bare number with an optional ± uncertainty. */
export function readObservedOrder(text: string | number): { value: number; tolerance: number } | { error: string } {
  const parsed = parseQuantity(text);
  if ('error' in parsed) return { error: parsed.error };
  if (!sameDimension(parsed.quantity.unit.dimension, DIMENSIONLESS))
    return { error: 'an order is a plain number, with no unit' };
  return { value: parsed.quantity.value, tolerance: parsed.quantity.uncertainty ?? DEFAULT_ORDER_TOLERANCE };
}

/** The diagnostic for a contradicted observation: an error when the record is favoured. */
export function contradiction(check: ObservationCheck, status: Status, index: number): Diagnostic {
  const predicted =
    check.predicted !== undefined
      ? check.basis === 'limits'
        ? `${check.predicted} whatever the constants`
        : `${check.predicted.toFixed(measurementDecimals(check.observed, check.tolerance))} at these conditions`
      : `only orders from ${check.range![0]} to ${check.range![1]}, whatever the constants`;
  return diagnostic(
    'observation/order',
    status === 'favoured' ? 'error' : 'warning',
    `observation ${check.observation}: order in ${check.species} is ${check.observed} ± ${check.tolerance}, but the ${lawWords(check)} gives ${predicted}`,
    {
      path: ['observations', index, 'orders', check.species],
      actual: check.observed,
      expected: check.predicted ?? check.range,
    },
  );
}

/** The note for a check the constants leave open, or one with no prediction: said, never passed off as a pass. */
export function openVerdict(check: ObservationCheck, index: number): Diagnostic {
  const where = { path: ['observations', index, 'orders', check.species] };
  const head = `observation ${check.observation}: order in ${check.species} ${check.observed} ± ${check.tolerance}`;
  if (check.status === 'unknown')
    return diagnostic('observation/order', 'info', `${head} is not judged: ${check.reason}`, {
      ...where,
      note: 'give the rate constants of every step (k, and k_rev or K) so the order can be computed at these conditions',
    });
  const allowed = check.range
    ? `the ${lawWords(check)} allows orders from ${check.range[0]} to ${check.range[1]} depending on the constants`
    : `${check.reason}`;
  return diagnostic('observation/order', 'info', `${head} is not excluded, but not confirmed either: ${allowed}`, {
    ...where,
    note: 'give the rate constants (k, and k_rev or K, or energies) to judge it at these conditions',
  });
}

/** Indices of the record's observations, for lookup by id. */
export function observationIndex(record: MechanismRecord): Map<string, number> {
  return new Map((record.observations ?? []).map((o, i) => [o.id, i]));
}

function lawWords(check: ObservationCheck): string {
  const method =
    check.method === 'rds' ? 'rate-determining-step' : check.method === 'long_chain' ? 'long-chain' : 'steady-state';
  return `${method} rate law`;
}

function round(x: number): number {
  return Math.round(x * 1e4) / 1e4;
}
