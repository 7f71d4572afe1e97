/**
 * The Michaelis–Menten family in the trade's constants (enzyme-shape.ts finds the shape): for
 * k_obs[E]_T[S] / (1 + K_S[S] + …), k_cat = k_obs/K_S, K_M = 1/K_S, k_cat/K_M = k_obs and
 * V_max = k_cat[E]_T; an [I] term gives the competitive K_i = 1/K_I, an [S][I] term the
 * uncompetitive K_i' = K_S/K_S,I, an [S]² term the substrate-inhibition K_si; with an inhibitor,
 * the apparent K_M and V_max at its concentration. Each is defined in the elementary constants.
 */
import { Polynomial, RationalFunction } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import { apparentConstant, type ApparentConstant, type UnitPowers } from './apparent-constant.ts';
import { enzymeShape, shapeName } from './enzyme-shape.ts';
import type { Formatter } from './formatter.ts';
import type { NormalisedLaw, TradeForm } from './normalised-law.ts';
import { reversibleEnzymeForm } from './reversible-enzyme.ts';
import { namedWriter } from './write-normalised.ts';
import { writeTradeForm } from './write-trade-form.ts';

const unit = (concentration: number, time: number): UnitPowers => ({
  concentration: Rational.of(concentration),
  time: Rational.of(time),
});

/** The trade's form of a Michaelis–Menten-shaped normalised law (one-way or reversible), or undefined for any other shape. */
export function enzymeForm(
  law: NormalisedLaw,
  fmt: Formatter,
  values?: ReadonlyMap<string, number>,
): TradeForm | undefined {
  const shape = enzymeShape(law);
  if (!shape) return reversibleEnzymeForm(law, fmt, values);
  const { numerator: a, constant: zero, saturating, squared, competitive, uncompetitive } = shape;
  // Each constant is one quotient of two coefficient polynomials: one cancellation each.
  const q = (top: Polynomial, below: Polynomial) => RationalFunction.of(top, below);
  const T = Polynomial.symbol(shape.total);
  const modifiers = [...new Set([...competitive.keys(), ...uncompetitive.keys()])];
  const species = (s: string) => s.slice(1, -1);
  const iName = (x: string, prime: boolean) =>
    `K_i${prime ? "'" : ''}${modifiers.length === 1 ? '' : `,${species(x)}`}`;
  const iLatex = (x: string, prime: boolean) =>
    `${modifiers.length === 1 ? 'K_\\mathrm{i}' : `K_{\\mathrm{i},${fmt.style.latex(x).slice(1, -1)}}`}${prime ? "'" : ''}`;
  const names = [
    ['k_cat', 'k_\\mathrm{cat}'],
    ['K_M', 'K_\\mathrm{M}'],
    ['V_max', 'V_\\mathrm{max}'],
    ...modifiers.flatMap((x) => [false, true].map((p) => [iName(x, p), iLatex(x, p)])),
    ['K_si', 'K_\\mathrm{si}'],
  ].map(([name, latex]) => ({ name: name!, latex: latex! }));
  const written = writeTradeForm(namedWriter(fmt, names), shape, iName);
  const at = modifiers.map(species).join(', ');
  const weigh = (m: Map<string, Polynomial>) => Polynomial.sum([...m].map(([x, c]) => c.mul(Polynomial.symbol(x))));
  const below = saturating.add(weigh(uncompetitive));
  const specs = [
    spec('k_cat', 'turnover number', q(a, saturating), unit(0, -1)),
    spec('K_M', 'Michaelis constant', q(zero, saturating), unit(1, 0)),
    spec('k_cat/K_M', 'specificity constant', q(a, zero), unit(-1, -1), 'k_\\mathrm{cat}/K_\\mathrm{M}'),
    spec(
      'V_max',
      'limiting rate, at saturating substrate',
      q(a.mul(T), saturating),
      unit(1, -1),
      undefined,
      written.vmax,
    ),
    ...[...competitive].map(([x, c]) =>
      spec(
        iName(x, false),
        `competitive inhibition constant of ${species(x)}`,
        q(zero, c),
        unit(1, 0),
        iLatex(x, false),
      ),
    ),
    ...[...uncompetitive].map(([x, c]) =>
      spec(
        iName(x, true),
        `uncompetitive inhibition constant of ${species(x)}`,
        q(saturating, c),
        unit(1, 0),
        iLatex(x, true),
      ),
    ),
    ...(squared ? [spec('K_si', 'substrate inhibition constant', q(saturating, squared), unit(1, 0))] : []),
    ...(modifiers.length > 0 && !squared
      ? [
          spec(
            'K_M^app',
            `apparent Michaelis constant at the given ${at}`,
            q(zero.add(weigh(competitive)), below),
            unit(1, 0),
            undefined,
            written.kmApparent,
          ),
          spec(
            'V_max^app',
            `apparent limiting rate at the given ${at}`,
            q(a.mul(T), below),
            unit(1, -1),
            undefined,
            written.vmaxApparent,
          ),
        ]
      : []),
  ];
  const constants = specs.map((s) => apparentConstant(s, fmt, values));
  const same = (x: string) => zero.mul(uncompetitive.get(x)!).equals(saturating.mul(competitive.get(x)!));
  return {
    shape: shapeName(shape, same),
    substrate: species(shape.substrate),
    inhibitors: modifiers.map(species),
    ...written.law,
    constants,
  };
}

const LATEX: Readonly<Record<string, string>> = {
  k_cat: 'k_\\mathrm{cat}',
  K_M: 'K_\\mathrm{M}',
  V_max: 'V_\\mathrm{max}',
  K_si: 'K_\\mathrm{si}',
  'K_M^app': 'K_\\mathrm{M}^\\mathrm{app}',
  'V_max^app': 'V_\\mathrm{max}^\\mathrm{app}',
};

function spec(
  name: string,
  meaning: string,
  definition: RationalFunction,
  unitPowers: UnitPowers,
  latex = LATEX[name]!,
  relation?: { text: string; latex: string },
) {
  return { name, latex, meaning, definition, unit: unitPowers, ...(relation && { relation }) };
}
