/**
 * URL slugs for species symbols. Symbols carry charges, brackets, dots and case that matter
 * (CO is not Co), so the slug spells the symbol out in safe characters, and where two symbols
 * would still collide (case only) each gets a short suffix derived from its exact text.
 */

const SPELLED: Record<string, string> = {
  '+': '-plus',
  '-': '-minus',
  '*': '-excited',
  // A surface site: CO@ is "CO at a site", so it never shares a slug with CO.
  '@': '-at-site-',
  '•': '-radical',
  '·': '-dot-',
  '.': '-dot-',
  '^': '',
  '[': '',
  ']': '',
  '(': '-',
  ')': '-',
};

/** The readable part of a slug: lower case, letters and digits, hyphen-separated. */
export function readableSlug(symbol: string): string {
  let out = '';
  for (const c of symbol.normalize('NFKD')) {
    if (/[A-Za-z0-9]/.test(c)) out += c.toLowerCase();
    else if (c in SPELLED) out += SPELLED[c];
    else out += '-';
  }
  out = out.replace(/-+/g, '-').replace(/^-|-$/g, '');
  // A trailing radical dot written as '.' reads as a radical, not a hydrate dot.
  out = out.replace(/-dot$/, '-radical');
  return out || 'species';
}

/** Slugs for a whole catalogue's symbols, unique even where symbols differ only in case. */
export function speciesSlugs(symbols: Iterable<string>): Map<string, string> {
  const all = [...new Set(symbols)].sort();
  const byReadable = new Map<string, string[]>();
  for (const s of all) byReadable.set(readableSlug(s), [...(byReadable.get(readableSlug(s)) ?? []), s]);
  const out = new Map<string, string>();
  for (const [readable, symbolsHere] of byReadable) {
    for (const s of symbolsHere) out.set(s, symbolsHere.length === 1 ? readable : `${readable}-${shortHash(s)}`);
  }
  return out;
}

/** Six hex digits of FNV-1a over the symbol's exact text. */
function shortHash(text: string): string {
  let h = 0x811c9dc5;
  for (const ch of text) {
    h ^= ch.codePointAt(0)!;
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0').slice(0, 6);
}
