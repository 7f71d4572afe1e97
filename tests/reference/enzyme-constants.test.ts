/**
 * The Michaelis–Menten family in the trade's constants. For each mechanism the test writes, from
 * the source named beside it, (a) each named constant (k_cat, K_M, K_i, K_i' …) as a function of
 * the elementary rate constants, compared with the engine's definition at random positive points,
 * and (b) the textbook's law in those named constants, evaluated with the engine's constants and
 * compared with the engine's raw law — so a wrong name, a wrong definition or a wrong shape fails.
 * "From memory" means the formula was written down as remembered, not copied from the page.
 */
import { describe, expect, it } from 'vitest';
import { deriveYaml, errorRules } from '../helpers/derive-yaml.ts';
import {
  expectSameLaw,
  lawBy,
  lookupIn,
  randomPoint,
  relativelyClose,
  seededRandom,
  type Lookup,
} from '../helpers/rate-law-check.ts';
import { constantNamed, namedValues, unitOf } from '../helpers/normalised-check.ts';
import type { DerivedRateLaw } from '../../src/engine/rate-law/derive-rate-laws.ts';

const header = (system: string) =>
  `title: reference enzyme law\nsystem: ${system}\nstatus: proposed\nnotation: labels\n`;

/** Expects the textbook law in named constants (n) and concentrations (c) to equal the raw law. */
function expectTradeLaw(derived: DerivedRateLaw, law: (n: (name: string) => number, c: Lookup) => number): void {
  const expression = derived.law.expression!;
  const random = seededRandom(7);
  for (let i = 0; i < 8; i++) {
    const point = randomPoint(expression.symbols(), random);
    const ours = expression.evaluate(point);
    const textbook = law(namedValues(derived.normalised!, point), lookupIn(point));
    expect(relativelyClose(ours, textbook, 1e-11), `engine ${ours}, textbook ${textbook}`).toBe(true);
  }
}

/** Expects two sides written by the test in named constants and concentrations to agree at random points. */
function expectRelation(
  derived: DerivedRateLaw,
  sides: (n: (name: string) => number, c: Lookup) => [number, number],
): void {
  const random = seededRandom(11);
  for (let i = 0; i < 8; i++) {
    const point = randomPoint(derived.law.expression!.symbols(), random);
    const [left, right] = sides(namedValues(derived.normalised!, point), lookupIn(point));
    expect(relativelyClose(left, right, 1e-11), `${left} against ${right}`).toBe(true);
  }
}

