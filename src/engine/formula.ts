/**
 * Chemical formulas in trade notation → element counts, charge and state marks.
 *
 * Grammar (whitespace allowed only around the whole formula):
 *   formula  = [radical-dots] (body | "e") [suffixes] [phase]
 *   body     = part { ("·" | ".") [count] part }     hydrate/adduct: CuSO4·5H2O, CuSO4.5H2O
 *   part     = unit { unit | "=" unit | "≡" unit }   "=" "≡" are bond marks, ignored: CH2=CH2
 *   unit     = (symbol | "(" body ")" | "[" body "]" | "[" mass symbol "]") [count]
 *   count    = digits, at least 1 (ASCII, or subscript ₀–₉)
 *   suffixes = any of: charge, radical dot "•" "·" ".", excited "*"  (O2•-, NO2*, Br.)
 *   phase    = "(aq)" | "(g)" | "(l)" | "(s)", last, not counted as atoms
 * Symbols: the 118 elements, D and T, and nuclides as [13C] (see elements.ts).
 * "e" alone with charge −1 is the electron: `e-`, `e−`, `e⁻`, `e-(aq)`.
 * A "·" or "." is an adduct separator when followed by a digit or a unit, else a radical dot;
 * "•" always marks a radical, wherever it stands (•OH, HO•, CH3C•HCH3).
 *
 * Charge. Written at the end: `^2-`, `^{2-}`, `{2-}`, `²⁻`, `+3`/`-2` (sign first), `++`/`--`
 * (one per unit of charge), or a single `+`/`-` (±1). Unicode minus `−` counts as `-`.
 * The one ambiguity is plain digits followed by exactly one sign, as in `Fe3+` vs `NH4+`:
 *   - the digits are the charge after a closing square bracket (`[Co(NH3)6]3+`, `[Fe(CN)6]4-`)
 *     or when the whole formula is one element symbol (`Fe3+`, `Cu2+`, `Al3+`);
 *   - otherwise the digits count the last atom or group and the charge is ±1
 *     (`NH4+` is NH4 with charge +1, `H2PO4-` is H2PO4 with −1, `SO42-` is S O42 with −1).
 * So write polyatomic ions with a caret or superscripts (`SO4^2-`, `SO4²⁻`), and a charged
 * homonuclear molecule likewise: `I3^-` (triiodide; `I3-` is I with −3), `O2^-` or `O2•-`
 * (superoxide; `O2-` is oxide), `Hg2^2+` or `Hg2++` (mercury(I)). Digits after ")" are counts.
 *
 * Offsets in errors are indices into the given string (UTF-16 code units, as JS strings index).
 */
import { isAtomSymbol, nuclideSymbol, splitNuclide } from './elements.ts';

export type Phase = 'aq' | 'g' | 'l' | 's';

export interface Composition {
  elements: ReadonlyMap<string, number>;
  charge: number;
  radical: boolean;
  excited: boolean;
  phase?: Phase;
}

export interface FormulaError {
  error: string;
  offset: number;
}

type Counts = Map<string, number>;

const ASCII_DIGITS = '0123456789';
const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const PHASE_SUFFIX = /\((aq|g|l|s)\)$/;
const PHASE_AHEAD = /^\((aq|g|l|s)\)/;
// Counts and charges of seven digits or more are typos, and six keep every sum exact in a double.
const MAX_DIGITS = 6;

/** Reads a formula in trade notation; see the header for the grammar and the charge rule. */
export function parseFormula(text: string): { composition: Composition } | FormulaError {
  let start = 0;
  let end = text.length;
  while (start < end && /\s/.test(text[start]!)) start++;
  while (end > start && /\s/.test(text[end - 1]!)) end--;
  if (start === end) return { error: 'empty formula', offset: 0 };
  const phase = PHASE_SUFFIX.exec(text.slice(start, end))?.[1] as Phase | undefined;
  if (phase !== undefined) end -= phase.length + 2;

  const r = new Reader(text, start, end);
  while (isRadicalDot(r.peek())) {
    r.radical = true;
    r.pos++;
  }
  const bodyAt = r.pos;
  // Element symbols are capitalised, so a lower-case e where the body starts can only be the electron.
  const electron = r.peek() === 'e' && !isLower(r.peek(1));
  let elements: Counts = new Map();
  if (electron) r.pos++;
  else {
    const body = readBody(r, 0);
    if (body === undefined) return r.failure!;
    elements = body;
    if (r.pos === bodyAt) return { error: emptyBodyMessage(r.peek(), phase), offset: bodyAt };
  }

  let charge: number | undefined;
  while (r.pos < r.end) {
    const c = r.peek();
    const at = r.pos;
    if (isRadicalDot(c)) {
      r.radical = true;
      r.pos++;
    } else if (c === '*') {
      if (r.excited) return { error: 'excited state marked twice', offset: at };
      r.excited = true;
      r.pos++;
    } else if (startsCharge(c)) {
      if (charge !== undefined) return { error: 'charge written twice', offset: at };
      charge = readCharge(r);
      if (charge === undefined) return r.failure!;
    } else {
      return { error: unexpectedMessage(r), offset: at };
    }
  }
  if (electron && charge !== -1) return { error: 'an electron is written e- (charge -1)', offset: bodyAt };
  const composition: Composition = { elements, charge: charge ?? 0, radical: r.radical, excited: r.excited };
  if (phase !== undefined) composition.phase = phase;
  return { composition };
}

