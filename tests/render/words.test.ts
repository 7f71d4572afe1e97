import { describe, expect, it } from 'vitest';
import type { ObservationJson } from '../../src/model/index.ts';
import {
  capitalised,
  constantNameLatex,
  limitsText,
  methodName,
  numberText,
  orderText,
  percentText,
  plainNumber,
  predictionText,
  quantityText,
  rateConstantUnit,
  roleRank,
  roleWords,
  severityCount,
  verdictCounts,
  verdictMark,
} from '../../src/render/words/index.ts';
import { observationRows } from '../../src/site/index.ts';

describe('display words and number formats', () => {
  it.each([
    ['8.1e4 M^-1 s^-1', '8.1 × 10⁴ M⁻¹ s⁻¹'],
    ['1.0e-3 M', '1.0 × 10⁻³ M'],
    ['8.0e-33 cm^6 molecule^-2 s^-1', '8.0 × 10⁻³³ cm⁶ molecule⁻² s⁻¹'],
    ['0.52 +/- 0.08', '0.52 ± 0.08'],
    ['56 kJ/mol', '56 kJ/mol'],
    ['4.0 M^(-1)', '4.0 M⁻¹'],
  ])('quantityText(%s)', (text, shown) => expect(quantityText(text)).toBe(shown));

  it.each([
    [5.62671e-6, '5.63 × 10⁻⁶'],
    [0.0551, '0.0551'],
    [142.2, '142'],
    [34000, '34000'],
    [340000, '3.4 × 10⁵'],
    [-56, '−56'],
    [0, '0'],
  ])('numberText(%s)', (x, shown) => expect(numberText(x)).toBe(shown));

  it('writes order limits, percentages and verdicts in words', () => {
    expect(limitsText(1, 1)).toBe('1');
    expect(limitsText(1, 0)).toBe('1 → 0');
    expect(limitsText('1/2', '-1/2')).toBe('1/2 → −1/2');
    expect(percentText(0.1295)).toBe('13 %');
    expect(percentText(0.053)).toBe('5.3 %');
    expect(percentText(0.004)).toBe('0.40 %');
    expect(percentText(0.00001)).toBe('< 0.01 %');
    expect(verdictMark('pass')).toMatchObject({ symbol: '\u2713', word: 'consistent' });
    expect(verdictMark('fail')).toMatchObject({ symbol: '\u2717', word: 'contradicted' });
    expect(verdictMark('not_excluded').word).toBe('not excluded');
    expect(verdictMark('unknown').word).toBe('no prediction');
    expect(verdictMark(undefined).word).toBe('not judged');
    expect(capitalised(methodName('steady_state'))).toBe('Steady-state approximation');
    expect(methodName('rds')).toBe('rate-determining step with fast pre-equilibria');
    expect(constantNameLatex('k_obs')).toBe('k_\\mathrm{obs}');
    expect(roleRank('reactant')).toBeLessThan(roleRank('intermediate'));
    expect(roleRank('third body')).toBe(roleRank('third_body'));
    expect(roleWords('third_body')).toBe('third body');
    expect(roleWords(undefined)).toBe('no role derived');
  });

  it('orders: at most three decimals, fractions as written, a true minus sign', () => {
    expect(orderText(0.5252)).toBe('0.525');
    expect(orderText(-1)).toBe('\u22121');
    expect(orderText('1/2')).toBe('1/2');
    expect(orderText('-1/2')).toBe('\u22121/2');
  });

  it('plain numbers and units for a terminal', () => {
    expect(plainNumber(1.234e-5)).toBe('1.23e-5');
    expect(plainNumber(142.2)).toBe('142');
    expect(rateConstantUnit(1)).toBe('s⁻¹');
    expect(rateConstantUnit(2)).toBe('M⁻¹ s⁻¹');
    expect(rateConstantUnit(0)).toBe('M s⁻¹');
    expect(rateConstantUnit(3)).toBe('M⁻² s⁻¹');
  });

  it('counts diagnostics by severity, the third severity being a note', () => {
    expect(severityCount(1, 'warning')).toBe('1 warning');
    expect(severityCount(3, 'info')).toBe('3 notes');
  });

  const check = (extra: Partial<ObservationJson>): ObservationJson => ({
    id: 'o1',
    species: 'A',
    method: 'rds',
    observed: 1,
    tolerance: 0.1,
    basis: 'conditions',
    status: 'pass',
    ...extra,
  });

  it('says what was predicted: at the conditions, at any, or a range', () => {
    // Rounded to the measurement it is compared with (1 ± 0.1: one decimal).
    expect(predictionText(check({ predicted: 0.5252 }))).toBe('0.5 at these conditions');
    expect(predictionText(check({ predicted: 1, basis: 'limits' }))).toBe('1 (at any conditions)');
    expect(predictionText(check({ range: [0, 1], basis: 'limits', status: 'not_excluded' }))).toBe(
      '0 to 1 for some constants (not given)',
    );
    expect(predictionText(check({ basis: 'none', status: 'unknown' }))).toBe('—');
    expect(predictionText(check({ basis: 'none', status: 'unknown', reason: 'no closed form' }))).toBe(
      'no prediction: no closed form',
    );
  });

  it('shows the third verdict apart from a pass, and counts verdicts apart', () => {
    const open = verdictMark('not_excluded');
    expect(open.symbol).not.toBe(verdictMark('pass').symbol);
    expect(open.className).not.toBe(verdictMark('pass').className);
    expect(open.className).not.toBe(verdictMark('unknown').className);
    expect(verdictCounts({ pass: 2, fail: 0, not_excluded: 1, unknown: 1 })).toBe(
      '2 consistent, 1 not excluded, 1 no prediction',
    );
    expect(verdictCounts({ pass: 0, fail: 0, not_excluded: 0, unknown: 0 })).toBe('');
  });

  it('gathers the checks of several rate laws into one row per observed order', () => {
    const rows = observationRows([check({}), check({ method: 'steady_state' }), check({ species: 'B' })]);
    expect(rows.map((r) => [r.observation, r.species, Object.keys(r.checks)])).toEqual([
      ['o1', 'A', ['rds', 'steady_state']],
      ['o1', 'B', ['rds']],
    ]);
  });
});
