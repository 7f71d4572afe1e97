/**
 * Bad data reach the fitting stage only in shapes that read cleanly (the data/* rules stop the
 * rest at their cells); what is left must never crash a fit: too few points for the constants, a
 * species held at one concentration, a law needing a concentration nobody gave, a time course of a
 * rival without constants. Each ends as a stated issue or a flagged constant, never an exception.
 */
import { describe, expect, it } from 'vitest';
import { deriveMechanism, fitDerivation, type InitialRateData } from '../../../src/engine/index.ts';
import { saturationRecord } from '../../helpers/fit-records.ts';

const record = saturationRecord('s-first', 'S');
const derivation = deriveMechanism(record);
const table = (rows: [number, number, number][]): InitialRateData => ({
  kind: 'initial_rates',
  observation: 'table-1',
  species: ['S', 'B'],
  concentrations: rows.map(([s, b]) => [s, b]),
  rates: rows.map(([, , r]) => r),
});

describe('fits of bad data never crash', () => {
  it('two points cannot fit a two-constant law with an uncertainty', () => {
    const fitted = fitDerivation(derivation, record, [
      table([
        [0.1, 0.2, 1e-5],
        [0.2, 0.2, 1.6e-5],
      ]),
    ]);
    const law = fitted.fits!.dataSets[0]!.laws[0]!;
    const issues = law.fit?.fit.issues.map((i) => i.kind) ?? [law.issue!.kind];
    expect(issues).toContain('too-few-points');
    // No order is fed to the checks without a degree of freedom for its interval.
    expect(fitted.observations?.some((c) => c.observation === 'table-1')).toBe(false);
  });

  it('a species held at one concentration is reported held, and the law still fits', () => {
    const rows: [number, number, number][] = [0.02, 0.05, 0.1, 0.2, 0.5, 1].map((s) => [
      s,
      0.2,
      (0.5 * s) / (1 + 10 * s),
    ]);
    const fitted = fitDerivation(derivation, record, [table(rows)]);
    const orders = fitted.fits!.dataSets[0]!.orders!;
    expect(orders.held.map((h) => h.species)).toEqual(['B']);
    expect(orders.orders.map((o) => o.name)).toEqual(['S']);
    expect(fitted.fits!.dataSets[0]!.laws[0]!.fit).toBeDefined();
  });

  it('equal rates at every point read as saturation (order 0 in S), or a flagged constant, never a throw', () => {
    const rows: [number, number, number][] = [0.02, 0.05, 0.1, 0.2].map((s) => [s, 0.2, 1e-5]);
    const fitted = fitDerivation(derivation, record, [table(rows)]);
    const [, K] = fitted.fits!.dataSets[0]!.laws[0]!.fit!.fit.parameters;
    // Equal rates as S changes fourfold: the law must sit on its plateau, K[S] ≫ 1 even at the lowest S.
    expect(!K!.identifiable || K!.value * 0.02 > 5).toBe(true);
  });

  it('a law that needs a concentration nobody gave says which', () => {
    const bare = { ...record, observations: [{ id: 'table-1' }] };
    const d = deriveMechanism(bare);
    const fitted = fitDerivation(d, bare, [
      table([
        [0.1, 0.2, 1e-5],
        [0.2, 0.2, 1.6e-5],
        [0.4, 0.2, 2.1e-5],
      ]),
    ]);
    expect(fitted.fits!.dataSets[0]!.laws[0]!.issue?.message).toMatch(/\[C\]_T/);
  });

  it('a time course of a record without constants says what is missing', () => {
    const fitted = fitDerivation(derivation, record, [
      {
        kind: 'time_course',
        observation: 'table-1',
        times: [0, 10, 20],
        species: ['S'],
        concentrations: [[1e-3], [8e-4], [6e-4]],
      },
    ]);
    const tc = fitted.fits!.dataSets[0]!.timeCourse!;
    expect(tc.simulation).toBeUndefined();
    expect(tc.issues.map((i) => i.message).join(' ')).toMatch(/rate constants/);
  });
});
