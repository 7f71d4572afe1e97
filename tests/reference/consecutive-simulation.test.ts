/**
 * The concentration–time series of a record with consecutive first-order steps A → B → C against
 * the analytic solution of Harcourt and Esson (1866) and Bateman (1910), as given in P. Atkins &
 * J. de Paula, Physical Chemistry, consecutive elementary reactions (from memory):
 *   [A] = A₀ e^{−k₁t},  [B] = A₀ k₁/(k₂ − k₁) (e^{−k₁t} − e^{−k₂t}),  [C] = A₀ − [A] − [B],
 *   t_max = ln(k₂/k₁)/(k₂ − k₁),  [B]max = A₀ (k₁/k₂)^{k₂/(k₂ − k₁)}.
 * This checks the series end to end — record, derivation, constants, the chosen span and output
 * times — where tests/unit/numeric/consecutive-reactions.test.ts checks the integrator alone.
 */
import { describe, expect, it } from 'vitest';
import { concentrationSeries, firstObservationSeries } from '../../src/engine/simulation/concentration-series.ts';
import { loadRecordSource } from '../../src/records/index.ts';
import { simulationBasis } from '../../src/engine/derive.ts';
import { deriveYaml } from '../helpers/derive-yaml.ts';

const A0 = 0.1;
const yaml = (k1: number, k2: number) => `title: consecutive first-order steps
system: consecutive
status: proposed
notation: labels
steps:
  - { equation: A -> B, k: ${k1} s^-1 }
  - { equation: B -> C, k: ${k2} s^-1 }
observations:
  - id: run
    concentrations: { A: ${A0} M }
`;

describe.each([
  ['comparable constants', 1, 2.5],
  ['a fast second step (k₂/k₁ = 1000)', 0.01, 10],
])('A → B → C, %s (k₁ = %d s⁻¹, k₂ = %d s⁻¹)', (_, k1, k2) => {
  const record = loadRecordSource('consecutive.yaml', yaml(k1, k2)).record!;
  const d = deriveYaml(yaml(k1, k2));
  const series = firstObservationSeries(record.observations!, simulationBasis(d)!, d.constants!)!;
  const at = (sp: string) => series.values[series.species.indexOf(sp)]!;
  const tMax = Math.log(k2 / k1) / (k2 - k1);
  const bMax = A0 * (k1 / k2) ** (k2 / (k2 - k1));

  it('runs from t = 0 to a round time past 99 % conversion', () => {
    expect(series.status).toBe('ok');
    expect(series.unit).toBe('M');
    expect(series.times[0]).toBe(0);
    expect(series.times.every((t, k) => k === 0 || t > series.times[k - 1]!)).toBe(true);
    expect(series.conversion!).toBeGreaterThanOrEqual(0.99);
    const end = series.times[series.times.length - 1]!;
    expect(end / 10 ** Math.floor(Math.log10(end))).toBeOneOf([1, 2, 5]);
    // 99 % of C needs about ln(100)/k₁ when the first step is the slow one; the span stays within a few of those.
    expect(end).toBeLessThan((5 * Math.log(100)) / Math.min(k1, k2));
  });

  it('has log-spaced early times, reaching well before the faster step', () => {
    const first = series.times[1]!;
    expect(first).toBeLessThanOrEqual(0.1 / Math.max(k1, k2));
    const decade = series.times.filter((t) => t >= first && t < 10 * first);
    expect(decade.length).toBeGreaterThanOrEqual(18);
  });

  it('matches the Harcourt–Esson solution to 1e-5 relative (1e-12 M absolute)', () => {
    series.times.forEach((t, k) => {
      const a = A0 * Math.exp(-k1 * t);
      const b = ((A0 * k1) / (k2 - k1)) * (Math.exp(-k1 * t) - Math.exp(-k2 * t));
      const c = A0 - a - b;
      expect(Math.abs(at('A')[k]! - a)).toBeLessThan(1e-5 * a + 1e-12);
      expect(Math.abs(at('B')[k]! - b)).toBeLessThan(1e-5 * b + 1e-12);
      expect(Math.abs(at('C')[k]! - c)).toBeLessThan(1e-5 * c + 1e-12);
    });
  });

  it('shows the maximum of B near t_max with [B]max from the textbook formula', () => {
    const B = at('B');
    const peak = B.indexOf(Math.max(...B));
    // The output grid is 20 points per decade (plus even steps): the sampled peak is within one
    // grid step of t_max, and just under [B]max.
    expect(series.times[peak]! / tMax).toBeGreaterThan(0.85);
    expect(series.times[peak]! / tMax).toBeLessThan(1.15);
    expect(B[peak]!).toBeLessThanOrEqual(bMax * (1 + 1e-5));
    expect(B[peak]!).toBeGreaterThan(bMax * 0.99);
  });
});

describe('a record that cannot be simulated', () => {
  it('says what is missing instead of throwing', () => {
    const text = yaml(1, 2).replace(', k: 2 s^-1', '');
    const d = deriveYaml(text);
    const record = loadRecordSource('missing.yaml', text).record!;
    const series = concentrationSeries(simulationBasis(d)!, new Map([['k_1', 1]]), record.observations![0]!);
    expect(series).toMatchObject({
      status: 'skipped',
      message: 'not simulated: needs the rate constant of step 2',
      times: [],
      values: [],
    });
  });
});
