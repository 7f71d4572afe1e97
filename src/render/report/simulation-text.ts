/**
 * A person's view of the full simulations: the rate constants used (given or from Eyring), and
 * for each observation the simulated initial rate and when it was read, the apparent orders by
 * simulation, each rate law's relative error, and why an approximation fails where it does.
 */
import {
  CONVERSION_FOR_INITIAL_RATE,
  DEFAULT_APPROXIMATION_THRESHOLD,
  forwardConstant,
  reverseConstant,
  type Derivation,
  type Mechanism,
} from '../../engine/index.ts';
import { methodLaw, percentText, plainNumber, rateConstantUnit } from '../words/index.ts';

const WIDTH = 100;

/** Renders the simulation checks of a derivation as plain text lines. */
export function simulationLines(derivation: Derivation): string[] {
  const checks = derivation.simulation ?? [];
  const mechanism = derivation.mechanism;
  if (checks.length === 0 || !mechanism) return [];
  const lines = [
    '',
    `Simulation (full mass-action kinetics; the initial rate is extrapolated to zero conversion from readings at 1 to 4 %, and the approximations are compared at ${CONVERSION_FOR_INITIAL_RATE * 100} %):`,
  ];
  lines.push(...wrap(['rate constants:', ...constantList(mechanism, derivation.constants ?? new Map())], '  ', '    '));
  const fromEnergies = derivation.constantsFromEnergies ?? [];
  if (fromEnergies.length > 0)
    lines.push(
      ...wrap(
        words(
          `from the step energies by the Eyring equation: step${fromEnergies.length > 1 ? 's' : ''} ${fromEnergies.join(', ')}`,
        ),
        '  ',
        '    ',
      ),
    );
  checks.forEach((check, index) => {
    lines.push(`  observation ${check.observation}:`);
    if (check.status !== 'ok') {
      lines.push(...wrap(words(check.message ?? check.status), '    ', '      '));
      return;
    }
    lines.push(
      `    initial rate ${plainNumber(check.initialRate!)} M s⁻¹; ${CONVERSION_FOR_INITIAL_RATE * 100} % conversion at t = ${plainNumber(check.time!)} s`,
    );
    const orders = Object.entries(check.orders).map(([sp, o]) => `${sp} ${o.toFixed(3)}`);
    if (orders.length > 0) lines.push(`    orders by simulation: ${orders.join(', ')}`);
    for (const [method, error] of Object.entries(check.approximationError)) {
      const verdict = error > DEFAULT_APPROXIMATION_THRESHOLD ? 'beyond' : 'within';
      lines.push(
        `    ${methodLaw(method)}: off by ${percentText(error)} (${verdict} ${percentText(DEFAULT_APPROXIMATION_THRESHOLD)})`,
      );
    }
    const invalid = derivation.diagnostics.filter(
      (d) => d.rule === 'approximation/invalid' && d.path?.[0] === 'observations' && d.path[1] === index,
    );
    for (const d of invalid) lines.push(...wrap(words(`approximation/invalid: ${d.message}`), '    ', '      '));
  });
  return lines;
}

/** k and k_rev of every step, with units: M^(1−n) s⁻¹ for a step of molecularity n. */
function constantList(mechanism: Mechanism, values: ReadonlyMap<string, number>): string[] {
  const parts: string[] = [];
  for (const step of mechanism.steps) {
    const order = (side: typeof step.reactants) => side.reduce((n, t) => n + t.coefficient.toNumber(), 0);
    const k = values.get(forwardConstant(step.label));
    const kRev = values.get(reverseConstant(step.label));
    parts.push(
      `${forwardConstant(step.label)} = ${k === undefined ? '?' : `${plainNumber(k)} ${rateConstantUnit(order(step.reactants))}`}`,
    );
    if (step.reversible)
      parts.push(
        `${reverseConstant(step.label)} = ${kRev === undefined ? '?' : `${plainNumber(kRev)} ${rateConstantUnit(order(step.products))}`}`,
      );
  }
  return parts.map((p, i) => (i < parts.length - 1 ? `${p};` : p));
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
