/**
 * Closed forms of nonlinear steady states for published mechanisms: radical chains terminated by
 * recombination (half and three-halves orders), Ogg's N2O5 mechanism (a ratio of intermediates),
 * a quadratic (the Rice–Herzfeld ethane chain), and the long-chain approximation; the gas-phase
 * unimolecular (Lindemann–Hinshelwood) law as a linear control. Each expected law is written in
 * the test from the source named beside it and compared as a function (tests/helpers/law-compare.ts:
 * exactly where it is a product of powers, and at random points always), independent of how the
 * engine orders its terms. "From memory" means the law was written down as remembered, not copied.
 *
 * The engine's rate is that of the overall reaction (a step's rate over its σ); where a source
 * writes d[P]/dt = ν_P·r, the expected law below is divided by ν_P and the comment says so.
 */
import { describe, expect, it } from 'vitest';
import { recordReport } from '../../src/render/report/record-report.ts';
import { rateLawLines } from '../../src/render/report/rate-law-text.ts';
import { acetaldehyde, CATALYST_DIMER, ETHANE, HYDROGEN_BROMINE } from '../helpers/chain-records.ts';
import { deriveYaml, errorRules } from '../helpers/derive-yaml.ts';
import { expectLaw } from '../helpers/law-compare.ts';
import { lawBy, orderTable } from '../helpers/rate-law-check.ts';

const header = (system: string, approximation = 'auto') =>
  `title: reference nonlinear steady state\nsystem: ${system}\nstatus: proposed\napproximation: ${approximation}\n`;

describe('hydrogen–bromine: the Bodenstein–Lind law in closed form', () => {
  // Source: M. Bodenstein & S. C. Lind, Z. physik. Chem. 57 (1907) 168 (the empirical law);
  // mechanism of Christiansen, Herzfeld and Polanyi (1919) as in P. Atkins & J. de Paula, Physical
  // Chemistry, "chain reactions" (from memory): Br2 + M -> 2 Br + M (a), Br + H2 -> HBr + H (b),
  // H + Br2 -> HBr + Br (b'), H + HBr -> H2 + Br (c), 2 Br + M -> Br2 + M (d), and
  // d[HBr]/dt = 2 k_b (k_a/k_d)^½ [H2][Br2]^(3/2) / ([Br2] + (k_c/k_b')[HBr]).
  // The overall H2 + Br2 -> 2 HBr goes at half of d[HBr]/dt.
  const record = (approximation: string) => `${header('hbr', approximation)}${HYDROGEN_BROMINE}`;
  const names = { ka: 'k_1', kb: 'k_2', kb2: 'k_3', kc: 'k_4', kd: 'k_5', H2: '[H2]', Br2: '[Br2]', HBr: '[HBr]' };
  const law = 'kb*(ka/kd)^(1/2)*H2*Br2^(3/2)/(Br2 + (kc/kb2)*HBr)';

  it('the exact steady state gives it, with the inhibition by HBr; the third body cancels', () => {
    const d = deriveYaml(record('auto'));
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    expectLaw(ss, law, names);
    expect(orderTable(ss)).toEqual({ Br2: ['3/2', '1/2'], H2: ['1', '1'], HBr: ['0', '-1'], M: ['0', '0'] });
    // The long-chain law is the same here, so it is said in the derivation rather than given twice.
    expect(d.rateLaws!.map((r) => r.law.method)).toEqual(['steady_state']);
    expect(ss.law.trace.at(-1)!.say).toMatch(/long-chain approximation .* gives this same law/);
  });

  it('the long-chain approximation, asked for, gives the same law', () => {
    const d = deriveYaml(record('long_chain'));
    expect(errorRules(d)).toEqual([]);
    const lc = lawBy(d, 'long_chain');
    expectLaw(lc, law, names);
    expect(lc.law.trace[0]!.say).toMatch(/carriers Br•, H• are made in step 1 and destroyed in step 5/);
  });
});

