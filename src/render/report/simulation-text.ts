/**
 * A person's view of the full simulations: the rate constants used (given or from Eyring), and
 * for each observation the simulated initial rate and when it was read, the apparent orders by
 * simulation, each rate law's relative error, and why an approximation fails where it does.
 */
import { simulationConstants, type Derivation } from '../../engine/derive.ts';
import type { Mechanism } from '../../engine/mechanism/mechanism.ts';
import { forwardConstant, reverseConstant } from '../../engine/rate-law/symbols.ts';
import { DEFAULT_APPROXIMATION_THRESHOLD } from '../../engine/simulation/approximation-validity.ts';
import { CONVERSION_FOR_INITIAL_RATE } from '../../engine/simulation/initial-rate.ts';
import type { MechanismRecord } from '../../model/mechanism-record.ts';

const WIDTH = 100;
const LAW_NAME = { rds: 'rate-determining-step law', steady_state: 'steady-state law' } as const;
const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '1': '¹', '2': '²', '3': '³', '4': '⁴' };

/** Renders the simulation checks of a derivation as plain text lines. */
export function simulationLines(record: MechanismRecord, derivation: Derivation): string[] {
  const checks = derivation.simulation ?? [];
  const mechanism = derivation.mechanism;
  if (checks.length === 0 || !mechanism) return [];
  const lines = ['', `Simulation (full mass-action kinetics; the initial rate is read at ${CONVERSION_FOR_INITIAL_RATE * 100} % conversion):`];
  lines.push(...wrap(['rate constants:', ...constantList(record, mechanism)], '  ', '    '));
  const fromEnergies = derivation.constantsFromEnergies ?? [];
  if (fromEnergies.length > 0) lines.push(...wrap(words(`from the step energies by the Eyring equation: step${fromEnergies.length > 1 ? 's' : ''} ${fromEnergies.join(', ')}`), '  ', '    '));
  checks.forEach((check, index) => {
    lines.push(`  observation ${check.observation}:`);
    if (check.status !== 'ok') {
      lines.push(...wrap(words(check.message ?? check.status), '    ', '      '));
      return;
    }
    lines.push(`    initial rate ${formatNumber(check.initialRate!)} M s⁻¹, read at t = ${formatNumber(check.time!)} s`);
    const orders = Object.entries(check.orders).map(([sp, o]) => `${sp} ${o.toFixed(3)}`);
    if (orders.length > 0) lines.push(`    orders by simulation: ${orders.join(', ')}`);
    for (const [method, error] of Object.entries(check.approximationError)) {
      const verdict = error > DEFAULT_APPROXIMATION_THRESHOLD ? 'beyond' : 'within';
      lines.push(`    ${LAW_NAME[method as keyof typeof LAW_NAME]}: off by ${percent(error)} (${verdict} ${percent(DEFAULT_APPROXIMATION_THRESHOLD)})`);
    }
    const invalid = derivation.diagnostics.filter((d) => d.rule === 'approximation/invalid' && d.path?.[0] === 'observations' && d.path[1] === index);
    for (const d of invalid) lines.push(...wrap(words(`approximation/invalid: ${d.message}`), '    ', '      '));
  });
  return lines;
}

/** k and k_rev of every step, with units: M^(1−n) s⁻¹ for a step of molecularity n. */
function constantList(record: MechanismRecord, mechanism: Mechanism): string[] {
  const values = simulationConstants(record, mechanism);
  const parts: string[] = [];
  for (const step of mechanism.steps) {
    const order = (side: typeof step.reactants) => side.reduce((n, t) => n + t.coefficient.toNumber(), 0);
    const k = values.get(forwardConstant(step.label));
    const kRev = values.get(reverseConstant(step.label));
    parts.push(`${forwardConstant(step.label)} = ${k === undefined ? '?' : `${formatNumber(k)} ${rateUnit(order(step.reactants))}`}`);
    if (step.reversible) parts.push(`${reverseConstant(step.label)} = ${kRev === undefined ? '?' : `${formatNumber(kRev)} ${rateUnit(order(step.products))}`}`);
  }
  return parts.map((p, i) => (i < parts.length - 1 ? `${p};` : p));
}

/** M^(1−n) s⁻¹ written with superscripts: s⁻¹, M⁻¹ s⁻¹, M s⁻¹. */
export function rateUnit(molecularity: number): string {
  const power = 1 - molecularity;
  if (power === 0) return 's⁻¹';
  const exponent = power === 1 ? '' : String(power).replace(/[-0-9]/g, (d) => SUPERSCRIPT[d] ?? d);
  return `M${exponent} s⁻¹`;
}

/** Three significant figures; exponent form outside 0.001–10 000 (`1.23e-5`). */
export function formatNumber(x: number): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  if (Math.abs(x) >= 1e-3 && Math.abs(x) < 1e4) return String(Number(x.toPrecision(3)));
  const [mantissa, exponent] = x.toExponential(2).split('e');
  return `${Number(mantissa)}e${Number(exponent)}`;
}

function percent(x: number): string {
  const p = x * 100;
  if (p < 0.01) return '< 0.01 %';
  return `${p < 1 ? p.toFixed(2) : p < 10 ? p.toFixed(1) : p.toFixed(0)} %`;
}

function words(text: string): string[] {
  return text.split(' ');
}

/** Pieces joined by spaces and wrapped to the terminal width, breaking only between pieces. */
function wrap(pieces: readonly string[], first: string, rest: string): string[] {
  const lines: string[] = [];
  let line = first;
  for (const piece of pieces) {
    const fresh = line.trim().length === 0;
    if (!fresh && line.length + 1 + piece.length > WIDTH) {
      lines.push(line);
      line = rest + piece;
    } else {
      line = fresh ? line + piece : `${line} ${piece}`;
    }
  }
  lines.push(line);
  return lines;
}
