/**
 * The energetic span model (S. Kozuch & S. Shaik, Acc. Chem. Res. 2011, 44, 101; J. Phys. Chem. A
 * 2008, 112, 6032 — formulas from memory) checked against an independent route: the EXACT
 * steady-state rate law of the same cycle, derived symbolically by our rate-law engine
 * (King–Altman / Cramer) and evaluated numerically.
 *
 * Both sides must describe the same physical situation. The energetic span TOF is the steady
 * turnover of the cycle with every species that enters or leaves it at its standard-state
 * concentration (the reactants' 1 M is folded into the Gibbs energies of the states) and every step
 * reversible, the reverse at the rate the same profile gives (ΔG_rev‡ = ΔG‡ − ΔG); its numerator
 * e^{−ΔG_r/RT} − 1 is that reverse flux at 1 M of product. So the records below make every step
 * reversible, take k and k_-1 from the Eyring equation at c° = 1 M, and the rate law is evaluated
 * at [A] = [B] = [P] = 1 M; rate/[Cat]_T is then the turnover frequency, and the two must agree
 * to rounding.
 */
import { describe, expect, it } from 'vitest';
import { deriveMechanism } from '../../src/engine/derive.ts';
import { energeticSpan } from '../../src/engine/energy/energetic-span.ts';
import { energyAnalysis } from '../../src/engine/energy/energy-analysis.ts';
import { loadRecordSource } from '../../src/records/index.ts';

// CODATA 2018 exact constants, stated here so the check does not lean on the engine's.
const K_B = 1.380649e-23;
const H = 6.62607015e-34;
const R = 6.02214076e23 * K_B;
const T = 298.15;
const RT = R * T;
const eyring = (barrierKJ: number) => ((K_B * T) / H) * Math.exp((-barrierKJ * 1000) / RT);

interface CycleStep {
  equation: string;
  label: string;
  barrier: number; // kJ/mol
  change: number; // kJ/mol
  /** particles on each side, for the units of k and K */
  n: [number, number];
  rds?: boolean;
}

/** A record whose steps carry energies and the Eyring constants that follow from them. */
function cycleRecord(steps: CycleStep[], approximation = 'steady_state', reversibleLast = true): string {
  const lines = steps.map((s, i) => {
    const kf = eyring(s.barrier);
    const kr = eyring(s.barrier - s.change);
    const reversible = reversibleLast || i < steps.length - 1;
    const equation = reversible ? s.equation : s.equation.replace('<=>', '->');
    const K = reversible ? `, K: ${kf / kr} ${unit(s.n[1] - s.n[0], 'M')}` : '';
    return `  - { equation: ${equation}, label: ${s.label}${s.rds ? ', rds: true' : ''}, k: ${kf} ${unit(1 - s.n[0], 'M')}s^-1${K}, energy: { barrier: ${s.barrier} kJ/mol, change: ${s.change} kJ/mol } }`;
  });
  return `title: energetic span cross-check\nsystem: span-check\nstatus: proposed\nnotation: labels\nspecies:\n  Cat: { role: catalyst }\nsteps:\n${lines.join('\n')}\napproximation: ${approximation}\nenergy: { basis: G, standard_state: 1 M, T: 298.15 K }\n`;
}

function unit(power: number, base: string): string {
  return power === 0 ? '' : `${base}${power === 1 ? '' : `^${power}`} `;
}

function analyse(yaml: string) {
  const loaded = loadRecordSource('span.yaml', yaml);
  if (!loaded.record) throw new Error(JSON.stringify(loaded.diagnostics));
  const derivation = deriveMechanism(loaded.record);
  return { derivation, ...energyAnalysis(loaded.record, derivation.mechanism!, derivation.route!) };
}

/** rate/[Cat]_T of the exact steady-state law at 1 M of every reactant and product. */
function steadyStateTurnover(
  steps: CycleStep[],
  derivation: ReturnType<typeof deriveMechanism>,
  reversibleLast = true,
): number {
  const law = derivation.rateLaws?.find((l) => l.law.method === 'steady_state')?.law.expression;
  if (!law) throw new Error(`no steady-state law: ${JSON.stringify(derivation.diagnostics)}`);
  const values = new Map<string, number>([['[Cat]_T', 1]]);
  for (const [i, s] of steps.entries()) {
    values.set(`k_${s.label}`, eyring(s.barrier));
    values.set(`k_-${s.label}`, reversibleLast || i < steps.length - 1 ? eyring(s.barrier - s.change) : 0);
  }
  for (const symbol of law.symbols()) if (/^\[[^\]]+\]$/.test(symbol)) values.set(symbol, 1);
  return law.evaluate(values);
}

