/**
 * The reversible Michaelis–Menten law in the trade's constants: a law
 * (k_f[E]_T[S] − k_r[E]_T[P]) / (1 + K_S[S] + K_P[P]) reads
 * (V_f[S]/K_M,S − V_r[P]/K_M,P) / (1 + [S]/K_M,S + [P]/K_M,P), with K_M,S = 1/K_S, K_M,P = 1/K_P,
 * V_f = k_cat,f[E]_T (k_cat,f = k_f/K_S) and V_r likewise; the Haldane relationship gives the
 * equilibrium constant K_eq = V_f K_M,P / (V_r K_M,S) = k_f/k_r. The product term below is the
 * product's inhibition of the forward rate.
 */
import { Monomial, Polynomial, RationalFunction } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import { apparentConstant, type UnitPowers } from './apparent-constant.ts';
import type { Formatter } from './formatter.ts';
import type { NormalisedLaw, TradeForm } from './normalised-law.ts';
import { symbolMeaning } from './symbols.ts';
import { namedWriter } from './write-normalised.ts';

const unit = (concentration: number, time: number): UnitPowers => ({
  concentration: Rational.of(concentration),
  time: Rational.of(time),
});

/** The Haldane form of a reversible one-substrate, one-product law, or undefined for any other shape. */
export function reversibleEnzymeForm(
  law: NormalisedLaw,
  fmt: Formatter,
  values?: ReadonlyMap<string, number>,
): TradeForm | undefined {
  const [factor] = law.factors;
  if (law.numerator.length !== 2 || law.factors.length !== 1 || !factor || factor.power !== 1) return undefined;
  if (factor.terms.length !== 3) return undefined;
  const sides = law.numerator.map((t) => ({ term: t, parts: split(t.concentrations) }));
  const forward = sides.find((s) => s.term.sign > 0);
  const backward = sides.find((s) => s.term.sign < 0);
  if (!forward?.parts || !backward?.parts || forward.parts.total !== backward.parts.total) return undefined;
  const [S, P, total] = [forward.parts.species, backward.parts.species, forward.parts.total];
  // Each constant is one quotient of two coefficient polynomials (before any division).
  const weight = (symbol: string) => {
    const t = factor.terms.find((t) => t.concentrations.equals(Monomial.of(symbol)));
    return t && t.sign > 0 && t.power.equals(Rational.ONE) ? t.coefficient : undefined;
  };
  const [cS, cP] = [weight(S), weight(P)];
  if (!cS || !cP) return undefined;
  const [a, b, zero] = [forward.term.coefficient, backward.term.coefficient, factor.reference];
  const T = Polynomial.symbol(total);
  const q = (top: Polynomial, below: Polynomial) => RationalFunction.of(top, below);
  const [s, p] = [S, P].map((x) => fmt.style.latex(x).slice(1, -1));
  const names = {
    kf: { name: 'k_cat,f', latex: 'k_\\mathrm{cat}^\\mathrm{f}' },
    kr: { name: 'k_cat,r', latex: 'k_\\mathrm{cat}^\\mathrm{r}' },
    KS: { name: `K_M,${S.slice(1, -1)}`, latex: `K_\\mathrm{M}^{${s}}` },
    KP: { name: `K_M,${P.slice(1, -1)}`, latex: `K_\\mathrm{M}^{${p}}` },
    Vf: { name: 'V_f', latex: 'V_\\mathrm{f}' },
    Vr: { name: 'V_r', latex: 'V_\\mathrm{r}' },
    Keq: { name: 'K_eq', latex: 'K_\\mathrm{eq}' },
  };
  // Written as the trade writes them: V_f K_M,P / (V_r K_M,S).
  const w = namedWriter(fmt, [names.Vf, names.Vr, names.kf, names.kr, names.KS, names.KP, names.Keq]);
  const written = (m: Monomial | Polynomial) => ({ text: w.text(m), latex: w.latex(m) });
  const specs = [
    { ...names.kf, meaning: 'turnover number forwards', definition: q(a, cS), unit: unit(0, -1) },
    { ...names.KS, meaning: `Michaelis constant of ${S.slice(1, -1)}`, definition: q(zero, cS), unit: unit(1, 0) },
    { ...names.kr, meaning: 'turnover number backwards', definition: q(b, cP), unit: unit(0, -1) },
    { ...names.KP, meaning: `Michaelis constant of ${P.slice(1, -1)}`, definition: q(zero, cP), unit: unit(1, 0) },
    {
      ...names.Vf,
      meaning: 'limiting rate forwards',
      definition: q(a.mul(T), cS),
      unit: unit(1, -1),
      relation: written(
        Monomial.fromFactors([
          [names.kf.name, 1],
          [total, 1],
        ]),
      ),
    },
    {
      ...names.Vr,
      meaning: 'limiting rate backwards',
      definition: q(b.mul(T), cP),
      unit: unit(1, -1),
      relation: written(
        Monomial.fromFactors([
          [names.kr.name, 1],
          [total, 1],
        ]),
      ),
    },
    {
      ...names.Keq,
      meaning: 'equilibrium constant of the overall reaction (Haldane relationship)',
      definition: q(a, b),
      unit: unit(0, 0),
      relation: written(
        Monomial.fromFactors([
          [names.Vf.name, 1],
          [names.KP.name, 1],
          [names.Vr.name, -1],
          [names.KS.name, -1],
        ]),
      ),
    },
  ];
  const top = Polynomial.sum([
    Polynomial.term(
      Rational.ONE,
      Monomial.fromFactors([
        [names.Vf.name, 1],
        [S, 1],
        [names.KS.name, -1],
      ]),
    ),
    Polynomial.term(
      Rational.of(-1),
      Monomial.fromFactors([
        [names.Vr.name, 1],
        [P, 1],
        [names.KP.name, -1],
      ]),
    ),
  ]);
  const below = Polynomial.sum([
    Polynomial.ONE,
    Polynomial.term(
      Rational.ONE,
      Monomial.fromFactors([
        [S, 1],
        [names.KS.name, -1],
      ]),
    ),
    Polynomial.term(
      Rational.ONE,
      Monomial.fromFactors([
        [P, 1],
        [names.KP.name, -1],
      ]),
    ),
  ]);
  return {
    shape: 'reversible_michaelis_menten',
    substrate: S.slice(1, -1),
    inhibitors: [P.slice(1, -1)],
    text: `(${w.text(top)}) / (${w.text(below)})`,
    latex: `\\frac{${w.latex(top)}}{${w.latex(below)}}`,
    constants: specs.map((spec) => apparentConstant(spec, fmt, values)),
  };
}

/** [E]_T × [X], each to the first power: the total and the species. */
function split(m: Monomial): { total: string; species: string } | undefined {
  if (m.factors.length !== 2 || !m.factors.every(([, e]) => e.equals(Rational.ONE))) return undefined;
  const total = m.factors.find(([s]) => symbolMeaning(s)?.kind === 'total')?.[0];
  const species = m.factors.find(([s]) => symbolMeaning(s)?.kind === 'concentration')?.[0];
  return total && species ? { total, species } : undefined;
}
