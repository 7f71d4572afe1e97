/**
 * Apparent constants: the grouped coefficients a kineticist reads off a rate law (k_obs, the K of
 * a denominator term, k_cat, K_M …), each with its definition in the elementary constants, its
 * unit and, where every constant of the definition is given, its value. Units are those of the
 * engine's canonical values (M and s); a rate is in M s⁻¹, so a coefficient's unit follows from
 * the concentrations it multiplies.
 */
import type { RationalFunction } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import type { Formatter } from './formatter.ts';

/** A unit M^concentration s^time. */
export interface UnitPowers {
  concentration: Rational;
  time: Rational;
}

/** One named apparent constant of a normalised law. */
export interface ApparentConstant {
  /** plain-text name: k_obs, K_CO, k_cat, K_M, K_i, K_i', V_max … */
  name: string;
  latex: string;
  /** what it is, in the trade's words */
  meaning: string;
  /** the definition, in elementary constants (and concentrations, for V_max and apparent constants) */
  definition: RationalFunction;
  definitionText: string;
  definitionLatex: string;
  /** the same in the other named constants, where that reads better: K_M^app = K_M(1 + [I]/K_i) */
  relationText?: string;
  relationLatex?: string;
  unit: UnitPowers;
  unitText: string;
  unitLatex: string;
  /** the value in canonical units where every symbol of the definition has one */
  value?: number;
}

/** The unit of a coefficient that multiplies concentrations of total degree `degree` in a rate (M s⁻¹). */
export function rateCoefficientUnit(degree: Rational): UnitPowers {
  return { concentration: Rational.ONE.sub(degree), time: Rational.of(-1) };
}

/** The unit of a K whose term K^power × (concentrations of degree `degree`) is dimensionless. */
export function bindingConstantUnit(degree: Rational, power: Rational = Rational.ONE): UnitPowers {
  return { concentration: degree.neg().div(power), time: Rational.ZERO };
}

/** Builds an apparent constant with its written forms, unit and (where the values allow) value. */
export function apparentConstant(
  spec: {
    name: string;
    latex: string;
    meaning: string;
    definition: RationalFunction;
    unit: UnitPowers;
    relation?: { text: string; latex: string };
  },
  fmt: Formatter,
  values?: ReadonlyMap<string, number>,
): ApparentConstant {
  const { relation, ...rest } = spec;
  const out: ApparentConstant = {
    ...rest,
    ...(relation && { relationText: relation.text, relationLatex: relation.latex }),
    definitionText: fmt.text(spec.definition),
    definitionLatex: fmt.latex(spec.definition),
    unitText: unitText(spec.unit),
    unitLatex: unitLatex(spec.unit),
  };
  const value = values && valueOf(spec.definition, values);
  if (value !== undefined) out.value = value;
  return out;
}

/** The numeric value of a definition where every symbol has a value and the result is finite. */
export function valueOf(definition: RationalFunction, values: ReadonlyMap<string, number>): number | undefined {
  if (!definition.symbols().every((s) => values.has(s))) return undefined;
  const v = definition.evaluate(values);
  return Number.isFinite(v) ? v : undefined;
}

/** `M^-1 s^-1`, `s^-1`, `M`, `M^(-1/2)`; empty for a dimensionless constant. */
export function unitText(unit: UnitPowers): string {
  const part = (symbol: string, e: Rational) =>
    e.isZero() ? '' : e.equals(Rational.ONE) ? symbol : e.isInteger() ? `${symbol}^${e}` : `${symbol}^(${e})`;
  return [part('M', unit.concentration), part('s', unit.time)].filter(Boolean).join(' ');
}

/** The unit in LaTeX, upright: `\mathrm{M^{-1}\,s^{-1}}`; empty for a dimensionless constant. */
export function unitLatex(unit: UnitPowers): string {
  const part = (symbol: string, e: Rational) =>
    e.isZero() ? '' : e.equals(Rational.ONE) ? symbol : `${symbol}^{${e}}`;
  const parts = [part('M', unit.concentration), part('s', unit.time)].filter(Boolean);
  return parts.length === 0 ? '' : `\\mathrm{${parts.join('\\,')}}`;
}

/** The unit of a product of apparent constants raised to powers (for k_cat = k_obs / K_S, say). */
export function unitProduct(...factors: [UnitPowers, number][]): UnitPowers {
  return factors.reduce(
    (u, [f, p]) => ({
      concentration: u.concentration.add(f.concentration.mul(Rational.of(p))),
      time: u.time.add(f.time.mul(Rational.of(p))),
    }),
    { concentration: Rational.ZERO, time: Rational.ZERO },
  );
}
