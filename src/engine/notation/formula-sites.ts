/**
 * Surface sites in formulas. `@` alone is a vacant site; a formula followed by `@` is that species
 * held on a site (`CO@`, `H@`, `O@`, read "CO at a site"). A kind may follow the mark, lower-case
 * letters and digits starting with a letter (`@a`, `CO@t1`), for a surface with more than one kind
 * of site; a species that occupies several sites repeats the mark (`C2H4@@`). The trade's `*`
 * is not used because `A*` already means an excited state. Sites count like a pseudo-element in
 * the balance of a step (so `CO + @ -> CO@` balances) and carry no atoms or charge.
 */
import type { Composition } from './composition.ts';
import { ASCII_DIGITS, Reader, isDigitOf, isLower } from './formula-reader.ts';

/** The mark that starts a surface site. */
export const SITE_MARK = '@';

/** Reads the site marks at the cursor to the end of the formula: the number of sites of each kind ('' for the plain site). */
export function readSites(r: Reader): Map<string, number> | undefined {
  const sites = new Map<string, number>();
  while (r.peek() === SITE_MARK) {
    r.pos++;
    const at = r.pos;
    if (isDigitOf(ASCII_DIGITS, r.peek())) return r.fail('a site kind starts with a lower-case letter (@a, @t1)', at);
    let kind = '';
    while (isLower(r.peek()) || isDigitOf(ASCII_DIGITS, r.peek())) {
      kind += r.peek();
      r.pos++;
    }
    sites.set(kind, (sites.get(kind) ?? 0) + 1);
  }
  if (r.pos < r.end) return r.fail('the site mark @ goes at the end of the formula', r.pos);
  return sites;
}

/** How a site kind is written in messages: `@`, `@a`. */
export function siteName(kind: string): string {
  return `${SITE_MARK}${kind}`;
}

/** True for a vacant site: sites and no atoms (`@`, `@a`). */
export function isVacantSite(composition: Composition | undefined): boolean {
  return (composition?.sites?.size ?? 0) > 0 && composition!.elements.size === 0;
}
