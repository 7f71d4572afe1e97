/**
 * Numeric values for the symbols of a rate law: the rate constants of the steps (k, k_rev and K
 * completing each other: K = k/k_rev) and an observation's concentrations in M. A product that
 * the observation does not list is taken as 0 (initial rates); a catalyst's listed
 * concentration is its total.
 */
import type { Observation } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { CONCENTRATION, sameDimension } from '../units/dimension.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { parseQuantity, toCanonical } from '../units/quantity.ts';
import type { StepConstants } from '../mechanism/step-constants.ts';
import type { RateLawContext } from './context.ts';
import { concentration, equilibriumConstant, forwardConstant, reverseConstant } from './symbols.ts';

/** The constants given or implied by each step, by symbol. */
export function constantValues(mechanism: Mechanism, constants: readonly StepConstants[]): Map<string, number> {
  const values = new Map<string, number>();
  mechanism.steps.forEach((step, i) => {
    const { k, kRev, K } = constants[i] ?? {};
    const reverse = kRev ?? (k !== undefined && K !== undefined ? k / K : undefined);
    const equilibrium = K ?? (k !== undefined && kRev !== undefined ? k / kRev : undefined);
    if (k !== undefined) values.set(forwardConstant(step.label), k);
    if (step.reversible && reverse !== undefined) values.set(reverseConstant(step.label), reverse);
    if (step.reversible && equilibrium !== undefined) values.set(equilibriumConstant(step.label), equilibrium);
  });
  return values;
}

/**
 * Concentrations of one observation by symbol. A conserved pool's total is what the observation
 * puts into it: Σ weight × listed concentration of each of its forms (a catalyst listed alone is
 * its total; an added ligand joins the pool it is released from).
 */
export function observationValues(
  observation: Observation,
  index: number,
  context: RateLawContext,
): { values: Map<string, number>; assumedZero: string[]; diagnostics: Diagnostic[] } {
  const values = new Map<string, number>();
  const listed = new Map<string, number>();
  const diagnostics: Diagnostic[] = [];
  for (const [species, text] of Object.entries(observation.concentrations ?? {})) {
    const path = ['observations', index, 'concentrations', species];
    if (!context.mechanism.species.has(species)) {
      diagnostics.push(
        diagnostic('observation/species', 'warning', `${species} is not a species of this mechanism`, { path }),
      );
      continue;
    }
    const parsed = parseQuantity(text);
    if ('error' in parsed || !sameDimension(parsed.quantity.unit.dimension, CONCENTRATION)) {
      const why =
        'error' in parsed ? parsed.error : `'${parsed.quantity.unit.text || 'no unit'}' is not a concentration unit`;
      diagnostics.push(
        diagnostic('observation/units', 'error', `concentration of ${species}: ${why}`, {
          path,
          note: 'e.g. 0.10 M, 5 mM, 2.0e17 molecule cm^-3',
        }),
      );
      continue;
    }
    // A negative concentration is reported once, by mechanism/negative-concentrations.ts, and not used.
    if (parsed.quantity.value < 0) continue;
    listed.set(species, toCanonical(parsed.quantity));
    if (!context.internal.includes(species)) values.set(concentration(species), toCanonical(parsed.quantity));
  }
  for (const pool of context.conservations) {
    if (!pool.species.some((sp) => listed.has(sp))) continue;
    values.set(
      pool.total,
      pool.species.reduce((sum, sp, i) => sum + pool.weights[i]!.toNumber() * (listed.get(sp) ?? 0), 0),
    );
  }
  const assumedZero: string[] = [];
  for (const [species, role] of context.roles) {
    if (role === 'product' && !values.has(concentration(species))) {
      values.set(concentration(species), 0);
      assumedZero.push(species);
    }
  }
  return { values, assumedZero, diagnostics };
}
