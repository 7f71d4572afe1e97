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
 *   sites    = "@" [kind] { "@" [kind] }, last: a species on a surface site (CO@); "@" alone is a
 *              vacant site (formula-sites.ts)
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
import type { Composition, Phase } from './composition.ts';
import { readBody, type Counts } from './formula-body.ts';
import { readCharge } from './formula-charge.ts';
import { readSites, SITE_MARK } from './formula-sites.ts';
import {
  Reader,
  isAnyDigit,
  isLower,
  isRadicalDot,
  startsCharge,
  unexpectedMessage,
  type FormulaError,
} from './formula-reader.ts';

export type { Composition, Phase } from './composition.ts';
export type { FormulaError } from './formula-reader.ts';
export { formatComposition } from './format-composition.ts';

const PHASE_SUFFIX = /\((aq|g|l|s)\)$/;

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
  if (r.peek() === SITE_MARK) {
    const sites = readSites(r);
    return sites
      ? { composition: { elements: new Map(), charge: 0, radical: false, excited: false, sites } }
      : r.failure!;
  }
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
  let sites: Map<string, number> | undefined;
  while (r.pos < r.end) {
    const c = r.peek();
    const at = r.pos;
    if (c === SITE_MARK && !electron) {
      sites = readSites(r);
      if (!sites) return r.failure!;
    } else if (isRadicalDot(c)) {
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
  if (sites) composition.sites = sites;
  return { composition };
}

function emptyBodyMessage(c: string, phase: Phase | undefined): string {
  if (c === '') return phase === undefined ? 'expected an element symbol' : 'a phase needs a formula before it';
  if (isAnyDigit(c)) return 'a formula cannot start with a number (a coefficient belongs in the equation)';
  if (isLower(c)) return 'element symbols start with a capital letter';
  return `unexpected character '${c}'`;
}
