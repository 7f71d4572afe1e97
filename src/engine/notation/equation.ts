/**
 * Step equations: `2 NO + O2 -> 2 NO2`, `E + S <=> ES`.
 *
 * - Exactly one arrow: `->` `→` `⟶` one-way; `<=>` `⇌` `<->` `⇄` reversible.
 * - Terms are separated by a plus with white space on both sides, because `+` and `-` also write
 *   charges: `Fe3+ + e-` is two terms, `Na+` is one.
 * - A leading whole number is the coefficient, spaced (`2 NO`) or glued (`2NO`, `2@`); glued only before
 *   a letter, `[`, `(` or a site mark `@`, so a nuclide is written `[13C]O`, not `13CO`. Elementary steps take whole
 *   coefficients of at least 1.
 * - A species is the text as written, with no white space inside; identity is the text, so the
 *   formula is not read here. The same species twice on one side is merged (`A + A` is `2 A`).
 * Offsets are indices into the given string (UTF-16 code units, as JS strings index).
 */
import { Rational } from '../exact/rational.ts';

export interface Term {
  species: string;
  coefficient: Rational;
  /** index of the species text (after any coefficient) in the equation string */
  offset: number;
}

export interface ParsedEquation {
  reactants: Term[];
  products: Term[];
  reversible: boolean;
}

export interface EquationError {
  error: string;
  offset: number;
}

// Longest first where one arrow begins another (`<->` before `->`).
const ARROWS: readonly { text: string; reversible: boolean }[] = [
  { text: '<=>', reversible: true },
  { text: '<->', reversible: true },
  { text: '⇌', reversible: true },
  { text: '⇄', reversible: true },
  { text: '->', reversible: false },
  { text: '→', reversible: false },
  { text: '⟶', reversible: false },
];

// Marks people type for an arrow that we do not read; only looked for when no arrow is found,
// since `=` may be a bond inside a species (`CH2=CH2`).
const NOT_ARROWS: readonly { text: string; message: string }[] = [
  { text: '↔', message: "'↔' is the resonance arrow; write '<=>' for a reversible step" },
  { text: '⇔', message: "'⇔' is not a step arrow; write '<=>' for a reversible step" },
  { text: '=>', message: "'=>' is not a step arrow; write '->' for a one-way step" },
  { text: '⇒', message: "'⇒' is not a step arrow; write '->' for a one-way step" },
  { text: '<-', message: "steps are written left to right; write '->' with the reactants first" },
  { text: '←', message: "steps are written left to right; write '->' with the reactants first" },
  { text: '=', message: "'=' is not a step arrow; write '->' for a one-way step or '<=>' for a reversible one" },
];

/** The largest coefficient read: elementary steps have small ones, and a huge one would only make every later stage slow. */
export const MAX_COEFFICIENT = 1000;
/** The longest species symbol read (the site's file names and every formula reader stay bounded). */
export const MAX_SYMBOL_LENGTH = 100;

