/** The nested F test's probabilities and its refusal of models that are not nested. */
import { describe, expect, it } from 'vitest';
import { fTailProbability, nestedFTest, studentTQuantile } from '../../../src/engine/fitting/index.ts';

describe('nestedFTest', () => {
  it('for one extra parameter, P(F ≥ t²) is the two-sided probability of t', () => {
    // F(1, ν) is the square of Student's t(ν): a standard identity, computed here, not looked up.
    const t = studentTQuantile(0.975, 10);
    expect(fTailProbability(t * t, 1, 10)).toBeCloseTo(0.05, 10);
  });

  it('computes F from the two residual sums of squares', () => {
    const test = nestedFTest({ rss: 30, parameters: 2 }, { rss: 12, parameters: 4 }, 20);
    expect(test.valid).toBe(true);
    expect(test.f).toBeCloseTo(18 / 2 / (12 / 16), 12);
    expect(test.df1).toBe(2);
    expect(test.df2).toBe(16);
    expect(test.pValue).toBeGreaterThan(0);
    expect(test.pValue).toBeLessThan(0.01);
  });

  it('refuses models given in the wrong order or with no degrees of freedom left', () => {
    expect(nestedFTest({ rss: 12, parameters: 4 }, { rss: 30, parameters: 2 }, 20).valid).toBe(false);
    expect(nestedFTest({ rss: 30, parameters: 2 }, { rss: 12, parameters: 4 }, 4).valid).toBe(false);
  });
});
