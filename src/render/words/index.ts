/** Display words and number formats: what the terminal, the pull-request report, the figures and the pages call things. */
export {
  ROLE_ORDER,
  SEVERITIES,
  capitalised,
  lawShapeWords,
  methodAbout,
  methodLaw,
  methodName,
  methodShort,
  molecularityText,
  plural,
  roleRank,
  roleWords,
  severityCount,
  severityWord,
  standingMark,
  VERDICTS,
  verdictCounts,
  verdictMark,
} from './chemistry-words.ts';
export { constantNameLatex, equationLatex, overallLatex } from './equation-latex.ts';
export {
  limitsText,
  numberText,
  orderText,
  percentText,
  plainNumber,
  quantityText,
  rateConstantUnit,
  signedValue,
  superscript,
  trueMinus,
  trueMinusSigns,
} from './numbers.ts';
export {
  decimalPlaces,
  measuredOrderText,
  measurementDecimals,
  orderLikeMeasured,
  orderToDecimals,
} from './measured-precision.ts';
export {
  concentrationUnitOf,
  inRecordUnit,
  recordConcentrationUnit,
  unitText,
  type RecordUnit,
} from './record-units.ts';
export { countWords, survivorsText } from './count-words.ts';
export { predictionText } from './predictions.ts';
export { speciesTerms } from './species-terms.ts';
export { speciesLatex, symbolLatex } from '../../engine/index.ts';
