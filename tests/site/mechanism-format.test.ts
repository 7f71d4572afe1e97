import { describe, expect, it } from 'vitest';
import type { ObservationJson } from '../../src/render/report/record-report.ts';
import { constantNameLatex, limitsText, methodName, numberText, observationRows, percentText, predictionText, quantityText, roleRank, verdictText } from '../../src/render/words/mechanism-words.ts';

describe('mechanism page formats', () => {
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
    expect(percentText(0.004)).toBe('0.4 %');
    expect(verdictText('pass')).toMatch(/consistent/);
    expect(verdictText('fail')).toMatch(/contradicted/);
    expect(verdictText('unknown')).toMatch(/cannot tell/);
    expect(methodName('steady_state')).toBe('Steady-state approximation');
    expect(constantNameLatex('k_obs')).toBe('k_\\mathrm{obs}');
    expect(roleRank('reactant')).toBeLessThan(roleRank('intermediate'));
  });

  const check = (extra: Partial<ObservationJson>): ObservationJson => ({ id: 'o1', species: 'A', method: 'rds', observed: 1, tolerance: 0.1, basis: 'conditions', status: 'pass', ...extra });

  it('says what was predicted: at the conditions, at any, or a range', () => {
    expect(predictionText(check({ predicted: 0.5252 }))).toBe('0.5252 at these conditions');
    expect(predictionText(check({ predicted: 1, basis: 'limits' }))).toBe('1 (at any conditions)');
    expect(predictionText(check({ range: [0, 1], basis: 'limits' }))).toBe('0 to 1 (depends on the constants)');
    expect(predictionText(check({ basis: 'none', status: 'unknown' }))).toBe('—');
  });

  it('gathers the checks of several rate laws into one row per observed order', () => {
    const rows = observationRows([check({}), check({ method: 'steady_state' }), check({ species: 'B' })]);
    expect(rows.map((r) => [r.observation, r.species, Object.keys(r.checks)])).toEqual([
      ['o1', 'A', ['rds', 'steady_state']],
      ['o1', 'B', ['rds']],
    ]);
  });
});
