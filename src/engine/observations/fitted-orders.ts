/**
 * Orders fitted from an initial-rate table judged like hand-entered ones: each order with the
 * half-width of its 95 % interval as the tolerance, at the middle of the measured range (the
 * geometric mean of each varied concentration, where a power law fitted over the range is the
 * local order). A fitted order replaces a hand-entered one for the same observation and species;
 * where both exist and their intervals do not overlap, the disagreement is a warning at the hand
 * entry, since one of the two was worked out wrongly.
 */
import type { MechanismRecord, Observation } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { readObservedOrder, type ObservationCheck } from './judge-order.ts';

/** The orders fitted from one observation's table, and where they hold. */
export interface FittedOrders {
  observationIndex: number;
  /** species → order and the half-width of its interval */
  orders: { species: string; value: number; halfWidth: number }[];
  /** species → the middle of its measured range, in M */
  middle: Map<string, number>;
}

/** Decimal digits enough for an order and its tolerance, without floating-point noise in the report. */
const round = (x: number) => Number(x.toPrecision(3));

/**
 * The record's observations with the fitted orders in place of the hand-entered ones (for the
 * existing judgement), and the warnings where the two disagree.
 */
export function observationsWithFittedOrders(
  record: Pick<MechanismRecord, 'observations'>,
  fitted: readonly FittedOrders[],
): { observations: Observation[]; replaced: Set<string>; diagnostics: Diagnostic[] } {
  const observations = (record.observations ?? []).map((o) => ({ ...o }));
  const replaced = new Set<string>();
  const diagnostics: Diagnostic[] = [];
  for (const f of fitted) {
    const o = observations[f.observationIndex];
    if (!o || f.orders.length === 0) continue;
    const orders: Record<string, string | number> = { ...(o.orders ?? {}) };
    for (const q of f.orders) {
      if (!Number.isFinite(q.value) || !Number.isFinite(q.halfWidth)) continue;
      const hand = orders[q.species];
      if (hand !== undefined) {
        const read = readObservedOrder(hand);
        if (!('error' in read) && Math.abs(read.value - q.value) > read.tolerance + q.halfWidth)
          diagnostics.push(mismatch(o.id, q, read, f.observationIndex));
      }
      orders[q.species] = `${round(q.value)} ± ${round(q.halfWidth)}`;
      replaced.add(`${o.id}\u0000${q.species}`);
    }
    const concentrations: Record<string, string | number> = { ...(o.concentrations ?? {}) };
    for (const [species, c] of f.middle) concentrations[species] = `${c} M`;
    observations[f.observationIndex] = { ...o, orders, concentrations };
  }
  return { observations, replaced, diagnostics };
}

/** Marks which checks come from fitted orders, for the report. */
export function isFittedCheck(check: ObservationCheck, replaced: ReadonlySet<string>): boolean {
  return replaced.has(`${check.observation}\u0000${check.species}`);
}

function mismatch(
  id: string,
  q: FittedOrders['orders'][number],
  hand: { value: number; tolerance: number },
  index: number,
): Diagnostic {
  return diagnostic(
    'observation/fitted-order',
    'warning',
    `observation ${id}: the order in ${q.species} entered by hand, ${hand.value} ± ${hand.tolerance}, disagrees with the order fitted from its data, ${round(q.value)} ± ${round(q.halfWidth)} (95 % interval)`,
    {
      path: ['observations', index, 'orders', q.species],
      actual: hand.value,
      expected: round(q.value),
      note: 'the fitted order is the one judged; correct or remove the hand-entered order',
    },
  );
}
