/**
 * Every rule of the catalogue, in the order they were introduced. Each file holds one rule's id,
 * its summary and, in its doc comment, what it checks and why.
 */
import { approximationInvalid } from './approximation-invalid.ts';
import { balanceAtoms } from './balance-atoms.ts';
import { balanceCharge } from './balance-charge.ts';
import { balanceSites } from './balance-sites.ts';
import { constantsDetailedBalance } from './constants-detailed-balance.ts';
import { constantsNegative } from './constants-negative.ts';
import { dataCell } from './data-cell.ts';
import { dataColumns } from './data-columns.ts';
import { dataFile } from './data-file.ts';
import { dataNotIdentifiable } from './data-not-identifiable.ts';
import { dataPath } from './data-path.ts';
import { dataPoints } from './data-points.ts';
import { dataRange } from './data-range.ts';
import { dataUnits } from './data-units.ts';
import { fitActivation } from './fit-activation.ts';
import { fitNotIdentifiable } from './fit-not-identifiable.ts';
import { fitRivalRejected } from './fit-rival-rejected.ts';
import { energyProfile } from './energy-profile.ts';
import { energyRdsSpan } from './energy-rds-span.ts';
import { equationSyntax } from './equation-syntax.ts';
import { formulaSyntax } from './formula-syntax.ts';
import { internalFailure } from './internal-failure.ts';
import { observationFittedOrder } from './observation-fitted-order.ts';
import { observationNegativeConcentration } from './observation-negative-concentration.ts';
import { observationOrder } from './observation-order.ts';
import { observationSpecies } from './observation-species.ts';
import { observationUnits } from './observation-units.ts';
import { rateNonlinear } from './rate-nonlinear.ts';
import { rateNotAChain } from './rate-not-a-chain.ts';
import { rateNotEliminable } from './rate-not-eliminable.ts';
import { recordDuplicateId } from './record-duplicate-id.ts';
import { recordFile } from './record-file.ts';
import { rateSymbolicBudget } from './rate-symbolic-budget.ts';
import { recordSchema } from './record-schema.ts';
import { recordYaml } from './record-yaml.ts';
import { rolesDeclaredMismatch } from './roles-declared-mismatch.ts';
import { routeAmbiguous } from './route-ambiguous.ts';
import { routeOffRoute } from './route-off-route.ts';
import { routeSearchLimit } from './route-search-limit.ts';
import { simulationFailed } from './simulation-failed.ts';
import { speciesConfusable } from './species-confusable.ts';
import { speciesUnused } from './species-unused.ts';
import { stepMolecularity } from './step-molecularity.ts';
import { stepRds } from './step-rds.ts';
import { stepUnits } from './step-units.ts';

/** Every rule definition; the order is the order of RULE_IDS. */
export const RULES = [
  recordYaml,
  recordSchema,
  equationSyntax,
  formulaSyntax,
  balanceAtoms,
  balanceCharge,
  stepMolecularity,
  stepUnits,
  routeAmbiguous,
  rolesDeclaredMismatch,
  rateNotEliminable,
  rateNonlinear,
  observationOrder,
  approximationInvalid,
  energyProfile,
  energyRdsSpan,
  speciesUnused,
  stepRds,
  observationUnits,
  observationSpecies,
  simulationFailed,
  constantsDetailedBalance,
  internalFailure,
  recordDuplicateId,
  recordFile,
  constantsNegative,
  observationNegativeConcentration,
  speciesConfusable,
  dataPath,
  dataFile,
  dataColumns,
  dataUnits,
  dataCell,
  dataRange,
  dataPoints,
  dataNotIdentifiable,
  routeSearchLimit,
  routeOffRoute,
  balanceSites,
  rateSymbolicBudget,
  rateNotAChain,
  observationFittedOrder,
  fitNotIdentifiable,
  fitRivalRejected,
  fitActivation,
] as const;

/** A rule's stable id. */
export type RuleId = (typeof RULES)[number]['id'];

/** The stable rule ids (DESIGN.md, "Contracts"): add new ones, never rename. */
export const RULE_IDS: readonly RuleId[] = RULES.map((r) => r.id);

/** The one-line summary of a rule. */
export function ruleSummary(id: RuleId): string {
  return RULES.find((r) => r.id === id)!.summary;
}
