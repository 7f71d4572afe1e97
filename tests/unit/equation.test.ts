import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseEquation, type ParsedEquation } from '../../src/engine/notation/equation.ts';

function equationOf(text: string): ParsedEquation {
  const r = parseEquation(text);
  if ('error' in r) throw new Error(`'${text}': ${r.error} at ${r.offset}`);
  return r.equation;
}

/** Terms as [species, coefficient, offset] for compact tables. */
function flat(terms: ParsedEquation['reactants']): [string, string, number][] {
  return terms.map((t) => [t.species, t.coefficient.toString(), t.offset]);
}

describe('parseEquation: terms, coefficients and offsets', () => {
  const cases: [
    text: string,
    reactants: [string, string, number][],
    products: [string, string, number][],
    reversible: boolean,
  ][] = [
    [
      'H2O2 + I- -> H2O + IO-',
      [
        ['H2O2', '1', 0],
        ['I-', '1', 7],
      ],
      [
        ['H2O', '1', 13],
        ['IO-', '1', 19],
      ],
      false,
    ],
    // Charges use + and -: a plus glued to a species is part of it.
    [
      'Fe3+ + e- -> Fe2+',
      [
        ['Fe3+', '1', 0],
        ['e-', '1', 7],
      ],
      [['Fe2+', '1', 13]],
      false,
    ],
    [
      'Na+ + Cl- -> NaCl',
      [
        ['Na+', '1', 0],
        ['Cl-', '1', 6],
      ],
      [['NaCl', '1', 13]],
      false,
    ],
    [
      '2 NO + O2 -> 2 NO2',
      [
        ['NO', '2', 2],
        ['O2', '1', 7],
      ],
      [['NO2', '2', 15]],
      false,
    ],
    ['2NO2 <=> N2O4', [['NO2', '2', 1]], [['N2O4', '1', 9]], true],
    ['2NO2<=>N2O4', [['NO2', '2', 1]], [['N2O4', '1', 7]], true],
    [
      '2e- + Cu2+ -> Cu',
      [
        ['e-', '2', 1],
        ['Cu2+', '1', 6],
      ],
      [['Cu', '1', 14]],
      false,
    ],
    ['2[Fe(CN)6]3- -> X', [['[Fe(CN)6]3-', '2', 1]], [['X', '1', 16]], false],
    ['2(CH3)3C• -> C8H18', [['(CH3)3C•', '2', 1]], [['C8H18', '1', 13]], false],
    [
      'E + S ⇌ ES',
      [
        ['E', '1', 0],
        ['S', '1', 4],
      ],
      [['ES', '1', 8]],
      true,
    ],
    ['A <-> B', [['A', '1', 0]], [['B', '1', 6]], true],
    ['A ⇄ B', [['A', '1', 0]], [['B', '1', 4]], true],
    ['A → B', [['A', '1', 0]], [['B', '1', 4]], false],
    ['A ⟶ B', [['A', '1', 0]], [['B', '1', 4]], false],
    [
      'A* -> A + hν',
      [['A*', '1', 0]],
      [
        ['A', '1', 6],
        ['hν', '1', 10],
      ],
      false,
    ],
    // The same species twice on one side is one term; the first offset is kept.
    ['A + A -> A2', [['A', '2', 0]], [['A2', '1', 9]], false],
    [
      'Br• + M + Br• -> Br2 + M',
      [
        ['Br•', '2', 0],
        ['M', '1', 6],
      ],
      [
        ['Br2', '1', 17],
        ['M', '1', 23],
      ],
      false,
    ],
    // White space: tabs and runs of spaces, and around the whole equation.
    [
      '  A\t+   B  ->C ',
      [
        ['A', '1', 2],
        ['B', '1', 8],
      ],
      [['C', '1', 13]],
      false,
    ],
    // A bond mark inside a species is not an arrow when a real arrow is present.
    [
      'CH2=CH2 + H2 -> C2H6',
      [
        ['CH2=CH2', '1', 0],
        ['H2', '1', 10],
      ],
      [['C2H6', '1', 16]],
      false,
    ],
    // `e-` right before the arrow with no space: the arrow is the first "->".
    ['e-->B', [['e-', '1', 0]], [['B', '1', 4]], false],
    // Digits not followed by a letter, '[' or '(' are part of the species text.
    ['2•OH -> H2O2', [['2•OH', '1', 0]], [['H2O2', '1', 8]], false],
  ];

  it.each(cases)('%s', (text, reactants, products, reversible) => {
    const e = equationOf(text);
    expect(flat(e.reactants)).toEqual(reactants);
    expect(flat(e.products)).toEqual(products);
    expect(e.reversible).toBe(reversible);
  });
});

