/**
 * The derivation of one record: parse, balance, route, overall equation and roles.
 * Pure: a valid record in, a value with diagnostics out. Later stages (rate laws, orders,
 * observations, energies) add to the same value.
 */
import type { MechanismRecord, Role } from '../records/mechanism-record.ts';
import { checkBalance } from './balance.ts';
import type { Diagnostic } from './diagnostic.ts';
import { buildMechanism, type Mechanism } from './mechanism.ts';
import { checkMolecularity } from './molecularity.ts';
import { overallEquation, type OverallEquation } from './overall-equation.ts';
import { deriveRoles } from './roles.ts';
import { stoichiometricNumbers } from './route.ts';
import { checkStepUnits } from './step-units.ts';

export interface Derivation {
  mechanism?: Mechanism;
  /** Horiuti stoichiometric number σ of each step */
  stoichiometricNumbers?: number[];
  routeSource?: 'given' | 'derived';
  overall?: OverallEquation;
  roles?: Map<string, Role>;
  /** net-zero species that occur only in steps off the route (σ = 0) */
  offRoute?: Set<string>;
  /** species whose free concentration is held constant */
  buffered: string[];
  diagnostics: Diagnostic[];
}

/** Derives everything the catalogue shows about one mechanism record. */
export function deriveMechanism(record: MechanismRecord): Derivation {
  const built = buildMechanism(record);
  const diagnostics = [...built.diagnostics];
  const mechanism = built.mechanism;
  if (!mechanism) return { buffered: [], diagnostics };
  const buffered = [...mechanism.species.values()].filter((s) => s.buffered).map((s) => s.symbol);
  diagnostics.push(...checkBalance(mechanism), ...checkMolecularity(mechanism), ...checkStepUnits(record, mechanism));

  const mustCancel = new Set([...mechanism.species.values()].filter((s) => s.declaredRole === 'intermediate' || s.declaredRole === 'catalyst').map((s) => s.symbol));
  const route = stoichiometricNumbers(mechanism.steps, mustCancel);
  diagnostics.push(...route.diagnostics);
  if (!route.numbers) return { mechanism, buffered, diagnostics };
  const sigma = route.numbers;

  const { roles, offRoute, diagnostics: roleDiagnostics } = deriveRoles(mechanism, sigma);
  diagnostics.push(...roleDiagnostics);
  const catalysts = [...roles].filter(([, r]) => r === 'catalyst').map(([sp]) => sp);
  return {
    mechanism,
    stoichiometricNumbers: sigma,
    routeSource: route.source === 'given' ? 'given' : 'derived',
    overall: overallEquation(mechanism, sigma, catalysts),
    roles,
    offRoute,
    buffered,
    diagnostics,
  };
}
