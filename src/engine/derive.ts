/**
 * The derivation of one record, stage by stage: the mechanism and its checks, the constants, the
 * route, the rate laws, the observations, the energies and the simulations. This is the only file
 * that imports every stage; each stage takes the narrow values it needs (the mechanism, the
 * `Route`, the constants), never the derivation being built. Pure: a valid record in, a value
 * with diagnostics out.
 */
import {
  diagnostic,
  type Diagnostic,
  type MechanismRecord,
  type Observation,
  type Role,
  type Status,
} from '../model/index.ts';
import { energyAnalysis, energyConditions, eyringStepConstants, type EnergyResult } from './energy/index.ts';
import { checkBalance, type StepBalance } from './mechanism/balance.ts';
import { checkDetailedBalance } from './mechanism/detailed-balance.ts';
import { buildMechanism, type Mechanism } from './mechanism/mechanism.ts';
import { checkMolecularity } from './mechanism/molecularity.ts';
import { checkNegativeConcentrations } from './mechanism/negative-concentrations.ts';
import { readStepConstants, type StepConstants } from './mechanism/step-constants.ts';
import { checkObservations } from './observations/check-observations.ts';
import type { ObservationCheck } from './observations/judge-order.ts';
import { deriveRateLaws, type DerivedRateLaw } from './rate-law/derive-rate-laws.ts';
import { constantValues } from './rate-law/numeric-values.ts';
import type { RateLawContext } from './rate-law/context.ts';
import type { OverallEquation } from './route/overall-equation.ts';
import { deriveRoute, type Route } from './route/route.ts';
import { checkApproximations, type SimulationCheck } from './simulation/approximation-validity.ts';
import type { SimulationBasis } from './simulation/simulation-setup.ts';
import type { RecordFits } from './fitting/record-fits.ts';

export interface Derivation {
  mechanism?: Mechanism;
  /** atom and charge balance of each step, in record order */
  balance?: StepBalance[];
  /** the route with the roles as the rate law confirmed them (inhibitors); the fields below repeat its parts */
  route?: Route;
  /** Horiuti stoichiometric number σ of each step */
  stoichiometricNumbers?: number[];
  routeSource?: 'given' | 'derived';
  overall?: OverallEquation;
  roles?: Map<string, Role>;
  /** position of each step along the route (off-route steps: Infinity) */
  routeOrder?: number[];
  /** net-zero species that occur only in steps off the route (σ = 0) */
  offRoute?: Set<string>;
  /** species whose free concentration is held constant */
  buffered: string[];
  rateLaws?: DerivedRateLaw[];
  /** what the rate laws were derived in: the symbols and conservation pools (for judging other observations) */
  rateLawContext?: RateLawContext;
  /** each species with an order, and its concentration symbol in the laws */
  orderSymbols?: { species: string; symbol: string }[];
  observations?: ObservationCheck[];
  /** numeric rate and equilibrium constants by symbol (k_1, k_-1, K_1), given or from energies */
  constants?: Map<string, number>;
  /** labels of the steps whose rate constants come from their energies (Eyring) */
  constantsFromEnergies?: string[];
  /** the energy profile (schematic without energies) and the energetic span */
  energy?: EnergyResult;
  /** full simulations of the observations that have constants */
  simulation?: SimulationCheck[];
  /** the record's data sets fitted (fit-record.ts): orders, laws, activation parameters, time courses */
  fits?: RecordFits;
  diagnostics: Diagnostic[];
}

export interface DeriveOptions {
  /** relative error above which an approximation is reported invalid (default 0.1) */
  approximationThreshold?: number;
  /** skip the numeric simulations (they are the slow part) */
  simulate?: boolean;
}

