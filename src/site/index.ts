/**
 * src/site: the page models of the catalogue site and the helpers the Astro pages use to render
 * them (KaTeX, sanitised notes, safe links). Everything chemical comes from the catalogue layer.
 * Pages import this and render/words, nothing else of ours.
 */
export { catalogueJson, jsonResponse, publicReport } from './api-report.ts';
export { systemFitViews, type FitRow, type SystemFitView } from './fit-view.ts';
export { mentionsHazard } from './hazard.ts';
export { doiUrl, httpUrl, sourceUrl } from './links.ts';
export { escapeHtml, renderMath } from './math.ts';
export { renderNotes } from './notes.ts';
export { plainNoteHtml } from './plain-note.ts';
export { observationRows, type ObservationRow } from './observation-rows.ts';
export { recordView, type ObservationView, type RecordView, type SpeciesView, type StepView } from './record-view.ts';
export {
  forgetCatalogue,
  loadCatalogue,
  siteCatalogue,
  type Catalogue,
  type SpeciesOccurrence,
  type SpeciesPage,
} from './site-catalogue.ts';
export { readableSlug, speciesSlugs } from './species-slug.ts';
export { speciesKey, speciesPageSlugs } from './species-pages.ts';
export {
  anchorId,
  groupDiagnostics,
  openProblems,
  placeText,
  recentRecords,
  roleCounts,
  roleSummary,
  ruleIndex,
  type Contradiction,
  type OpenProblems,
  type PlacedDiagnostic,
  type RoleCount,
  type RuleGroup,
  type SeverityGroup,
} from './summaries.ts';
export { systemTitle, withSystemRecord } from './system-record-view.ts';
export {
  shortLabels,
  systemView,
  type Discriminator,
  type MatrixRow,
  type RivalColumn,
  type SystemRecordView,
  type SystemView,
} from './system-view.ts';
export type {
  ApparentConstantJson,
  DiagnosticJson,
  ObservationJson,
  RateLawJson,
  RecordReport,
  Reference,
} from '../model/index.ts';
export { toolVersion } from '../catalogue/index.ts';
export { buildSearchIndex, type MechanismInput, type SpeciesInput } from '../search/build-index.ts';
