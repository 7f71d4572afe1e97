/**
 * src/model: the shared vocabulary of every layer — diagnostics and their rule ids, the record
 * type generated from the schema, and the JSON report. Imports nothing.
 */
export { countBySeverity, diagnostic, type Diagnostic, type RecordPath, type Severity } from './diagnostic.ts';
export { RULES, RULE_IDS, ruleSummary, type RuleId } from './rules/index.ts';
export type { RuleDefinition } from './rules/rule-definition.ts';
export type {
  Approximation,
  Doi,
  EnergySettings,
  MechanismRecord,
  Notation,
  Observation,
  QuantityText,
  Reference,
  Role,
  Slug,
  SpeciesEntry,
  SpeciesSymbol,
  Status,
  StepEnergy,
  StepEntry,
  StepLabel,
} from './mechanism-record.ts';
export type { EnergyBasis, EnergyJson, EnergyProfile, EnergyResult, ProfileState } from './energy-report.ts';
export type {
  CatalogueReport,
  DiagnosticJson,
  ObservationJson,
  RateLawJson,
  RecordReport,
  RootJson,
  SimulationJson,
  TermJson,
} from './report.ts';