/** Derives everything the catalogue shows about one mechanism record. */
export function deriveMechanism(record: MechanismRecord, options: DeriveOptions = {}): Derivation {
  const built = buildMechanism(record);
  const diagnostics = [...built.diagnostics, ...checkNegativeConcentrations(record.observations ?? [])];
  const mechanism = built.mechanism;
  if (!mechanism) return { buffered: [], diagnostics };
  const buffered = [...mechanism.species.values()].filter((s) => s.buffered).map((s) => s.symbol);
  const given = readStepConstants(record, mechanism);
  const balance = checkBalance(mechanism);
  diagnostics.push(...balance.diagnostics, ...checkMolecularity(mechanism), ...given.diagnostics);
  const fromEnergies = fillFromEnergies(record, mechanism, given.constants);
  diagnostics.push(...checkDetailedBalance(mechanism, fromEnergies.constants));
  const constants = constantValues(mechanism, fromEnergies.constants);

  const routed = deriveRoute(mechanism);
  diagnostics.push(...routed.diagnostics);
  if (!routed.route) return { mechanism, balance: balance.balance, buffered, diagnostics };

  const rates = deriveRateLaws(record.approximation ?? 'auto', mechanism, routed.route, constants);
  const route: Route = { ...routed.route, roles: rates.roles };
  const judged = checkObservations(record, rates.context, rates.rateLaws, constants, rates.symbols);
  diagnostics.push(
    ...rates.diagnostics,
    ...judged.diagnostics,
    ...inhibitorMismatches(mechanism, rates.roles, rates.rateLaws.length > 0),
  );
  const rateLaws = rates.rateLaws.map((law, i) => ({ ...law, restingStates: judged.restingStates[i] ?? [] }));
  const derivation: Derivation = {
    mechanism,
    balance: balance.balance,
    route,
    stoichiometricNumbers: [...route.sigma],
    routeSource: route.source,
    overall: route.overall,
    roles: rates.roles,
    offRoute: new Set(route.offRoute),
    routeOrder: [...route.order],
    buffered,
    rateLaws,
    rateLawContext: rates.context,
    orderSymbols: rates.symbols,
    observations: judged.checks,
    constants,
    constantsFromEnergies: fromEnergies.labels,
    diagnostics,
  };
  const energy = energyAnalysis(record, mechanism, route);
  if (energy.energy) derivation.energy = energy.energy;
  diagnostics.push(...energy.diagnostics);
  if (options.simulate !== false && (record.observations ?? []).length > 0) {
    const simulated = checkApproximations(
      record.observations ?? [],
      { mechanism, route, rateLaws },
      constants,
      options.approximationThreshold,
    );
    derivation.simulation = simulated.checks;
    diagnostics.push(...simulated.diagnostics);
  }
  return derivation;
}

/**
 * Observations a record does not hold (a rival's, in a system of rival proposals) judged against
 * the rate laws already derived, without deriving again: no diagnostics, no simulation.
 */
export function judgeObservations(
  derivation: Derivation,
  observations: readonly Observation[],
  status: Status,
): ObservationCheck[] {
  const { rateLawContext, rateLaws, orderSymbols, constants } = derivation;
  if (!rateLawContext || !rateLaws || !orderSymbols) return [];
  return checkObservations({ observations, status }, rateLawContext, rateLaws, constants ?? new Map(), orderSymbols)
    .checks;
}

/** What the simulations need from a derivation, or undefined where it found no route. */
export function simulationBasis(derivation: Derivation): SimulationBasis | undefined {
  const { mechanism, route, rateLaws } = derivation;
  return mechanism && route ? { mechanism, route, rateLaws: rateLaws ?? [] } : undefined;
}

/**
 * Where a step gives Gibbs energies but no rate constants, the Eyring equation supplies them
 * (given constants always win).
 */
function fillFromEnergies(
  record: MechanismRecord,
  mechanism: Mechanism,
  given: readonly StepConstants[],
): { constants: StepConstants[]; labels: string[] } {
  if (energyConditions(record).conditions.basis !== 'G') return { constants: [...given], labels: [] };
  const eyring = eyringStepConstants(record, mechanism).constants;
  const labels: string[] = [];
  const constants = given.map((c, i) => {
    const e = eyring[i];
    if (c.k !== undefined || e?.k === undefined) return c;
    labels.push(mechanism.steps[i]!.label);
    const out: StepConstants = { k: e.k };
    if (mechanism.steps[i]!.reversible && c.kRev === undefined && c.K === undefined && e.kRev !== undefined)
      out.kRev = e.kRev;
    else Object.assign(out, c.kRev !== undefined && { kRev: c.kRev }, c.K !== undefined && { K: c.K });
    return out;
  });
  return { constants, labels };
}

/** A declared inhibitor must show a negative order once a rate law exists. */
function inhibitorMismatches(
  mechanism: Mechanism,
  roles: ReadonlyMap<string, Role>,
  haveRateLaw: boolean,
): Diagnostic[] {
  if (!haveRateLaw) return [];
  return [...mechanism.species.values()]
    .filter((s) => s.declaredRole === 'inhibitor' && roles.get(s.symbol) !== 'inhibitor')
    .map((s) =>
      diagnostic(
        'roles/declared-mismatch',
        'error',
        `${s.symbol} is declared an inhibitor but has no negative order in the rate law`,
        {
          path: ['species', s.symbol, 'role'],
          actual: roles.get(s.symbol),
          expected: 'inhibitor',
        },
      ),
    );
}
