/**
 * PROVISIONAL hand-written shape of a record (to be replaced by types generated from
 * schemas/mechanism.schema.json with the same names).
 */
export type Status = 'proposed' | 'favoured' | 'disfavoured' | 'withdrawn';
export type Approximation = 'auto' | 'rds' | 'steady_state' | 'both';
export type Role = 'reactant' | 'product' | 'intermediate' | 'catalyst' | 'inhibitor' | 'third_body' | 'solvent';

/** A quantity as written: "1.1e-2 M^-1 s^-1", "56 kJ/mol", "0.98 ± 0.05"; bare numbers are dimensionless. */
export type QuantityText = string | number;

export interface MechanismRecord {
  title: string;
  system: string;
  status: Status;
  notation?: 'formulas' | 'labels';
  tags?: string[];
  contributors?: string[];
  added?: string;
  species?: Record<string, SpeciesEntry>;
  steps: StepEntry[];
  approximation?: Approximation;
  energy?: EnergySettings;
  observations?: Observation[];
  references?: Reference[];
  notes?: string;
}

export interface SpeciesEntry {
  name?: string;
  formula?: string | null;
  aliases?: string[];
  inchi?: string;
  smiles?: string;
  role?: Role;
  solvent?: boolean;
  third_body?: boolean;
  buffered?: boolean;
}

export interface StepEntry {
  equation: string;
  label?: string;
  rds?: boolean;
  times?: number;
  k?: QuantityText;
  k_rev?: QuantityText;
  K?: QuantityText;
  energy?: StepEnergy;
  note?: string;
}

export interface StepEnergy {
  barrier?: QuantityText;
  change?: QuantityText;
}

export interface EnergySettings {
  basis?: 'G' | 'H' | 'E';
  standard_state?: QuantityText;
  T?: QuantityText;
}

export interface Observation {
  id: string;
  source?: string;
  T?: QuantityText;
  concentrations?: Record<string, QuantityText>;
  orders?: Record<string, QuantityText>;
  rate?: QuantityText;
  note?: string;
}

export interface Reference {
  doi?: string;
  url?: string;
  citation?: string;
  note?: string;
}
