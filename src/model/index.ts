/**
 * src/model: the shared vocabulary of every layer — diagnostics and their rule ids, the record
 * type generated from the schema, and the JSON report. Imports nothing.
 */
export { countBySeverity, diagnostic, type Diagnostic, type RecordPath, type Severity } from './diagnostic.ts';
export { pathWords } from './path-words.ts';
export { RULES, RULE_IDS, ruleSummary, type RuleId } from './rules/index.ts';
export type { RuleDefinition } from './rules/rule-definition.ts';
export type {
  Approximation,
  DataCell,
  DataKind,
  Doi,
  EnergySettings,
  MechanismRecord,
  Notation,
  Observation,
  ObservationData,
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
export { DATA_COLUMN_NAMES, uncertaintyOf, type DataColumn, type DataTable, type SourceSpot } from './data-table.ts';
export type { EnergyBasis, EnergyJson, EnergyProfile, EnergyResult, ProfileState } from './energy-report.ts';
export type {
  ActivationFitsJson,
  DataSetFitsJson,
  FittedValueJson,
  RecordFitsJson,
  RivalFitJson,
} from './fits-report.ts';
export type {
  ApparentConstantJson,
  CatalogueReport,
  DiagnosticJson,
  NormalisedLawJson,
  NormalisedTermJson,
  ObservationJson,
  RateLawJson,
  RecordReport,
  RootJson,
  SimulationJson,
  TermJson,
  VerdictCounts,
} from './report.ts';
