/**
 * A time-course fit that cannot be trusted says so: in the fit (its reasons), as a positioned
 * fit/not-identifiable warning on the observation's data, and in the JSON report's rival. Three
 * ways a fit fails (common practice in reading any least-squares fit): it stops before
 * converging, a constant runs to the edge of its search window because the data do not feel it,
 * or its curves miss the data far beyond their stated uncertainties (χ² in its 0.1 % tail).
 */
import { describe, expect, it } from 'vitest';
import { deriveMechanism, fitDerivation, fitSystem, type TimeCourseData } from '../../../src/engine/index.ts';
import { fitTimeCourse } from '../../../src/engine/fitting/time-course-fit.ts';
import { timeCourseInput } from '../../../src/engine/fit-record.ts';
import { fitsJson } from '../../../src/render/report/fits-json.ts';
import { loadRecordSource } from '../../../src/records/index.ts';

// One first-order step A -> B, k = 0.01 s^-1 in the record, A starting at 1 mM.
const source = `title: one step
system: reliability
status: proposed
notation: labels
steps:
  - equation: A -> B
    k: 0.01 s^-1
observations:
  - id: run
    T: 298.15 K
    concentrations: { A: 1.0e-3 M }
`;
const record = loadRecordSource('content/mechanisms/one-step.yaml', source).record!;
const derivation = deriveMechanism(record, { simulate: false });
const times = [0, 20, 40, 60, 80, 100, 150, 200];
const course = (a: (t: number) => number, u?: number): TimeCourseData => ({
  kind: 'time_course',
  observation: 'run',
  times,
  species: ['A'],
  concentrations: times.map((t) => [a(t)]),
  ...(u !== undefined && { uncertainties: times.map(() => [u]) }),
});

describe('time-course fits that are not to be trusted', () => {
  it('a fit stopped before it converged is marked unreliable', () => {
    // data from k = 0.03 s^-1, the record starts at 0.01: one iteration cannot get there
    const data = course((t) => 1e-3 * Math.exp(-0.03 * t));
    const input = timeCourseInput(derivation, record, data, 0)!;
    const fit = fitTimeCourse(input, 1);
    expect(fit.simulation!.fit.converged).toBe(false);
    expect(fit.simulation!.unreliable!.join(' ')).toMatch(/did not converge/);
  });

  it('a constant the data do not feel runs to its window edge: a positioned warning and a marked JSON rival', () => {
    // A never decays: k runs towards zero, to the edge of its ×1000 window
    const data = course(() => 1e-3);
    const fitted = fitDerivation(derivation, record, [data]);
    const tc = fitted.fits!.dataSets[0]!.timeCourse!;
    expect(tc.simulation!.unreliable!.join(' ')).toMatch(/do not determine k_1/);
    const warning = fitted.diagnostics.find(
      (d) => d.rule === 'fit/not-identifiable' && /mass-action simulation/.test(d.message),
    );
    expect(warning?.severity).toBe('warning');
    expect(warning?.path).toEqual(['observations', 0, 'data']);
    const rival = fitsJson('one-step', fitted, undefined)!.data_sets![0]!.rivals.find((r) => r.method === 'simulation');
    expect(rival?.unreliable).toMatch(/do not determine k_1/);
  });

  it('curves far outside the stated uncertainties are a misfit', () => {
    // A falls then rises again, which no value of k reproduces; each point ± 1 µM
    const data = course((t) => 1e-3 * (0.5 + 0.5 * Math.cos(t / 40)), 1e-6);
    const fitted = fitDerivation(derivation, record, [data]);
    const tc = fitted.fits!.dataSets[0]!.timeCourse!;
    expect(tc.simulation!.unreliable!.join(' ')).toMatch(/beyond their stated uncertainties/);
  });

  it('a good fit to data from the model within their scatter carries no mark', () => {
    // data from k = 0.012 s^-1 exactly, stated ± 1 µM
    const data = course((t) => 1e-3 * Math.exp(-0.012 * t), 1e-6);
    const fitted = fitDerivation(derivation, record, [data]);
    const tc = fitted.fits!.dataSets[0]!.timeCourse!;
    expect(tc.simulation!.unreliable).toBeUndefined();
    expect(tc.simulation!.fit.parameters[0]!.value).toBeCloseTo(0.012, 4);
    expect(fitted.diagnostics.filter((d) => d.rule === 'fit/not-identifiable')).toEqual([]);
  });

  it('a favoured rival whose fit ran to its window edge is not rejected outright: a warning that says why', () => {
    // data from k = 0.05 s^-1; the favoured record starts at 1e-5, so its ×1000 window stops at 0.01
    const data = course((t) => 1e-3 * Math.exp(-0.05 * t));
    const rival = (id: string, k: number, status: 'favoured' | 'proposed') => {
      const r = loadRecordSource(
        `content/mechanisms/${id}.yaml`,
        source.replace('k: 0.01 s^-1', `k: ${k} s^-1`).replace('status: proposed', `status: ${status}`),
      ).record!;
      const d = deriveMechanism(r, { simulate: false });
      return { id, status, record: r, derivation: fitDerivation(d, r, [data]), data: [data] };
    };
    const fits = fitSystem([rival('slow-start', 1e-5, 'favoured'), rival('near-start', 0.04, 'proposed')]);
    const found = fits.diagnostics.get('slow-start')!.filter((d) => d.rule === 'fit/rival-rejected');
    expect(found.map((d) => d.severity)).toEqual(['warning']);
    expect(found[0]!.message).toMatch(/time-course fit of slow-start is unreliable/);
  });
});
