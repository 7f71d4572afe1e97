/**
 * Overall equations, stoichiometric numbers, roles and balance for mechanisms published in
 * textbooks. Each source is named beside its case; "from memory" means the mechanism was written
 * down as remembered, not copied from the page.
 */
import { describe, expect, it } from 'vitest';
import { deriveYaml, errorRules, overallSides } from '../helpers/derive-yaml.ts';

const header = (system: string) => `title: reference case\nsystem: ${system}\nstatus: proposed\n`;

describe('published mechanisms: overall equation, σ and roles', () => {
  it('NO2 + CO: slow bimolecular step, then fast regeneration (NO2 consumed twice, formed once)', () => {
    // Source: P. Atkins & J. de Paula, Physical Chemistry, chapter on reaction mechanisms (from memory);
    // also standard general-chemistry texts. Overall NO2 + CO -> NO + CO2, NO3 an intermediate.
    const d = deriveYaml(`${header('no2-co')}steps:
  - { equation: NO2 + NO2 -> NO3 + NO, rds: true }
  - equation: NO3 + CO -> NO2 + CO2
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1]);
    expect(overallSides(d)).toEqual({ reactants: { NO2: 1, CO: 1 }, products: { NO: 1, CO2: 1 }, catalysts: [] });
    expect(Object.fromEntries(d.roles!)).toEqual({
      NO2: 'reactant',
      NO3: 'intermediate',
      NO: 'product',
      CO: 'reactant',
      CO2: 'product',
    });
  });

  it('iodide-catalysed decomposition of hydrogen peroxide', () => {
    // Source: T. L. Brown et al., Chemistry: The Central Science, kinetics chapter (from memory):
    // H2O2 + I- -> H2O + IO- (slow); H2O2 + IO- -> H2O + O2 + I- (fast); overall 2 H2O2 -> 2 H2O + O2.
    const d = deriveYaml(`${header('peroxide')}steps:
  - { equation: H2O2 + I- -> H2O + IO-, rds: true }
  - equation: H2O2 + IO- -> H2O + O2 + I-
`);
    expect(errorRules(d)).toEqual([]);
    expect(overallSides(d)).toEqual({ reactants: { H2O2: 2 }, products: { H2O: 2, O2: 1 }, catalysts: ['I-'] });
    expect(d.roles!.get('IO-')).toBe('intermediate');
    expect(d.roles!.get('I-')).toBe('catalyst');
  });

  it('ozone decomposition: fast pre-equilibrium then a slow step', () => {
    // Source: Atkins & de Paula, Physical Chemistry, pre-equilibrium example (from memory):
    // O3 <=> O2 + O; O + O3 -> 2 O2; overall 2 O3 -> 3 O2.
    const d = deriveYaml(`${header('ozone')}steps:
  - equation: O3 <=> O2 + O
  - { equation: O + O3 -> 2 O2, rds: true }
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1]);
    expect(overallSides(d)).toEqual({ reactants: { O3: 2 }, products: { O2: 3 }, catalysts: [] });
    expect(d.roles!.get('O')).toBe('intermediate');
  });

  it('H2 + Br2 chain: the initiation and termination steps are off the route', () => {
    // Source: Bodenstein & Lind (1907) rate law, mechanism by Christiansen, Herzfeld and Polanyi (1919),
    // as given in Atkins & de Paula, Physical Chemistry (from memory). Horiuti numbers: propagation 1, 1; others 0.
    const d = deriveYaml(`${header('hbr')}species:
  Br•: { role: intermediate }
  H•: { role: intermediate }
steps:
  - equation: Br2 -> 2 Br•
  - equation: Br• + H2 -> HBr + H•
  - equation: H• + Br2 -> HBr + Br•
  - equation: H• + HBr -> H2 + Br•
  - equation: 2 Br• -> Br2
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([0, 1, 1, 0, 0]);
    expect(overallSides(d)).toEqual({ reactants: { Br2: 1, H2: 1 }, products: { HBr: 2 }, catalysts: [] });
    expect(d.roles!.get('Br•')).toBe('intermediate');
    expect(d.roles!.get('H•')).toBe('intermediate');
  });

  it('Lindemann–Hinshelwood unimolecular reaction with a third body', () => {
    // Source: F. A. Lindemann (1922); Atkins & de Paula, Physical Chemistry (from memory):
    // A + M <=> A* + M; A* -> P. M is a collision partner, on both sides of step 1.
    const d = deriveYaml(`${header('lindemann')}notation: labels
species:
  M: { third_body: true }
steps:
  - equation: A + M <=> A* + M
  - equation: A* -> P
`);
    expect(errorRules(d)).toEqual([]);
    expect(overallSides(d)).toEqual({ reactants: { A: 1 }, products: { P: 1 }, catalysts: [] });
    expect(d.roles!.get('M')).toBe('third_body');
    expect(d.roles!.get('A*')).toBe('intermediate');
  });

  it('Michaelis–Menten with a competitive inhibitor: the dead-end complex is off the route', () => {
    // Source: A. Cornish-Bowden, Fundamentals of Enzyme Kinetics, competitive inhibition (from memory).
    const d = deriveYaml(`${header('enzyme')}notation: labels
steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
  - equation: E + I <=> EI
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['E'] });
    expect(d.roles!.get('ES')).toBe('intermediate');
    expect([...d.offRoute!].sort()).toEqual(['EI', 'I']);
  });

  it('specific-acid-catalysed ester hydrolysis: buffered acid catalyst, water as solvent', () => {
    // Source: the A_AC2 scheme for ethyl acetate hydrolysis, e.g. in Anslyn & Dougherty,
    // Modern Physical Organic Chemistry (from memory), reduced to a protonation pre-equilibrium and one slow step.
    const d = deriveYaml(`${header('ester-hydrolysis')}species:
  EtOAc: { formula: C4H8O2 }
  EtOAcH+: { formula: C4H9O2+ }
  AcOH: { formula: C2H4O2 }
  EtOH: { formula: C2H6O }
  H2O: { solvent: true }
  H+: { buffered: true }
steps:
  - equation: EtOAc + H+ <=> EtOAcH+
  - { equation: EtOAcH+ + H2O -> AcOH + EtOH + H+, rds: true }
`);
    expect(errorRules(d)).toEqual([]);
    expect(overallSides(d)).toEqual({
      reactants: { EtOAc: 1, H2O: 1 },
      products: { AcOH: 1, EtOH: 1 },
      catalysts: ['H+'],
    });
    expect(d.roles!.get('H2O')).toBe('solvent');
    expect(d.roles!.get('H+')).toBe('catalyst');
    expect(d.buffered).toEqual(['H+']);
  });

  it('SN1 solvolysis of tert-butyl chloride with the common ion', () => {
    // Source: C. K. Ingold, Structure and Mechanism in Organic Chemistry, SN1 and the mass-law
    // (common-ion) effect (from memory). Carbocation intermediate; water the solvent nucleophile.
    const d = deriveYaml(`${header('sn1')}species:
  tBuCl: { formula: C4H9Cl }
  tBu+: { formula: C4H9+ }
  tBuOH: { formula: C4H10O }
  H2O: { solvent: true }
steps:
  - { equation: tBuCl <=> tBu+ + Cl-, rds: true }
  - equation: tBu+ + H2O -> tBuOH + H+
`);
    expect(errorRules(d)).toEqual([]);
    expect(overallSides(d)).toEqual({
      reactants: { tBuCl: 1, H2O: 1 },
      products: { 'Cl-': 1, tBuOH: 1, 'H+': 1 },
      catalysts: [],
    });
    expect(d.roles!.get('tBu+')).toBe('intermediate');
  });
});

