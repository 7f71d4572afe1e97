/**
 * The Michaelis–Menten family written as the trade writes it, in its named constants:
 * k_cat[E]_T[S] / (K_M(1 + [I]/K_i) + [S](1 + [I]/K_i') + [S]²/K_si), and the apparent constants
 * under inhibition, K_M^app = K_M(1 + [I]/K_i)/(1 + [I]/K_i') and V_max^app = V_max/(1 + [I]/K_i').
 */
import { Monomial, Polynomial } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import type { EnzymeShape } from './enzyme-shape.ts';
import type { NamedWriter } from './write-normalised.ts';

/** Text and LaTeX of one expression. */
export interface Written {
  text: string;
  latex: string;
}

/** Writes the law and the relations of the apparent constants; `inhibitionName` names K_i (prime: K_i'). */
export function writeTradeForm(
  w: NamedWriter,
  shape: EnzymeShape,
  inhibitionName: (x: string, prime: boolean) => string,
): { law: Written; vmax: Written; kmApparent: Written; vmaxApparent: Written } {
  const { substrate: S, total, competitive, uncompetitive } = shape;
  const plain = (m: Monomial): Written => ({ text: w.text(m), latex: w.latex(m) });
  // 1 + [I]/K_i + …, for the inhibitors of one kind.
  const bracket = (m: ReadonlyMap<string, unknown>, prime: boolean) =>
    Polynomial.sum([
      Polynomial.ONE,
      ...[...m.keys()].map((x) =>
        Polynomial.term(
          Rational.ONE,
          Monomial.fromFactors([
            [x, 1],
            [inhibitionName(x, prime), -1],
          ]),
        ),
      ),
    ]);
  const times = (lead: Written, m: ReadonlyMap<string, unknown>, prime: boolean): Written => {
    if (m.size === 0) return lead;
    const p = bracket(m, prime);
    return { text: `${lead.text}*(${w.text(p)})`, latex: `${lead.latex}\\left(${w.latex(p)}\\right)` };
  };
  const over = (top: Written, m: ReadonlyMap<string, unknown>, prime: boolean): Written => {
    if (m.size === 0) return top;
    const p = bracket(m, prime);
    return { text: `${top.text} / (${w.text(p)})`, latex: `\\frac{${top.latex}}{${w.latex(p)}}` };
  };
  const groups = [
    times(plain(Monomial.of('K_M')), competitive, false),
    times(plain(Monomial.of(S)), uncompetitive, true),
  ];
  if (shape.squared)
    groups.push(
      plain(
        Monomial.fromFactors([
          [S, 2],
          ['K_si', -1],
        ]),
      ),
    );
  const top = plain(
    Monomial.fromFactors([
      ['k_cat', 1],
      [total, 1],
      [S, 1],
    ]),
  );
  return {
    law: {
      text: `${top.text} / (${groups.map((g) => g.text).join(' + ')})`,
      latex: `\\frac{${top.latex}}{${groups.map((g) => g.latex).join(' + ')}}`,
    },
    vmax: plain(
      Monomial.fromFactors([
        ['k_cat', 1],
        [total, 1],
      ]),
    ),
    kmApparent: over(times(plain(Monomial.of('K_M')), competitive, false), uncompetitive, true),
    vmaxApparent: over(plain(Monomial.of('V_max')), uncompetitive, true),
  };
}
