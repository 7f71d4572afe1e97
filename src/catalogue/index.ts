/**
 * src/catalogue: folders of record files loaded, validated and derived once, for the CLI and the
 * site alike — each record with its diagnostics placed, the rivals of each system judged against
 * each other's observations, and the tool's version.
 */
export { loadCatalogue, type Catalogue, type CatalogueRecord, type CatalogueSystem } from './catalogue.ts';
export {
  checkRecordFile,
  checkRecordFiles,
  type CheckedRecord,
  type DerivationJob,
  type DerivationOutcome,
  type Deriver,
  type Pipeline,
} from './check-records.ts';
export { catalogueCache } from './catalogue-cache.ts';
export { defaultCacheFolder, openDerivationCache, type CachePart, type DerivationCache } from './derivation-cache.ts';
export { decodeDerivationValue, encodeDerivationValue } from './derivation-codec.ts';
export { deriveEncoded, receiveOutcome, type EncodedOutcome } from './derivation-job.ts';
export { derivationKey } from './derivation-key.ts';
export { engineSourceHash, engineVersion } from './engine-version.ts';
export { loadSystemRecords, systemFolderOf } from './system-records.ts';
export { toolVersion } from './tool-version.ts';
export type { LoadedSystemRecord, SystemRecord } from '../records/index.ts';
export {
  findRecordFiles,
  formatRecordFile,
  formatRecordText,
  isPublishable,
  MAX_ID_LENGTH,
  recordFileProblems,
  recordIdProblem,
  type FormattedRecordFile,
} from '../records/index.ts';
export { checkWithRivals, withSystemFits, type FittedRecord } from './fit-systems.ts';
export type { SystemDataSet } from '../engine/index.ts';
