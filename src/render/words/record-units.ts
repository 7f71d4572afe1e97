/**
 * Values in the units a record itself writes. The engine computes in canonical units (mol dm⁻³,
 * s); a page shows a value in the concentration unit the record's observations use (a gas-phase
 * record in molecule cm⁻³ stays in molecule cm⁻³), converting only to put a number back into the
 * record's own unit, never into one the record did not use.
 */
import { CONCENTRATION, parseQuantity, sameDimension, toCanonical } from '../../engine/index.ts';
import { numberText, superscript } from './numbers.ts';

/** A concentration unit as written in a record, and its size in mol dm⁻³ (M). */
export interface RecordUnit {
  /** as the record writes it, e.g. `molecule cm^-3` */
  text: string;
  /** typeset: `molecule cm⁻³` */
  display: string;
  /** one of this unit in M */
  molar: number;
}

/** A unit as typeset: carets become superscripts (`cm^-3` → `cm⁻³`, `s^(-1)` → `s⁻¹`), hyphen-minus a true minus. */
export function unitText(unit: string): string {
  return unit.replace(/\^\(?([+-]?\d+)\)?/g, (_, e: string) => superscript(e)).trim();
}

/** The concentration unit of a quantity as written (`2.0e17 molecule cm^-3`), or undefined if it is not a concentration. */
export function concentrationUnitOf(quantity: string): RecordUnit | undefined {
  const parsed = parseQuantity(quantity);
  if ('error' in parsed) return undefined;
  const { unit } = parsed.quantity;
  const one = toCanonical({ value: 1, unit });
  if (!unit.text.trim() || !(one > 0)) return undefined;
  if (!sameDimension(unit.dimension, CONCENTRATION)) return undefined;
  return { text: unit.text.trim(), display: unitText(unit.text), molar: one };
}

/** The first concentration unit the record's observations write, or M when they write none. */
export function recordConcentrationUnit(quantities: readonly string[]): RecordUnit {
  for (const q of quantities) {
    const unit = concentrationUnitOf(q);
    if (unit) return unit;
  }
  return { text: 'M', display: 'M', molar: 1 };
}

/** A value held in M (or M s⁻¹) shown in the record's unit: `2.4 × 10¹⁴`. */
export function inRecordUnit(valueInMolar: number, unit: RecordUnit): string {
  return numberText(valueInMolar / unit.molar);
}
