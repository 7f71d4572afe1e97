/**
 * Consistency with the recorded observations (DESIGN.md item 6): each observed order ± its
 * uncertainty (± 0.1 when none is given — common practice) against the order predicted at the
 * observation's conditions, or, where constants are missing, against the range between the
 * limiting orders ("consistent for some constants").
 */
import type { MechanismRecord, Status } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { DIMENSIONLESS, sameDimension } from '../units/dimension.ts';
import { parseQuantity } from '../units/quantity.ts';
import type { OrderRange, RateLawMethod } from '../rate-law/rate-law.ts';

/** The tolerance on an observed order when the record gives none (common practice). */
export const DEFAULT_ORDER_TOLERANCE = 0.1;

export interface ObservationCheck {
  observation: string;
  species: string;
  method: RateLawMethod;
  observed: number;
  tolerance: number;
  /** the order at the observation's conditions, or the exact order when both limits agree */
  predicted?: number;
  /** the limits, when the order at the conditions is not known */
  range?: [number, number];
  basis: 'conditions' | 'limits' | 'none';
  status: 'pass' | 'fail' | 'unknown';
}

/** What the rate law predicts for one species of one observation. */
export interface Prediction {
  atConditions?: number;
  limits?: OrderRange;
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
  if (prediction.atConditions !== undefined) {
    const p = prediction.atConditions;
    return { ...base, predicted: round(p), basis: 'conditions', status: within(p) ? 'pass' : 'fail' };
  }
  if (prediction.limits) {
    const [a, b] = [prediction.limits.low.toNumber(), prediction.limits.high.toNumber()];
    const [lo, hi] = [Math.min(a, b), Math.max(a, b)];
    if (lo === hi) return { ...base, predicted: lo, basis: 'limits', status: within(lo) ? 'pass' : 'fail' };
    const inside = observed >= lo - tolerance - 1e-12 && observed <= hi + tolerance + 1e-12;
    return { ...base, range: [lo, hi], basis: 'limits', status: inside ? 'pass' : 'fail' };
  }
  return { ...base, basis: 'none', status: 'unknown' };
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
      ? `${check.predicted}`
      : `between ${check.range![0]} and ${check.range![1]} for any constants`;
  return diagnostic(
    'observation/order',
    status === 'favoured' ? 'error' : 'warning',
    `observation ${check.observation}: order in ${check.species} is ${check.observed} ± ${check.tolerance}, but the ${check.method === 'rds' ? 'rate-determining-step' : check.method === 'long_chain' ? 'long-chain' : 'steady-state'} rate law gives ${predicted}`,
    {
      path: ['observations', index, 'orders', check.species],
      actual: check.observed,
      expected: check.predicted ?? check.range,
    },
  );
}

/** Indices of the record's observations, for lookup by id. */
export function observationIndex(record: MechanismRecord): Map<string, number> {
  return new Map((record.observations ?? []).map((o, i) => [o.id, i]));
}

function round(x: number): number {
  return Math.round(x * 1e4) / 1e4;
}
