/**
 * The demo catalogue's invented data sets read cleanly, and say true things about themselves: the
 * KX-7 rate table separates the rivals, the pincer survey at one [L] does not, and the acetal
 * temperature series gives a small positive ΔS‡ (each record's data note states these numbers).
 */
import { describe, expect, it } from 'vitest';
import { checkRecordFile } from '../../../src/catalogue/index.ts';
import { fitEyring, type InitialRateData, type TemperatureSeriesData } from '../../../src/engine/index.ts';
import { compareRivals } from '../../helpers/compare-rivals.ts';

const demo = (id: string) => checkRecordFile(`content/mechanisms/${id}.yaml`);
const runsOf = (data: InitialRateData) => data.rates.map((rate, i) => ({ c: data.concentrations[i]!, rate }));

describe('the demo data sets', () => {
  it('read without a diagnostic, in canonical units, each labelled invented', async () => {
    for (const [id, kind] of [
      ['kx7-hydroarylation-alkene-first', 'initial_rates'],
      ['pincer-exchange-dissociative', 'initial_rates'],
      ['acetal-hydrolysis-a1', 'temperature_series'],
      ['isomerase-mimic-single-complex', 'time_course'],
    ] as const) {
      const checked = await demo(id);
      expect(checked.diagnostics.filter((d) => d.rule.startsWith('data/'))).toEqual([]);
      expect(checked.data?.map((d) => d.kind)).toEqual([kind]);
      const observation = checked.record!.observations!.find((o) => o.data)!;
      expect(observation.data!.note).toMatch(/^Invented demo data/);
    }
  });

  it('KX-7: the alkene-first law takes an Akaike weight above 0.99 against arene-first', async () => {
    const data = (await demo('kx7-hydroarylation-alkene-first')).data![0] as InitialRateData;
    expect(data.species).toEqual(['Cat', 'A', 'B']);
    const [alkene, arene] = compareRivals(runsOf(data), {
      'alkene-first': { initial: [0.5, 10], law: (p, c) => (p[0]! * c[0]! * c[1]! * c[2]!) / (1 + p[1]! * c[1]!) },
      'arene-first': { initial: [0.5, 4], law: (p, c) => (p[0]! * c[0]! * c[1]! * c[2]!) / (1 + p[1]! * c[2]!) },
    });
    expect(alkene!.weight).toBeGreaterThan(0.99);
    expect(arene!.delta).toBeGreaterThan(100);
    expect(alkene!.fit.parameters[1]!.value).toBeCloseTo(11.3, -1);
  });

  it('pincer survey at one [L]: the two rivals fit equally (ΔAICc < 2, weights near ½)', async () => {
    const data = (await demo('pincer-exchange-dissociative')).data![0] as InitialRateData;
    const [dissociative, associative] = compareRivals(runsOf(data), {
      dissociative: { initial: [1e-4], law: (p, c) => (p[0]! * c[0]! * c[1]!) / c[2]! },
      associative: { initial: [1e-2], law: (p, c) => p[0]! * c[0]! * c[1]! },
    });
    expect(Math.abs(dissociative!.delta - associative!.delta)).toBeLessThan(2);
    expect(dissociative!.weight).toBeCloseTo(0.5, 2);
  });

  it('acetal: the Eyring fit gives ΔH‡ ≈ 67.6 kJ/mol and a small positive ΔS‡', async () => {
    const data = (await demo('acetal-hydrolysis-a1')).data![0] as TemperatureSeriesData;
    expect(data.order).toBe(2);
    const fit = fitEyring(data, data.order);
    expect(fit.enthalpy.value / 1000).toBeCloseTo(67.6, 1);
    expect(fit.entropy.value).toBeGreaterThan(0);
    expect(fit.entropy.value).toBeLessThan(20);
  });
});
