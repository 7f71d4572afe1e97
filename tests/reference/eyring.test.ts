/**
 * The Eyring equation k = κ (k_B T/h) exp(−ΔG‡/RT) (c°)^(1−n) (H. Eyring, J. Chem. Phys. 1935, 3,
 * 107; in this form with the standard-state factor as in IUPAC Gold Book, "Eyring equation" —
 * both from memory). Expected values are computed here from the CODATA 2018 exact constants,
 * stated in the test rather than imported, so the engine's constants are checked too.
 */
import { describe, expect, it } from 'vitest';
import { buildMechanism } from '../../src/engine/mechanism/mechanism.ts';
import { eyringRateConstant, eyringStepConstants, thermalFrequency } from '../../src/engine/energy/eyring.ts';
import { loadRecordSource } from '../../src/records/index.ts';

// CODATA 2018 exact defining constants (SI 2019).
const K_B = 1.380649e-23; // J K^-1
const H = 6.62607015e-34; // J s
const N_A = 6.02214076e23; // mol^-1
const R = N_A * K_B; // J mol^-1 K^-1
const T = 298.15;

const relativeError = (a: number | undefined, b: number) => Math.abs((a ?? NaN) / b - 1);

/** Loads an inline record and returns the Eyring constants of its steps. */
function constantsOf(yaml: string) {
  const loaded = loadRecordSource('eyring.yaml', yaml);
  if (!loaded.record) throw new Error(JSON.stringify(loaded.diagnostics));
  const { mechanism } = buildMechanism(loaded.record);
  if (!mechanism) throw new Error('no mechanism');
  return eyringStepConstants(loaded.record, mechanism);
}

const header = (energy: string) =>
  `title: eyring case\nsystem: eyring\nstatus: proposed\nnotation: labels\n${energy}steps:\n`;

describe('Eyring equation', () => {
  it('k_B T/h at 298.15 K is 6.2124e12 s^-1 and the engine uses the same constants', () => {
    const expected = (K_B * T) / H;
    // 6.21e12 s^-1 at 298 K is the value quoted in physical-chemistry texts (Atkins, from memory).
    expect(expected).toBeCloseTo(6.2124e12, -8);
    expect(relativeError(thermalFrequency(T), expected)).toBeLessThan(1e-15);
  });

  it('ΔG‡ = 80 kJ/mol, unimolecular: k = 0.05996 s^-1', () => {
    const expected = ((K_B * T) / H) * Math.exp(-80_000 / (R * T));
    // Independent arithmetic: RT = 2478.957 J/mol, 80000/RT = 32.2716, e^−32.2716 = 9.6518e-15.
    expect(expected).toBeCloseTo(0.05996, 5);
    expect(relativeError(eyringRateConstant({ barrier: 80_000, T, molecularity: 1 }), expected)).toBeLessThan(1e-13);
  });

  it('reads kcal/mol: 20 kcal/mol is 83.68 kJ/mol (thermochemical calorie, 4.184 J exactly)', () => {
    const { constants } = constantsOf(
      `${header('')}  - { equation: A -> B, energy: { barrier: 20 kcal/mol, change: -5 kcal/mol } }\n`,
    );
    const expected = ((K_B * T) / H) * Math.exp(-83_680 / (R * T));
    expect(expected).toBeCloseTo(0.013588, 6);
    expect(relativeError(constants[0]!.k, expected)).toBeLessThan(1e-12);
  });

  it('bimolecular step: the factor (c°)^(1−n) with c° = 1 M and with 1 bar (c° = p°/RT)', () => {
    const step = '  - { equation: A + B <=> C, energy: { barrier: 60 kJ/mol, change: -20 kJ/mol } }\n';
    const molar = constantsOf(`${header('energy: { standard_state: 1 M }\n')}${step}`).constants[0]!;
    const gas = constantsOf(`${header('energy: { standard_state: 1 bar, T: 298.15 K }\n')}${step}`).constants[0]!;
    const base = ((K_B * T) / H) * Math.exp(-60_000 / (R * T));
    // 1 bar = 1e5 Pa; c° = p°/RT = 40.3395 mol m^-3 = 0.0403395 mol dm^-3.
    const cGas = 1e5 / (R * T) / 1000;
    expect(cGas).toBeCloseTo(0.0403395, 6);
    expect(relativeError(molar.k, base)).toBeLessThan(1e-12); // M^-1 s^-1, factor 1^(−1)
    expect(relativeError(gas.k, base / cGas)).toBeLessThan(1e-12);
    // The reverse (C -> A + B) is unimolecular, so its constant does not depend on c°.
    const reverse = ((K_B * T) / H) * Math.exp(-80_000 / (R * T));
    expect(relativeError(molar.kRev, reverse)).toBeLessThan(1e-12);
    expect(relativeError(gas.kRev, reverse)).toBeLessThan(1e-12);
    // K = k/k_rev = exp(−ΔG°/RT) (c°)^(−1) in M^-1: the thermodynamic constant over c°^Δn.
    expect(relativeError(molar.k! / molar.kRev!, Math.exp(20_000 / (R * T)))).toBeLessThan(1e-12);
    expect(relativeError(gas.k! / gas.kRev!, Math.exp(20_000 / (R * T)) / cGas)).toBeLessThan(1e-12);
  });

  it('uses the record temperature and defaults to 298.15 K', () => {
    const step = '  - { equation: A -> B, energy: { barrier: 70 kJ/mol } }\n';
    const hot = constantsOf(`${header('energy: { T: 350 K }\n')}${step}`);
    const plain = constantsOf(`${header('')}${step}`);
    expect(relativeError(hot.constants[0]!.k, ((K_B * 350) / H) * Math.exp(-70_000 / (R * 350)))).toBeLessThan(1e-12);
    expect(plain.conditions.T).toBe(298.15);
    expect(plain.constants[0]!.kRev).toBeUndefined();
  });

  it('a bad temperature or standard state is a diagnostic, not an exception', () => {
    const { diagnostics, conditions } = constantsOf(
      `${header('energy: { T: 5 kJ/mol, standard_state: 3 s }\n')}  - { equation: A -> B }\n`,
    );
    expect(diagnostics).toMatchObject([
      { rule: 'energy/profile', severity: 'error', path: ['energy', 'T'] },
      { rule: 'energy/profile', severity: 'error', path: ['energy', 'standard_state'] },
    ]);
    expect(conditions).toMatchObject({ T: 298.15, standardConcentration: 1 });
  });
});