describe('Michaelis–Menten', () => {
  it('Briggs–Haldane steady state: k_cat = k_2, K_M = (k_-1 + k_2)/k_1, with values and units', () => {
    // Source: G. E. Briggs & J. B. S. Haldane, Biochem. J. 19 (1925) 338 (from memory), as in
    // A. Cornish-Bowden, Fundamentals of Enzyme Kinetics, ch. 2 (from memory):
    // v = k_2[E]_0[S]/(K_M + [S]) with K_M = (k_-1 + k_2)/k_1; k_cat = k_2, V = k_cat[E]_0.
    const d = deriveYaml(`${header('mm')}approximation: steady_state
steps:
  - { equation: E + S <=> ES, k: 1e7 M^-1 s^-1, k_rev: 400 s^-1 }
  - { equation: ES -> E + P, k: 100 s^-1 }
`);
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.trade?.shape).toBe('michaelis_menten');
    expect(n.trade?.substrate).toBe('S');
    expectSameLaw(constantNamed(n, 'k_cat').definition, { symbols: ['k_2'], rate: (v) => v('k_2') });
    expectSameLaw(constantNamed(n, 'K_M').definition, {
      symbols: ['k_1', 'k_-1', 'k_2'],
      rate: (v) => (v('k_-1') + v('k_2')) / v('k_1'),
    });
    expectTradeLaw(ss, (n, c) => (n('k_cat') * c('[E]_T') * c('[S]')) / (n('K_M') + c('[S]')));
    // Values from the constants, computed here: K_M = (400 + 100)/1e7 = 5e-5 M.
    expect(constantNamed(n, 'K_M').value).toBeCloseTo(5e-5, 15);
    expect(constantNamed(n, 'k_cat').value).toBe(100);
    expect(constantNamed(n, 'k_cat/K_M').value).toBeCloseTo(2e6, 6);
    expect(['k_cat', 'K_M', 'k_cat/K_M', 'V_max'].map((x) => unitOf(constantNamed(n, x)))).toEqual([
      's^-1',
      'M',
      'M^-1 s^-1',
      'M s^-1',
    ]);
    // V_max = k_cat[E]_T depends on the enzyme's concentration: no value of its own.
    expect(constantNamed(n, 'V_max').value).toBeUndefined();
    // The normalised form: 1 in front, K_S = 1/K_M.
    expectSameLaw(constantNamed(n, 'K_S').definition, {
      symbols: ['k_1', 'k_-1', 'k_2'],
      rate: (v) => v('k_1') / (v('k_-1') + v('k_2')),
    });
  });

  it('rapid equilibrium: K_M is the dissociation constant of ES, 1/K_1', () => {
    // Source: L. Michaelis & M. L. Menten, Biochem. Z. 49 (1913) 333 (from memory): binding at
    // equilibrium, v = k_2[E]_0[S]/(K_s + [S]) with K_s = k_-1/k_1 the dissociation constant.
    const d = deriveYaml(`${header('mm-re')}steps:
  - { equation: E + S <=> ES, K: 2e4 M^-1 }
  - { equation: ES -> E + P, rds: true, k: 5 s^-1 }
`);
    const rds = lawBy(d, 'rds');
    const n = rds.normalised!;
    expect(n.trade?.shape).toBe('michaelis_menten');
    expectSameLaw(constantNamed(n, 'K_M').definition, { symbols: ['K_1'], rate: (v) => 1 / v('K_1') });
    expectSameLaw(constantNamed(n, 'k_cat').definition, { symbols: ['k_2'], rate: (v) => v('k_2') });
    expectTradeLaw(rds, (n, c) => (n('k_cat') * c('[E]_T') * c('[S]')) / (n('K_M') + c('[S]')));
    expect(constantNamed(n, 'K_M').value).toBeCloseTo(5e-5, 15);
    // The grouped k_obs of the rds path is k_cat/K_M, with its unit and value.
    expect(rds.presented!.grouped!.unitText).toBe('M^-1 s^-1');
    expect(rds.presented!.grouped!.value).toBeCloseTo(1e5, 6);
  });
});

