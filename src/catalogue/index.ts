/**
 * src/catalogue: folders of record files loaded, validated and derived once, for the CLI and the
 * site alike — each record with its diagnostics placed, the rivals of each system judged against
 * each other's observations, and the tool's version.
 */
export { loadCatalogue, type Catalogue, type CatalogueRecord, type CatalogueSystem } from './catalogue.ts';
export { checkRecordFile, checkRecordFiles, type CheckedRecord } from './check-records.ts';
export { toolVersion } from './tool-version.ts';
export {
  findRecordFiles,
  isPublishable,
  MAX_ID_LENGTH,
  recordFileProblems,
  recordIdProblem,
} from '../records/index.ts';
export { checkWithRivals, withSystemFits, type FittedRecord } from './fit-systems.ts';
export type { SystemDataSet } from '../engine/index.ts';
