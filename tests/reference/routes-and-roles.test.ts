/**
 * Routes, roles and verdicts for published mechanisms: the overall equation, the Horiuti numbers
 * σ, the role of every species and the three-valued verdict on observed orders, each written from
 * the source (named beside its case; "from memory" where the page was not at hand), not from the
 * engine's output. Declared roles must never change the route: each declared case is checked
 * against the same mechanism without the declaration. The rate-law algebra itself is checked in
 * rate-laws.test.ts.
 */
import { describe, expect, it } from 'vitest';
import type { Derivation } from '../../src/engine/derive.ts';
import { deriveYaml, errorRules, overallSides } from '../helpers/derive-yaml.ts';

const header = (system: string) => `title: reference case\nsystem: ${system}\nstatus: proposed\n`;
const roles = (d: Derivation) => Object.fromEntries(d.roles!);
const notes = (d: Derivation, rule: string) => d.diagnostics.filter((x) => x.rule === rule);
const verdict = (d: Derivation, species: string) => d.observations!.find((o) => o.species === species)!;

describe('enzyme mechanisms (two substrates, inhibition)', () => {
  // Ping-pong bi-bi: W. W. Cleland, Biochim. Biophys. Acta 67 (1963) 104; A. Cornish-Bowden,
  // Fundamentals of Enzyme Kinetics, two-substrate reactions (from memory). E + A ⇌ EA → F + P;
  // F + B ⇌ FB → E + Q: the modified enzyme F carries the group from A to B, so every step runs
  // once, A + B → P + Q, with the enzyme written over the arrow.
  const pingPong = (species: string) => `${header('ping-pong')}notation: labels
${species}steps:
  - equation: E + A <=> EA
  - equation: EA -> F + P
  - equation: F + B <=> FB
  - equation: FB -> E + Q
`;
  const pingPongRoles = {
    E: 'catalyst',
    A: 'reactant',
    EA: 'intermediate',
    F: 'intermediate',
    P: 'product',
    B: 'reactant',
    FB: 'intermediate',
    Q: 'product',
  };

  it('ping-pong bi-bi: every step once, A + B -> P + Q over E', () => {
    const d = deriveYaml(pingPong(''));
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 1, 1]);
    expect(overallSides(d)).toEqual({ reactants: { A: 1, B: 1 }, products: { P: 1, Q: 1 }, catalysts: ['E'] });
    expect(roles(d)).toEqual(pingPongRoles);
  });

  it('ping-pong bi-bi with F declared an intermediate: the same route (a declared intermediate is no chain carrier)', () => {
    const d = deriveYaml(pingPong('species:\n  F: { role: intermediate }\n'));
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 1, 1]);
    expect(overallSides(d)).toEqual({ reactants: { A: 1, B: 1 }, products: { P: 1, Q: 1 }, catalysts: ['E'] });
    expect(roles(d)).toEqual(pingPongRoles);
    expect(d.route!.chain).toBeUndefined();
  });

  it('ordered bi-bi: A binds first, Q leaves last; A + B -> P + Q over E', () => {
    // Cleland (1963); I. H. Segel, Enzyme Kinetics (1975), ordered bi bi (from memory).
    const d = deriveYaml(`${header('ordered-bi-bi')}notation: labels
steps:
  - equation: E + A <=> EA
  - equation: EA + B <=> EAB
  - equation: EAB -> EQ + P
  - equation: EQ <=> E + Q
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 1, 1]);
    expect(overallSides(d)).toEqual({ reactants: { A: 1, B: 1 }, products: { P: 1, Q: 1 }, catalysts: ['E'] });
    expect(roles(d)).toEqual({
      E: 'catalyst',
      A: 'reactant',
      EA: 'intermediate',
      B: 'reactant',
      EAB: 'intermediate',
      EQ: 'intermediate',
      P: 'product',
      Q: 'product',
    });
  });

  // Inhibition types: Cornish-Bowden, Fundamentals of Enzyme Kinetics; Segel, Enzyme Kinetics
  // (from memory). The inhibitor binds off the catalytic cycle, so the overall change stays S → P;
  // the free inhibitor slows the rate (negative order), the inhibited complexes are dead ends.
  const inhibition = (extra: string, observations = '') => `${header('inhibition')}notation: labels
steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
${extra}${observations}`;

  it('competitive: EI is a dead end off the route; I an inhibitor, its order between −1 and 0 without constants', () => {
    const d = deriveYaml(
      inhibition(
        '  - equation: E + I <=> EI\n',
        `observations:
  - id: inhibited
    concentrations: { E: 1.0e-8 M, S: 1.0e-3 M, I: 1.0e-3 M }
    orders: { I: -0.5 ± 0.1, S: 1.5 ± 0.1 }
`,
      ),
    );
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['E'] });
    expect(roles(d)).toEqual({
      E: 'catalyst',
      S: 'reactant',
      ES: 'intermediate',
      P: 'product',
      I: 'inhibitor',
      EI: 'off_route',
    });
    // v = V[S]/(K_M(1 + [I]/K_i) + [S]): the order in I runs from 0 (little I) to −1 (much I), so
    // −0.5 is allowed for some constants, which are not given; the order in S stays within 0 to 1
    // whatever the constants, so 1.5 is excluded.
    expect(verdict(d, 'I')).toMatchObject({ status: 'not_excluded', range: [-1, 0] });
    expect(verdict(d, 'S')).toMatchObject({ status: 'fail', range: [0, 1] });
    const offRoute = notes(d, 'route/off-route');
    expect(offRoute.map((n) => n.path)).toEqual([['steps', 2]]);
    expect(offRoute[0]!.message).toContain('dead-end');
  });

  it('uncompetitive: the inhibitor binds only ES; ESI off the route', () => {
    const d = deriveYaml(inhibition('  - equation: ES + I <=> ESI\n'));
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['E'] });
    expect(roles(d)).toMatchObject({ E: 'catalyst', ES: 'intermediate', I: 'inhibitor', ESI: 'off_route' });
  });

  it('mixed: I binds E and ES, and EI binds S — the whole box stays off the route', () => {
    const d = deriveYaml(
      inhibition('  - equation: E + I <=> EI\n  - equation: ES + I <=> ESI\n  - equation: EI + S <=> ESI\n'),
    );
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 0, 0, 0]);
    expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['E'] });
    expect(roles(d)).toMatchObject({ I: 'inhibitor', EI: 'off_route', ESI: 'off_route', S: 'reactant' });
    expect(notes(d, 'route/off-route').map((n) => n.path)).toEqual([
      ['steps', 2],
      ['steps', 3],
      ['steps', 4],
    ]);
  });

  it('substrate inhibition: ESS is a dead end; S stays the reactant, its order between −1 and 1', () => {
    // J. B. S. Haldane, Enzymes (1930), substrate inhibition (from memory): v = V[S]/(K_M + [S] + [S]²/K_i).
    const d = deriveYaml(
      inhibition(
        '  - equation: ES + S <=> ESS\n',
        `observations:
  - id: high-s
    concentrations: { E: 1.0e-8 M, S: 0.1 M }
    orders: { S: -0.5 ± 0.1 }
`,
      ),
    );
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 0]);
    expect(roles(d)).toMatchObject({ S: 'reactant', ESS: 'off_route', E: 'catalyst' });
    expect(verdict(d, 'S')).toMatchObject({ status: 'not_excluded', range: [-1, 1] });
  });
});

describe('acid–base and carbonyl mechanisms', () => {
  // Base-promoted ester hydrolysis (B_AC2): C. K. Ingold, Structure and Mechanism in Organic
  // Chemistry; J. Clayden et al., Organic Chemistry (from memory). Hydroxide adds to the carbonyl
  // (tetrahedral intermediate), the alkoxide leaves, and the acid is deprotonated by it at once:
  // EtOAc + OH- → AcO- + EtOH, hydroxide consumed (the reaction is base-promoted, not catalysed).
  const ester = (declared: string) => `${header('ester-saponification')}species:
  EtOAc: { formula: C4H8O2 }
  T-: { formula: C4H9O3-${declared} }
  AcOH: { formula: C2H4O2 }
  AcO-: { formula: C2H3O2- }
  EtO-: { formula: C2H5O- }
  EtOH: { formula: C2H6O }
steps:
  - equation: EtOAc + OH- <=> T-
  - { equation: T- -> AcOH + EtO-, rds: true }
  - equation: AcOH + EtO- -> AcO- + EtOH
`;

  for (const [name, declared] of [
    ['without declarations', ''],
    ['with the tetrahedral intermediate declared', ', role: intermediate'],
  ]) {
    it(`saponification through the tetrahedral intermediate, ${name}: EtOAc + OH- -> AcO- + EtOH`, () => {
      const d = deriveYaml(ester(declared!));
      expect(errorRules(d)).toEqual([]);
      expect(d.stoichiometricNumbers).toEqual([1, 1, 1]);
      expect(overallSides(d)).toEqual({
        reactants: { EtOAc: 1, 'OH-': 1 },
        products: { 'AcO-': 1, EtOH: 1 },
        catalysts: [],
      });
      expect(roles(d)).toEqual({
        EtOAc: 'reactant',
        'OH-': 'reactant',
        'T-': 'intermediate',
        AcOH: 'intermediate',
        'EtO-': 'intermediate',
        'AcO-': 'product',
        EtOH: 'product',
      });
    });
  }

  it('E1 dehydration of tert-butanol: H+ over the arrow; first order in the alcohol whatever the constants', () => {
    // Acid-catalysed E1 dehydration, e.g. Clayden et al., Organic Chemistry; F. A. Carey and R. J.
    // Sundberg, Advanced Organic Chemistry (from memory): protonation, loss of water (slow), loss of
    // H+ from the carbocation. At fixed pH (buffered H+) r = k_2 K_1 [tBuOH][H+]: order 1 in tBuOH.
    const d = deriveYaml(`${header('tbuoh-dehydration')}species:
  tBuOH: { formula: C4H10O }
  tBuOH2+: { formula: C4H11O+ }
  tBu+: { formula: C4H9+ }
  C4H8: { name: isobutene }
  H+: { role: catalyst, buffered: true }
steps:
  - equation: tBuOH + H+ <=> tBuOH2+
  - { equation: tBuOH2+ -> tBu+ + H2O, rds: true }
  - equation: tBu+ -> C4H8 + H+
observations:
  - id: fixed-ph
    concentrations: { tBuOH: 0.5 M, H+: 0.1 M }
    orders: { tBuOH: 1.0 ± 0.1 }
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 1]);
    expect(overallSides(d)).toEqual({
      reactants: { tBuOH: 1 },
      products: { H2O: 1, C4H8: 1 },
      catalysts: ['H+'],
    });
    expect(roles(d)).toMatchObject({ 'H+': 'catalyst', 'tBuOH2+': 'intermediate', 'tBu+': 'intermediate' });
    expect(verdict(d, 'tBuOH')).toMatchObject({ status: 'pass', predicted: 1, basis: 'limits' });
  });

  // Acid-catalysed iodination of acetone: A. Lapworth, J. Chem. Soc. 85 (1904) 30; P. Atkins and
  // J. de Paula, Physical Chemistry (from memory). Rate-determining enolisation, then fast
  // iodination of the enol, which releases a further H+: CH3COCH3 + I2 → CH3COCH2I + H+ + I-, zero
  // order in iodine. H+ is formed net (the reaction is autocatalytic), so it is a product.
  const acetone = (declared: string) => `${header('acetone-iodination')}species:
  CH3COCH3: { formula: C3H6O }
  CH3C(OH)CH3+: { formula: C3H7O+ }
  CH2=C(OH)CH3: { formula: C3H6O }
  CH3COCH2I: { formula: C3H5IO }
${declared}steps:
  - equation: CH3COCH3 + H+ <=> CH3C(OH)CH3+
  - { equation: CH3C(OH)CH3+ -> CH2=C(OH)CH3 + H+, rds: true }
  - equation: CH2=C(OH)CH3 + I2 -> CH3COCH2I + I- + H+
observations:
  - id: lapworth
    concentrations: { CH3COCH3: 0.5 M, H+: 0.1 M, I2: 1.0e-3 M }
    orders: { I2: 0.0 ± 0.05, CH3COCH3: 1.0 ± 0.1 }
`;

  it('acetone iodination: the route runs through the iodination; H+ formed net; zero order in I2', () => {
    const d = deriveYaml(acetone(''));
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([1, 1, 1]);
    expect(overallSides(d)).toEqual({
      reactants: { CH3COCH3: 1, I2: 1 },
      products: { 'H+': 1, CH3COCH2I: 1, 'I-': 1 },
      catalysts: [],
    });
    expect(roles(d)).toMatchObject({ 'H+': 'product', 'CH2=C(OH)CH3': 'intermediate', I2: 'reactant' });
    // r = k_2 K_1 [CH3COCH3][H+]: iodine is not in the law, acetone first order, whatever the constants.
    expect(verdict(d, 'I2')).toMatchObject({ status: 'pass', predicted: 0 });
    expect(verdict(d, 'CH3COCH3')).toMatchObject({ status: 'pass', predicted: 1 });
  });

  it('acetone iodination with H+ declared a catalyst: the route stands and the declaration is an error at its line', () => {
    const d = deriveYaml(acetone('  H+: { role: catalyst }\n'));
    expect(d.stoichiometricNumbers).toEqual([1, 1, 1]);
    expect(d.roles!.get('H+')).toBe('product');
    const mismatch = d.diagnostics.filter((x) => x.rule === 'roles/declared-mismatch');
    expect(mismatch).toHaveLength(1);
    expect(mismatch[0]).toMatchObject({ severity: 'error', path: ['species', 'H+', 'role'] });
    expect(mismatch[0]!.message).toContain('formed net');
    expect(mismatch[0]!.message).toContain('a product');
  });

  // Constructed for this check (the case reported against the route finder; no single published
  // source): two hydrolysis steps each release OH-, and the neutralisation H+ + OH- → H2O removes
  // both. Balancing OH- by hand gives σ = [1, 1, 2] and CO3^2- + 2 H+ → H2CO3 in water — the
  // textbook net ionic equation of carbonate titrated to carbonic acid (general chemistry, from memory).
  const carbonate = (declared: string) => `${header('carbonate')}species:
  H2O: { solvent: true }
${declared}steps:
  - equation: CO3^2- + H2O -> HCO3- + OH-
  - { equation: HCO3- + H2O -> H2CO3 + OH-, rds: true }
  - equation: H+ + OH- -> H2O
`;

  for (const [name, declared] of [
    ['', ''],
    [' with HCO3- declared an intermediate', '  HCO3-: { role: intermediate }\n'],
  ]) {
    it(`a neutralisation after two hydroxide-forming steps is part of the route, not the whole of it${name}`, () => {
      const d = deriveYaml(carbonate(declared!));
      expect(d.stoichiometricNumbers).toEqual([1, 1, 2]);
      expect(overallSides(d)).toEqual({
        reactants: { 'CO3^2-': 1, 'H+': 2 },
        products: { H2CO3: 1 },
        catalysts: [],
      });
      expect(roles(d)).toMatchObject({ 'HCO3-': 'intermediate', 'OH-': 'intermediate', H2O: 'solvent' });
      expect(d.diagnostics.filter((x) => x.rule === 'step/rds' || x.rule.startsWith('route/'))).toEqual([]);
    });
  }
});