describe('chlorine-atom chains terminated by Cl recombination', () => {
  it('chlorination of methane: r = k_2 (k_1/k_4)^½ [Cl2]^½ [CH4]', () => {
    // Source: K. J. Laidler, Chemical Kinetics, 3rd ed., photochemical and thermal chlorination
    // chains (from memory): Cl2 + M -> 2 Cl + M, Cl + RH -> HCl + R, R + Cl2 -> RCl + Cl,
    // 2 Cl + M -> Cl2 + M; steady state with initiation = termination gives
    // r = k_2 (k_1/k_4)^½ [Cl2]^½ [RH], the chain length k_2[RH]/(k_1 k_4 [Cl2])^½ [M]^-1.
    const d = deriveYaml(`${header('chlorination')}species:
  Cl•: { role: intermediate }
  CH3•: { role: intermediate }
  M: { third_body: true }
steps:
  - equation: Cl2 + M -> 2 Cl• + M
  - equation: Cl• + CH4 -> HCl + CH3•
  - equation: CH3• + Cl2 -> CH3Cl + Cl•
  - equation: 2 Cl• + M -> Cl2 + M
`);
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    expectLaw(ss, 'k2*(k1/k4)^(1/2)*Cl2^(1/2)*CH4', {
      k1: 'k_1',
      k2: 'k_2',
      k4: 'k_4',
      Cl2: '[Cl2]',
      CH4: '[CH4]',
    });
    expect(orderTable(ss)).toMatchObject({ Cl2: ['1/2', '1/2'], CH4: ['1', '1'], M: ['0', '0'] });
    // Initiation makes no HCl, so the long-chain law is this one, and the derivation says so.
    expect(ss.law.trace.at(-1)!.say).toMatch(/long-chain approximation .* gives this same law/);
  });

  it('hydrogen–chlorine: half order in Cl2 (a recombination-terminated chain)', () => {
    // Source: Atkins & de Paula, Physical Chemistry, and Laidler, Chemical Kinetics (from memory):
    // Cl2 -> 2 Cl, Cl + H2 -> HCl + H, H + Cl2 -> HCl + Cl, 2 Cl -> Cl2;
    // d[HCl]/dt = 2 k_2 (k_1/k_4)^½ [H2][Cl2]^½, so the overall H2 + Cl2 -> 2 HCl goes at half that.
    const d = deriveYaml(`${header('hcl')}species:
  Cl•: { role: intermediate }
  H•: { role: intermediate }
steps:
  - equation: Cl2 -> 2 Cl•
  - equation: Cl• + H2 -> HCl + H•
  - equation: H• + Cl2 -> HCl + Cl•
  - equation: 2 Cl• -> Cl2
`);
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    expectLaw(ss, 'k2*(k1/k4)^(1/2)*H2*Cl2^(1/2)', { k1: 'k_1', k2: 'k_2', k4: 'k_4', H2: '[H2]', Cl2: '[Cl2]' });
    expect(orderTable(ss)).toMatchObject({ Cl2: ['1/2', '1/2'], H2: ['1', '1'] });
  });
});

describe('Rice–Herzfeld chains of acetaldehyde', () => {
  // Source: F. O. Rice & K. F. Herzfeld, J. Am. Chem. Soc. 56 (1934) 284, and Laidler, Chemical
  // Kinetics, the Goldfinger–Letort–Niclause rules for the overall order (from memory):
  // CH3CHO -> CH3 + CHO (1), CH3 + CH3CHO -> CH4 + CH3CO (2), CH3CO -> CH3 + CO (3), and a
  // termination: 2 CH3 (ββ, order 3/2) or 2 CH3CO (μμ, order ½).
  const steps = acetaldehyde;
  const names = { k1: 'k_1', k2: 'k_2', k3: 'k_3', k4: 'k_4', A: '[CH3CHO]' };

  it('termination by methyl recombination: r = k_2 (k_1/2k_4)^½ [CH3CHO]^(3/2)', () => {
    // Atkins & de Paula (from memory): d[CH4]/dt = k_b (k_a/2k_d)^½ [CH3CHO]^(3/2); CH4 has ν = 1.
    const d = deriveYaml(`${header('acetaldehyde')}${steps('2 CH3• -> C2H6')}`);
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    // (k_1/2k_4)^½ has an irrational factor 2^(-1/2): a law with radicals, not a rational function.
    expect(ss.algebraic).toBeDefined();
    expectLaw(ss, 'k2*(k1/(2*k4))^(1/2)*A^(3/2)', names);
    expect(orderTable(ss)['CH3CHO']).toEqual(['3/2', '3/2']);
    expect(ss.algebraic!.latex).toContain('\\sqrt{');
  });

  it('termination by acetyl recombination: order ½ with long chains, and the exact law keeps the initiation', () => {
    const d = deriveYaml(`${header('acetaldehyde')}${steps('2 CH3CO• -> C4H6O2')}`);
    expect(errorRules(d)).toEqual([]);
    // Long chains: k_1[A] = 2k_4[CH3CO]² and r = k_3[CH3CO] = k_3 (k_1/2k_4)^½ [A]^½.
    const lc = lawBy(d, 'long_chain');
    expectLaw(lc, 'k3*(k1/(2*k4))^(1/2)*A^(1/2)', names);
    expect(orderTable(lc)['CH3CHO']).toEqual(['1/2', '1/2']);
    // Exact (by hand, from mass action): the same sum k_1[A] = 2k_4[CH3CO]², but CH4 is also made from
    // every methyl the initiation gives: r = k_2[CH3][A] = k_1[A] + k_3[CH3CO]; order ½ → 1.
    const ss = lawBy(d, 'steady_state');
    expectLaw(ss, 'k1*A + k3*(k1/(2*k4))^(1/2)*A^(1/2)', names, { requireExact: false });
    expect(orderTable(ss)['CH3CHO']).toEqual(['1/2', '1']);
  });
});

