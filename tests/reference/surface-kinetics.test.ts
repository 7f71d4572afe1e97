/**
 * Surface reactions: site balances of any order in the rate-determining step, written in the
 * record's surface-site notation (a vacant site `@`, a species on a site `CO@`) and in labels.
 * Each expected law is written here from the source named beside it, as a function of the
 * engine's symbols, and compared with the engine's exact law at random positive points; order
 * limits are compared exactly; the normalised form's constants are checked against the textbook's.
 *
 * The textbooks write rates in pressures and coverages, θ = [X@]/[@]_T; with concentrations the
 * same algebra gives the same law, with [@]_T to the number of sites the slow step uses.
 */
import { describe, expect, it } from 'vitest';
import { deriveYaml, errorRules } from '../helpers/derive-yaml.ts';
import { expectSameLaw, lawBy, orderTable } from '../helpers/rate-law-check.ts';
import { constantNamed, unitOf } from '../helpers/normalised-check.ts';

const header = (system: string) => `title: reference surface law\nsystem: ${system}\nstatus: proposed\n`;

describe('Langmuir–Hinshelwood: two adsorbed species react (second order in the site balance)', () => {
  // Source: P. Atkins & J. de Paula, Physical Chemistry, "the Langmuir–Hinshelwood mechanism"
  // (from memory): v = k θ_A θ_B with θ_A = K_A p_A/(1 + K_A p_A + K_B p_B), so
  // v = k K_A K_B p_A p_B / (1 + K_A p_A + K_B p_B)²; each order runs from 1 to −1 as its
  // adsorbate crowds the other off the surface. Also I. Chorkendorff & J. W. Niemantsverdriet,
  // Concepts of Modern Catalysis and Kinetics (from memory).
  const d = deriveYaml(`${header('lh')}notation: labels
steps:
  - { equation: A + S <=> AS, K: 4 M^-1 }
  - { equation: B + S <=> BS, K: 0.5 M^-1 }
  - { equation: AS + BS -> P + 2 S, rds: true, k: 3 M^-1 s^-1 }
`);

  it('gives k K_A K_B [A][B][S]_T² / (1 + K_A[A] + K_B[B])² with no diagnostic', () => {
    expect(errorRules(d)).toEqual([]);
    expect(d.diagnostics.filter((x) => x.rule.startsWith('rate/'))).toEqual([]);
    const rds = lawBy(d, 'rds');
    expectSameLaw(rds.law.expression, {
      symbols: ['k_3', 'K_1', 'K_2', '[A]', '[B]', '[S]_T'],
      rate: (v) =>
        (v('k_3') * v('K_1') * v('K_2') * v('[A]') * v('[B]') * v('[S]_T') ** 2) /
        (1 + v('K_1') * v('[A]') + v('K_2') * v('[B]')) ** 2,
    });
    expect(orderTable(rds)).toEqual({ A: ['1', '-1'], S: ['2', '2'], B: ['1', '-1'], P: ['0', '0'] });
  });

  it('normalises to k_obs[A][B][S]_T²/(1 + K_A[A] + K_B[B])², the square kept whole', () => {
    const n = lawBy(d, 'rds').normalised!;
    expect(n.factors.map((f) => f.power)).toEqual([2]);
    expect(n.factors[0]!.terms.map((t) => t.constant ?? '1')).toEqual(['1', 'K_A', 'K_B']);
    // K_A and K_B are the adsorption constants of A and B: K_1 and K_2 of the record.
    expectSameLaw(constantNamed(n, 'K_A').definition, { symbols: ['K_1'], rate: (v) => v('K_1') });
    expectSameLaw(constantNamed(n, 'K_B').definition, { symbols: ['K_2'], rate: (v) => v('K_2') });
    const kObs = constantNamed(n, 'k_obs');
    expectSameLaw(kObs.definition, { symbols: ['k_3', 'K_1', 'K_2'], rate: (v) => v('k_3') * v('K_1') * v('K_2') });
    // k M^-1 s^-1 × K_A M^-1 × K_B M^-1, multiplying four concentrations to a rate in M s^-1.
    expect(unitOf(kObs)).toBe('M^-3 s^-1');
    expect(kObs.value).toBeCloseTo(3 * 4 * 0.5, 12);
    expect(constantNamed(n, 'K_A').value).toBe(4);
    expect(unitOf(constantNamed(n, 'K_A'))).toBe('M^-1');
    expect(n.trade).toBeUndefined();
  });
});