describe('parseEquation: errors point at the problem', () => {
  const cases: [text: string, offset: number][] = [
    ['A = B', 2], // '=' is not an arrow; the message suggests '->' or '<=>'
    ['A => B', 2],
    ['A ↔ B', 2], // resonance arrow
    ['A <- B', 2],
    ['A + B', 5], // no arrow: points where one is expected
    ['A -> B -> C', 7], // second arrow
    ['A -> B <=> C', 7],
    [' -> B', 1], // empty left side: at the arrow
    ['A -> ', 2], // empty right side: at the arrow
    ['A +B -> C', 2], // plus without a space after it
    ['A+ B -> C', 3],
    ['A B -> C', 2],
    ['+ A -> B', 0],
    ['A + + B -> C', 4],
    ['A + -> B', 2],
    ['1/2 O2 -> O', 0],
    ['0.5 O2 -> O', 0],
    ['0.5O2 -> O', 0],
    ['½O2 -> O', 0],
    ['0 A -> B', 0],
    ['0A -> B', 0],
    ['-1 A -> B', 0],
    ['2 -> B', 1], // a coefficient with nothing after it
    ['A -> 2 B C', 9],
  ];

  it.each(cases)('%s → offset %i', (text, offset) => {
    expect(parseEquation(text)).toMatchObject({ offset });
  });

  it('names whole numbers for a fractional coefficient', () => {
    expect(parseEquation('1/2 O2 -> O')).toMatchObject({ error: expect.stringContaining('whole numbers') });
  });

  it('suggests an arrow for a bare equals sign', () => {
    expect(parseEquation('A = B')).toMatchObject({ error: expect.stringContaining("'<=>'") });
  });
});

describe('parseEquation: properties', () => {
  const species = fc.oneof(
    fc.constantFrom(
      'Fe3+',
      'Fe2+',
      'e-',
      'NH4+',
      'Na+',
      'I-',
      'H2O2',
      'SO4^2-',
      '[Co(NH3)6]3+',
      'A*',
      'E',
      'ES',
      'O2•-',
      'CH2=CH2',
      '(CH3)3C•',
    ),
    fc.stringMatching(/^[A-Z][A-Za-z0-9]{0,4}[+*-]?$/),
  );
  const term = fc.record({
    species,
    coefficient: fc.integer({ min: 1, max: 12 }),
    style: fc.constantFrom('plain', 'spaced', 'glued'),
  });
  const gap = fc.stringMatching(/^[ \t]{1,3}$/);
  const arrow = fc.constantFrom('->', '→', '⟶', '<=>', '⇌', '<->', '⇄');
  const side = fc.array(fc.tuple(term, gap, gap), { minLength: 1, maxLength: 4 });

  it('reads back terms written with any spacing, coefficient style and arrow', () => {
    fc.assert(
      fc.property(side, side, arrow, gap, gap, (left, right, arrowText, before, after) => {
        let text = '';
        const expectedSides: Map<string, { coefficient: bigint; offset: number }>[] = [];
        for (const [index, terms] of [left, right].entries()) {
          if (index === 1) text += `${before}${arrowText}${after}`;
          const expected = new Map<string, { coefficient: bigint; offset: number }>();
          terms.forEach(([t, gapBefore, gapAfter], i) => {
            if (i > 0) text += `${gapBefore}+${gapAfter}`;
            const style =
              t.coefficient === 1 && t.style === 'plain' ? 'plain' : t.style === 'plain' ? 'spaced' : t.style;
            if (style === 'spaced') text += `${t.coefficient} `;
            if (style === 'glued') text += `${t.coefficient}`;
            const seen = expected.get(t.species);
            const n = BigInt(style === 'plain' ? 1 : t.coefficient);
            expected.set(t.species, {
              coefficient: (seen?.coefficient ?? 0n) + n,
              offset: seen?.offset ?? text.length,
            });
            text += t.species;
          });
          expectedSides.push(expected);
        }
        const e = equationOf(text);
        for (const [terms, expected] of [
          [e.reactants, expectedSides[0]!],
          [e.products, expectedSides[1]!],
        ] as const) {
          expect(terms.map((t) => [t.species, t.coefficient.num, t.offset])).toEqual(
            [...expected].map(([s, v]) => [s, v.coefficient, v.offset]),
          );
          for (const t of terms) expect(text.slice(t.offset, t.offset + t.species.length)).toBe(t.species);
        }
        expect(e.reversible).toBe(['<=>', '⇌', '<->', '⇄'].includes(arrowText));
      }),
    );
  });

  it('never throws, and every error offset lies inside the text', () => {
    const piece = fc.constantFrom(
      'A',
      'Fe3+',
      'e-',
      ' + ',
      '+',
      ' ',
      '->',
      '<=>',
      '=',
      '2',
      '0',
      '1/2',
      '½',
      '⇌',
      '↔',
      '\t',
    );
    fc.assert(
      fc.property(
        fc.array(piece, { maxLength: 10 }).map((a) => a.join('')),
        (text) => {
          const r = parseEquation(text);
          if ('error' in r) {
            expect(r.offset).toBeGreaterThanOrEqual(0);
            expect(r.offset).toBeLessThanOrEqual(text.length);
          } else {
            expect(r.equation.reactants.length).toBeGreaterThan(0);
            expect(r.equation.products.length).toBeGreaterThan(0);
            for (const t of [...r.equation.reactants, ...r.equation.products])
              expect(t.coefficient.num).toBeGreaterThan(0n);
          }
        },
      ),
    );
  });
});
