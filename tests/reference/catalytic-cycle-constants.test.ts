/**
 * Homogeneous catalytic cycles with a pre-equilibrium: the apparent constants a kineticist reads
 * off the law (k_obs, the K of each denominator term), each with its unit and, from the record's
 * constants, its value — computed here by hand from the textbook's definition. The constants in
 * these records are illustrative numbers chosen for the arithmetic, not measured values.
 */
import { describe, expect, it } from 'vitest';
import { deriveYaml, errorRules } from '../helpers/derive-yaml.ts';
import { expectSameLaw, lawBy, orderTable } from '../helpers/rate-law-check.ts';
import { constantNamed, unitOf } from '../helpers/normalised-check.ts';

const header = (system: string) =>
  `title: reference catalytic cycle\nsystem: ${system}\nstatus: proposed\nnotation: labels\n`;

describe('ligand dissociation before the rate-determining step (inverse order in added ligand)', () => {
  // Source: J. F. Hartwig, Organotransition Metal Chemistry, kinetics of reactions that need a
  // ligand to dissociate first (from memory); J. H. Espenson, Chemical Kinetics and Reaction
  // Mechanisms, pre-equilibria (from memory): ML3 ⇌ ML2 + L (K_1), ML2 + A → ML2A (slow, k_2),
  // then fast steps regenerate ML2, so r = k_2 K_1 [M]_T [A] / (K_1 + [L]): first order in A,
  // from zero to inverse first order in L. Normalised: r = k_2[M]_T[A] / (1 + [L]/K_1).
  // The ligand is added in excess, so its free concentration is held (buffered), as in the source.
  const d = deriveYaml(`${header('ligand-dissociation')}species:
  L: { buffered: true }
steps:
  - { equation: ML3 <=> ML2 + L, K: 2e-3 M }
  - { equation: ML2 + A -> ML2A, rds: true, k: 0.5 M^-1 s^-1 }
  - { equation: ML2A + B -> ML2 + AB, k: 1e3 M^-1 s^-1 }
`);

  it('gives k_2 K_1 [M]_T[A]/(K_1 + [L])', () => {
    expect(errorRules(d)).toEqual([]);
    const rds = lawBy(d, 'rds');
    expectSameLaw(rds.law.expression, {
      symbols: ['k_2', 'K_1', '[ML2]_T', '[A]', '[L]'],
      rate: (v) => (v('k_2') * v('K_1') * v('[ML2]_T') * v('[A]')) / (v('K_1') + v('[L]')),
    });
    expect(orderTable(rds)).toMatchObject({ A: ['1', '1'], L: ['0', '-1'], B: ['0', '0'] });
  });

  it('names k_obs = k_2 and K_L = 1/K_1, with units and the values of the record', () => {
    const n = lawBy(d, 'rds').normalised!;
    expect(n.factors[0]!.terms.map((t) => t.constant ?? '1')).toEqual(['1', 'K_L']);
    expectSameLaw(constantNamed(n, 'k_obs').definition, { symbols: ['k_2'], rate: (v) => v('k_2') });
    expectSameLaw(constantNamed(n, 'K_L').definition, { symbols: ['K_1'], rate: (v) => 1 / v('K_1') });
    expect(unitOf(constantNamed(n, 'k_obs'))).toBe('M^-1 s^-1');
    expect(constantNamed(n, 'k_obs').value).toBe(0.5);
    // 1/(2e-3 M) = 500 M^-1.
    expect(unitOf(constantNamed(n, 'K_L'))).toBe('M^-1');
    expect(constantNamed(n, 'K_L').value).toBeCloseTo(500, 9);
    // One substrate but no saturation by it: not the Michaelis–Menten shape.
    expect(n.trade).toBeUndefined();
  });
});

describe('specific acid catalysis: protonation in a fast pre-equilibrium, then the slow step', () => {
  // Source: P. Atkins & J. de Paula, Physical Chemistry, acid catalysis (from memory); K. J.
  // Laidler, Chemical Kinetics, specific hydrogen-ion catalysis (from memory):
  // S + H+ ⇌ SH+ (K_1), SH+ → P + H+ (slow, k_2); at fixed pH r = k_2 K_1 [S][H+] = k_obs[S][H+].
  const d = deriveYaml(`${header('acid')}species:
  H+: { buffered: true }
steps:
  - { equation: S + H+ <=> SH+, K: 0.02 M^-1 }
  - { equation: SH+ -> P + H+, rds: true, k: 3e3 s^-1 }
`);

  it('groups k_obs = k_2 K_1 and gives its unit and value (rds path)', () => {
    expect(errorRules(d)).toEqual([]);
    const rds = lawBy(d, 'rds');
    expectSameLaw(rds.law.expression, {
      symbols: ['k_2', 'K_1', '[S]', '[H+]'],
      rate: (v) => v('k_2') * v('K_1') * v('[S]') * v('[H+]'),
    });
    const grouped = rds.presented!.grouped!;
    expect(grouped.name).toBe('k_obs');
    // k_2 s^-1 × K_1 M^-1 = M^-1 s^-1; 3e3 × 0.02 = 60.
    expect(grouped.unitText).toBe('M^-1 s^-1');
    expect(grouped.value).toBeCloseTo(60, 9);
    const kObs = constantNamed(rds.normalised!, 'k_obs');
    expect([kObs.unitText, kObs.value]).toEqual([grouped.unitText, grouped.value]);
  });
});
