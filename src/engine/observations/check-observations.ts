/**
 * Judges every observed order of a record against each derived rate law, at its conditions or by
 * its limits, and reads the resting state of each conserved catalyst at each observation.
 */
import type { Observation, Status } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import {
  contradiction,
  judgeOrder,
  openVerdict,
  readObservedOrder,
  type ObservationCheck,
  type Prediction,
} from './judge-order.ts';
import { orderBounds } from './order-bounds.ts';
import type { RateLawContext } from '../rate-law/context.ts';
import { lawExpression, type DerivedRateLaw } from '../rate-law/derive-rate-laws.ts';
import { observationValues } from '../rate-law/numeric-values.ts';
import { numericOrderAt } from '../rate-law/numeric-order.ts';
import { apparentOrder, orderLimitsOf, withAbsent, type RateExpression } from '../rate-law/orders.ts';
import { RationalFunction } from '../exact/index.ts';
import type { OrderRange } from '../rate-law/rate-law.ts';
import { restingStates, type RestingState } from '../rate-law/resting-state.ts';

/** The presented law with the species this observation lacks (zero concentration) taken as absent. */
function lawAt(
  derived: DerivedRateLaw,
  symbol: string,
  values: ReadonlyMap<string, number>,
): RateExpression | undefined {
  const expression = lawExpression(derived);
  if (!expression) return undefined;
  const absent = expression.symbols().filter((s) => values.get(s) === 0 && s !== symbol);
  return withAbsent(expression, absent);
}

/** Order limits of the law as this observation has it. */
function limitsAt(
  derived: DerivedRateLaw,
  species: string,
  law: RateExpression | undefined,
  symbol: string,
): OrderRange | undefined {
  return (law && orderLimitsOf(law, [{ species, symbol }]).get(species)) ?? derived.orders.get(species);
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
        const prediction = predict(derived, species, symbol, values, context);
        const check = judgeOrder(
          observation.id,
          species,
          derived.law.method,
          observed.value,
          observed.tolerance,
          prediction,
        );
        checks.push(check);
        if (lawIndex !== 0) return;
        if (check.status === 'fail') diagnostics.push(contradiction(check, record.status, index));
        else if (check.status !== 'pass' && symbol) diagnostics.push(openVerdict(check, index));
      });
    }
  });
  return { checks, restingStates: resting, diagnostics };
}

/** What one law predicts for one species at one observation's conditions. */
function predict(
  derived: DerivedRateLaw,
  species: string,
  symbol: string | undefined,
  values: ReadonlyMap<string, number>,
  context: RateLawContext,
): Prediction {
  if (!symbol || !context.mechanism.species.has(species))
    return { missing: `${species} is not a species of this mechanism` };
  const prediction: Prediction = {};
  const law = lawAt(derived, symbol, values);
  const limits = limitsAt(derived, species, law, symbol);
  if (limits) prediction.limits = limits;
  if (law instanceof RationalFunction) prediction.bounds = orderBounds(law, symbol);
  else if (law) {
    // A law with radicals: its orders at the limits are exact, but no bound between them is worked out.
    prediction.bounds = 'unbounded';
    prediction.openReason = 'the law holds a radical, so without constants only its limiting orders are known';
  }
  const exact = derived.law.expression ?? derived.algebraic?.expression;
  const at = exact
    ? apparentOrder(exact, symbol, values, limits?.low.toNumber())
    : derived.law.nonlinear && numericOrderAt(derived.law.nonlinear, symbol, values);
  if (typeof at === 'number' && Number.isFinite(at)) prediction.atConditions = at;
  else if (!exact)
    prediction.missing =
      'the steady state has no closed form, so the order comes only from solving it numerically at these conditions, which needs every rate constant and concentration';
  return prediction;
}
