/** The energy profile of one turnover: states along the route, species present, checks. */
import { describe, expect, it } from 'vitest';
import { deriveMechanism } from '../../../src/engine/derive.ts';
import { energyAnalysis } from '../../../src/engine/energy/energy-analysis.ts';
import { loadRecordSource } from '../../../src/records/index.ts';

/** Loads, derives and analyses an inline record. */
function analyse(body: string, notation = 'labels') {
  const yaml = `title: profile case\nsystem: profile\nstatus: proposed\nnotation: ${notation}\n${body}`;
  const loaded = loadRecordSource('profile.yaml', yaml);
  if (!loaded.record) throw new Error(JSON.stringify(loaded.diagnostics));
  const derivation = deriveMechanism(loaded.record);
  return { derivation, ...energyAnalysis(loaded.record, derivation.mechanism!, derivation.route!) };
}

const summary = (states: { kind: string; energy?: number; species: Record<string, number>; step?: string }[]) =>
  states.map((s) => [s.kind === 'minimum' ? 'min' : `ts ${s.step}`, s.energy, s.species]);

describe('energy profile', () => {
  it('repeats a step with σ = 2 and skips a step with σ = 0', () => {
    const { energy, derivation, diagnostics } = analyse(`steps:
  - { equation: A -> I, label: a, energy: { barrier: 50 kJ/mol, change: -10 kJ/mol } }
  - { equation: 2 I + B -> P, label: b, energy: { barrier: 30 kJ/mol, change: -40 kJ/mol } }
  - { equation: B <=> D, label: dead, times: 0, energy: { barrier: 5 kJ/mol, change: -1 kJ/mol } }
`);
    expect(derivation.stoichiometricNumbers).toEqual([2, 1, 0]);
    expect(diagnostics).toEqual([]);
    // By hand: 0; +50; −10; −10+50 = 40; −20; −20+30 = 10; −20−40 = −60.
    expect(summary(energy!.states)).toEqual([
      ['min', 0, { A: 2, B: 1 }],
      ['ts a', 50, { A: 2, B: 1 }],
      ['min', -10, { A: 1, I: 1, B: 1 }],
      ['ts a', 40, { A: 1, I: 1, B: 1 }],
      ['min', -20, { I: 2, B: 1 }],
      ['ts b', 10, { I: 2, B: 1 }],
      ['min', -60, { P: 1 }],
    ]);
    expect(energy!.states.map((s) => s.index)).toEqual([0, 1, 1, 2, 2, 3, 3]);
    expect(energy).toMatchObject({ kind: 'sequence', schematic: false, overall_change: -60, direction: 'exergonic' });
  });

  it('carries an excess reactant and the catalyst through; the last minimum is the first one lower by ΔG_r', () => {
    // The demo KX-7 cycle (content/mechanisms/kx7-hydroarylation-alkene-first.yaml).
    const { energy } = analyse(`species:
  Cat: { role: catalyst }
steps:
  - { equation: Cat + A <=> CatA, label: bind, energy: { barrier: 45 kJ/mol, change: -6 kJ/mol } }
  - { equation: CatA + B -> Cat + P, label: ar, rds: true, energy: { barrier: 80 kJ/mol, change: -50 kJ/mol } }
`);
    expect(summary(energy!.states)).toEqual([
      ['min', 0, { Cat: 1, A: 1, B: 1 }],
      ['ts bind', 45, { Cat: 1, A: 1, B: 1 }],
      ['min', -6, { B: 1, CatA: 1 }],
      ['ts ar', 74, { B: 1, CatA: 1 }],
      ['min', -56, { Cat: 1, P: 1 }],
    ]);
    expect(energy).toMatchObject({ kind: 'cycle', carriers: ['Cat'], overall_change: -56, rds_step: 'ar' });
  });

  it('follows the route from the starting materials when the cycle is written with its steps swapped', () => {
    // The same cycle as above with the regeneration step written first. The turnover still starts
    // where the catalyst takes up A (route order), not at the first line of the record.
    const { energy, derivation } = analyse(`species:
  Cat: { role: catalyst }
steps:
  - { equation: CatA + B -> Cat + P, label: ar, rds: true, energy: { barrier: 80 kJ/mol, change: -50 kJ/mol } }
  - { equation: Cat + A <=> CatA, label: bind, energy: { barrier: 45 kJ/mol, change: -6 kJ/mol } }
`);
    expect(derivation.routeOrder).toEqual([1, 0]);
    // By hand, as above: 0; +45; −6; −6+80 = 74; −56.
    expect(summary(energy!.states)).toEqual([
      ['min', 0, { Cat: 1, A: 1, B: 1 }],
      ['ts bind', 45, { Cat: 1, A: 1, B: 1 }],
      ['min', -6, { B: 1, CatA: 1 }],
      ['ts ar', 74, { B: 1, CatA: 1 }],
      ['min', -56, { Cat: 1, P: 1 }],
    ]);
    // Energetic span by hand: TDTS ‡ar at 74, TDI the adduct at −6 before it, δE = 80 kJ/mol.
    expect(energy).toMatchObject({
      kind: 'cycle',
      carriers: ['Cat'],
      overall_change: -56,
      tdts_step: 'ar',
      tdi_state: 1,
      span: 80,
    });
    expect(derivation.diagnostics.filter((d) => d.rule.startsWith('energy/'))).toEqual([]);
  });

  it('needs two NO2 at the start of NO2 + CO, though only one is consumed overall', () => {
    // Source: Atkins & de Paula, Physical Chemistry, reaction mechanisms (from memory).
    const { energy } = analyse(
      `steps:
  - equation: NO2 + NO2 -> NO3 + NO
  - equation: NO3 + CO -> NO2 + CO2
`,
      'formulas',
    );
    const minima = energy!.states.filter((s) => s.kind === 'minimum').map((s) => s.species);
    expect(minima).toEqual([
      { NO2: 2, CO: 1 },
      { NO3: 1, NO: 1, CO: 1 },
      { NO2: 1, NO: 1, CO2: 1 },
    ]);
    expect(energy).toMatchObject({ kind: 'sequence', schematic: true });
  });

  it('treats a chain carrier like a catalyst: the propagation cycle returns Cl•', () => {
    const { energy } = analyse(
      `steps:
  - { equation: Cl2 + M -> 2 Cl• + M, label: init }
  - { equation: Cl• + CHF3 -> HCl + CF3•, label: p1 }
  - { equation: CF3• + Cl2 -> CF3Cl + Cl•, label: p2 }
  - { equation: 2 Cl• + M -> Cl2 + M, label: term }
species:
  M: { third_body: true }
`,
      'formulas',
    );
    expect(energy!.carriers).toEqual(['Cl•']);
    expect(energy!.states.filter((s) => s.kind === 'minimum').map((s) => s.species)).toEqual([
      { Cl2: 1, 'Cl•': 1, CHF3: 1 },
      { Cl2: 1, HCl: 1, 'CF3•': 1 },
      { 'Cl•': 1, HCl: 1, CF3Cl: 1 },
    ]);
  });

  it('a transition state below a neighbouring minimum is an error at the barrier', () => {
    const { energy, diagnostics } = analyse(`steps:
  - { equation: A -> I, energy: { barrier: -5 kJ/mol, change: -10 kJ/mol } }
  - { equation: I -> P, energy: { barrier: 10 kJ/mol, change: 20 kJ/mol } }
`);
    expect(diagnostics).toMatchObject([
      { rule: 'energy/profile', severity: 'error', path: ['steps', 0, 'energy', 'barrier'] },
      { rule: 'energy/profile', severity: 'error', path: ['steps', 1, 'energy', 'barrier'] },
    ]);
    expect(energy!.span).toBeUndefined();
  });

  it('a step without energies makes the profile schematic, with a note but no error', () => {
    const partial = analyse(`steps:
  - { equation: A -> I, energy: { barrier: 50 kJ/mol, change: -10 kJ/mol } }
  - { equation: I -> P, energy: { barrier: 30 kJ/mol } }
`);
    expect(partial.energy).toMatchObject({ schematic: true });
    expect(partial.energy!.span).toBeUndefined();
    expect(partial.energy!.states.map((s) => s.energy)).toEqual([0, 50, -10, 20, undefined]);
    expect(partial.diagnostics).toMatchObject([{ rule: 'energy/profile', severity: 'info', path: ['steps', 1] }]);
    const none = analyse(`steps:\n  - equation: A -> I\n  - equation: I -> P\n`);
    expect(none.energy).toMatchObject({ schematic: true });
    expect(none.diagnostics).toEqual([]);
  });

  it('reads kcal/mol and eV, warns on a bare number and rejects a wrong unit', () => {
    const { energy, diagnostics } = analyse(`steps:
  - { equation: A -> I, energy: { barrier: 10 kcal/mol, change: -0.5 eV } }
  - { equation: I -> P, energy: { barrier: 30, change: 12 s } }
`);
    // 10 × 4.184 = 41.84 kJ/mol; 0.5 eV × F = 0.5 × 96.4853321 kJ/mol (CODATA 2018, exact e and N_A).
    expect(energy!.states[1]!.energy).toBeCloseTo(41.84, 10);
    expect(energy!.states[2]!.energy).toBeCloseTo(-48.24266606, 7);
    expect(diagnostics).toMatchObject([
      { rule: 'energy/profile', severity: 'warning', path: ['steps', 1, 'energy', 'barrier'] },
      { rule: 'energy/profile', severity: 'error', path: ['steps', 1, 'energy', 'change'] },
      { rule: 'energy/profile', severity: 'info' },
    ]);
  });

  it('returns nothing without a route', () => {
    const loaded = loadRecordSource(
      'profile.yaml',
      `title: t\nsystem: s\nstatus: proposed\nnotation: labels\nsteps:\n  - equation: A <=> B\n  - equation: B <=> A\n`,
    );
    const derivation = deriveMechanism(loaded.record!);
    expect(derivation.route).toBeUndefined();
    expect(derivation.energy).toBeUndefined();
    expect(derivation.diagnostics.filter((d) => d.rule.startsWith('energy/'))).toEqual([]);
  });
});
