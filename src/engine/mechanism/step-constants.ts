/**
 * Units of the constants a step gives: k of a step of molecularity n has dimension
 * concentration^(1−n) time^−1; k_rev the same for the reverse molecularity; K, concentration
 * to the power (particles formed − particles consumed).
 */
import type { MechanismRecord } from '../../model/index.ts';
import { diagnostic, pathWords, type Diagnostic } from '../../model/index.ts';
import type { Mechanism, Step } from './mechanism.ts';
import { molecularity } from './molecularity.ts';
import { parseQuantity, toCanonical, type Quantity } from '../units/quantity.ts';
import {
  CONCENTRATION,
  formatDimension,
  powerDimension,
  rateConstantDimension,
  sameDimension,
  type Dimension,
} from '../units/units.ts';
import { Rational } from '../exact/rational.ts';

/** The constants of one step in canonical units (M and s), where given and readable. */
export interface StepConstants {
  k?: number;
  kRev?: number;
  K?: number;
}

/** Reads and checks k, k_rev and K of every step; returns canonical values by step index. */
export function readStepConstants(
  record: MechanismRecord,
  mechanism: Mechanism,
): { constants: StepConstants[]; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const constants = mechanism.steps.map((step) => {
    const entry = record.steps[step.index]!;
    const forward = molecularity(step.reactants);
    const reverse = molecularity(step.products);
    const out: StepConstants = {};
    const read = (field: 'k' | 'k_rev' | 'K', expected: Dimension, what: string) => {
      const text = entry[field];
      if (text === undefined) return undefined;
      const q = checkedQuantity(text, expected, what, ['steps', step.index, field], field === 'K', diagnostics);
      return q && toCanonical(q);
    };
    const k = read('k', rateConstantDimension(forward), `a rate constant of a step of molecularity ${forward}`);
    if (k !== undefined) out.k = k;
    if (!step.reversible && (entry.k_rev !== undefined || entry.K !== undefined)) {
      diagnostics.push(oneWay(step, entry.k_rev !== undefined ? 'k_rev' : 'K'));
      return out;
    }
    const kRev = read('k_rev', rateConstantDimension(reverse), `a reverse rate constant of molecularity ${reverse}`);
    if (kRev !== undefined) out.kRev = kRev;
    const K = read(
      'K',
      powerDimension(CONCENTRATION, Rational.of(reverse - forward)),
      'the equilibrium constant of this step',
    );
    if (K !== undefined) out.K = K;
    if (
      out.k !== undefined &&
      out.kRev !== undefined &&
      out.K !== undefined &&
      Math.abs(out.k / out.kRev / out.K - 1) > 0.01
    ) {
      diagnostics.push(
        diagnostic(
          'step/units',
          'warning',
          `K differs from k/k_rev by more than 1 % (${out.K.toPrecision(3)} against ${(out.k / out.kRev).toPrecision(3)})`,
          {
            path: ['steps', step.index, 'K'],
          },
        ),
      );
    }
    return out;
  });
  return { constants, diagnostics };
}

function checkedQuantity(
  text: string | number,
  expected: Dimension,
  what: string,
  path: (string | number)[],
  bareNumberAllowed: boolean,
  diagnostics: Diagnostic[],
): Quantity | undefined {
  const parsed = parseQuantity(text);
  const field = pathWords(path);
  if ('error' in parsed) {
    diagnostics.push(diagnostic('step/units', 'error', `${field}: ${parsed.error}`, { path }));
    return undefined;
  }
  const q = parsed.quantity;
  if (!(q.value > 0)) {
    const message = `${field} is ${q.value === 0 ? 'zero' : 'negative'}; ${what} must be positive`;
    diagnostics.push(diagnostic('constants/negative', 'error', message, { path, actual: text }));
    return undefined;
  }
  if (q.unit.text === '' && bareNumberAllowed) {
    // A bare equilibrium constant is read against the 1 M standard state, as tables usually give it.
    return q;
  }
  if (!sameDimension(q.unit.dimension, expected)) {
    const wanted = formatDimension(expected);
    diagnostics.push(
      diagnostic(
        'step/units',
        'error',
        q.unit.text === ''
          ? `${field} must have a unit: ${what} is in ${wanted}`
          : `${field} is in ${q.unit.text}, but ${what} must be in ${wanted}`,
        {
          path,
          actual: q.unit.text,
          expected: wanted,
        },
      ),
    );
    return undefined;
  }
  return q;
}

function oneWay(step: Step, field: string): Diagnostic {
  return diagnostic(
    'step/units',
    'error',
    `step ${step.label} is one-way (->), so ${field} has no meaning; write <=> for a reversible step`,
    {
      path: ['steps', step.index, field],
    },
  );
}