const WHOLE_GLUED = /^(\d+)(?=[A-Za-z[(@])/;
// Fractions and decimals, spaced or glued, so that `1/2 O2` and `0.5O2` get the coefficient message.
const NUMBER_LIKE = /^([+-]?(\d+(\.\d*)?|\.\d+)(\/\d+)?|[½⅓⅔¼¾⅕⅙⅛])/;
const WHOLE_ONLY = /^\d+$/;

/** Reads a step equation into terms with coefficients and offsets, or an error with its offset. */
export function parseEquation(text: string): { equation: ParsedEquation } | EquationError {
  const arrows = findArrows(text);
  if (arrows.length === 0) return missingArrow(text);
  const [arrow, extra] = arrows;
  if (extra !== undefined) return { error: 'a step has exactly one arrow', offset: extra.at };
  const reactants = readSide(text, 0, arrow!.at, 'left', arrow!.at);
  if ('error' in reactants) return reactants;
  const products = readSide(text, arrow!.at + arrow!.text.length, text.length, 'right', arrow!.at);
  if ('error' in products) return products;
  return { equation: { reactants, products, reversible: arrow!.reversible } };
}

function findArrows(text: string): { at: number; text: string; reversible: boolean }[] {
  const found: { at: number; text: string; reversible: boolean }[] = [];
  for (let i = 0; i < text.length; i++) {
    const arrow = ARROWS.find((a) => text.startsWith(a.text, i));
    if (arrow === undefined) continue;
    found.push({ at: i, ...arrow });
    i += arrow.text.length - 1;
  }
  return found;
}

function missingArrow(text: string): EquationError {
  let best: EquationError | undefined;
  for (const mark of NOT_ARROWS) {
    const at = text.indexOf(mark.text);
    if (at >= 0 && (best === undefined || at < best.offset)) best = { error: mark.message, offset: at };
  }
  return best ?? { error: "a step needs an arrow: '->' one-way or '<=>' reversible", offset: text.trimEnd().length };
}

// side = term { " + " term }, read as white-space separated words where a lone "+" separates.
function readSide(
  text: string,
  from: number,
  to: number,
  side: 'left' | 'right',
  arrowAt: number,
): Term[] | EquationError {
  const words = [...text.slice(from, to).matchAll(/\S+/g)].map((m) => ({ text: m[0], at: from + m.index }));
  if (words.length === 0) return { error: `the ${side} side of the arrow has no species`, offset: arrowAt };
  const terms: Term[] = [];
  let group: typeof words = [];
  let lastPlus = -1;
  for (const word of [...words, undefined]) {
    if (word !== undefined && word.text !== '+') {
      group.push(word);
      continue;
    }
    if (group.length === 0) return { error: "missing term beside '+'", offset: word?.at ?? lastPlus };
    const term = readTerm(group);
    if ('error' in term) return term;
    const same = terms.find((t) => t.species === term.species);
    if (same) same.coefficient = same.coefficient.add(term.coefficient);
    else terms.push(term);
    group = [];
    lastPlus = word?.at ?? lastPlus;
  }
  return terms;
}

// term = [whole] species | whole species   (one or two words)
function readTerm(words: readonly { text: string; at: number }[]): Term | EquationError {
  const [first, second, third] = words as [{ text: string; at: number }, ...{ text: string; at: number }[]];
  if (second === undefined) return readGluedTerm(first);
  if (!NUMBER_LIKE.test(first.text) || NUMBER_LIKE.exec(first.text)![0] !== first.text) {
    return { error: "terms are separated by ' + ' (a plus with spaces on both sides)", offset: second.at };
  }
  if (!WHOLE_ONLY.test(first.text) || /^0+$/.test(first.text)) return wholeNumberError(first.at);
  if (third !== undefined)
    return { error: "terms are separated by ' + ' (a plus with spaces on both sides)", offset: third.at };
  return checkedTerm(second.text, first.text, second.at, first.at);
}

/** A term whose coefficient and symbol are within the limits, or the error at the part that is not. */
function checkedTerm(species: string, whole: string, offset: number, wholeAt: number): Term | EquationError {
  const coefficient = BigInt(whole);
  if (coefficient > BigInt(MAX_COEFFICIENT))
    return { error: `a coefficient of an elementary step is at most ${MAX_COEFFICIENT}`, offset: wholeAt };
  if (species.length > MAX_SYMBOL_LENGTH)
    return { error: `a species symbol is at most ${MAX_SYMBOL_LENGTH} characters long`, offset };
  return { species, coefficient: Rational.of(coefficient), offset };
}

function readGluedTerm(word: { text: string; at: number }): Term | EquationError {
  const number = NUMBER_LIKE.exec(word.text)?.[0];
  if (number === word.text)
    return { error: 'a coefficient needs a species after it', offset: word.at + word.text.length };
  const whole = WHOLE_GLUED.exec(word.text)?.[1];
  if (whole !== undefined && number === whole) {
    if (/^0+$/.test(whole)) return wholeNumberError(word.at);
    return checkedTerm(word.text.slice(whole.length), whole, word.at + whole.length, word.at);
  }
  // `0.5O2`, `1/2O2`, `½O2`: a fraction glued to a species, never a species name of its own.
  if (number !== undefined && /^[A-Za-z[(]/.test(word.text.slice(number.length)) && !WHOLE_ONLY.test(number)) {
    return wholeNumberError(word.at);
  }
  return checkedTerm(word.text, '1', word.at, word.at);
}

function wholeNumberError(offset: number): EquationError {
  return { error: 'coefficients of an elementary step are whole numbers (1, 2, 3…)', offset };
}