describe('reversible inhibition (steady state throughout)', () => {
  // Source for all three: A. Cornish-Bowden, Fundamentals of Enzyme Kinetics, ch. 6, "inhibition"
  // (from memory); I. H. Segel, Enzyme Kinetics (from memory). K_i is the dissociation constant
  // of EI, K_i' that of ESI; competitive: v = V[S]/(K_M(1 + [I]/K_i) + [S]); uncompetitive:
  // v = V[S]/(K_M + [S](1 + [I]/K_i')); mixed: both. Apparent: K_M^app = K_M(1 + [I]/K_i)/(1 + [I]/K_i'),
  // V^app = V/(1 + [I]/K_i').
  const base = `  - equation: E + S <=> ES
  - equation: ES -> E + P
`;
  const law = (n: (name: string) => number, c: Lookup, competitive: boolean, uncompetitive: boolean) =>
    (n('k_cat') * c('[E]_T') * c('[S]')) /
    (n('K_M') * (1 + (competitive ? c('[I]') / n('K_i') : 0)) +
      c('[S]') * (1 + (uncompetitive ? c('[I]') / n("K_i'") : 0)));

  it('competitive: K_i = k_-3/k_3, K_M^app = K_M(1 + [I]/K_i), V_max unchanged', () => {
    const d = deriveYaml(`${header('competitive')}approximation: steady_state
steps:
${base}  - equation: E + I <=> EI
`);
    expect(d.roles?.get('I')).toBe('inhibitor');
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.trade?.shape).toBe('competitive_inhibition');
    expect(n.trade?.inhibitors).toEqual(['I']);
    expectSameLaw(constantNamed(n, 'K_i').definition, { symbols: ['k_3', 'k_-3'], rate: (v) => v('k_-3') / v('k_3') });
    expectTradeLaw(ss, (n, c) => law(n, c, true, false));
    expectTradeLaw(ss, (n, c) => (n('V_max^app') * c('[S]')) / (n('K_M^app') + c('[S]')));
    expectRelation(ss, (n, c) => [n('K_M^app'), n('K_M') * (1 + c('[I]') / n('K_i'))]);
    expectRelation(ss, (n) => [n('V_max^app'), n('V_max')]);
    expect(unitOf(constantNamed(n, 'K_i'))).toBe('M');
  });

  it("uncompetitive: K_i' = k_-3/k_3 of ESI; both apparent constants fall by 1 + [I]/K_i'", () => {
    const d = deriveYaml(`${header('uncompetitive')}approximation: steady_state
steps:
${base}  - equation: ES + I <=> ESI
`);
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.trade?.shape).toBe('uncompetitive_inhibition');
    expectSameLaw(constantNamed(n, "K_i'").definition, {
      symbols: ['k_3', 'k_-3'],
      rate: (v) => v('k_-3') / v('k_3'),
    });
    expectTradeLaw(ss, (n, c) => law(n, c, false, true));
    expectTradeLaw(ss, (n, c) => (n('V_max^app') * c('[S]')) / (n('K_M^app') + c('[S]')));
    expectRelation(ss, (n, c) => [n('K_M^app'), n('K_M') / (1 + c('[I]') / n("K_i'"))]);
    expectRelation(ss, (n, c) => [n('V_max^app'), n('V_max') / (1 + c('[I]') / n("K_i'"))]);
  });

  it("mixed: K_i from EI, K_i' from ESI", () => {
    const d = deriveYaml(`${header('mixed')}approximation: steady_state
steps:
${base}  - equation: E + I <=> EI
  - equation: ES + I <=> ESI
`);
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.trade?.shape).toBe('mixed_inhibition');
    expectSameLaw(constantNamed(n, 'K_i').definition, { symbols: ['k_3', 'k_-3'], rate: (v) => v('k_-3') / v('k_3') });
    expectSameLaw(constantNamed(n, "K_i'").definition, {
      symbols: ['k_4', 'k_-4'],
      rate: (v) => v('k_-4') / v('k_4'),
    });
    expectTradeLaw(ss, (n, c) => law(n, c, true, true));
    expectRelation(ss, (n, c) => [n('K_M^app'), (n('K_M') * (1 + c('[I]') / n('K_i'))) / (1 + c('[I]') / n("K_i'"))]);
    expectRelation(ss, (n, c) => [n('V_max^app'), n('V_max') / (1 + c('[I]') / n("K_i'"))]);
  });
});

