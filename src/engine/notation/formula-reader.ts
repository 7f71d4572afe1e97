/**
 * The cursor the formula parser reads with, and the character classes it tests. Shared by the
 * body, charge and top-level readers, so it depends on none of them.
 */

export interface FormulaError {
  error: string;
  offset: number;
}

export const ASCII_DIGITS = '0123456789';
export const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
export const PHASE_AHEAD = /^\((aq|g|l|s)\)/;
// Counts and charges of seven digits or more are typos, and six keep every sum exact in a double.
const MAX_DIGITS = 6;

/** Cursor over text[pos, end) that keeps the first failure and the marks met on the way. */
export class Reader {
  pos: number;
  radical = false;
  excited = false;
  failure: FormulaError | undefined;

  constructor(
    readonly text: string,
    start: number,
    readonly end: number,
  ) {
    this.pos = start;
  }

  peek(ahead = 0): string {
    const i = this.pos + ahead;
    return i < this.end ? this.text[i]! : '';
  }

  fail(error: string, offset: number): undefined {
    this.failure ??= { error, offset };
    return undefined;
  }
}

/** Reads a run of digits of one family (ASCII, subscript or superscript) as a number. */
export function readDigits(r: Reader, family: string): number | undefined {
  const at = r.pos;
  let value = 0;
  while (isDigitOf(family, r.peek())) {
    value = value * 10 + family.indexOf(r.peek());
    r.pos++;
  }
  if (r.pos - at > MAX_DIGITS) return r.fail('number too large', at);
  return value;
}

/** The error for a character that starts nothing valid where the reader stands. */
export function unexpectedMessage(r: Reader): string {
  const c = r.peek();
  if (c === ')' || c === ']') return `unmatched '${c}'`;
  if (c === '(' && PHASE_AHEAD.test(r.text.slice(r.pos, Math.min(r.end, r.pos + 4))))
    return 'the phase goes at the end of the formula';
  if (startsCharge(c) && c !== '{') return 'the charge goes at the end of the formula';
  if (/\s/.test(c)) return 'no spaces inside a formula';
  return `unexpected character '${c}'`;
}

/** +1, -1 or 0 for a plus sign, a minus sign (ASCII, Unicode minus, superscript) or anything else. */
export function signOf(c: string): 1 | -1 | 0 {
  return c === '+' || c === '⁺' ? 1 : c === '-' || c === '−' || c === '⁻' ? -1 : 0;
}
/** Whether c is a plus or minus sign in any of the accepted forms. */
export function isSign(c: string): boolean {
  return signOf(c) !== 0;
}
/** Whether c is one digit of the family; `''.includes` is true for the '' that peek() gives at the end. */
export function isDigitOf(family: string, c: string): boolean {
  return c.length === 1 && family.includes(c);
}
/** Whether c is an ASCII or superscript digit (the digits a charge may use). */
export function isAnyDigit(c: string): boolean {
  return isDigitOf(ASCII_DIGITS, c) || isDigitOf(SUPERSCRIPT_DIGITS, c);
}
/** The digit family c belongs to: superscript, else ASCII. */
export function digitFamily(c: string): string {
  return isDigitOf(SUPERSCRIPT_DIGITS, c) ? SUPERSCRIPT_DIGITS : ASCII_DIGITS;
}
/** Whether c can start a charge without its caret or braces. */
export function startsChargeSpec(c: string): boolean {
  return isSign(c) || isAnyDigit(c);
}
/** Whether c can start a charge in any notation. */
export function startsCharge(c: string): boolean {
  return c === '^' || c === '{' || startsChargeSpec(c);
}
/** Whether c is an ASCII capital letter. */
export function isUpper(c: string): boolean {
  return c >= 'A' && c <= 'Z' && c !== '';
}
/** Whether c is an ASCII lower-case letter. */
export function isLower(c: string): boolean {
  return c >= 'a' && c <= 'z' && c !== '';
}
/** Whether c can start a unit: an element symbol or an opening bracket. */
export function startsUnit(c: string): boolean {
  return isUpper(c) || c === '(' || c === '[';
}
/** Whether c can mark a radical. */
export function isRadicalDot(c: string): boolean {
  return c === '•' || c === '·' || c === '.';
}
/** Whether c can separate the parts of an adduct or hydrate. */
export function isAdductDot(c: string): boolean {
  return c === '·' || c === '.';
}
/** Whether c, after an adduct dot, makes the dot a separator rather than a radical mark. */
export function startsAdductPart(c: string): boolean {
  return startsUnit(c) || isDigitOf(ASCII_DIGITS, c);
}
