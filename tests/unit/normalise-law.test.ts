/**
 * The normaliser's choices, one at a time: which term a factor is divided by, how the K's are
 * named when names would clash, how a fractional power is written, and the units it gives.
 */
import { describe, expect, it } from 'vitest';
import { Polynomial, RationalFunction } from '../../src/engine/exact/index.ts';
import { Rational } from '../../src/engine/exact/rational.ts';
import type { Mechanism } from '../../src/engine/mechanism/mechanism.ts';
import { formatterFor } from '../../src/engine/rate-law/formatter.ts';
import { evaluateNormalised, normaliseLaw } from '../../src/engine/rate-law/normalise-law.ts';
import { unitLatex, unitText } from '../../src/engine/rate-law/apparent-constant.ts';
import { deriveYaml } from '../helpers/derive-yaml.ts';
import { expectSameLaw, lawBy } from '../helpers/rate-law-check.ts';
import { constantNamed } from '../helpers/normalised-check.ts';

const record = (steps: string, extra = '') =>
  deriveYaml(`title: t\nsystem: t\nstatus: proposed\nnotation: labels\n${extra}steps:\n${steps}`);

describe('normalised laws', () => {
  it('with no constant term below, divides by the term of lowest degree: ozone reads 1 + K[O3]/[O2]', () => {
    // Steady state on O: r = k_1k_2[O3]²/(k_-1[O2] + k_2[O3]); at high O2 it tends to
    // (k_1k_2/k_-1)[O3]²/[O2] (P. Atkins & J. de Paula, Physical Chemistry; from memory).
    const d = deriveYaml(`title: t\nsystem: t\nstatus: proposed\napproximation: steady_state\nsteps:
  - equation: O3 <=> O2 + O
  - equation: O + O3 -> 2 O2
`);
    const n = lawBy(d, 'steady_state').normalised!;
    expect(n.text).toBe('k_obs*[O3]^2/[O2] / (1 + K_(O3/O2)*[O3]/[O2])');
    expectSameLaw(constantNamed(n, 'k_obs').definition, {
      symbols: ['k_1', 'k_-1', 'k_2'],
      rate: (v) => (v('k_1') * v('k_2')) / v('k_-1'),
    });
    expect(constantNamed(n, 'k_obs').unitText).toBe('s^-1');
    expect(constantNamed(n, 'K_(O3/O2)').unitText).toBe('');
  });

  it("never takes the name of a step's own constant: K_S of a step labelled S becomes K_S'", () => {
    const d = record(`  - { equation: E + S <=> ES, label: S }
  - { equation: ES -> E + P, rds: true }
`);
    const n = lawBy(d, 'rds').normalised!;
    expect(n.factors[0]!.terms.map((t) => t.constant ?? '1')).toEqual(['1', "K_S'"]);
    expect(n.trade?.shape).toBe('michaelis_menten');
  });

  it('names two factors that weigh the same species apart (one species on two kinds of site)', () => {
    const d = record(`  - equation: A + X <=> AX
  - equation: A + Y <=> AY
  - { equation: AX + AY -> P + X + Y, rds: true }
`);
    const n = lawBy(d, 'rds').normalised!;
    expect(n.factors.map((f) => f.terms.map((t) => t.constant ?? '1'))).toEqual([
      ['1', 'K_A'],
      ['1', "K_A'"],
    ]);
  });

  it('keeps a single-term law as it is, named k_obs, with no factors', () => {
    const d = record(`  - { equation: A + B -> P, rds: true, k: 2 M^-1 s^-1 }
`);
    const n = lawBy(d, 'rds').normalised!;
    expect(n.factors).toEqual([]);
    expect(n.text).toBe('k_obs*[A]*[B]');
    expect([constantNamed(n, 'k_obs').value, constantNamed(n, 'k_obs').unitText]).toEqual([2, 'M^-1 s^-1']);
  });

  it('puts a negative leading term, sign and all, into k_obs: k_1[A]/(k_2[B] - k_3) reads over 1 - K_B[B]', () => {
    const A = Polynomial.symbol('[A]');
    const raw = RationalFunction.of(
      Polynomial.symbol('k_1').mul(A),
      Polynomial.symbol('k_2').mul(Polynomial.symbol('[B]')).sub(Polynomial.symbol('k_3')),
    );
    const fmt = formatterFor({ steps: [], species: new Map() } as unknown as Mechanism);
    const n = normaliseLaw(raw, { constantSymbols: new Set(), stepLabels: [] }, fmt);
    expect(n.factors[0]!.terms.map((t) => [t.constant ?? '1', t.sign])).toEqual([
      ['1', 1],
      ['K_B', -1],
    ]);
    for (const [a, b, k1, k2, k3] of [
      [0.3, 0.2, 2, 3, 7],
      [5, 1e-3, 0.1, 10, 0.5],
    ]) {
      const point = new Map(Object.entries({ '[A]': a!, '[B]': b!, k_1: k1!, k_2: k2!, k_3: k3! }));
      expect(evaluateNormalised(n, point)).toBeCloseTo(raw.evaluate(point), 12);
    }
  });

  it('writes units in M and s, with fractional powers in parentheses', () => {
    const u = (c: number | Rational, t: number) => ({
      concentration: typeof c === 'number' ? Rational.of(c) : c,
      time: Rational.of(t),
    });
    expect(unitText(u(-1, -1))).toBe('M^-1 s^-1');
    expect(unitText(u(0, -1))).toBe('s^-1');
    expect(unitText(u(1, 0))).toBe('M');
    expect(unitText(u(Rational.of(-3, 2), -1))).toBe('M^(-3/2) s^-1');
    expect(unitText(u(0, 0))).toBe('');
    expect(unitLatex(u(-1, -1))).toBe('\\mathrm{M^{-1}\\,s^{-1}}');
  });
});