/** Element counts in Hill order with charge and marks, for messages: "H4 N, charge +1". */
export function formatComposition(c: Composition): string {
  const hasCarbon = [...c.elements.keys()].some((s) => splitNuclide(s).element === 'C');
  const symbols = [...c.elements.keys()]
    .filter((s) => c.elements.get(s) !== 0)
    .sort((a, b) => compareHill(hillKey(a, hasCarbon), hillKey(b, hasCarbon)));
  const atoms = symbols.map((s) => (c.elements.get(s) === 1 ? s : `${s}${c.elements.get(s)}`)).join(' ');
  const parts = [atoms === '' ? 'no atoms' : atoms];
  if (c.charge !== 0) parts.push(`charge ${c.charge > 0 ? '+' : ''}${c.charge}`);
  if (c.radical) parts.push('radical');
  if (c.excited) parts.push('excited');
  if (c.phase !== undefined) parts.push(`(${c.phase})`);
  return parts.join(', ');
}

type HillKey = readonly [rank: number, element: string, massNumber: number];

// Hill order: with carbon present C then H first, everything else alphabetical; a nuclide
// follows its element (H, D, T; C, 13C) so labelled formulas read next to unlabelled ones.
function hillKey(symbol: string, hasCarbon: boolean): HillKey {
  const { element, massNumber = 0 } = splitNuclide(symbol);
  const rank = !hasCarbon ? 2 : element === 'C' ? 0 : element === 'H' ? 1 : 2;
  return [rank, element, massNumber];
}

function compareHill(a: HillKey, b: HillKey): number {
  if (a[0] !== b[0]) return a[0] - b[0];
  if (a[1] !== b[1]) return a[1] < b[1] ? -1 : 1;
  return a[2] - b[2];
}