describe('radical chains and gas-phase mechanisms', () => {
  // H2 + Br2: M. Bodenstein and S. C. Lind, Z. phys. Chem. 57 (1907) 168 (rate law); mechanism by
  // J. A. Christiansen, K. F. Herzfeld and M. Polanyi (1919), as in Atkins & de Paula, Physical
  // Chemistry (from memory). The propagation pair is the route (Br2 + H2 → 2 HBr); initiation and
  // termination are off it; the inhibition step H• + HBr → H2 + Br• is propagation run backwards.
  const hbr = (species: string) => `${header('hbr')}${species}steps:
  - equation: Br2 -> 2 Br•
  - equation: Br• + H2 -> HBr + H•
  - equation: H• + Br2 -> HBr + Br•
  - equation: H• + HBr -> H2 + Br•
  - equation: 2 Br• -> Br2
`;

  for (const [name, species, source] of [
    ['detected from the steps', '', 'detected'],
    [
      'with the atoms declared intermediates',
      'species:\n  Br•: { role: intermediate }\n  H•: { role: intermediate }\n',
      'detected',
    ],
    [
      'with the atoms declared chain carriers',
      'species:\n  Br•: { chain_carrier: true }\n  H•: { chain_carrier: true }\n',
      'declared',
    ],
  ]) {
    it(`H2 + Br2 chain, ${name}: propagation is the route, initiation and termination off it`, () => {
      const d = deriveYaml(hbr(species!));
      expect(errorRules(d)).toEqual([]);
      expect(d.stoichiometricNumbers).toEqual([0, 1, 1, 0, 0]);
      expect(overallSides(d)).toEqual({ reactants: { Br2: 1, H2: 1 }, products: { HBr: 2 }, catalysts: [] });
      expect(roles(d)).toEqual({
        Br2: 'reactant',
        'Br•': 'intermediate',
        H2: 'reactant',
        HBr: 'product',
        'H•': 'intermediate',
      });
      expect(d.route!.chain).toMatchObject({ propagation: [1, 2], initiation: [0], termination: [4], source });
      expect([...d.route!.chain!.carriers].sort()).toEqual(['Br•', 'H•']);
      const offRoute = notes(d, 'route/off-route');
      expect(offRoute.map((n) => n.path)).toEqual([
        ['steps', 0],
        ['steps', 3],
        ['steps', 4],
      ]);
      expect(offRoute[0]!.message).toContain('starts chains');
      expect(offRoute[1]!.message).toContain('step 2 backwards');
      expect(offRoute[2]!.message).toContain('ends chains');
    });
  }

  it('Rice–Herzfeld acetaldehyde pyrolysis: CH3CHO -> CH4 + CO; CHO• and C2H6 only off the route', () => {
    // F. O. Rice and K. F. Herzfeld, J. Am. Chem. Soc. 56 (1934) 284; K. J. Laidler, Chemical
    // Kinetics (from memory): CH3CHO → CH3• + CHO•; CH3• + CH3CHO → CH4 + CH3CO•; CH3CO• → CH3• + CO;
    // 2 CH3• → C2H6. The long-chain overall reaction is that of the two propagation steps.
    const d = deriveYaml(`${header('acetaldehyde')}steps:
  - equation: CH3CHO -> CH3• + CHO•
  - equation: CH3• + CH3CHO -> CH4 + CH3CO•
  - equation: CH3CO• -> CH3• + CO
  - equation: 2 CH3• -> C2H6
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([0, 1, 1, 0]);
    expect(overallSides(d)).toEqual({ reactants: { CH3CHO: 1 }, products: { CH4: 1, CO: 1 }, catalysts: [] });
    expect(roles(d)).toEqual({
      CH3CHO: 'reactant',
      'CH3•': 'intermediate',
      'CHO•': 'off_route',
      CH4: 'product',
      'CH3CO•': 'intermediate',
      CO: 'product',
      C2H6: 'off_route',
    });
    expect(d.route!.chain).toMatchObject({ initiation: [0], termination: [3], source: 'detected' });
  });

  it("Ogg's N2O5 decomposition: the dissociation runs twice per turnover", () => {
    // R. A. Ogg, J. Chem. Phys. 15 (1947) 337 (from memory): N2O5 ⇌ NO2 + NO3;
    // NO2 + NO3 → NO2 + O2 + NO; NO + NO3 → 2 NO2. Two NO3 per O2, so σ = [2, 1, 1]:
    // 2 N2O5 → 4 NO2 + O2, with NO3 and NO intermediates. Not a chain: nothing is regenerated.
    const d = deriveYaml(`${header('n2o5')}steps:
  - equation: N2O5 <=> NO2 + NO3
  - equation: NO2 + NO3 -> NO2 + O2 + NO
  - equation: NO + NO3 -> 2 NO2
`);
    expect(errorRules(d)).toEqual([]);
    expect(d.stoichiometricNumbers).toEqual([2, 1, 1]);
    expect(overallSides(d)).toEqual({ reactants: { N2O5: 2 }, products: { NO2: 4, O2: 1 }, catalysts: [] });
    expect(roles(d)).toMatchObject({ NO3: 'intermediate', NO: 'intermediate' });
    expect(d.route!.chain).toBeUndefined();
  });

  it('Michaelis–Menten is no chain: the enzyme total is conserved, so the dead-end binding is no termination', () => {
    // L. Michaelis and M. L. Menten (1913), with a dead-end inhibitor (Cornish-Bowden, from memory).
    const d = deriveYaml(`${header('dead-end')}notation: labels
steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
  - equation: E + I <=> EI
`);
    expect(d.route!.chain).toBeUndefined();
  });
});
