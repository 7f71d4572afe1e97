/** Judges every observed order of a record against each derived rate law, at its conditions or by its limits. */
import type { MechanismRecord } from '../../model/mechanism-record.ts';
import { diagnostic, type Diagnostic } from '../../model/diagnostic.ts';
import { contradiction, judgeOrder, readObservedOrder, type ObservationCheck, type Prediction } from './judge-order.ts';
import type { StepConstants } from '../mechanism/step-constants.ts';
import type { RateLawContext } from '../rate-law/context.ts';
import type { DerivedRateLaw } from '../rate-law/derive-rate-laws.ts';
import { constantValues, observationValues } from '../rate-law/numeric-values.ts';
import { numericOrderAt } from '../rate-law/numeric-order.ts';
import { apparentOrder, orderLimitsOf, withAbsent } from '../rate-law/orders.ts';
import type { OrderRange } from '../rate-law/rate-law.ts';
import { restingStates } from '../rate-law/resting-state.ts';

/** Checks each observation; contradictions of the first (primary) rate law become diagnostics. */
/** Order limits with the species this observation lacks (zero concentration) taken as absent. */
function limitsAt(derived: DerivedRateLaw, species: string, symbol: string | undefined, values: ReadonlyMap<string, number>): OrderRange | undefined {
  const expression = derived.presented?.expression;
  if (!expression || !symbol) return derived.orders.get(species);
  const absent = expression.symbols().filter((s) => values.get(s) === 0 && s !== symbol);
  return orderLimitsOf(withAbsent(expression, absent), [{ species, symbol }]).get(species) ?? derived.orders.get(species);
}

/** Judges every observed order of a record against each derived rate law. */
export function checkObservations(
  record: MechanismRecord,
  context: RateLawContext,
  rateLaws: readonly DerivedRateLaw[],
  constants: readonly StepConstants[],
  symbols: readonly { species: string; symbol: string }[],
): { checks: ObservationCheck[]; diagnostics: Diagnostic[] } {
  const checks: ObservationCheck[] = [];
  const diagnostics: Diagnostic[] = [];
  const given = constantValues(context.mechanism, constants);
  (record.observations ?? []).forEach((observation, index) => {
    const conditions = observationValues(observation, index, context);
    diagnostics.push(...conditions.diagnostics);
    const values = new Map([...given, ...conditions.values]);
    for (const derived of rateLaws) {
      for (const state of restingStates(derived.law.catalystBalances, values)) derived.restingStates.push({ observation: observation.id, ...state });
    }
    for (const [species, text] of Object.entries(observation.orders ?? {})) {
      const path = ['observations', index, 'orders', species];
      const observed = readObservedOrder(text);
      if ('error' in observed) {
        diagnostics.push(diagnostic('observation/units', 'error', `order in ${species}: ${observed.error}`, { path }));
        continue;
      }
      const symbol = symbols.find((s) => s.species === species)?.symbol;
      if (!context.mechanism.species.has(species)) {
        diagnostics.push(diagnostic('observation/species', 'warning', `${species} is not a species of this mechanism`, { path }));
      }
      rateLaws.forEach((derived, lawIndex) => {
        const prediction: Prediction = {};
        const limits = limitsAt(derived, species, symbol, values);
        if (symbol && limits) prediction.limits = limits;
        if (symbol && context.mechanism.species.has(species)) {
          const at = derived.law.expression
            ? apparentOrder(derived.law.expression, symbol, values, limits?.low.toNumber())
            : derived.law.nonlinear && numericOrderAt(derived.law.nonlinear, symbol, values);
          if (typeof at === 'number') prediction.atConditions = at;
        }
        const check = judgeOrder(observation.id, species, derived.law.method, observed.value, observed.tolerance, prediction);
        checks.push(check);
        if (lawIndex === 0 && check.status === 'fail') diagnostics.push(contradiction(check, record.status, index));
      });
    }
  });
  return { checks, diagnostics };
}