/** Cursor over text[pos, end) that keeps the first failure and the marks met on the way. */
class Reader {
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

// body = part { adduct-dot [count] part }
function readBody(r: Reader, depth: number): Counts | undefined {
  const total = readPart(r, depth, true);
  if (total === undefined || total.size === 0) return total;
  while (isAdductDot(r.peek()) && startsAdductPart(r.peek(1))) {
    r.pos++;
    const multiplier = readCount(r, 'count');
    if (multiplier === undefined) return undefined;
    const partAt = r.pos;
    const part = readPart(r, depth, false);
    if (part === undefined) return undefined;
    if (part.size === 0) return r.fail('expected a formula after the adduct dot', partAt);
    addInto(total, part, multiplier);
  }
  return total;
}

// part = unit { unit | bond-mark unit | "•" unit }; stops at the first character that starts none.
function readPart(r: Reader, depth: number, firstPart: boolean): Counts | undefined {
  const counts: Counts = new Map();
  let units = 0;
  for (;;) {
    const c = r.peek();
    if (units > 0 && (c === '=' || c === '≡' || c === '•') && startsUnit(r.peek(1))) {
      if (c === '•') r.radical = true;
      r.pos++;
      continue;
    }
    if (!startsUnit(c)) return counts;
    const alone = depth === 0 && firstPart && units === 0;
    const unit = isUpper(c) ? readSymbolUnit(r, alone) : readGroupUnit(r, depth);
    if (unit === undefined) return undefined;
    addInto(counts, unit, 1);
    units++;
  }
}

function readSymbolUnit(r: Reader, alone: boolean): Counts | undefined {
  const at = r.pos;
  let symbol = r.peek();
  r.pos++;
  if (isLower(r.peek())) {
    symbol += r.peek();
    r.pos++;
  }
  if (!isAtomSymbol(symbol)) return r.fail(`unknown element '${symbol}'`, at);
  // `Fe3+`: for a lone element symbol the digits before a single sign are its charge.
  const n = readCount(r, alone ? 'charge-if-signed' : 'count');
  return n === undefined ? undefined : new Map([[symbol, n]]);
}

function readGroupUnit(r: Reader, depth: number): Counts | undefined {
  const at = r.pos;
  const open = r.peek();
  if (open === '[' && isDigitOf(ASCII_DIGITS, r.peek(1))) return readNuclide(r, depth);
  if (PHASE_AHEAD.test(r.text.slice(at, r.end))) return r.fail('the phase goes at the end of the formula', at);
  r.pos++;
  const inner = readBody(r, depth + 1);
  if (inner === undefined) return undefined;
  const close = open === '(' ? ')' : ']';
  const c = r.peek();
  if (c === '') return r.fail(`unclosed '${open}'`, at);
  if (c !== close) {
    if (c === ')' || c === ']') return r.fail(`'${open}' closed by '${c}'`, r.pos);
    return r.fail(unexpectedMessage(r), r.pos);
  }
  if (inner.size === 0) return r.fail('empty brackets', at);
  r.pos++;
  // `[Co(NH3)6]3+`: after a top-level square bracket the digits before a single sign are the charge.
  const n = readCount(r, depth === 0 && open === '[' ? 'charge-if-signed' : 'count');
  return n === undefined ? undefined : scale(inner, n);
}

// "[" mass symbol "]", e.g. [13C]
function readNuclide(r: Reader, depth: number): Counts | undefined {
  const at = r.pos;
  r.pos++;
  const mass = readDigits(r, ASCII_DIGITS);
  if (mass === undefined) return undefined;
  const symbolAt = r.pos;
  let symbol = '';
  while (symbol.length < 2 && (symbol === '' ? isUpper(r.peek()) : isLower(r.peek()))) {
    symbol += r.peek();
    r.pos++;
  }
  if (symbol === '' || r.peek() !== ']') return r.fail('a nuclide is written like [13C]', r.pos);
  const nuclide = nuclideSymbol(mass, symbol);
  if ('error' in nuclide) return r.fail(nuclide.error, nuclide.error.startsWith('unknown') ? symbolAt : at + 1);
  r.pos++;
  const n = readCount(r, depth === 0 ? 'charge-if-signed' : 'count');
  return n === undefined ? undefined : new Map([[nuclide.symbol, n]]);
}

// A count after a unit: subscript digits always; ASCII digits unless, in 'charge-if-signed' mode,
// exactly one sign follows them (then they are left for the charge). Absent means 1.
function readCount(r: Reader, mode: 'count' | 'charge-if-signed'): number | undefined {
  const at = r.pos;
  const c = r.peek();
  const family = isDigitOf(SUBSCRIPT_DIGITS, c) ? SUBSCRIPT_DIGITS : isDigitOf(ASCII_DIGITS, c) ? ASCII_DIGITS : '';
  if (family === '') return 1;
  if (mode === 'charge-if-signed' && family === ASCII_DIGITS) {
    let ahead = 0;
    while (isDigitOf(ASCII_DIGITS, r.peek(ahead))) ahead++;
    const after = r.peek(ahead + 1);
    if (isSign(r.peek(ahead)) && !isSign(after) && !isAnyDigit(after)) return 1;
  }
  const n = readDigits(r, family);
  if (n === 0) return r.fail('a count must be at least 1', at);
  return n;
}

// charge = "^" spec | "^{" spec "}" | "{" spec "}" | spec
function readCharge(r: Reader): number | undefined {
  const at = r.pos;
  if (r.peek() === '^') {
    r.pos++;
    if (r.peek() !== '{' && !startsChargeSpec(r.peek())) return r.fail("expected a charge after '^'", at);
  }
  if (r.peek() !== '{') return readChargeSpec(r);
  const braceAt = r.pos;
  r.pos++;
  const charge = readChargeSpec(r);
  if (charge === undefined) return undefined;
  if (r.peek() === '') return r.fail("unclosed '{'", braceAt);
  if (r.peek() !== '}') return r.fail(unexpectedMessage(r), r.pos);
  r.pos++;
  return charge;
}

// spec = digits sign | sign digits | sign { same sign }   (ASCII or superscript)
function readChargeSpec(r: Reader): number | undefined {
  const at = r.pos;
  const digits = isAnyDigit(r.peek()) ? readDigits(r, digitFamily(r.peek())) : null;
  if (digits === undefined) return undefined;
  const signAt = r.pos;
  let sign = 0;
  let signs = 0;
  while (isSign(r.peek())) {
    const s = signOf(r.peek());
    if (sign !== 0 && s !== sign) return r.fail('mixed signs in a charge', r.pos);
    sign = s;
    signs++;
    r.pos++;
  }
  if (signs === 0) return r.fail(digits === null ? 'expected a charge' : 'a charge needs a sign, as in 2+ or 2-', signAt);
  let magnitude = signs;
  if (digits !== null) {
    if (signs > 1) return r.fail('write a charge as digits and one sign, as in 3+', signAt);
    magnitude = digits;
  } else if (signs === 1 && isAnyDigit(r.peek())) {
    const after = readDigits(r, digitFamily(r.peek()));
    if (after === undefined) return undefined;
    magnitude = after;
  }
  if (magnitude === 0) return r.fail('a charge of 0 is written by leaving it out', at);
  return sign * magnitude;
}

function readDigits(r: Reader, family: string): number | undefined {
  const at = r.pos;
  let value = 0;
  while (isDigitOf(family, r.peek())) {
    value = value * 10 + family.indexOf(r.peek());
    r.pos++;
  }
  if (r.pos - at > MAX_DIGITS) return r.fail('number too large', at);
  return value;
}

function addInto(total: Counts, add: ReadonlyMap<string, number>, times: number): void {
  for (const [symbol, n] of add) total.set(symbol, (total.get(symbol) ?? 0) + n * times);
}

function scale(counts: Counts, times: number): Counts {
  const scaled: Counts = new Map();
  addInto(scaled, counts, times);
  return scaled;
}

function emptyBodyMessage(c: string, phase: Phase | undefined): string {
  if (c === '') return phase === undefined ? 'expected an element symbol' : 'a phase needs a formula before it';
  if (isAnyDigit(c)) return 'a formula cannot start with a number (a coefficient belongs in the equation)';
  if (isLower(c)) return 'element symbols start with a capital letter';
  return `unexpected character '${c}'`;
}

function unexpectedMessage(r: Reader): string {
  const c = r.peek();
  if (c === ')' || c === ']') return `unmatched '${c}'`;
  if (c === '(' && PHASE_AHEAD.test(r.text.slice(r.pos, r.end))) return 'the phase goes at the end of the formula';
  if (startsCharge(c) && c !== '{') return 'the charge goes at the end of the formula';
  if (/\s/.test(c)) return 'no spaces inside a formula';
  return `unexpected character '${c}'`;
}

function signOf(c: string): 1 | -1 | 0 {
  return c === '+' || c === '⁺' ? 1 : c === '-' || c === '−' || c === '⁻' ? -1 : 0;
}
function isSign(c: string): boolean {
  return signOf(c) !== 0;
}
// `''.includes` is true for the empty string, which peek() returns at the end.
function isDigitOf(family: string, c: string): boolean {
  return c.length === 1 && family.includes(c);
}
function isAnyDigit(c: string): boolean {
  return isDigitOf(ASCII_DIGITS, c) || isDigitOf(SUPERSCRIPT_DIGITS, c);
}
function digitFamily(c: string): string {
  return isDigitOf(SUPERSCRIPT_DIGITS, c) ? SUPERSCRIPT_DIGITS : ASCII_DIGITS;
}
function startsChargeSpec(c: string): boolean {
  return isSign(c) || isAnyDigit(c);
}
function startsCharge(c: string): boolean {
  return c === '^' || c === '{' || startsChargeSpec(c);
}
function isUpper(c: string): boolean {
  return c >= 'A' && c <= 'Z' && c !== '';
}
function isLower(c: string): boolean {
  return c >= 'a' && c <= 'z' && c !== '';
}
function startsUnit(c: string): boolean {
  return isUpper(c) || c === '(' || c === '[';
}
function isRadicalDot(c: string): boolean {
  return c === '•' || c === '·' || c === '.';
}
function isAdductDot(c: string): boolean {
  return c === '·' || c === '.';
}
function startsAdductPart(c: string): boolean {
  return startsUnit(c) || isDigitOf(ASCII_DIGITS, c);
}
