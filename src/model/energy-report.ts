/**
 * The energy profile and energetic span as the JSON report gives them (`energy`, DESIGN.md
 * "Contracts"): the engine builds values of these shapes and the report prints them as they are.
 */

/** Gibbs energy, enthalpy or electronic energy. */
export type EnergyBasis = 'G' | 'H' | 'E';

/** One state of the profile: a minimum or the transition state of one step. */
export interface ProfileState {
  /**
   * A minimum's index counts the route steps completed (0 = the starting state); a transition
   * state's is the 1-based position of its step along the route, so TS i lies between minima i−1 and i.
   */
  index: number;
  kind: 'minimum' | 'transition';
  /** kJ/mol relative to the starting state; absent where the recorded energies do not reach */
  energy?: number;
  /** everything present, with amounts; a transition state carries its step's starting species */
  species: Record<string, number>;
  /** label of the step (transition states only) */
  step?: string;
}

/** The states of one turnover with the overall change; schematic where energies are missing. */
export interface EnergyProfile {
  basis: EnergyBasis;
  unit: 'kJ/mol';
  /** cycle: something (a catalyst, a chain carrier) is needed at the start and returned at the end */
  kind: 'cycle' | 'sequence';
  /** true when a step of the route records no barrier or no change */
  schematic: boolean;
  states: ProfileState[];
  /** energy of the last minimum relative to the first, kJ/mol (ΔG_r of one turnover) */
  overall_change?: number;
  direction?: 'exergonic' | 'endergonic' | 'thermoneutral';
  /** label of the step declared rate-determining, if it is on the route */
  rds_step?: string;
  /** species needed at the start and returned at the end */
  carriers: string[];
}

/** The record's `energy` in the JSON report: the profile plus the energetic span where it applies. */
export interface EnergyResult extends EnergyProfile {
  /** temperature of the TOF / K */
  T: number;
  /** energetic span δE / kJ mol^-1 */
  span?: number;
  /** label of the step whose transition state determines the TOF */
  tdts_step?: string;
  /** index of that transition state among the states (1-based position along the route) */
  tdts_state?: number;
  /** index of the determining minimum (0 = the starting state) */
  tdi_state?: number;
  /** TOF from the full energetic-span expression (Gibbs basis only) / s^-1 */
  tof_per_s?: number;
  /** TOF from the span alone, (k_B T/h) e^{−δE/RT} / s^-1 */
  tof_span_per_s?: number;
  /** degree of TOF control of each transition state and each intermediate (they each sum to 1) */
  control?: {
    transition_states: { index: number; step: string; x_tof: number }[];
    intermediates: { index: number; x_tof: number }[];
  };
}

/** The record's `energy` in the JSON report. */
export type EnergyJson = EnergyResult;