describe('route edge cases', () => {
  it('asks for times when two independent routes are equally good', () => {
    // Two parallel channels A -> I1 -> P and A -> I2 -> P (a constructed case, not from a source).
    const d = deriveYaml(`${header('parallel')}notation: labels
steps:
  - equation: A -> I1
  - equation: I1 -> P
  - equation: A -> I2
  - equation: I2 -> Q
`);
    expect(errorRules(d)).toContain('route/ambiguous');
  });

  it('given times win over the search', () => {
    const d = deriveYaml(`${header('given')}notation: labels
steps:
  - { equation: A -> I1, times: 1 }
  - { equation: I1 -> P, times: 1 }
  - { equation: A -> I2, times: 0 }
  - { equation: I2 -> Q, times: 0 }
`);
    expect(errorRules(d)).toEqual([]);
    expect(overallSides(d).products).toEqual({ P: 1 });
  });

  it('reports unbalanced atoms and charge on the step', () => {
    const d = deriveYaml(`${header('unbalanced')}steps:
  - equation: H2O2 + I- -> H2O + IO
`);
    expect(errorRules(d)).toEqual(['balance/charge']);
    const d2 = deriveYaml(`${header('unbalanced')}steps:
  - equation: H2O2 + I- -> H2O + I-
`);
    expect(errorRules(d2)).toEqual(['balance/atoms']);
  });
});