describe('CO oxidation on a metal: CO and dissociated O2 react on the surface', () => {
  // Source: Chorkendorff & Niemantsverdriet, Concepts of Modern Catalysis and Kinetics, CO
  // oxidation on platinum (from memory): CO + * ⇌ CO*, O2 + 2* ⇌ 2O*, CO* + O* → CO2 + 2*
  // (slow), so r_CO2 = k K_CO p_CO (K_O2 p_O2)^½ / (1 + K_CO p_CO + (K_O2 p_O2)^½)². The slow step
  // runs twice per 2 CO + O2 → 2 CO2 (σ = 2): the overall rate is half of r_CO2.
  const d = deriveYaml(`${header('co-oxidation')}steps:
  - equation: CO + @ <=> CO@
  - equation: O2 + 2@ <=> 2 O@
  - { equation: CO@ + O@ -> CO2 + 2 @, rds: true }
`);

  it('reads the site notation: balanced steps, @ the catalyst, adsorbates the intermediates', () => {
    expect(errorRules(d)).toEqual([]);
    expect(d.balance).toEqual(['balanced', 'balanced', 'balanced']);
    expect(Object.fromEntries(d.roles!)).toMatchObject({
      '@': 'catalyst',
      'CO@': 'intermediate',
      'O@': 'intermediate',
      CO: 'reactant',
      O2: 'reactant',
      CO2: 'product',
    });
    expect(d.overall!.text).toBe('2 CO + O2 -> 2 CO2');
    // Dissociative adsorption is an ordinary step: the vacant sites are not colliding molecules.
    expect(d.diagnostics.filter((x) => x.rule === 'step/molecularity')).toEqual([]);
    expect(d.mechanism!.steps.map((s) => s.molecularity)).toEqual([1, 1, 2]);
  });

  it('gives the half-order square-root law with the site balance squared', () => {
    const rds = lawBy(d, 'rds');
    expectSameLaw(rds.law.expression, {
      symbols: ['k_3', 'K_1', 'K_2', '[CO]', '[O2]', '[@]_T'],
      rate: (v) =>
        (v('k_3') * v('K_1') * v('[CO]') * Math.sqrt(v('K_2') * v('[O2]')) * v('[@]_T') ** 2) /
        (1 + v('K_1') * v('[CO]') + Math.sqrt(v('K_2') * v('[O2]'))) ** 2 /
        2,
    });
    expect(orderTable(rds)).toEqual({ CO: ['1', '-1'], '@': ['2', '2'], O2: ['1/2', '-1/2'], CO2: ['0', '0'] });
    const n = rds.normalised!;
    // The trade writes the oxygen term (K_O2 p_O2)^½: K_O2 is the constant of step 2 itself.
    const oxygen = n.factors[0]!.terms.find((t) => t.constant === 'K_O2')!;
    expect(oxygen.power.toString()).toBe('1/2');
    expectSameLaw(constantNamed(n, 'K_O2').definition, { symbols: ['K_2'], rate: (v) => v('K_2') });
    expect(unitOf(constantNamed(n, 'K_O2'))).toBe('M^-1');
  });
});