describe('energetic span against the exact steady state', () => {
  it('(a) TDTS after the TDI: the demo KX-7 cycle made fully reversible', () => {
    const steps: CycleStep[] = [
      { equation: 'Cat + A <=> CatA', label: 'bind', barrier: 45, change: -6, n: [2, 1] },
      { equation: 'CatA + B <=> Cat + P', label: 'ar', barrier: 80, change: -50, n: [2, 2], rds: true },
    ];
    const { energy, derivation, diagnostics } = analyse(cycleRecord(steps));
    // States by hand: 0, TS 45, −6, TS 74, −56; the largest span is TS(ar) − CatA = 74 − (−6) = 80,
    // with the TS after the intermediate, so no ΔG_r is added.
    expect(energy).toMatchObject({ kind: 'cycle', span: 80, tdts_step: 'ar', tdts_state: 2, tdi_state: 1 });
    expect(diagnostics.filter((d) => d.rule.startsWith('energy/'))).toEqual([]);
    const exact = steadyStateTurnover(steps, derivation);
    expect(Math.abs(energy!.tof_per_s! / exact - 1)).toBeLessThan(1e-9);
    // The span alone: (k_B T/h) e^{−80 kJ/mol / RT} = 0.05996 s^-1 (tests/reference/eyring.test.ts).
    expect(energy!.tof_span_per_s).toBeCloseTo(eyring(80), 12);
    // The span alone overestimates by the next term, TS(ar) over the start state (74 − 0 = 74 kJ/mol,
    // 6 kJ/mol below the span): TOF ≈ e^{−δE/RT}(k_B T/h) / (1 + e^{−6 kJ/mol / RT}) = 0.918 × that.
    // The remaining terms are below e^{−35 kJ/mol / RT} ≈ 1e-6 of the leading one.
    expect(Math.abs(exact / (eyring(80) / (1 + Math.exp(-6000 / RT))) - 1)).toBeLessThan(1e-5);
  });

  it('(b) TDTS before the TDI: a deep late intermediate, so the span wraps into the next turnover', () => {
    const steps: CycleStep[] = [
      { equation: 'Cat + A <=> X', label: 'add', barrier: 70, change: -40, n: [2, 1] },
      { equation: 'X <=> Y', label: 'shift', barrier: 60, change: -20, n: [1, 1] },
      { equation: 'Y + B <=> Cat + P', label: 'out', barrier: 50, change: 30, n: [2, 2], rds: true },
    ];
    const { energy, derivation, diagnostics } = analyse(cycleRecord(steps));
    // States by hand: 0, TS 70, −40, TS 20, −60, TS −10, −30 (ΔG_r = −30). Spans:
    // TS(add) − Y + ΔG_r = 70 + 60 − 30 = 100 beats every TS-after-intermediate pair (≤ 70).
    expect(energy).toMatchObject({
      kind: 'cycle',
      span: 100,
      tdts_step: 'add',
      tdts_state: 1,
      tdi_state: 2,
      overall_change: -30,
    });
    const exact = steadyStateTurnover(steps, derivation);
    expect(Math.abs(energy!.tof_per_s! / exact - 1)).toBeLessThan(1e-9);
    expect(energy!.tof_span_per_s).toBeCloseTo(eyring(100), 20);
    // The declared rds (the step out of the deepest intermediate) is not where the span points.
    expect(diagnostics).toMatchObject([
      { rule: 'energy/rds-span', severity: 'warning', path: ['steps', 2, 'rds'], actual: 'out', expected: 'add' },
    ]);
    // Degree of TOF control: the TDTS and TDI dominate, and each set sums to 1.
    const x = energy!.control!;
    expect(x.transition_states.reduce((a, t) => a + t.x_tof, 0)).toBeCloseTo(1, 12);
    expect(x.intermediates.reduce((a, t) => a + t.x_tof, 0)).toBeCloseTo(1, 12);
    expect(x.transition_states[0]!.x_tof).toBeGreaterThan(0.99);
    expect(x.intermediates[2]!.x_tof).toBeGreaterThan(0.99);
  });

  it('(c) a sequence passed once is the cycle with product release irreversible', () => {
    // For a one-way sequence the model keeps only the pairs with the TS after the intermediate
    // (the cycle with ΔG_r → −∞). That is the steady state of the same steps closed into a cycle
    // whose last step cannot run back: the material, distributed over the minima, is the "carrier".
    const steps: CycleStep[] = [
      { equation: 'Cat <=> X', label: 'a', barrier: 60, change: -15, n: [1, 1] },
      { equation: 'X <=> Cat + P', label: 'b', barrier: 75, change: -30, n: [1, 2] },
    ];
    const { derivation } = analyse(cycleRecord(steps, 'steady_state', false));
    const exact = steadyStateTurnover(steps, derivation, false);
    const span = energeticSpan({ minima: [0, -15_000, -45_000], transitions: [60_000, 60_000], T, kind: 'sequence' });
    expect(Math.abs(span!.tof / exact - 1)).toBeLessThan(1e-9);
    // δE = TS(b) − X = 60 − (−15) = 75 kJ/mol: the barrier of step b from its own start.
    expect(span).toMatchObject({ tdts: 2, tdi: 1 });
    expect(span!.span).toBeCloseTo(75_000, 6);
  });

  it('the full TOF changes sign for an endergonic turnover and vanishes for a thermoneutral one', () => {
    const base = { transitions: [50_000], T, kind: 'cycle' as const };
    expect(energeticSpan({ ...base, minima: [0, 10_000] })!.tof).toBeLessThan(0);
    expect(energeticSpan({ ...base, minima: [0, 0] })!.tof).toBe(0);
    // A single step: TOF = k_f − k_r = (k_B T/h)(e^{−50/RT} − e^{−(50+20)/RT}) for ΔG_r = −20 kJ/mol.
    const one = energeticSpan({ ...base, minima: [0, -20_000] })!;
    expect(Math.abs(one.tof / (eyring(50) - eyring(70)) - 1)).toBeLessThan(1e-12);
  });
});
