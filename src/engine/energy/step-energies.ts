/**
 * Reads each step's `energy: {barrier, change}` into J/mol. Both are measured from the step's own
 * starting state (DESIGN.md item 8), so a profile is built by adding them up along the route.
 */
import type { MechanismRecord } from '../../model/index.ts';
import { diagnostic, pathWords, type Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { parseQuantity, toCanonical } from '../units/quantity.ts';
import { MOLAR_ENERGY, sameDimension } from '../units/units.ts';

/** One step's energies in J/mol; a field is absent where not recorded or not readable. */
export interface StepEnergyValues {
  barrier?: number;
  change?: number;
}

/** J/mol in one kJ/mol: bare numbers are read in kJ/mol, the unit most profiles are quoted in. */
const KJ_PER_MOL = 1000;

/** The recorded energies of every step, by step index, with unit diagnostics. */
export function readStepEnergies(
  record: MechanismRecord,
  mechanism: Mechanism,
): { energies: StepEnergyValues[]; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const energies = mechanism.steps.map((step) => {
    const entry = record.steps[step.index]?.energy;
    const out: StepEnergyValues = {};
    for (const field of ['barrier', 'change'] as const) {
      const text = entry?.[field];
      if (text === undefined) continue;
      const value = readEnergy(text, ['steps', step.index, 'energy', field], diagnostics);
      if (value !== undefined) out[field] = value;
    }
    return out;
  });
  return { energies, diagnostics };
}

function readEnergy(text: string | number, path: (string | number)[], diagnostics: Diagnostic[]): number | undefined {
  const parsed = parseQuantity(text);
  const field = pathWords(path);
  if ('error' in parsed) {
    diagnostics.push(diagnostic('energy/profile', 'error', `${field}: ${parsed.error}`, { path, actual: text }));
    return undefined;
  }
  const q = parsed.quantity;
  if (q.unit.text === '') {
    diagnostics.push(
      diagnostic('energy/profile', 'warning', `${field} has no unit; it is read as kJ/mol`, {
        path,
        actual: text,
        note: `write ${q.value} kJ/mol (or kcal/mol, eV)`,
      }),
    );
    return q.value * KJ_PER_MOL;
  }
  if (!sameDimension(q.unit.dimension, MOLAR_ENERGY)) {
    diagnostics.push(
      diagnostic(
        'energy/profile',
        'error',
        `${field} must be a molar energy such as kJ/mol, kcal/mol or eV, not '${q.unit.text}'`,
        { path, actual: text },
      ),
    );
    return undefined;
  }
  return toCanonical(q);
}
