/**
 * The conditions a record's energies refer to (its `energy:` block): the basis, the temperature
 * and the standard concentration. Read in one place so that Eyring constants, the profile and the
 * energetic span all use the same values.
 */
import type { MechanismRecord } from '../../model/index.ts';
import { GAS_CONSTANT } from '../units/physical-constants.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { parseQuantity, toCanonical } from '../units/quantity.ts';
import { CONCENTRATION, PRESSURE, TEMPERATURE, sameDimension } from '../units/units.ts';

import type { EnergyBasis } from '../../model/index.ts';

export type { EnergyBasis };

/** What the energies of a record refer to. */
export interface EnergyConditions {
  basis: EnergyBasis;
  /** temperature / K */
  T: number;
  /** standard concentration c° / M (mol dm^-3) */
  standardConcentration: number;
}

/** 298.15 K: the temperature of thermochemical tables, used when the record gives none. */
export const DEFAULT_TEMPERATURE = 298.15;
/** 1 M: the usual solution standard state, used when the record gives none. */
export const DEFAULT_STANDARD_CONCENTRATION = 1;

/** Reads basis, T and c° from the record; unreadable values give a diagnostic and the default. */
export function energyConditions(record: MechanismRecord): { conditions: EnergyConditions; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const settings = record.energy ?? {};
  const T = readTemperature(settings.T, diagnostics);
  const standardConcentration = readStandardState(settings.standard_state, T, diagnostics);
  return { conditions: { basis: settings.basis ?? 'G', T, standardConcentration }, diagnostics };
}

function readTemperature(text: string | number | undefined, diagnostics: Diagnostic[]): number {
  if (text === undefined) return DEFAULT_TEMPERATURE;
  const path = ['energy', 'T'];
  const parsed = parseQuantity(text);
  if (
    'error' in parsed ||
    !sameDimension(parsed.quantity.unit.dimension, TEMPERATURE) ||
    toCanonical(parsed.quantity) <= 0
  ) {
    const why = 'error' in parsed ? parsed.error : 'it must be a positive temperature in K';
    diagnostics.push(
      diagnostic('energy/profile', 'error', `energy/T: ${why}; ${DEFAULT_TEMPERATURE} K is used`, {
        path,
        actual: text,
      }),
    );
    return DEFAULT_TEMPERATURE;
  }
  return toCanonical(parsed.quantity);
}

// A gas-phase standard state is a pressure; the Eyring factor needs the matching concentration,
// c° = p°/RT (ideal gas). Canonical pressure is J dm^-3, so p°/RT comes out in mol dm^-3 = M.
function readStandardState(text: string | number | undefined, T: number, diagnostics: Diagnostic[]): number {
  if (text === undefined) return DEFAULT_STANDARD_CONCENTRATION;
  const parsed = parseQuantity(text);
  if (!('error' in parsed) && toCanonical(parsed.quantity) > 0) {
    const dimension = parsed.quantity.unit.dimension;
    if (sameDimension(dimension, CONCENTRATION)) return toCanonical(parsed.quantity);
    if (sameDimension(dimension, PRESSURE)) return toCanonical(parsed.quantity) / (GAS_CONSTANT * T);
  }
  const why = 'error' in parsed ? parsed.error : 'it must be a positive concentration (1 M) or pressure (1 bar)';
  diagnostics.push(
    diagnostic('energy/profile', 'error', `energy/standard_state: ${why}; 1 M is used`, {
      path: ['energy', 'standard_state'],
      actual: text,
    }),
  );
  return DEFAULT_STANDARD_CONCENTRATION;
}