describe("Ogg's mechanism of N2O5 decomposition: a ratio of intermediates", () => {
  it('r = k_1 k_2 [N2O5]/(k_-1 + 2 k_2) with no constants given', () => {
    // Source: R. A. Ogg, J. Chem. Phys. 15 (1947) 337, as in Atkins & de Paula (from memory):
    // N2O5 ⇌ NO2 + NO3, NO2 + NO3 -> NO2 + O2 + NO, NO + NO3 -> 2 NO2;
    // -d[N2O5]/dt = 2 k_1 k_2 [N2O5]/(k_-1 + 2 k_2); the overall 2 N2O5 -> 4 NO2 + O2 goes at half.
    const d = deriveYaml(`${header('n2o5')}steps:
  - equation: N2O5 <=> NO2 + NO3
  - equation: NO2 + NO3 -> NO2 + O2 + NO
  - equation: NO + NO3 -> 2 NO2
`);
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    expect(ss.law.expression).toBeDefined();
    expectLaw(ss, 'k1*k2*N2O5/(km1 + 2*k2)', { k1: 'k_1', km1: 'k_-1', k2: 'k_2', N2O5: '[N2O5]' });
    expect(orderTable(ss)).toMatchObject({ N2O5: ['1', '1'], NO2: ['0', '0'] });
    // The balance of NO is [NO3](k_2[NO2] − k_3[NO]): dividing out [NO3] fixes [NO]/[NO2] = k_2/k_3.
    expect(ss.law.trace.some((t) => /carries \[NO3\]/.test(t.say))).toBe(true);
    expect(d.diagnostics.filter((x) => x.rule === 'rate/nonlinear')).toEqual([]);
  });
});

describe('a quadratic: the Rice–Herzfeld decomposition of ethane', () => {
  // Source: Rice & Herzfeld (1934) and Laidler, Chemical Kinetics (from memory):
  // C2H6 -> 2 CH3 (1), CH3 + C2H6 -> CH4 + C2H5 (2), C2H5 -> C2H4 + H (3),
  // H + C2H6 -> H2 + C2H5 (4), H + C2H5 -> C2H6 (5); with long chains r = (k_1 k_3 k_4/k_5)^½ [C2H6].
  const d = deriveYaml(`${header('ethane')}${ETHANE}`);
  const names = { k1: 'k_1', k3: 'k_3', k4: 'k_4', k5: 'k_5', E: '[C2H6]' };

  it('the exact steady state is the positive root of a quadratic, first order at every [C2H6]', () => {
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    // By hand, from mass action: [CH3] = 2k_1/k_2; adding the C2H5 and H balances gives
    // k_1[E] = k_5[H][C2H5] and the H balance [H] = k_3[C2H5]/(k_4[E] + k_5[C2H5]), so
    // k_3 k_5 x² − k_1 k_5 [E] x − k_1 k_4 [E]² = 0 for x = [C2H5], and r = k_3 x.
    expectLaw(ss, 'k3*E*(k1*k5 + (k1^2*k5^2 + 4*k1*k3*k4*k5)^(1/2))/(2*k3*k5)', names, { requireExact: false });
    expect(ss.algebraic!.expression.roots[0]!.kind).toBe('quadratic');
    expect(orderTable(ss)['C2H6']).toEqual(['1', '1']);
  });

  it('the long-chain law is offered beside it: (k_1 k_3 k_4/k_5)^½ [C2H6]', () => {
    const lc = lawBy(d, 'long_chain');
    expectLaw(lc, '(k1*k3*k4/k5)^(1/2)*E', names);
    expect(d.rateLaws!.map((r) => r.law.method)).toEqual(['steady_state', 'long_chain']);
  });
});

