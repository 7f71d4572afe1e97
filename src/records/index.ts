/** src/records: record files read with source positions, validated, and errors mapped to lines. */
export { findAliasProblems } from './alias-problems.ts';
export { closestName, editDistance } from './closest-name.ts';
export { describeSchemaError } from './describe-schema-error.ts';
export type { DescribedError, SchemaProblem } from './describe-schema-error.ts';
export { findRecordFiles } from './find-record-files.ts';
export { formatRecordText, type FormattedRecord } from './format-record.ts';
export { formatRecordFile, type FormattedRecordFile } from './format-record-file.ts';
export { loadRecordFile, loadRecordSource } from './load-record.ts';
export type { LoadedRecord } from './load-record.ts';
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
} from '../model/index.ts';
export { MAX_ALIAS_COUNT, parseRecordYaml } from './parse-record-yaml.ts';
export type { ParsedYaml } from './parse-record-yaml.ts';
export { placeDiagnostics } from './place-diagnostics.ts';
export { isPublishable, recordFileProblems } from './record-file-problems.ts';
export { readObservationData, type ObservationDataResult } from './read-observation-data.ts';
export { contentFolderOf, resolveDataPath } from './resolve-data-path.ts';
export { isRecordId, MAX_ID_LENGTH, recordId, recordIdProblem, suggestRecordId } from './record-id.ts';
export { describeSchemaErrors, pathWords, recordPath } from './schema-messages.ts';
export { createValidator, recordSchema, recordValidator } from './schema-validator.ts';
export type { RecordValidator } from './schema-validator.ts';
export { createLocator, keyText, sourceShift } from './source-positions.ts';
export type { RecordLocator, SourcePosition } from './source-positions.ts';
export { loadSystemFile, loadSystemSource } from './load-system-record.ts';
export type { LoadedSystemRecord, SystemRecord } from './load-system-record.ts';
