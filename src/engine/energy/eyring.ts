/**
 * The Eyring equation of transition-state theory:
 *   k = κ (k_B T / h) exp(−ΔG‡/RT) (c°)^(1−n)
 * with the CODATA 2018 exact constants. The factor (c°)^(1−n) turns the dimensionless
 * thermodynamic constant of a step of molecularity n into one in M^(1−n) s^-1, because ΔG‡ refers
 * to the standard state c° of each of the n reacting particles.
 */
import type { MechanismRecord } from '../../model/index.ts';
import { BOLTZMANN, GAS_CONSTANT, PLANCK } from '../units/physical-constants.ts';
import type { Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { molecularity } from '../mechanism/molecularity.ts';
import { energyConditions, type EnergyConditions } from './conditions.ts';
import { readStepEnergies } from './step-energies.ts';

/** k_B T / h in s^-1: the frequency factor of transition-state theory (6.2124e12 s^-1 at 298.15 K). */
export function thermalFrequency(T: number): number {
  return (BOLTZMANN * T) / PLANCK;
}

/** The inputs of one Eyring rate constant, in SI units and M. */
export interface EyringInput {
  /** ΔG‡ / J mol^-1 */
  barrier: number;
  /** temperature / K */
  T: number;
  /** particles that meet in the step's direction (1, 2 or 3) */
  molecularity: number;
  /** c° / M; 1 M when absent */
  standardConcentration?: number;
  /** transmission coefficient κ; 1 when absent */
  kappa?: number;
}

/** Eyring rate constant in M^(1−n) s^-1. */
export function eyringRateConstant(input: EyringInput): number {
  const { barrier, T, molecularity: n, standardConcentration = 1, kappa = 1 } = input;
  return kappa * thermalFrequency(T) * Math.exp(-barrier / (GAS_CONSTANT * T)) * standardConcentration ** (1 - n);
}

/** Both directions of one step from its recorded energies. */
export interface StepEyringConstants {
  stepIndex: number;
  label: string;
  /** molecularity of the forward and reverse directions */
  forwardMolecularity: number;
  reverseMolecularity: number;
  /** forward constant / M^(1−n) s^-1, where a barrier is recorded */
  k?: number;
  /** constant of the microscopic reverse, from ΔG_rev‡ = ΔG‡ − ΔG, where both are recorded */
  kRev?: number;
}

/** Eyring constants of every step that records a barrier, at the record's T and c°. */
export function eyringStepConstants(
  record: MechanismRecord,
  mechanism: Mechanism,
): { conditions: EnergyConditions; constants: StepEyringConstants[]; diagnostics: Diagnostic[] } {
  const { conditions, diagnostics } = energyConditions(record);
  const read = readStepEnergies(record, mechanism);
  diagnostics.push(...read.diagnostics);
  const { T, standardConcentration } = conditions;
  const constants = mechanism.steps.map((step): StepEyringConstants => {
    const { barrier, change } = read.energies[step.index] ?? {};
    const forwardMolecularity = molecularity(step.reactants);
    const reverseMolecularity = molecularity(step.products);
    const out: StepEyringConstants = {
      stepIndex: step.index,
      label: step.label,
      forwardMolecularity,
      reverseMolecularity,
    };
    if (barrier === undefined) return out;
    out.k = eyringRateConstant({ barrier, T, molecularity: forwardMolecularity, standardConcentration });
    // The reverse climbs to the same transition state from the step's products.
    if (change !== undefined)
      out.kRev = eyringRateConstant({
        barrier: barrier - change,
        T,
        molecularity: reverseMolecularity,
        standardConcentration,
      });
    return out;
  });
  return { conditions, constants, diagnostics };
}