describe('a catalyst with an off-cycle dimer: a quadratic in the free catalyst', () => {
  it('order in the total catalyst from 1 (monomer) to ½ (dimer resting state), closed form', () => {
    // By hand, from mass action (the monomer–dimer balance of a precatalyst is common practice in
    // organometallic kinetics): [C2] = K_1[C]², [CS] = k_2[C][S]/(k_-2 + k_3) and
    // [C]_T = [C] + 2K_1[C]² + [CS], a quadratic in [C]; r = k_3[CS].
    const d = deriveYaml(`${header('dimer', 'steady_state')}${CATALYST_DIMER}`);
    expect(errorRules(d)).toEqual([]);
    const ss = lawBy(d, 'steady_state');
    const a = '2*k1/km1';
    const b = '(1 + k2*S/(km2 + k3))';
    // The positive root of a[C]² + b[C] − [C]_T = 0, written 2[C]_T/(b + √(b² + 4a[C]_T)) so that
    // floating point does not lose it to cancellation when 4a[C]_T ≪ b².
    const free = `2*T/(${b} + ((${b})^2 + 4*${a}*T)^(1/2))`;
    expectLaw(
      ss,
      `k3*k2*S*${free}/(km2 + k3)`,
      { k1: 'k_1', km1: 'k_-1', k2: 'k_2', km2: 'k_-2', k3: 'k_3', S: '[S]', T: '[C]_T' },
      { requireExact: false },
    );
    expect(orderTable(ss)).toMatchObject({ C: ['1', '1/2'], S: ['1', '0'] });
  });
});

describe('control: a linear steady state stays a rational function', () => {
  it('Lindemann–Hinshelwood: k_1 k_2 [A][M]/(k_-1[M] + k_2)', () => {
    // Source: F. A. Lindemann, Trans. Faraday Soc. 17 (1922) 598; C. N. Hinshelwood (1926); as in
    // Atkins & de Paula (from memory): A + M ⇌ A* + M, A* -> P.
    const d = deriveYaml(`${header('lindemann')}notation: labels
steps:
  - equation: A + M <=> A* + M
  - equation: A* -> P
`);
    const ss = lawBy(d, 'steady_state');
    expect(ss.algebraic).toBeUndefined();
    expectLaw(ss, 'k1*k2*A*M/(km1*M + k2)', { k1: 'k_1', km1: 'k_-1', k2: 'k_2', A: '[A]', M: '[M]' });
    expect(orderTable(ss)).toMatchObject({ A: ['1', '1'], M: ['1', '0'] });
  });
});

describe('a law with radicals downstream: JSON structure, observation checks', () => {
  const d = deriveYaml(`${header('acetaldehyde')}species:
  CH3•: { role: intermediate }
  CH3CO•: { role: intermediate }
steps:
  - { equation: CH3CHO -> CH3• + CHO•, k: 1.0e-6 s^-1 }
  - { equation: CH3• + CH3CHO -> CH4 + CH3CO•, k: 1.0e4 M^-1 s^-1 }
  - { equation: CH3CO• -> CH3• + CO, k: 1.0e5 s^-1 }
  - { equation: 2 CH3• -> C2H6, k: 1.0e10 M^-1 s^-1 }
observations:
  - id: pyrolysis
    concentrations: { CH3CHO: 0.05 M }
    orders: { CH3CHO: 1.5 ± 0.05 }
`);

  it('writes the roots into the JSON structure (additively) and the law into text and LaTeX', () => {
    const json = recordReport({ id: 'x', file: 'x.yaml', derivation: d, diagnostics: [] });
    const law = json.rate_laws![0]!;
    expect(law.numeric_only).toBeUndefined();
    expect(law.text).toContain('[CH3CHO]^(3/2)');
    expect(law.structure!.roots).toHaveLength(1);
    const root = law.structure!.roots![0]!;
    expect(root.symbol).toBe('ρ_1');
    // 2k_4 ρ² − k_1 = 0, in the engine's primitive form (either sign).
    const terms = Object.fromEntries(
      root.polynomial.map((t) => [Object.keys(t.factors).sort().join(' '), t.coefficient]),
    );
    expect(Math.abs(Number(terms['k_4 ρ_1']))).toBe(2);
    expect(Math.abs(Number(terms['k_1']))).toBe(1);
    expect(law.structure!.numerator[0]!.factors).toMatchObject({ '[CH3CHO]': '3/2', ρ_1: 1 });
    expect(law.orders['CH3CHO']).toEqual({ low: '3/2', high: '3/2' });
  });

  it('prints the law with radicals in the text report', () => {
    expect(rateLawLines(d)).toContain('  r = k_2*[CH3CHO]^(3/2)*(k_1 / (2*k_4))^(1/2)');
  });

  it('judges the observed order against the law with radicals at its conditions', () => {
    const check = d.observations!.find((o) => o.method === 'steady_state')!;
    expect(check.basis).toBe('conditions');
    expect(check.predicted).toBeCloseTo(1.5, 4);
    expect(check.status).toBe('pass');
  });
});
