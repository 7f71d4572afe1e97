/**
 * GENERATED from schemas/mechanism.schema.json by scripts/generate-record-types.mjs.
 * Do not edit by hand: change the schema, then run `npm run types`.
 */

/**
 * Where the proposal stands: proposed (under discussion), favoured (the group's current best explanation), disfavoured (contradicted but kept for the record) or withdrawn (abandoned).
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Status".
 */
export type Status = 'proposed' | 'favoured' | 'disfavoured' | 'withdrawn';
/**
 * How the species symbols are written: formulas (the default; atoms, charge and surface sites are checked for balance) or labels (plain names such as A, E, ES; balance is not checked).
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Notation".
 */
export type Notation = 'formulas' | 'labels';
/**
 * The part a species plays in the overall reaction. A declared role must agree with the derived one; declaring intermediate or catalyst also tells the route finder that the species must cancel on the route (nothing more: a declared intermediate is not thereby a chain carrier, see chain_carrier). off_route: found only on steps off the route (σ = 0), such as a side product of termination or a dead-end complex.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Role".
 */
export type Role =
  | 'reactant'
  | 'product'
  | 'intermediate'
  | 'catalyst'
  | 'inhibitor'
  | 'third_body'
  | 'solvent'
  | 'off_route';
/**
 * How to derive the rate law: rds (rate-determining step with fast pre-equilibria), steady_state (Bodenstein approximation for every intermediate), both, auto (rds when a step is marked rds, otherwise steady state; a chain reaction also gets its long-chain law where that differs), or long_chain (the steady state of a chain reaction with long chains: initiation rate = termination rate, and the propagation steps alone fix the ratio of the chain carriers).
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Approximation".
 */
export type Approximation = 'auto' | 'rds' | 'steady_state' | 'both' | 'long_chain';
/**
 * A quantity as written: a number, an optional uncertainty (± u or +/- u) and a unit, e.g. 1.1e-2 M^-1 s^-1, 56 kJ/mol, 298.15 K, 0.98 ± 0.05. A bare number is dimensionless.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "QuantityText".
 */
export type QuantityText = string | number;
/**
 * An identifier made of lower-case letters, digits and single hyphens, at most 100 characters, e.g. peroxide-disproportionation.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Slug".
 */
export type Slug = string;
/**
 * A species symbol as written in the equations (a formula such as H2O2, I-, [Co(NH3)6]3+, or a label such as ES); no spaces. Surface sites: @ is a vacant site and a formula followed by @ is that species held on a site (CO@, H@, O@); a kind of site may follow the mark (@a, CO@t1) and a species on several sites repeats it (C2H4@@). Sites balance like an element. * is not a site: NO2* is an excited state. Quote a symbol that starts with @ in YAML ("@").
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "SpeciesSymbol".
 */
export type SpeciesSymbol = string;
/**
 * A short name for a step, used in its rate constants k_label, k_-label and K_label: letters, digits and underscores, e.g. 1, 2a, ox.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "StepLabel".
 */
export type StepLabel = string;
/**
 * A Digital Object Identifier without the https://doi.org/ prefix, e.g. 10.1000/xyz123.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Doi".
 */
export type Doi = string;
/**
 * What the table holds: initial_rates (concentrations of the species against the initial rate, one row per run), time_course (concentrations of one or more species against time t, starting from the observation's concentrations), or temperature_series (a rate constant k against temperature T).
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "DataKind".
 */
export type DataKind = 'initial_rates' | 'time_course' | 'temperature_series';
/**
 * One cell of an inline data table: a number, a label (in a replicate column), or null for a value not measured.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "DataCell".
 */
export type DataCell = number | string | null;

/**
 * One proposed reaction mechanism: a sequence of elementary steps, with the measurements it should explain. The file name (without .yaml) is the record's id.
 */
