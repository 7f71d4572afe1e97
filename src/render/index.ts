/**
 * src/render: pure writers of what the engine derived — the reports (JSON model, text,
 * markdown, SARIF, a derivation for a person), the SVG figures, SBML, and the display words and
 * number formats every writer shares. Pure: no input or output of its own.
 */
export { catalogueReport, reportOf } from './report/catalogue-report.ts';
export { escapeControlCharacters } from './report/control-characters.ts';
export { derivationText, type DerivedRecord } from './report/derivation-text.ts';
export { markdownReport, type MarkdownOptions } from './report/markdown.ts';
export { MARKDOWN_SECTIONS, recordSection, type MarkdownSection } from './report/markdown-record.ts';
export {
  comparedFacts,
  comparedVerdicts,
  verdictWords,
  type ComparedFact,
  type ComparedVerdict,
} from './report/record-comparison.ts';
export { systemDataSetJson } from './report/fits-json.ts';
export { favouredSentence, fitsText, valueText, weightText } from './report/fits-text.ts';
export {
  diagnosticJson,
  observationJson,
  rateLawJson,
  recordReport,
  type RecordInput,
} from './report/record-report.ts';
export { sarifReport } from './report/sarif.ts';
export { primaryChecks, tallyVerdicts } from './report/verdict-tally.ts';
export { byPosition, diagnosticRow, findingLines, positionWords } from './report/finding-text.ts';
export {
  blockingWords,
  findingCounts,
  summaryLine,
  summarySentences,
  type FindingCounts,
} from './report/summary-words.ts';
export { findingsSection, RECORD_SECTIONS, recordHeading, textReport, type TextSection } from './report/text.ts';
export type { ConcentrationUnit } from './plots/concentration-scale.ts';
export { concentrationTimeSvg } from './plots/concentration-time-svg.ts';
export { energyProfileSvg } from './plots/energy-profile-svg.ts';
export { fittedCurvesSvg, orderPlotSvg, residualsSvg, type FitPlotOptions } from './plots/fit-plots-svg.ts';
export { sbmlDocument } from './sbml/sbml.ts';
export {
  ROLE_ORDER,
  SEVERITIES,
  capitalised,
  constantNameLatex,
  equationLatex,
  limitsText,
  methodAbout,
  methodLaw,
  methodName,
  methodShort,
  molecularityText,
  numberText,
  orderText,
  overallLatex,
  percentText,
  plainNumber,
  plural,
  predictionText,
  quantityText,
  rateConstantUnit,
  recordConcentrationUnit,
  roleRank,
  roleWords,
  severityCount,
  severityWord,
  standingMark,
  signedValue,
  speciesLatex,
  speciesTerms,
  superscript,
  symbolLatex,
  trueMinus,
  trueMinusSigns,
  VERDICTS,
  verdictCounts,
  verdictMark,
} from './words/index.ts';
