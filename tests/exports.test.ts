/** Pins the public API of each layer: what its index.ts exports (adding is a decision, removing a break). */
import { describe, expect, it } from 'vitest';
import * as catalogue from '../src/catalogue/index.ts';
import * as engine from '../src/engine/index.ts';
import * as model from '../src/model/index.ts';
import * as render from '../src/render/index.ts';

describe('public API', () => {
  it('model', () => {
    expect(Object.keys(model).sort()).toEqual([
      'DATA_COLUMN_NAMES',
      'RULES',
      'RULE_IDS',
      'countBySeverity',
      'diagnostic',
      'pathWords',
      'ruleSummary',
      'uncertaintyOf',
    ]);
  });

  it('engine', () => {
    expect(Object.keys(engine).sort()).toEqual([
      'CONCENTRATION',
      'CONFIDENCE_LEVEL',
      'CONVERSION_FOR_INITIAL_RATE',
      'DEFAULT_APPROXIMATION_THRESHOLD',
      'DERIVATION_CLASSES',
      'Polynomial',
      'REFERENCE_TEMPERATURE',
      'Rational',
      'RationalFunction',
      'akaikeWeights',
      'concentration',
      'concentrationSeries',
      'decimalPlaces',
      'deriveMechanism',
      'equilibriumConstant',
      'firstObservationSeries',
      'fitArrhenius',
      'fitDerivation',
      'fitEyring',
      'fitInitialRateOrders',
      'fitNonlinear',
      'fitSystem',
      'formatLatex',
      'formatText',
      'forwardConstant',
      'informationCriteria',
      'judgeObservations',
      'leastSquaresCriteria',
      'leastSquaresLogLikelihood',
      'linearLeastSquares',
      'measurementDecimals',
      'molecularity',
      'nestedFTest',
      'parseEquation',
      'parseQuantity',
      'readKineticData',
      'reverseConstant',
      'sameDimension',
      'simulationBasis',
      'speciesLatex',
      'studentTQuantile',
      'symbolLatex',
      'toCanonical',
    ]);
  });

  it('catalogue', () => {
    expect(Object.keys(catalogue).sort()).toEqual([
      'MAX_ID_LENGTH',
      'catalogueCache',
      'checkRecordFile',
      'checkRecordFiles',
      'checkWithRivals',
      'decodeDerivationValue',
      'defaultCacheFolder',
      'derivationKey',
      'deriveEncoded',
      'encodeDerivationValue',
      'engineSourceHash',
      'engineVersion',
      'findRecordFiles',
      'formatRecordFile',
      'formatRecordText',
      'isPublishable',
      'loadCatalogue',
      'loadSystemRecords',
      'openDerivationCache',
      'receiveOutcome',
      'recordFileProblems',
      'recordIdProblem',
      'systemFolderOf',
      'toolVersion',
      'withSystemFits',
    ]);
  });

  it('render: the writers, and the words every writer shares', () => {
    const writers = [
      'byPosition',
      'catalogueReport',
      'concentrationTimeSvg',
      'derivationText',
      'diagnosticJson',
      'energyProfileSvg',
    ];
    expect(Object.keys(render)).toEqual(
      expect.arrayContaining([...writers, 'markdownReport', 'sarifReport', 'sbmlDocument', 'textReport']),
    );
    expect(Object.keys(render)).toEqual(
      expect.arrayContaining(['numberText', 'plainNumber', 'roleWords', 'verdictMark', 'severityWord']),
    );
  });

  it('the rule ids stay stable: every id of DESIGN.md, in order', () => {
    expect(model.RULE_IDS.slice(0, 16)).toEqual([
      'record/yaml',
      'record/schema',
      'equation/syntax',
      'formula/syntax',
      'balance/atoms',
      'balance/charge',
      'step/molecularity',
      'step/units',
      'route/ambiguous',
      'roles/declared-mismatch',
      'rate/not-eliminable',
      'rate/nonlinear',
      'observation/order',
      'approximation/invalid',
      'energy/profile',
      'energy/rds-span',
    ]);
    expect(new Set(model.RULE_IDS).size).toBe(model.RULE_IDS.length);
    for (const rule of model.RULES) expect(rule.summary).toMatch(/^[a-z]/);
  });
});
