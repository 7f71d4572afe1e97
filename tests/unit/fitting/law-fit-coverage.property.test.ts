/**
 * Coverage of the law fits: rates generated from a known saturation law r = k[C]_T[S][B]/(1 + K[S])
 * with known constants and 5 % noise (fixed seeds) are fitted back through the derivation; the
 * 95 % intervals of k_obs and K_S must hold the true values at about the nominal rate. With 40
 * independent data sets the count inside is binomial (n 40, p 0.95): mean 38, and 34 or more with
 * probability above 0.99 (common practice for a coverage check). Then the ranking: with data that
 * separate the rivals the true model wins, and a favoured rival the data reject is an error.
 */
import { describe, expect, it } from 'vitest';
import { deriveMechanism, fitDerivation, fitSystem } from '../../../src/engine/index.ts';
import { asData, saturationRecord, saturationTable } from '../../helpers/fit-records.ts';

const K_TRUE = 11.3;
const k_TRUE = 0.678;

describe('law fits cover their true constants', () => {
  it('holds k_obs and K within their 95 % intervals about 95 % of the time', () => {
    const record = saturationRecord('s-first', 'S');
    const derivation = deriveMechanism(record);
    let inside = { k: 0, K: 0 };
    const runs = 40;
    for (let seed = 1; seed <= runs; seed++) {
      const fitted = fitDerivation(derivation, record, asData(saturationTable(k_TRUE, K_TRUE, seed)));
      const law = fitted.fits!.dataSets[0]!.laws[0]!;
      expect(law.issue).toBeUndefined();
      const [kObs, K] = law.fit!.fit.parameters;
      expect(kObs!.name).toBe('k_obs');
      if (kObs!.interval[0] <= k_TRUE && k_TRUE <= kObs!.interval[1]) inside.k++;
      if (K!.interval[0] <= K_TRUE && K_TRUE <= K!.interval[1]) inside.K++;
    }
    expect(inside.k).toBeGreaterThanOrEqual(34);
    expect(inside.K).toBeGreaterThanOrEqual(34);
  });

  it('gives fitted orders as chords that pass against the true law', () => {
    const record = saturationRecord('s-first', 'S');
    const fitted = fitDerivation(deriveMechanism(record), record, asData(saturationTable(k_TRUE, K_TRUE, 7)));
    const orders = fitted.fits!.dataSets[0]!.orders!.orders;
    // Over S = 0.02–1.28 M with K = 11.3 M^-1 the local order falls from 0.82 to 0.06: the chord lies between.
    const s = orders.find((o) => o.name === 'S')!;
    expect(s.value).toBeGreaterThan(0.06);
    expect(s.value).toBeLessThan(0.82);
    // B is first order throughout (common sense of the law).
    const b = orders.find((o) => o.name === 'B')!;
    expect(Math.abs(b.value - 1)).toBeLessThan(3 * b.standardError + 0.05);
  });
});

describe('ranking rivals fitted to the same data', () => {
  const rivals = (favoured: 'S' | 'B') =>
    (['S', 'B'] as const).map((first) => {
      const record = saturationRecord(
        `${first.toLowerCase()}-first`,
        first,
        first === favoured ? 'favoured' : 'proposed',
      );
      const data = first === 'S' ? asData(saturationTable(k_TRUE, K_TRUE, 3)) : [];
      const derivation = fitDerivation(deriveMechanism(record), record, data);
      return { id: `${first.toLowerCase()}-first`, status: record.status, record, derivation, data };
    });

  it('lets the true model win when the data separate the rivals', () => {
    const fits = fitSystem(rivals('S'));
    const ranking = fits.dataSets[0]!.ranking;
    expect(ranking.best).toBe('s-first');
    expect(ranking.rivals.find((r) => r.record === 'b-first')!.rejected).toBe(true);
    expect(fits.diagnostics.get('b-first')!.map((d) => [d.rule, d.severity])).toEqual([
      ['fit/rival-rejected', 'warning'],
    ]);
    expect(fits.diagnostics.get('s-first')).toBeUndefined();
  });

  it('reports a favoured record the data reject as an error', () => {
    const fits = fitSystem(rivals('B'));
    expect(fits.diagnostics.get('b-first')!.map((d) => [d.rule, d.severity, d.path])).toEqual([
      ['fit/rival-rejected', 'error', ['status']],
    ]);
  });

  it('suggests a measurement only between rivals that survive', () => {
    const fits = fitSystem(rivals('S'));
    // One survivor: nothing left to tell apart.
    expect(fits.dataSets[0]!.next).toBeUndefined();
    expect(fits.dataSets[0]!.plot?.x).toBe('S');
  });
});
