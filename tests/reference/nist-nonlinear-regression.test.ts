/**
 * The Levenberg–Marquardt wrapper against the certified results of the NIST Statistical Reference
 * Datasets for nonlinear regression (NIST/ITL StRD, https://www.itl.nist.gov/div898/strd/; data
 * files and their origin in tests/reference/data/README.md), from both of NIST's starting points.
 * Certified values (11 significant digits) are quoted from the same files. Tolerances: Misra1a
 * (lower difficulty) 9 digits on the estimates and 8 on the standard deviations; Thurber (higher
 * difficulty, a cubic over a cubic with strongly correlated parameters) 7 and 6 — the digits a
 * double-precision fit with a converged relative offset of 1e-6 or better can promise.
 */
import { describe, expect, it } from 'vitest';
import { fitNonlinear } from '../../src/engine/fitting/index.ts';
import { agreeingDigits, readReferenceData } from '../helpers/reference-data.ts';

describe('NIST StRD Misra1a: y = b1 (1 − exp(−b2 x)), 14 points', () => {
  const rows = readReferenceData('nist-misra1a.dat');
  const x = rows.map(([, xi]) => xi!);
  const y = rows.map(([yi]) => yi!);
  // Certified Values of Misra1a.dat: estimate and standard deviation of b1, b2; residual sum of squares.
  const certified = [
    [2.3894212918e2, 2.7070075241],
    [5.5015643181e-4, 7.2668688436e-6],
  ];
  const starts = {
    'start 1': [500, 1e-4],
    'start 2': [250, 5e-4],
  };

  for (const [label, start] of Object.entries(starts)) {
    for (const positive of [false, true]) {
      it(`converges from ${label} ${positive ? 'fitting logarithms' : 'on the linear scale'} to the certified values`, () => {
        const fit = fitNonlinear({
          parameters: [
            { name: 'b1', initial: start[0]!, positive },
            { name: 'b2', initial: start[1]!, positive },
          ],
          y,
          model: ([b1, b2]) => x.map((xi) => b1! * (1 - Math.exp(-b2! * xi))),
        });
        expect(fit.converged).toBe(true);
        expect(fit.issues).toEqual([]);
        fit.parameters.forEach((p, j) => {
          expect(agreeingDigits(p.value, certified[j]![0]!)).toBeGreaterThan(9);
          expect(agreeingDigits(p.standardError, certified[j]![1]!)).toBeGreaterThan(8);
        });
        expect(agreeingDigits(fit.rss, 1.2455138894e-1)).toBeGreaterThan(9);
        expect(agreeingDigits(fit.residualStandardDeviation, 1.018787633e-1)).toBeGreaterThan(9);
        expect(fit.dof).toBe(12);
      });
    }
  }
});

describe('NIST StRD Thurber: a rational cubic/cubic, 37 points, 7 parameters', () => {
  const rows = readReferenceData('nist-thurber.dat');
  const x = rows.map(([, xi]) => xi!);
  const y = rows.map(([yi]) => yi!);
  const powers = (xi: number) => [1, xi, xi * xi, xi * xi * xi];
  const numerator = (b: readonly number[], xi: number) => powers(xi).reduce((s, v, j) => s + b[j]! * v, 0);
  const denominator = (b: readonly number[], xi: number) => 1 + b[4]! * xi + b[5]! * xi * xi + b[6]! * xi ** 3;
  // The analytic Jacobian, so this case also checks the path that uses one.
  const jacobian = (b: readonly number[]) =>
    x.map((xi) => {
      const d = denominator(b, xi);
      const f = numerator(b, xi) / d;
      return [
        ...powers(xi).map((v) => v / d),
        ...powers(xi)
          .slice(1)
          .map((v) => (-f * v) / d),
      ];
    });
  // Certified Values of Thurber.dat: estimates and standard deviations of b1 … b7.
  const estimates = [
    1.28813968e3, 1.4910792535e3, 5.8323836877e2, 7.5416644291e1, 9.6629502864e-1, 3.9797285797e-1, 4.9727297349e-2,
  ];
  const deviations = [
    4.6647963344, 3.9571156086e1, 2.8698696102e1, 5.567537027, 3.1333340687e-2, 1.4984928198e-2, 6.5842344623e-3,
  ];
  const starts = {
    'start 1': [1000, 1000, 400, 40, 0.7, 0.3, 0.03],
    'start 2': [1300, 1500, 500, 75, 1, 0.4, 0.05],
  };

  for (const [label, start] of Object.entries(starts)) {
    for (const analytic of [true, false]) {
      it(`converges from ${label} with ${analytic ? 'an analytic' : 'a numeric'} Jacobian to the certified values`, () => {
        const fit = fitNonlinear({
          parameters: start.map((initial, j) => ({ name: `b${j + 1}`, initial })),
          y,
          model: (b) => x.map((xi) => numerator(b, xi) / denominator(b, xi)),
          ...(analytic ? { jacobian } : {}),
        });
        expect(fit.converged).toBe(true);
        fit.parameters.forEach((p, j) => {
          expect(agreeingDigits(p.value, estimates[j]!)).toBeGreaterThan(7);
          expect(agreeingDigits(p.standardError, deviations[j]!)).toBeGreaterThan(6);
        });
        expect(agreeingDigits(fit.rss, 5.6427082397e3)).toBeGreaterThan(9);
        expect(agreeingDigits(fit.residualStandardDeviation, 1.3714600784e1)).toBeGreaterThan(9);
        expect(fit.dof).toBe(30);
      });
    }
  }
});
