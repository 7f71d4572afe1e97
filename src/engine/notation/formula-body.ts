/**
 * Reading the body of a formula (the atoms, before any charge or marks) into element counts:
 * adduct parts, units, bracketed groups and nuclides, following the grammar in formula.ts.
 */
import { isAtomSymbol, nuclideSymbol } from './elements.ts';
import {
  ASCII_DIGITS,
  PHASE_AHEAD,
  Reader,
  SUBSCRIPT_DIGITS,
  isAdductDot,
  isAnyDigit,
  isDigitOf,
  isLower,
  isSign,
  isUpper,
  readDigits,
  startsAdductPart,
  startsUnit,
  unexpectedMessage,
} from './formula-reader.ts';

/** How deep brackets may nest: [Co(NH3)6]3+ needs two; a deeper formula is a mistake (or an attack on the stack). */
export const MAX_BRACKET_DEPTH = 8;

/** Element symbol → count; nuclides such as 13C are their own symbols. */
export type Counts = Map<string, number>;

// body = part { adduct-dot [count] part }
/** Reads a body into element counts; undefined after a failure recorded in the reader. */
export function readBody(r: Reader, depth: number): Counts | undefined {
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
  if (PHASE_AHEAD.test(r.text.slice(at, Math.min(r.end, at + 4))))
    return r.fail('the phase goes at the end of the formula', at);
  if (depth >= MAX_BRACKET_DEPTH) return r.fail(`brackets nested more than ${MAX_BRACKET_DEPTH} deep`, at);
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

function addInto(total: Counts, add: ReadonlyMap<string, number>, times: number): void {
  for (const [symbol, n] of add) total.set(symbol, (total.get(symbol) ?? 0) + n * times);
}

function scale(counts: Counts, times: number): Counts {
  const scaled: Counts = new Map();
  addInto(scaled, counts, times);
  return scaled;
}