describe('product inhibition', () => {
  it('a dead-end E·P complex inhibits competitively: K_i of P = k_-3/k_3', () => {
    // Source: Cornish-Bowden, Fundamentals of Enzyme Kinetics, product inhibition (from memory):
    // a product that binds the free enzyme only competes with the substrate,
    // v = V[S]/(K_M(1 + [P]/K_iP) + [S]).
    const d = deriveYaml(`${header('product-dead-end')}approximation: steady_state
steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
  - equation: E + P <=> EP
`);
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.trade?.shape).toBe('competitive_inhibition');
    expect(n.trade?.inhibitors).toEqual(['P']);
    expectSameLaw(constantNamed(n, 'K_i').definition, { symbols: ['k_3', 'k_-3'], rate: (v) => v('k_-3') / v('k_3') });
    expectTradeLaw(
      ss,
      (n, c) => (n('k_cat') * c('[E]_T') * c('[S]')) / (n('K_M') * (1 + c('[P]') / n('K_i')) + c('[S]')),
    );
  });

  it('reversible release: the Haldane form, k_f = V_f/K_mS and k_r = V_r/K_mP over 1 + [S]/K_mS + [P]/K_mP', () => {
    // Source: Cornish-Bowden, Fundamentals of Enzyme Kinetics, the reversible Michaelis–Menten
    // mechanism (from memory): E + S ⇌ ES ⇌ E + P gives
    // v = (V_f[S]/K_mS − V_r[P]/K_mP)/(1 + [S]/K_mS + [P]/K_mP) with V_f = k_2[E]_0, V_r = k_-1[E]_0,
    // K_mS = (k_-1 + k_2)/k_1 and K_mP = (k_-1 + k_2)/k_-2. The product term is its inhibition.
    const d = deriveYaml(`${header('reversible')}approximation: steady_state
steps:
  - equation: E + S <=> ES
  - equation: ES <=> E + P
`);
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.numerator.map((t) => [t.constant, t.sign])).toEqual([
      ['k_f', 1],
      ['k_r', -1],
    ]);
    const KmS = (v: Lookup) => (v('k_-1') + v('k_2')) / v('k_1');
    const KmP = (v: Lookup) => (v('k_-1') + v('k_2')) / v('k_-2');
    const forward = ['k_1', 'k_-1', 'k_2'];
    const reverse = ['k_-1', 'k_2', 'k_-2'];
    expectSameLaw(constantNamed(n, 'k_f').definition, { symbols: forward, rate: (v) => v('k_2') / KmS(v) });
    expectSameLaw(constantNamed(n, 'k_r').definition, { symbols: reverse, rate: (v) => v('k_-1') / KmP(v) });
    expectSameLaw(constantNamed(n, 'K_S').definition, { symbols: forward, rate: (v) => 1 / KmS(v) });
    expectSameLaw(constantNamed(n, 'K_P').definition, { symbols: reverse, rate: (v) => 1 / KmP(v) });
    // In the trade's constants: the Haldane form, and K_eq = V_f K_M,P/(V_r K_M,S) = k_1k_2/(k_-1k_-2),
    // the equilibrium constant of S ⇌ P (J. B. S. Haldane, Enzymes, 1930; from memory).
    expect(n.trade?.shape).toBe('reversible_michaelis_menten');
    expectSameLaw(constantNamed(n, 'K_M,S').definition, { symbols: forward, rate: (v) => KmS(v) });
    expectSameLaw(constantNamed(n, 'K_M,P').definition, { symbols: reverse, rate: (v) => KmP(v) });
    expectSameLaw(constantNamed(n, 'K_eq').definition, {
      symbols: ['k_1', 'k_-1', 'k_2', 'k_-2'],
      rate: (v) => (v('k_1') * v('k_2')) / (v('k_-1') * v('k_-2')),
    });
    expect(unitOf(constantNamed(n, 'K_eq'))).toBe('');
    expectTradeLaw(
      ss,
      (n, c) =>
        ((n('V_f') * c('[S]')) / n('K_M,S') - (n('V_r') * c('[P]')) / n('K_M,P')) /
        (1 + c('[S]') / n('K_M,S') + c('[P]') / n('K_M,P')),
    );
    expectRelation(ss, (n) => [n('K_eq'), (n('V_f') * n('K_M,P')) / (n('V_r') * n('K_M,S'))]);
  });
});

describe('substrate inhibition', () => {
  it('a second substrate on ES: K_si = k_-3/k_3 and the [S]²/K_si term', () => {
    // Source: Cornish-Bowden, Fundamentals of Enzyme Kinetics, substrate inhibition (from memory):
    // ES + S ⇌ SES (dead end) gives v = V[S]/(K_M + [S] + [S]²/K_si), K_si the dissociation constant of SES.
    const d = deriveYaml(`${header('substrate-inhibition')}approximation: steady_state
steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
  - equation: ES + S <=> SES
`);
    const ss = lawBy(d, 'steady_state');
    const n = ss.normalised!;
    expect(n.trade?.shape).toBe('substrate_inhibition');
    expectSameLaw(constantNamed(n, 'K_si').definition, {
      symbols: ['k_3', 'k_-3'],
      rate: (v) => v('k_-3') / v('k_3'),
    });
    expectTradeLaw(
      ss,
      (n, c) => (n('k_cat') * c('[E]_T') * c('[S]')) / (n('K_M') + c('[S]') + c('[S]') ** 2 / n('K_si')),
    );
  });
});