export interface MechanismRecord {
  /**
   * A short title for the proposal, shown as the heading of its page, e.g. "Two-step halide route for the peroxide disproportionation".
   */
  title: string;
  /**
   * The reaction system this proposal explains. Rival proposals for the same overall change share one system name, so their pages can be compared side by side.
   */
  system: Slug;
  status: Status;
  /**
   * One line saying why the proposal has its status, shown beside the status on every page, e.g. "contradicted by the added-ligand runs". Expected for disfavoured and withdrawn records.
   */
  status_reason?: string;
  notation?: Notation;
  /**
   * Free keywords for search, e.g. aqueous, halide, enzyme.
   */
  tags?: string[];
  /**
   * Who proposed or recorded this mechanism: the group's usual handles or names.
   */
  contributors?: string[];
  /**
   * The date the record was added to the catalogue, written YYYY-MM-DD (used for "recently added").
   */
  added?: string;
  /**
   * Optional details about species, keyed by the symbol used in the equations. Symbols not listed here are read from the equations themselves.
   */
  species?: {
    [k: string]: SpeciesEntry;
  };
  /**
   * The elementary steps, in the order they occur. Each step is one molecular event.
   *
   * @minItems 1
   */
  steps: StepEntry[];
  approximation?: Approximation;
  energy?: EnergySettings;
  /**
   * Kinetic measurements this mechanism should explain: observed orders, rates and the conditions they were measured at.
   */
  observations?: Observation[];
  /**
   * Literature and notebooks supporting or contradicting the proposal.
   */
  references?: Reference[];
  /**
   * Discussion in Markdown; $...$ encloses LaTeX math. Rendered sanitised on the mechanism's page. At most 20000 characters: longer discussions belong in a linked document.
   */
  notes?: string;
}
/**
 * Identity and behaviour of one species.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "SpeciesEntry".
 */
export interface SpeciesEntry {
  /**
   * The species' common name, e.g. hydrogen peroxide.
   */
  name?: string;
  /**
   * The composition when the symbol is not itself a formula (e.g. symbol Cat, formula C10H12N2; a species on a surface site ends in @, e.g. symbol Pt-CO, formula CO@). null: no composition, so balance is not checked for the steps it takes part in.
   */
  formula?: string | null;
  /**
   * Other names the species is known by, for search.
   */
  aliases?: string[];
  /**
   * The standard InChI, starting with InChI=.
   */
  inchi?: string;
  /**
   * A SMILES string for the species.
   */
  smiles?: string;
  role?: Role;
  /**
   * true: the solvent, present in large excess at constant concentration; absorbed into the rate constants but kept in the overall equation.
   */
  solvent?: boolean;
  /**
   * true: a collision partner (often written M) that appears on both sides of a step and only carries away energy.
   */
  third_body?: boolean;
  /**
   * true: its free concentration is held constant (a buffer, or a large excess), so it has no conservation relation but stays in the rate law.
   */
  buffered?: boolean;
  /**
   * true: a chain carrier (an atom or radical that a propagation cycle regenerates). The route is then the propagation cycle, with the steps that make carriers from non-carriers (initiation) and the steps that destroy them (termination) off the route — the long-chain convention. Without it, chains are detected from the steps; role: intermediate alone never makes a species a carrier.
   */
  chain_carrier?: boolean;
}
/**
 * One elementary step.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "StepEntry".
 */
export interface StepEntry {
  /**
   * The step as an equation: terms joined by " + " (spaces around the plus), '->' for a one-way step, '<=>' for a reversible one (→ and ⇌ are also read), e.g. H2O2 + I- -> H2O + IO-, or on a surface CO + @ <=> CO@ (@ a vacant site, CO@ adsorbed CO).
   */
  equation: string;
  /**
   * A name for the step's rate constants (k_label, k_-label, K_label). Defaults to the step's position, counting from 1.
   */
  label?: StepLabel;
  /**
   * true: this is the rate-determining step. At most one step may be marked.
   */
  rds?: boolean;
  /**
   * The step's stoichiometric number: how many times it occurs per overall reaction (0: off the route; at most 1000). Derived when absent.
   */
  times?: number;
  /**
   * The forward rate constant with units, e.g. 1.1e-2 M^-1 s^-1.
   */
  k?: QuantityText;
  /**
   * The reverse rate constant of a reversible step, with units.
   */
  k_rev?: QuantityText;
  /**
   * The equilibrium constant of a reversible step (forward over reverse), with units where it has them.
   */
  K?: QuantityText;
  energy?: StepEnergy;
  /**
   * A remark about this step, shown beside it.
   */
  note?: string;
}
/**
 * Energies of the step measured from its starting state, on the basis set under the record's energy settings (Gibbs energy by default).
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "StepEnergy".
 */
