/**
 * Judges every observed order of a record against each derived rate law, at its conditions or by
 * its limits, and reads the resting state of each conserved catalyst at each observation.
 */
import type { Observation, Status } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { contradiction, judgeOrder, readObservedOrder, type ObservationCheck, type Prediction } from './judge-order.ts';
import type { RateLawContext } from '../rate-law/context.ts';
import { lawExpression, type DerivedRateLaw } from '../rate-law/derive-rate-laws.ts';
import { observationValues } from '../rate-law/numeric-values.ts';
import { numericOrderAt } from '../rate-law/numeric-order.ts';
import { apparentOrder, orderLimitsOf, withAbsent } from '../rate-law/orders.ts';
import type { OrderRange } from '../rate-law/rate-law.ts';
import { restingStates, type RestingState } from '../rate-law/resting-state.ts';

/** Order limits with the species this observation lacks (zero concentration) taken as absent. */
function limitsAt(
  derived: DerivedRateLaw,
  species: string,
  symbol: string | undefined,
  values: ReadonlyMap<string, number>,
): OrderRange | undefined {
  const expression = lawExpression(derived);
  if (!expression || !symbol) return derived.orders.get(species);
  const absent = expression.symbols().filter((s) => values.get(s) === 0 && s !== symbol);
  return (
    orderLimitsOf(withAbsent(expression, absent), [{ species, symbol }]).get(species) ?? derived.orders.get(species)
  );
}

/** What the observations say about each rate law. */
export interface ObservationJudgement {
  checks: ObservationCheck[];
  /** per rate law (same order), the dominant catalyst form at each observation */
  restingStates: (RestingState & { observation: string })[][];
  /** contradictions of the first (primary) rate law, and unreadable observations */
  diagnostics: Diagnostic[];
}

/** The record fields the judgement reads: its observations, and its status (a favoured record's contradiction is an error). */
export interface ObservedRecord {
  observations?: readonly Observation[];
  status: Status;
}

/** Judges every observed order of a record against each derived rate law; `given` holds the numeric constants by symbol. */
export function checkObservations(
  record: ObservedRecord,
  context: RateLawContext,
  rateLaws: readonly DerivedRateLaw[],
  given: ReadonlyMap<string, number>,
  symbols: readonly { species: string; symbol: string }[],
): ObservationJudgement {
  const checks: ObservationCheck[] = [];
  const diagnostics: Diagnostic[] = [];
  const resting = rateLaws.map((): (RestingState & { observation: string })[] => []);
  (record.observations ?? []).forEach((observation, index) => {
    const conditions = observationValues(observation, index, context);
    diagnostics.push(...conditions.diagnostics);
    const values = new Map([...given, ...conditions.values]);
    rateLaws.forEach((derived, lawIndex) => {
      for (const state of restingStates(derived.law.catalystBalances, values))
        resting[lawIndex]!.push({ observation: observation.id, ...state });
    });
    for (const [species, text] of Object.entries(observation.orders ?? {})) {
      const path = ['observations', index, 'orders', species];
      const observed = readObservedOrder(text);
      if ('error' in observed) {
        diagnostics.push(diagnostic('observation/units', 'error', `order in ${species}: ${observed.error}`, { path }));
        continue;
      }
      const symbol = symbols.find((s) => s.species === species)?.symbol;
      if (!context.mechanism.species.has(species)) {
        diagnostics.push(
          diagnostic('observation/species', 'warning', `${species} is not a species of this mechanism`, { path }),
        );
      }
      rateLaws.forEach((derived, lawIndex) => {
        const prediction: Prediction = {};
        const limits = limitsAt(derived, species, symbol, values);
        if (symbol && limits) prediction.limits = limits;
        if (symbol && context.mechanism.species.has(species)) {
          const exact = lawExpression(derived);
          const at = exact
            ? apparentOrder(exact, symbol, values, limits?.low.toNumber())
            : derived.law.nonlinear && numericOrderAt(derived.law.nonlinear, symbol, values);
          if (typeof at === 'number') prediction.atConditions = at;
        }
        const check = judgeOrder(
          observation.id,
          species,
          derived.law.method,
          observed.value,
          observed.tolerance,
          prediction,
        );
        checks.push(check);
        if (lawIndex === 0 && check.status === 'fail') diagnostics.push(contradiction(check, record.status, index));
      });
    }
  });
  return { checks, restingStates: resting, diagnostics };
}
