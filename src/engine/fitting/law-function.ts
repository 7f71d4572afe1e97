/**
 * A normalised rate law as a numeric function of its apparent constants and the concentrations:
 * rate = Σ ± C^p Π[X]^e / Π (1 + Σ ± K^p Π[X]^e)^power. The fits work in these constants (k_obs,
 * K_A …) because they are what initial rates can determine; the elementary constants behind them
 * are generally not separable from rates alone.
 */
import type { NormalisedLaw, NormalisedTerm } from '../rate-law/normalised-law.ts';

/** A law ready to evaluate: the constants it needs, the concentration symbols it reads, and the rate. */
export interface LawFunction {
  /** apparent constant names, in the law's order */
  constants: string[];
  /** concentration symbols the law reads: `[A]`, `[Cat]_T` */
  symbols: string[];
  /** the rate for constant values (in `constants` order) and concentrations by symbol */
  rate(constants: readonly number[], concentrations: ReadonlyMap<string, number>): number;
}

/** Builds the numeric law; every symbol in `symbols` must have a concentration when it is evaluated. */
export function lawFunction(law: NormalisedLaw): LawFunction {
  const constants = law.constants.map((c) => c.name);
  const index = new Map(constants.map((c, i) => [c, i]));
  const symbols = new Set<string>();
  const terms = [...law.numerator, ...law.factors.flatMap((f) => f.terms)];
  for (const t of terms) for (const s of t.concentrations.symbols()) symbols.add(s);
  const term = (t: NormalisedTerm, values: readonly number[], c: ReadonlyMap<string, number>): number => {
    const k = t.constant === undefined ? 1 : Math.pow(values[index.get(t.constant)!]!, t.power.toNumber());
    return t.sign * k * t.concentrations.evaluate(c);
  };
  return {
    constants,
    symbols: [...symbols],
    rate(values, c) {
      let top = 0;
      for (const t of law.numerator) top += term(t, values, c);
      let bottom = 1;
      for (const f of law.factors) {
        let sum = 0;
        for (const t of f.terms) sum += term(t, values, c);
        bottom *= Math.pow(sum, f.power);
      }
      return top / bottom;
    },
  };
}

/**
 * The constants whose every term vanishes at every point (a K of an inhibitor never added): the
 * data cannot see them, so they are held rather than fitted.
 */
export function unseenConstants(law: NormalisedLaw, points: readonly ReadonlyMap<string, number>[]): string[] {
  const seen = new Set<string>();
  for (const t of [...law.numerator, ...law.factors.flatMap((f) => f.terms)]) {
    if (t.constant === undefined) continue;
    const symbols = t.concentrations.symbols();
    if (points.some((p) => symbols.every((s) => p.has(s)) && t.concentrations.evaluate(p) !== 0)) seen.add(t.constant);
  }
  return law.constants.map((c) => c.name).filter((c) => !seen.has(c));
}

/** The law as a function of some of its constants, the others held at `held` (0 where not given). */
export function restrictLaw(law: LawFunction, free: readonly string[], held: ReadonlyMap<string, number>): LawFunction {
  const slots = law.constants.map((c) => free.indexOf(c));
  const full = law.constants.map((c) => held.get(c) ?? 0);
  return {
    constants: [...free],
    symbols: law.symbols,
    rate(values, c) {
      const all = full.slice();
      slots.forEach((k, j) => {
        if (k >= 0) all[j] = values[k]!;
      });
      return law.rate(all, c);
    },
  };
}

/**
 * The constants of the law's denominator whose every term reads only concentrations held through
 * a run (an inhibitor's K_I at one [I]): such a term only rescales the law's other constants
 * (divide through by 1 + K_I[I]), so one run cannot determine it and it is held, not fitted.
 */
export function steadyTermConstants(law: NormalisedLaw, held: ReadonlySet<string>): string[] {
  const moving = new Set<string>();
  const inFactors = new Set<string>();
  for (const t of law.numerator) if (t.constant !== undefined) moving.add(t.constant);
  for (const t of law.factors.flatMap((f) => f.terms)) {
    if (t.constant === undefined) continue;
    inFactors.add(t.constant);
    if (!t.concentrations.symbols().every((s) => held.has(s))) moving.add(t.constant);
  }
  return law.constants.map((c) => c.name).filter((c) => inFactors.has(c) && !moving.has(c));
}