describe('routes a kineticist expects (found in review)', () => {
  it('product inhibition: the dead-end E·P complex stays off the route, the enzyme a catalyst', () => {
    // Competitive product inhibition, e.g. Cornish-Bowden, Fundamentals of Enzyme Kinetics (from memory).
    const d = deriveYaml(`${header('product-inhibition')}notation: labels
steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
  - equation: E + P <=> EP
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['E'] });
  });

  it('methane chlorination: the overall equation is that of the propagation steps', () => {
    // Radical chain of CH4 + Cl2, e.g. Atkins & de Paula, Physical Chemistry (from memory):
    // the long-chain overall reaction is CH4 + Cl2 -> CH3Cl + HCl.
    const d = deriveYaml(`${header('chlorination')}steps:
  - equation: Cl2 -> 2 Cl•
  - equation: Cl• + CH4 -> HCl + CH3•
  - equation: CH3• + Cl2 -> CH3Cl + Cl•
  - equation: 2 CH3• -> C2H6
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([0, 1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { CH4: 1, Cl2: 1 }, products: { HCl: 1, CH3Cl: 1 }, catalysts: [] });
    // Ethane forms only in the termination step, which is off the route: a side product, not a product of the overall equation.
    expect(d.roles!.get('C2H6')).toBe('off_route');
  });

  it('Rice–Herzfeld ethane pyrolysis with declared chain carriers: C2H6 -> C2H4 + H2', () => {
    // F. O. Rice and K. F. Herzfeld (1934), as in Atkins & de Paula, Physical Chemistry (from memory).
    // The chain carriers are C2H5• and H•; CH3• only takes part in the initiation sequence.
    const d = deriveYaml(`${header('ethane')}species:
  C2H5•: { chain_carrier: true }
  H•: { chain_carrier: true }
steps:
  - equation: C2H6 -> 2 CH3•
  - equation: CH3• + C2H6 -> CH4 + C2H5•
  - equation: C2H5• -> C2H4 + H•
  - equation: H• + C2H6 -> H2 + C2H5•
  - equation: H• + C2H5• -> C2H6
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([0, 0, 1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { C2H6: 1 }, products: { C2H4: 1, H2: 1 }, catalysts: [] });
  });

  it('a catalytic cycle written from the slow step on still has the enzyme as its catalyst', () => {
    const d = deriveYaml(`${header('cycle-order')}notation: labels
steps:
  - { equation: ES -> E + P, rds: true }
  - equation: E + S <=> ES
`);
    expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['E'] });
    expect(d.roles!.get('ES')).toBe('intermediate');
  });
});

describe('parallel paths to one overall reaction', () => {
  it('random-order binding of two substrates: one overall reaction, the other path noted', () => {
    // Random-order bi-substrate mechanism, e.g. Cornish-Bowden, Fundamentals of Enzyme Kinetics (from memory).
    const d = deriveYaml(`${header('random-bi')}notation: labels
steps:
  - equation: E + A <=> EA
  - equation: E + B <=> EB
  - equation: EA + B <=> EAB
  - equation: EB + A <=> EAB
  - { equation: EAB -> E + P, rds: true }
`);
    expect(errorRules(d)).toEqual([]);
    expect(overallSides(d)).toEqual({ reactants: { A: 1, B: 1 }, products: { P: 1 }, catalysts: ['E'] });
    expect(d.diagnostics.find((x) => x.rule === 'route/ambiguous')).toMatchObject({ severity: 'info' });
  });
});
