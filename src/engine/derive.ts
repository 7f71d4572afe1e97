/**
 * The derivation of one record: parse, balance, route, overall equation and roles.
 * Pure: a valid record in, a value with diagnostics out. Later stages (rate laws, orders,
 * observations, energies) add to the same value.
 */
import type { MechanismRecord, Role } from '../model/mechanism-record.ts';
import { checkBalance } from './mechanism/balance.ts';
import { checkDetailedBalance } from './mechanism/detailed-balance.ts';
import { diagnostic, type Diagnostic } from '../model/diagnostic.ts';
import { buildMechanism, type Mechanism } from './mechanism/mechanism.ts';
import { checkMolecularity } from './mechanism/molecularity.ts';
import { overallEquation, type OverallEquation } from './route/overall-equation.ts';
import { deriveRoles } from './route/roles.ts';
import { stoichiometricNumbers } from './route/stoichiometric-numbers.ts';
import type { ObservationCheck } from './observations/judge-order.ts';
import { deriveRateLaws, type DerivedRateLaw } from './rate-law/derive-rate-laws.ts';
import { readStepConstants, type StepConstants } from './mechanism/step-constants.ts';
import { energyAnalysis, energyConditions, eyringStepConstants, type EnergyResult } from './energy/index.ts';
import { constantValues } from './rate-law/numeric-values.ts';
import { checkApproximations, type SimulationCheck } from './simulation/approximation-validity.ts';

export interface Derivation {
  mechanism?: Mechanism;
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
  observations?: ObservationCheck[];
  /** numeric rate and equilibrium constants by symbol (k_1, k_-1, K_1), given or from energies */
  constants?: Map<string, number>;
  /** labels of the steps whose rate constants come from their energies (Eyring) */
  constantsFromEnergies?: string[];
  /** the energy profile (schematic without energies) and the energetic span */
  energy?: EnergyResult;
  /** full simulations of the observations that have constants */
  simulation?: SimulationCheck[];
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
  const diagnostics = [...built.diagnostics];
  const mechanism = built.mechanism;
  if (!mechanism) return { buffered: [], diagnostics };
  const buffered = [...mechanism.species.values()].filter((s) => s.buffered).map((s) => s.symbol);
  const constants = readStepConstants(record, mechanism);
  diagnostics.push(...checkBalance(mechanism), ...checkMolecularity(mechanism), ...constants.diagnostics);
  const fromEnergies = fillFromEnergies(record, mechanism, constants.constants);
  diagnostics.push(...checkDetailedBalance(mechanism, fromEnergies.constants));

  const mustCancel = new Set([...mechanism.species.values()].filter((s) => s.declaredRole === 'intermediate' || s.declaredRole === 'catalyst').map((s) => s.symbol));
  const carriers = new Set([...mechanism.species.values()].filter((s) => s.declaredRole === 'intermediate').map((s) => s.symbol));
  const route = stoichiometricNumbers(mechanism.steps, mustCancel, carriers);
  diagnostics.push(...route.diagnostics);
  if (!route.numbers) return { mechanism, buffered, diagnostics };
  const sigma = route.numbers;

  const { roles, offRoute, routeOrder, diagnostics: roleDiagnostics } = deriveRoles(mechanism, sigma);
  diagnostics.push(...roleDiagnostics);
  // Only catalysts on the route go over the arrow; a binder off the route (an inhibitor) does not.
  const catalysts = [...roles].filter(([sp, r]) => r === 'catalyst' && !offRoute.has(sp)).map(([sp]) => sp);
  const rates = deriveRateLaws(record, mechanism, sigma, roles, offRoute, fromEnergies.constants, routeOrder);
  diagnostics.push(...rates.diagnostics, ...inhibitorMismatches(mechanism, rates.roles, rates.rateLaws.length > 0));
  const derivation: Derivation = {
    mechanism,
    stoichiometricNumbers: sigma,
    routeSource: route.source === 'given' ? 'given' : 'derived',
    overall: overallEquation(mechanism, sigma, catalysts),
    roles: rates.roles,
    offRoute,
    routeOrder,
    buffered,
    rateLaws: rates.rateLaws,
    observations: rates.observations,
    constants: constantValues(mechanism, fromEnergies.constants),
    constantsFromEnergies: fromEnergies.labels,
    diagnostics,
  };
  const energy = energyAnalysis(record, derivation);
  if (energy.energy) derivation.energy = energy.energy;
  diagnostics.push(...energy.diagnostics);
  if (options.simulate !== false && (record.observations ?? []).length > 0) {
    const simulated = checkApproximations(record, derivation, derivation.constants!, options.approximationThreshold);
    derivation.simulation = simulated.checks;
    diagnostics.push(...simulated.diagnostics);
  }
  return derivation;
}

/** The numeric constants by symbol (k_1, k_-1, K_1) the simulations use: given, or from the step energies by Eyring. */
export function simulationConstants(record: MechanismRecord, mechanism: Mechanism): Map<string, number> {
  return constantValues(mechanism, fillFromEnergies(record, mechanism, readStepConstants(record, mechanism).constants).constants);
}

/**
 * Where a step gives Gibbs energies but no rate constants, the Eyring equation supplies them
 * (given constants always win).
 */
function fillFromEnergies(record: MechanismRecord, mechanism: Mechanism, given: readonly StepConstants[]): { constants: StepConstants[]; labels: string[] } {
  if (energyConditions(record).conditions.basis !== 'G') return { constants: [...given], labels: [] };
  const eyring = eyringStepConstants(record, mechanism).constants;
  const labels: string[] = [];
  const constants = given.map((c, i) => {
    const e = eyring[i];
    if (c.k !== undefined || e?.k === undefined) return c;
    labels.push(mechanism.steps[i]!.label);
    const out: StepConstants = { k: e.k };
    if (mechanism.steps[i]!.reversible && c.kRev === undefined && c.K === undefined && e.kRev !== undefined) out.kRev = e.kRev;
    else Object.assign(out, c.kRev !== undefined && { kRev: c.kRev }, c.K !== undefined && { K: c.K });
    return out;
  });
  return { constants, labels };
}

/** A declared inhibitor must show a negative order once a rate law exists. */
function inhibitorMismatches(mechanism: Mechanism, roles: ReadonlyMap<string, Role>, haveRateLaw: boolean): Diagnostic[] {
  if (!haveRateLaw) return [];
  return [...mechanism.species.values()]
    .filter((s) => s.declaredRole === 'inhibitor' && roles.get(s.symbol) !== 'inhibitor')
    .map((s) =>
      diagnostic('roles/declared-mismatch', 'error', `${s.symbol} is declared an inhibitor but has no negative order in the rate law`, {
        path: ['species', s.symbol, 'role'],
        actual: roles.get(s.symbol),
        expected: 'inhibitor',
      }),
    );
}
