/**
 * Weighted linear least squares against the certified results of the NIST Statistical Reference
 * Datasets for linear regression (NIST/ITL StRD, https://www.itl.nist.gov/div898/strd/; data
 * files and their origin in tests/reference/data/README.md). Certified values are quoted below
 * from the same files. NIST certifies 15 significant digits; a program is graded by how many it
 * reproduces. Tolerances: Norris (lower difficulty) 12 digits, Longley (higher difficulty, six
 * nearly collinear regressors) 10 digits — what a careful double-precision solver achieves; the
 * normal equations would keep about 5 on Longley.
 */
import { describe, expect, it } from 'vitest';
import { linearLeastSquares, nestedFTest } from '../../src/engine/fitting/index.ts';
import { agreeingDigits, readReferenceData } from '../helpers/reference-data.ts';

describe('NIST StRD Norris (y = B0 + B1 x, 36 points)', () => {
  const rows = readReferenceData('nist-norris.dat');
  const fit = linearLeastSquares({ design: rows.map(([, x]) => [1, x!]), y: rows.map(([y]) => y!) });

  it('reproduces the certified estimates and their standard deviations to 12 digits', () => {
    // Certified Regression Statistics of Norris.dat.
    const certified = [
      [-0.262323073774029, 0.232818234301152],
      [1.00211681802045, 0.429796848199937e-3],
    ];
    fit.parameters.forEach((p, j) => {
      expect(agreeingDigits(p.value, certified[j]![0]!)).toBeGreaterThan(12);
      expect(agreeingDigits(p.standardError, certified[j]![1]!)).toBeGreaterThan(12);
    });
  });

  it('reproduces the residual standard deviation, R² and the analysis of variance', () => {
    expect(agreeingDigits(fit.residualStandardDeviation, 0.884796396144373)).toBeGreaterThan(12);
    expect(agreeingDigits(fit.rSquared, 0.999993745883712)).toBeGreaterThan(12);
    expect(fit.dof).toBe(34);
    expect(agreeingDigits(fit.rss, 26.6173985294224)).toBeGreaterThan(11);
    // The certified F statistic of the ANOVA table is the nested F test against y = B0.
    const mean = rows.reduce((s, [y]) => s + y!, 0) / rows.length;
    const total = rows.reduce((s, [y]) => s + (y! - mean) ** 2, 0);
    const test = nestedFTest({ rss: total, parameters: 1 }, { rss: fit.rss, parameters: 2 }, rows.length);
    expect(agreeingDigits(test.f, 5436385.54079785)).toBeGreaterThan(10);
    expect(test.df1).toBe(1);
    expect(test.df2).toBe(34);
  });
});

describe('NIST StRD Longley (seven coefficients, 16 points, higher difficulty)', () => {
  const rows = readReferenceData('nist-longley.dat');
  const fit = linearLeastSquares({ design: rows.map((r) => [1, ...r.slice(1)]), y: rows.map(([y]) => y!) });

  it('reproduces every certified estimate and standard deviation to 10 digits', () => {
    // Certified Regression Statistics of Longley.dat (B0 … B6).
    const certified = [
      [-3482258.63459582, 890420.383607373],
      [15.0618722713733, 84.9149257747669],
      [-0.35819179292591e-1, 0.334910077722432e-1],
      [-2.02022980381683, 0.488399681651699],
      [-1.03322686717359, 0.214274163161675],
      [-0.511041056535807e-1, 0.22607320006937],
      [1829.15146461355, 455.478499142212],
    ];
    fit.parameters.forEach((p, j) => {
      expect(agreeingDigits(p.value, certified[j]![0]!)).toBeGreaterThan(10);
      expect(agreeingDigits(p.standardError, certified[j]![1]!)).toBeGreaterThan(10);
    });
  });

  it('reproduces the residual standard deviation, R², the residual sum of squares and F', () => {
    expect(agreeingDigits(fit.residualStandardDeviation, 304.854073561965)).toBeGreaterThan(10);
    expect(agreeingDigits(fit.rSquared, 0.995479004577296)).toBeGreaterThan(10);
    expect(agreeingDigits(fit.rss, 836424.055505915)).toBeGreaterThan(10);
    expect(fit.dof).toBe(9);
    expect(fit.rank).toBe(7);
    const total = 184172401.944494 + 836424.055505915; // certified regression + residual sums of squares
    const test = nestedFTest({ rss: total, parameters: 1 }, { rss: fit.rss, parameters: 7 }, rows.length);
    expect(agreeingDigits(test.f, 330.285339234588)).toBeGreaterThan(9);
  });

  it('gives 95 % intervals from Student t with 9 degrees of freedom', () => {
    // t(0.975, 9) = 2.262157 (statistical tables, e.g. NIST/SEMATECH e-Handbook table 1.3.6.7.2 — from memory).
    const b6 = fit.parameters[6]!;
    const half = (b6.interval[1] - b6.interval[0]) / 2;
    expect(half / b6.standardError).toBeCloseTo(2.262157, 5);
  });
});