describe('Eley–Rideal: an adsorbed species meets one from the gas (first order in the sites)', () => {
  // Source: Atkins & de Paula, Physical Chemistry, "the Eley–Rideal mechanism" (from memory):
  // v = k p_B θ_A = k K p_A p_B / (1 + K p_A): first order in B, from first to zero order in A.
  const d = deriveYaml(`${header('er')}notation: labels
steps:
  - { equation: A + S <=> AS, K: 20 M^-1 }
  - { equation: AS + B -> P + S, rds: true, k: 0.1 M^-1 s^-1 }
`);

  it('gives k K[A][B][S]_T/(1 + K[A]) and names K_A, k_obs with units and values', () => {
    expect(errorRules(d)).toEqual([]);
    const rds = lawBy(d, 'rds');
    expectSameLaw(rds.law.expression, {
      symbols: ['k_2', 'K_1', '[A]', '[B]', '[S]_T'],
      rate: (v) => (v('k_2') * v('K_1') * v('[A]') * v('[B]') * v('[S]_T')) / (1 + v('K_1') * v('[A]')),
    });
    expect(orderTable(rds)).toEqual({ A: ['1', '0'], S: ['1', '1'], B: ['1', '1'], P: ['0', '0'] });
    const n = rds.normalised!;
    expect(unitOf(constantNamed(n, 'k_obs'))).toBe('M^-2 s^-1');
    expect(constantNamed(n, 'k_obs').value).toBeCloseTo(2, 12);
    expect(constantNamed(n, 'K_A').value).toBe(20);
    // The grouped constant of the rds path gets the same unit and value.
    expect(rds.presented!.grouped).toMatchObject({ unitText: 'M^-2 s^-1' });
    expect(rds.presented!.grouped!.value).toBeCloseTo(2, 12);
  });
});

describe('dissociative adsorption: half order at low pressure', () => {
  // Source: Atkins & de Paula, Physical Chemistry, the Langmuir isotherm for dissociative
  // adsorption (from memory): θ = (K p)^½/(1 + (K p)^½), so a slow step of the adsorbed atom
  // with a gas molecule goes as p^½ at low pressure and as p⁰ at saturation.
  // O2 + 2* ⇌ 2 O*, then O* + CO(g) → CO2 + * (slow, twice per O2; σ = 2 halves the overall rate).
  const d = deriveYaml(`${header('dissociative')}steps:
  - { equation: O2 + 2 @ <=> 2 O@, K: 9 M^-1 }
  - { equation: O@ + CO -> CO2 + @, rds: true, k: 0.4 M^-1 s^-1 }
`);

  it('gives k (K[O2])^½ [CO][@]_T / (2(1 + (K[O2])^½)), order ½ → 0 in O2', () => {
    expect(errorRules(d)).toEqual([]);
    const rds = lawBy(d, 'rds');
    expectSameLaw(rds.law.expression, {
      symbols: ['k_2', 'K_1', '[O2]', '[CO]', '[@]_T'],
      rate: (v) =>
        (v('k_2') * Math.sqrt(v('K_1') * v('[O2]')) * v('[CO]') * v('[@]_T')) /
        (1 + Math.sqrt(v('K_1') * v('[O2]'))) /
        2,
    });
    expect(orderTable(rds)).toMatchObject({ O2: ['1/2', '0'], CO: ['1', '1'], '@': ['1', '1'] });
    const n = rds.normalised!;
    expect(constantNamed(n, 'K_O2').value).toBe(9);
    // k_obs = k K^½ / 2 = 0.4 × 3 / 2.
    expect(constantNamed(n, 'k_obs').value).toBeCloseTo(0.6, 12);
    expect(unitOf(constantNamed(n, 'k_obs'))).toBe('M^(-3/2) s^-1');
  });
});

describe('surface-site notation in the balance', () => {
  it('a step that makes a site from nothing is balance/sites at its equation', () => {
    const d = deriveYaml(`${header('sites')}steps:
  - equation: CO + @ -> CO@ + @
`);
    expect(d.diagnostics.filter((x) => x.rule === 'balance/sites')).toMatchObject([
      {
        severity: 'error',
        message: 'surface sites do not balance (left → right): @ 1 → 2',
        path: ['steps', 0, 'equation'],
      },
    ]);
    expect(d.diagnostics.filter((x) => x.rule === 'balance/atoms')).toEqual([]);
  });

  it('kinds of site balance apart: @a and @b', () => {
    const d = deriveYaml(`${header('kinds')}steps:
  - equation: CO + @a -> CO@b
`);
    expect(d.diagnostics.find((x) => x.rule === 'balance/sites')?.message).toBe(
      'surface sites do not balance (left → right): @a 1 → 0, @b 0 → 1',
    );
  });

  it('an excited state stays an excited state: NO2* is not adsorbed', () => {
    const d = deriveYaml(`${header('excited')}steps:
  - equation: NO2 -> NO2*
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.mechanism!.species.get('NO2*')!.composition).toMatchObject({ excited: true });
    expect(d.mechanism!.species.get('NO2*')!.composition!.sites).toBeUndefined();
  });
});
