/**
 * The mechanism as the engine sees it: parsed steps with their net changes, and every species
 * with its declared properties and composition. Built once from a valid record.
 */
import type { MechanismRecord, Role, SpeciesEntry } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { parseEquation, type Term } from '../notation/equation.ts';
import { confusableCharacter } from '../notation/confusable-characters.ts';
import { parseFormula, type Composition } from '../notation/formula.ts';
import { isVacantSite } from '../notation/formula-sites.ts';
import { Rational } from '../exact/rational.ts';

/** The largest stoichiometric number a step may be given (the schema's maximum for `times`). */
export const MAX_TIMES = 1000;

export interface Step {
  index: number;
  /** names the constants: k_label, k_{-label}, K_label */
  label: string;
  text: string;
  reactants: Term[];
  products: Term[];
  reversible: boolean;
  rds: boolean;
  /** reactant molecules that meet in the forward step (the sum of its reactant coefficients, vacant sites left out) */
  molecularity: number;
  times?: number;
  /** net change per species, products minus reactants; zero entries kept out */
  change: Map<string, Rational>;
}

export interface Species {
  symbol: string;
  entry?: SpeciesEntry;
  /** undefined when the species has no composition (labels, or `formula: null`) */
  composition?: Composition;
  declaredRole?: Role;
  solvent: boolean;
  thirdBody: boolean;
  buffered: boolean;
}

export interface Mechanism {
  notation: 'formulas' | 'labels';
  steps: Step[];
  /** every species the steps use, in order of first appearance */
  species: Map<string, Species>;
}

/** Parses every step and species; returns no mechanism when an equation cannot be read. */
export function buildMechanism(record: MechanismRecord): { mechanism?: Mechanism; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const steps: Step[] = [];
  record.steps.forEach((entry, index) => {
    const parsed = parseEquation(entry.equation);
    if ('error' in parsed) {
      diagnostics.push(
        diagnostic('equation/syntax', 'error', parsed.error, {
          path: ['steps', index, 'equation'],
          offset: parsed.offset,
        }),
      );
      return;
    }
    const { reactants, products, reversible } = parsed.equation;
    const times = entry.times;
    // The schema says the same; the engine also takes records that were never validated.
    if (times !== undefined && !(Number.isSafeInteger(times) && times >= 0 && times <= MAX_TIMES)) {
      const message = `times must be a whole number from 0 to ${MAX_TIMES}`;
      diagnostics.push(
        diagnostic('record/schema', 'error', message, { path: ['steps', index, 'times'], actual: times }),
      );
      return;
    }
    steps.push({
      index,
      label: entry.label ?? String(index + 1),
      text: entry.equation,
      reactants,
      products,
      reversible,
      rds: entry.rds === true,
      molecularity: reactants.reduce((n, t) => n + t.coefficient.toNumber(), 0),
      ...(times !== undefined && { times }),
      change: netChange(reactants, products),
    });
  });
  if (diagnostics.length > 0) return { diagnostics };
  diagnostics.push(...duplicateLabels(steps));
  const notation = record.notation ?? 'formulas';
  const species = new Map<string, Species>();
  const firstUse = new Map<string, { step: number; offset: number }>();
  for (const step of steps) {
    for (const term of [...step.reactants, ...step.products]) {
      if (!firstUse.has(term.species)) firstUse.set(term.species, { step: step.index, offset: term.offset });
    }
  }
  for (const symbol of Object.keys(record.species ?? {}).filter((s) => !firstUse.has(s))) {
    diagnostics.push(
      diagnostic('species/unused', 'warning', `${symbol} is declared but no step uses it`, {
        path: ['species', symbol],
      }),
    );
  }
  for (const symbol of firstUse.keys()) {
    // Own entries only: a species named `constructor` is not Object.prototype.constructor.
    const entry = record.species && Object.hasOwn(record.species, symbol) ? record.species[symbol] : undefined;
    const { composition, problem } = compositionOf(symbol, entry, notation);
    if (problem) {
      const use = firstUse.get(symbol)!;
      const where = entry?.formula
        ? { path: ['species', symbol, 'formula'], offset: problem.offset }
        : { path: ['steps', use.step, 'equation'], offset: use.offset + problem.offset };
      diagnostics.push(
        diagnostic('formula/syntax', 'error', `'${entry?.formula ?? symbol}' is not a formula: ${problem.error}`, {
          ...where,
          note: 'give the species a formula, `formula: null` for no composition, or set `notation: labels` for the record',
        }),
      );
    }
    const confusing = notation === 'labels' ? confusableCharacter(symbol) : undefined;
    if (confusing) {
      const use = firstUse.get(symbol)!;
      const message = `the symbol '${symbol}' holds ${confusing.description}`;
      const note = 'two symbols that look the same are two species; write the symbol in plain Latin letters';
      const where = { path: ['steps', use.step, 'equation'], offset: use.offset + confusing.index };
      diagnostics.push(diagnostic('species/confusable', 'warning', message, { ...where, note }));
    }
    species.set(symbol, {
      symbol,
      ...(entry && { entry }),
      ...(composition && { composition }),
      ...(entry?.role && { declaredRole: entry.role }),
      solvent: entry?.solvent === true || entry?.role === 'solvent',
      thirdBody: entry?.third_body === true || entry?.role === 'third_body',
      buffered: entry?.buffered === true,
    });
  }
  // A vacant surface site is where a molecule lands, not a molecule that meets it: O2 + 2 @ is unimolecular.
  for (const step of steps) {
    step.molecularity = step.reactants
      .filter((t) => !isVacantSite(species.get(t.species)?.composition))
      .reduce((n, t) => n + t.coefficient.toNumber(), 0);
  }
  return { mechanism: { notation, steps, species }, diagnostics };
}

function compositionOf(symbol: string, entry: SpeciesEntry | undefined, notation: 'formulas' | 'labels') {
  // A collision partner stands for any molecule of the bath; it has a composition only when given.
  const thirdBody = entry?.third_body === true || entry?.role === 'third_body';
  if (entry?.formula === null || (thirdBody && entry?.formula === undefined)) return {};
  const text = entry?.formula ?? (notation === 'formulas' ? symbol : undefined);
  if (text === undefined) return {};
  const parsed = parseFormula(text);
  return 'error' in parsed ? { problem: parsed } : { composition: parsed.composition };
}

/** Products minus reactants; a species on both sides with equal coefficients (a third body) nets to nothing. */
export function netChange(reactants: readonly Term[], products: readonly Term[]): Map<string, Rational> {
  const change = new Map<string, Rational>();
  for (const t of reactants) change.set(t.species, (change.get(t.species) ?? Rational.ZERO).sub(t.coefficient));
  for (const t of products) change.set(t.species, (change.get(t.species) ?? Rational.ZERO).add(t.coefficient));
  for (const [sp, v] of change) if (v.isZero()) change.delete(sp);
  return change;
}

function duplicateLabels(steps: Step[]): Diagnostic[] {
  const seen = new Set<string>();
  return steps.flatMap((s) => {
    if (!seen.has(s.label)) {
      seen.add(s.label);
      return [];
    }
    return [
      diagnostic(
        'record/schema',
        'error',
        `step label '${s.label}' is used twice; labels name the rate constants and must differ`,
        { path: ['steps', s.index, 'label'] },
      ),
    ];
  });
}