export interface StepEnergy {
  /**
   * The activation energy from the step's reactants to its transition state, e.g. 56 kJ/mol.
   */
  barrier?: QuantityText;
  /**
   * The reaction energy of the step, products minus reactants, e.g. -40 kJ/mol.
   */
  change?: QuantityText;
}
/**
 * How the step energies are to be read.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "EnergySettings".
 */
export interface EnergySettings {
  /**
   * Which energy the steps give: G (Gibbs energy, the default), H (enthalpy) or E (electronic energy).
   */
  basis?: 'G' | 'H' | 'E';
  /**
   * The standard state the energies refer to, e.g. 1 M or 1 bar.
   */
  standard_state?: QuantityText;
  /**
   * The temperature the energies refer to, e.g. 298.15 K.
   */
  T?: QuantityText;
}
/**
 * One kinetic measurement and its conditions.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Observation".
 */
export interface Observation {
  /**
   * A short name for the measurement, unique within the record, e.g. initial-rates-2026-03.
   */
  id: Slug;
  /**
   * Where the data are: a notebook page or a DOI, e.g. notebook 14, p. 32.
   */
  source?: string;
  /**
   * The temperature of the measurement, e.g. 298.15 K.
   */
  T?: QuantityText;
  /**
   * Starting concentrations by species symbol, e.g. { H2O2: 0.10 M, I-: 0.010 M }; for a time course in data, the concentrations at t = 0 (species not listed start at zero).
   */
  concentrations?: {
    [k: string]: QuantityText;
  };
  /**
   * Observed reaction orders by species symbol, with uncertainty where known, e.g. { H2O2: 1.0 ± 0.1 }. Without one, ± 0.1 is assumed.
   */
  orders?: {
    [k: string]: QuantityText;
  };
  /**
   * The observed rate at these conditions, with units, e.g. 3.3e-5 M s^-1.
   */
  rate?: QuantityText;
  /**
   * A remark about the measurement.
   */
  note?: string;
  /**
   * The measurements behind this observation, as a table (initial rates, a time course or a temperature series), inline or in a CSV file.
   */
  data?: ObservationData;
}
/**
 * A source supporting or contradicting the proposal; give at least a DOI, a URL or a citation.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "Reference".
 */
export interface Reference {
  /**
   * The DOI of the paper, without the https://doi.org/ prefix.
   */
  doi?: Doi;
  /**
   * A web address for the source.
   */
  url?: string;
  /**
   * A citation as text, e.g. Author, Journal volume (year) first page.
   */
  citation?: string;
  /**
   * What the source supports or contradicts.
   */
  note?: string;
}
/**
 * The measurements themselves, as a table: inline (columns and rows) or in a CSV file beside the records (file). Columns are named by species symbol (a concentration), rate (an initial rate), t (time), T (temperature), k (a rate constant), u(NAME) (the standard uncertainty of column NAME) or replicate (a label for repeated runs). Each column with a quantity needs a unit, written in its header as 'NAME / unit' (e.g. 'H2O2 / mM') or given under units.
 *
 * This interface was referenced by `MechanismRecord`'s JSON-Schema
 * via the `definition` "ObservationData".
 */
export interface ObservationData {
  kind: DataKind;
  /**
   * A CSV file holding the table, as a path relative to this record file that stays inside the content folder (the folder above the one holding the records), e.g. ../data/peroxide-rates.csv. Its first line that is not a # comment is the header; lines starting with # are comments.
   */
  file?: string;
  /**
   * The header of an inline table: one name per column, each optionally with its unit, e.g. [H2O2 / mM, I- / mM, rate / µM s^-1, replicate].
   *
   * @minItems 1
   */
  columns?: string[];
  /**
   * The rows of an inline table, one list of cells per measurement, in the order of columns, e.g. [100, 10, 1.12, a]. A cell is a number; text that is not a number is reported; an empty cell (null) means not measured, allowed only for concentrations in a time course.
   */
  rows?: DataCell[][];
  /**
   * Units by column name, for columns whose header gives none, e.g. { H2O2: mM, rate: µM s^-1, t: min }. An uncertainty column u(NAME) without a unit takes the unit of NAME.
   */
  units?: {
    [k: string]: string;
  };
  /**
   * For a temperature series: which rate constant the k column holds, named as in the rate laws (k_2, k_-1) or k_obs for an observed pseudo-order constant. Defaults to k_obs.
   */
  constant?: string;
  /**
   * Where the numbers come from and how they were treated; say here when a data set is invented.
   */
  note?: string;
}
