/**
 * Characters in a species symbol that a reader cannot see or cannot tell from a common one: the
 * Cyrillic and Greek letters drawn like Latin ones (А and A are different species that look the
 * same), zero-width characters, and the bidirectional controls that reorder what is shown. The
 * formula reader rejects all of them; in labels notation they are allowed but warned about.
 */

// Cyrillic and Greek letters whose usual glyph is a Latin letter's, each above the letter it passes for.
const LOOK_ALIKES = 'АВЕКМНОРСТХЅІЈаеорсухѕіјԁһΑΒΕΖΗΙΚΜΝΟΡΤΥΧον';
const LATIN_TWINS = 'ABEKMHOPCTXSIJaeopcyxsijdhABEZHIKMNOPTYXov';

const INVISIBLE: Readonly<Record<string, string>> = {
  '\u200b': 'a zero-width space',
  '\u200c': 'a zero-width non-joiner',
  '\u200d': 'a zero-width joiner',
  '\u2060': 'a word joiner',
  '\ufeff': 'a zero-width no-break space',
  '\u00ad': 'a soft hyphen',
  '\u061c': 'an Arabic letter mark (a bidirectional control)',
  '\u200e': 'a left-to-right mark (a bidirectional control)',
  '\u200f': 'a right-to-left mark (a bidirectional control)',
};

function codePoint(c: string): string {
  return `U+${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
}

/** The first confusing character of a symbol: its index and what it is, in words; undefined when there is none. */
export function confusableCharacter(symbol: string): { index: number; description: string } | undefined {
  for (let index = 0; index < symbol.length; index++) {
    const c = symbol[index]!;
    const twin = LOOK_ALIKES.indexOf(c);
    if (twin >= 0)
      return { index, description: `${c} (${codePoint(c)}), which looks like the Latin letter ${LATIN_TWINS[twin]}` };
    const invisible = INVISIBLE[c] ?? (/[\u202a-\u202e\u2066-\u2069]/.test(c) ? 'a bidirectional control' : undefined);
    if (invisible !== undefined) return { index, description: `${invisible} (${codePoint(c)}), which cannot be seen` };
  }
  return undefined;
}
