/**
 * A 5-step mechanism's progress curve fitted back. The data are integrated from known elementary
 * constants (E + S ⇌ ES ⇌ EX → EP ⇌ E + P, with E + I ⇌ EI) plus 1 % noise (seed 21), the record
 * starts 1.5–2× off. One run at one [S]₀ and one [I] determines only the steady-state constants
 * k_obs = k_cat/K_M and K_S = 1/K_M, written out here by the net-rate-constant method of the
 * steady state (from memory); the fit must find them within its 95 % intervals, and the
 * simulation's constants (fitted and held together) must reproduce them.
 */
import { describe, expect, it } from 'vitest';
import { deriveMechanism, fitDerivation, type TimeCourseData } from '../../../src/engine/index.ts';
import { massActionModel } from '../../../src/engine/simulation/mass-action-system.ts';
import { integrateStiff } from '../../../src/engine/numeric/stiff-integrator.ts';
import { loadRecordSource } from '../../../src/records/index.ts';
import { normals } from '../../helpers/fit-records.ts';

type K = Record<'k1' | 'km1' | 'k2' | 'km2' | 'k3' | 'k4' | 'km4' | 'k5' | 'km5', number>;
const truth: K = { k1: 1e5, km1: 40, k2: 50, km2: 20, k3: 8, k4: 200, km4: 1e3, k5: 1e5, km5: 5 };
const start: K = { k1: 1.5e5, km1: 60, k2: 80, km2: 20, k3: 5, k4: 300, km4: 2e3, k5: 1e5, km5: 5 };

// k_cat/K_M = k1 k2 k3 / (k-1 k-2 + k-1 k3 + k2 k3); k_cat = k2 k3 k4 / (k2 k3 + k2 k4 + k-2 k4 + k3 k4)
const kOverKm = (k: K) => (k.k1 * k.k2 * k.k3) / (k.km1 * k.km2 + k.km1 * k.k3 + k.k2 * k.k3);
const kcat = (k: K) => (k.k2 * k.k3 * k.k4) / (k.k2 * k.k3 + k.k2 * k.k4 + k.km2 * k.k4 + k.k3 * k.k4);

const source = (k: K) => `title: five steps
system: five
status: proposed
notation: labels
approximation: steady_state
steps:
  - equation: E + S <=> ES
    k: ${k.k1} M^-1 s^-1
    k_rev: ${k.km1} s^-1
  - equation: ES <=> EX
    k: ${k.k2} s^-1
    k_rev: ${k.km2} s^-1
  - equation: EX -> EP
    k: ${k.k3} s^-1
  - equation: EP <=> E + P
    k: ${k.k4} s^-1
    k_rev: ${k.km4} M^-1 s^-1
  - equation: E + I <=> EI
    k: ${k.k5} M^-1 s^-1
    k_rev: ${k.km5} s^-1
observations:
  - id: course
    T: 298.15 K
    concentrations: { E: 2.0e-7 M, S: 2.5e-4 M, I: 2.0e-6 M }
`;

function generated(): TimeCourseData {
  const mechanism = deriveMechanism(loadRecordSource('content/mechanisms/five.yaml', source(truth)).record!, {
    simulate: false,
  }).mechanism!;
  const t = truth;
  const model = massActionModel(
    mechanism,
    { forward: [t.k1, t.k2, t.k3, t.k4, t.k5], reverse: [t.km1, t.km2, 0, t.km4, t.km5] },
    new Set(),
  );
  const species = [...mechanism.species.keys()];
  const y0 = new Float64Array(species.length);
  y0[species.indexOf('E')] = 2e-7;
  y0[species.indexOf('S')] = 2.5e-4;
  y0[species.indexOf('I')] = 2e-6;
  const times = [0, 30, 60, 90, 120, 180, 240, 300, 360, 480, 600, 720];
  const run = integrateStiff(model.system, y0, { tEnd: 720, outputTimes: times, rtol: 1e-9, atol: 1e-16 });
  const normal = normals(21);
  return {
    kind: 'time_course',
    observation: 'course',
    times,
    species: ['S', 'P'],
    concentrations: run.y.map((y) => [
      y[species.indexOf('S')]! * (1 + 0.01 * normal()),
      y[species.indexOf('P')]! * (1 + 0.01 * normal()) + 2e-7 * normal(),
    ]),
  };
}

describe('a 5-step progress curve fitted back', () => {
  const record = loadRecordSource('content/mechanisms/five.yaml', source(start)).record!;
  const derivation = deriveMechanism(record, { simulate: false });
  const fitted = fitDerivation(derivation, record, [generated()]);
  const tc = fitted.fits!.dataSets[0]!.timeCourse!;

  it('the closed form converges and its intervals hold the true k_obs and K_S', () => {
    const closed = tc.closedForm!;
    expect(closed.fit.converged).toBe(true);
    expect(closed.unreliable).toBeUndefined();
    const byName = new Map(closed.fit.parameters.map((p) => [p.name, p]));
    const kObs = byName.get('k_obs')!;
    const kS = byName.get('K_S')!;
    expect(kObs.interval[0]).toBeLessThan(kOverKm(truth));
    expect(kObs.interval[1]).toBeGreaterThan(kOverKm(truth));
    expect(kS.interval[0]).toBeLessThan(kOverKm(truth) / kcat(truth));
    expect(kS.interval[1]).toBeGreaterThan(kOverKm(truth) / kcat(truth));
    // K_I at one [I] only rescales the others: held, not fitted
    expect(closed.fit.parameters.map((p) => p.name)).not.toContain('K_I');
  });

  it('the simulation converges and its constants give the true k_cat/K_M and K_M within the closed form’s intervals', () => {
    const sim = tc.simulation!;
    expect(sim.fit.converged).toBe(true);
    expect(sim.unreliable).toBeUndefined();
    const all = new Map([...sim.fixed.map((f) => [f.name, f.value] as const)]);
    for (const p of sim.fit.parameters) all.set(p.name, p.value);
    const k: K = {
      k1: all.get('k_1')!,
      km1: all.get('k_-1')!,
      k2: all.get('k_2')!,
      km2: all.get('k_-2')!,
      k3: all.get('k_3')!,
      k4: all.get('k_4')!,
      km4: all.get('k_-4')!,
      k5: all.get('k_5')!,
      km5: all.get('k_-5')!,
    };
    const closed = new Map(tc.closedForm!.fit.parameters.map((p) => [p.name, p]));
    const [lo, hi] = closed.get('k_obs')!.interval;
    expect(kOverKm(k)).toBeGreaterThan(lo);
    expect(kOverKm(k)).toBeLessThan(hi);
    const [slo, shi] = closed.get('K_S')!.interval;
    expect(kOverKm(k) / kcat(k)).toBeGreaterThan(slo);
    expect(kOverKm(k) / kcat(k)).toBeLessThan(shi);
    expect(fitted.diagnostics.filter((d) => d.rule === 'fit/not-identifiable')).toEqual([]);
  });
});
