import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  ELEMENT_SYMBOLS,
  atomicNumber,
  isAtomSymbol,
  nuclideSymbol,
  splitNuclide,
} from '../../src/engine/notation/elements.ts';
import { formatComposition, parseFormula, type Composition, type Phase } from '../../src/engine/notation/formula.ts';

function compositionOf(text: string): Composition {
  const r = parseFormula(text);
  if ('error' in r) throw new Error(`'${text}': ${r.error} at ${r.offset}`);
  return r.composition;
}

describe('element symbols', () => {
  it('holds the 118 elements, with D and T beside them', () => {
    expect(ELEMENT_SYMBOLS.size).toBe(118);
    // Atomic numbers from memory of the periodic table.
    expect(atomicNumber('H')).toBe(1);
    expect(atomicNumber('Fe')).toBe(26);
    expect(atomicNumber('U')).toBe(92);
    expect(atomicNumber('Og')).toBe(118);
    expect(ELEMENT_SYMBOLS.has('D')).toBe(false);
    expect(isAtomSymbol('D') && isAtomSymbol('T')).toBe(true);
    expect(isAtomSymbol('Xx')).toBe(false);
  });

  it('names nuclides, folding 2H and 3H into D and T', () => {
    expect(nuclideSymbol(13, 'C')).toEqual({ symbol: '13C' });
    expect(nuclideSymbol(2, 'H')).toEqual({ symbol: 'D' });
    expect(nuclideSymbol(3, 'H')).toEqual({ symbol: 'T' });
    expect(nuclideSymbol(5, 'C')).toHaveProperty('error'); // A < Z
    expect(splitNuclide('13C')).toEqual({ element: 'C', massNumber: 13 });
    expect(splitNuclide('D')).toEqual({ element: 'H', massNumber: 2 });
  });
});

describe('parseFormula: compositions', () => {
  // Element counts are those of the well-known formulas (from memory); charges are the ions' usual ones.
  const cases: [text: string, elements: Record<string, number>, charge: number, marks?: Partial<Composition>][] = [
    ['H2O2', { H: 2, O: 2 }, 0],
    ['I-', { I: 1 }, -1],
    ['Fe3+', { Fe: 1 }, 3],
    ['Fe+3', { Fe: 1 }, 3],
    ['Fe2+', { Fe: 1 }, 2],
    ['Fe++', { Fe: 1 }, 2],
    ['Cu2+', { Cu: 1 }, 2],
    ['Al3+', { Al: 1 }, 3],
    ['Fe3−', { Fe: 1 }, -3], // Unicode minus, for the rule only
    ['SO4^2-', { S: 1, O: 4 }, -2],
    ['SO4^{2-}', { S: 1, O: 4 }, -2],
    ['SO4{2-}', { S: 1, O: 4 }, -2],
    ['SO4²⁻', { S: 1, O: 4 }, -2],
    ['SO4^-2', { S: 1, O: 4 }, -2],
    ['SO4--', { S: 1, O: 4 }, -2],
    ['SO₄²⁻', { S: 1, O: 4 }, -2],
    ['NH4+', { N: 1, H: 4 }, 1], // ammonium: the 4 counts H
    ['NH₄⁺', { N: 1, H: 4 }, 1],
    ['H3O+', { H: 3, O: 1 }, 1],
    ['H2PO4-', { H: 2, P: 1, O: 4 }, -1],
    ['SO42-', { S: 1, O: 42 }, -1], // the documented pitfall: polyatomic, so 42 counts O
    ['I3^-', { I: 3 }, -1], // triiodide
    ['I3-', { I: 1 }, -3], // single element symbol: the digits are the charge
    ['Hg2^2+', { Hg: 2 }, 2], // mercury(I)
    ['Hg2++', { Hg: 2 }, 2],
    ['Fe2+3', { Fe: 2 }, 3], // sign before digits: always the charge
    ['[Co(NH3)6]3+', { Co: 1, N: 6, H: 18 }, 3],
    ['[Co(NH3)6]^3+', { Co: 1, N: 6, H: 18 }, 3],
    ['[Fe(CN)6]4-', { Fe: 1, C: 6, N: 6 }, -4],
    ['[Fe(CN)6]3-', { Fe: 1, C: 6, N: 6 }, -3],
    ['[Cu(NH3)4]+', { Cu: 1, N: 4, H: 12 }, 1],
    ['K4[Fe(CN)6]', { K: 4, Fe: 1, C: 6, N: 6 }, 0],
    ['Fe(OH)2+', { Fe: 1, O: 2, H: 2 }, 1], // digits after ')' count
    ['CuSO4·5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 0],
    ['CuSO4.5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 0],
    ['CuSO4·H2O', { Cu: 1, S: 1, O: 5, H: 2 }, 0],
    ['Ca(OH)2', { Ca: 1, O: 2, H: 2 }, 0],
    ['Al2(SO4)3', { Al: 2, S: 3, O: 12 }, 0],
    ['C₆H₁₂O₆', { C: 6, H: 12, O: 6 }, 0], // glucose
    ['CH2=CH2', { C: 2, H: 4 }, 0], // ethene, bond mark ignored
    ['HC≡CH', { C: 2, H: 2 }, 0], // ethyne
    ['e-', {}, -1],
    ['e−', {}, -1],
    ['e⁻', {}, -1],
    ['e-(aq)', {}, -1, { phase: 'aq' }],
    ['Br•', { Br: 1 }, 0, { radical: true }],
    ['Br.', { Br: 1 }, 0, { radical: true }],
    ['Cl·', { Cl: 1 }, 0, { radical: true }],
    ['•OH', { O: 1, H: 1 }, 0, { radical: true }],
    ['HO•', { O: 1, H: 1 }, 0, { radical: true }],
    ['·OH', { O: 1, H: 1 }, 0, { radical: true }],
    ['O2•-', { O: 2 }, -1, { radical: true }], // superoxide
    ['CH3C•HCH3', { C: 3, H: 7 }, 0, { radical: true }], // 2-propyl, dot at the radical centre
    ['O2*', { O: 2 }, 0, { excited: true }],
    ['NO2*', { N: 1, O: 2 }, 0, { excited: true }],
    ['H2O(l)', { H: 2, O: 1 }, 0, { phase: 'l' }],
    ['NaCl(s)', { Na: 1, Cl: 1 }, 0, { phase: 's' }],
    ['O2(g)', { O: 2 }, 0, { phase: 'g' }],
    ['Fe3+(aq)', { Fe: 1 }, 3, { phase: 'aq' }],
    ['SO4^2-(aq)', { S: 1, O: 4 }, -2, { phase: 'aq' }],
    ['Br•(g)', { Br: 1 }, 0, { radical: true, phase: 'g' }],
    ['D2O', { D: 2, O: 1 }, 0],
    ['HDO', { H: 1, D: 1, O: 1 }, 0],
    ['T2', { T: 2 }, 0],
    ['[2H]2O', { D: 2, O: 1 }, 0],
    ['[13C]O2', { '13C': 1, O: 2 }, 0],
    ['H2[18O]', { H: 2, '18O': 1 }, 0],
    ['[13C]H3[12C]H3', { '13C': 1, H: 6, '12C': 1 }, 0],
    ['  H2O ', { H: 2, O: 1 }, 0],
  ];

  it.each(cases)('%s', (text, elements, charge, marks = {}) => {
    const c = compositionOf(text);
    expect(Object.fromEntries(c.elements)).toEqual(elements);
    expect(c.charge).toBe(charge);
    expect(c.radical).toBe(marks.radical ?? false);
    expect(c.excited).toBe(marks.excited ?? false);
    expect(c.phase).toBe(marks.phase);
  });
});

describe('parseFormula: errors point at the problem', () => {
  const cases: [text: string, offset: number, message?: string][] = [
    ['Xx', 0, "unknown element 'Xx'"],
    ['H2Xx', 2, "unknown element 'Xx'"],
    ['E', 0, "unknown element 'E'"],
    ['A*', 0, "unknown element 'A'"],
    ['Ca(OH2', 2],
    ['Ca(OH))2', 6],
    ['[Co(NH3)6)3+', 9],
    ['[Fe(CN)6', 0],
    ['H2O$', 3],
    ['H 2O', 1],
    ['', 0, 'empty formula'],
    ['   ', 0, 'empty formula'],
    ['e', 0],
    ['e+', 0],
    ['2H2O', 0],
    ['H0', 1],
    ['Fe+-', 3],
    ['Fe3+2-', 5], // Fe3 with charge +2, then a second charge
    ['()', 0],
    ['H2O(aq)(g)', 3],
    ['(aq)', 0],
    ['SO4^', 3],
    ['SO4^{2-', 4],
    ['SO4^2', 5],
    ['(OH-)2', 3],
    ['[1C]', 1],
    ['[13Xx]', 3],
    ['[13C', 4],
    ['O2**', 3],
    ['h', 0],
  ];

  it.each(cases)('%s → offset %i', (text, offset, message) => {
    const r = parseFormula(text);
    expect(r).toMatchObject({ offset });
    if (message !== undefined) expect(r).toMatchObject({ error: message });
  });

  it('reads a trailing middle dot as a radical, not an empty hydrate', () => {
    expect(compositionOf('CuSO4·').radical).toBe(true);
  });
});

describe('formatComposition', () => {
  it('writes Hill order with the charge and marks', () => {
    expect(formatComposition(compositionOf('H2O2'))).toBe('H2 O2');
    expect(formatComposition(compositionOf('C2H5OH'))).toBe('C2 H6 O'); // C, H first when carbon is present
    expect(formatComposition(compositionOf('NH4+'))).toBe('H4 N, charge +1'); // alphabetical without carbon
    expect(formatComposition(compositionOf('[13C]H3CH2D'))).toBe('C 13C H5 D');
    expect(formatComposition(compositionOf('e-'))).toBe('no atoms, charge -1');
    expect(formatComposition(compositionOf('HO•'))).toBe('H O, radical');
    expect(formatComposition(compositionOf('NO2*(g)'))).toBe('N O2, excited, (g)');
  });
});

describe('parseFormula: properties', () => {
  const symbols = [...ELEMENT_SYMBOLS, 'D', 'T'];
  const atom = fc.oneof(
    fc.constantFrom(...symbols).map((s) => ({ text: s, symbol: s })),
    fc.constantFrom('13C', '15N', '18O', '37Cl').map((s) => ({ text: `[${s}]`, symbol: s })),
  );
  const unit = fc.record({ atom, count: fc.integer({ min: 1, max: 30 }), showOne: fc.boolean() });
  const composition = fc.record({
    units: fc.array(unit, { minLength: 1, maxLength: 6 }),
    charge: fc.integer({ min: -4, max: 4 }),
    chargeStyle: fc.constantFrom('caret', 'braces', 'superscript', 'sign-first', 'repeated'),
    radical: fc.boolean(),
    excited: fc.boolean(),
    phase: fc.option(fc.constantFrom<Phase>('aq', 'g', 'l', 's'), { nil: undefined }),
  });

  const SUPER = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  function chargeText(q: number, style: string): string {
    if (q === 0) return '';
    const sign = q > 0 ? '+' : '-';
    const m = Math.abs(q);
    switch (style) {
      case 'caret':
        return `^${m}${sign}`;
      case 'braces':
        return `^{${m}${sign}}`;
      case 'superscript':
        return `${m === 1 ? '' : [...String(m)].map((d) => SUPER[Number(d)]).join('')}${q > 0 ? '⁺' : '⁻'}`;
      case 'sign-first':
        return `${sign}${m}`;
      default:
        return sign.repeat(m);
    }
  }

  it('reads back what an unambiguous writer wrote', () => {
    fc.assert(
      fc.property(composition, (c) => {
        const body = c.units.map((u) => `${u.atom.text}${u.count > 1 || u.showOne ? u.count : ''}`).join('');
        let charge = chargeText(c.charge, c.chargeStyle);
        // Digits then one lone sign is the documented ambiguity (`Fe3+`); an unambiguous writer adds '^'.
        if (/^[+\-⁺⁻]$/.test(charge) && /\d$/.test(body)) charge = `^${charge}`;
        const text = `${body}${charge}${c.radical ? '•' : ''}${c.excited ? '*' : ''}${c.phase ? `(${c.phase})` : ''}`;
        const expected = new Map<string, number>();
        for (const u of c.units) expected.set(u.atom.symbol, (expected.get(u.atom.symbol) ?? 0) + u.count);
        const parsed = compositionOf(text);
        expect(parsed.elements).toEqual(expected);
        expect(parsed.charge).toBe(c.charge);
        expect(parsed.radical).toBe(c.radical);
        expect(parsed.excited).toBe(c.excited);
        expect(parsed.phase).toBe(c.phase);
      }),
    );
  });

  it('multiplies a bracketed group and a hydrate by their counts', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 12 }), (n, w) => {
        const c = compositionOf(`[Cr(H2O)${n}]2(SO4)3·${w}H2O`);
        expect(c.elements.get('Cr')).toBe(2);
        expect(c.elements.get('H')).toBe(2 * 2 * n + 2 * w);
        expect(c.elements.get('O')).toBe(2 * n + 12 + w);
      }),
    );
  });

  it('never throws, and every error offset lies inside the text', () => {
    const alphabet = fc.constantFrom(...'HOCNFeSl()[]{}^+-−23456·.•*e ²⁻₂aqgs'.split(''), 'Fe', '(aq)', '[13C]');
    fc.assert(
      fc.property(
        fc.array(alphabet, { maxLength: 12 }).map((a) => a.join('')),
        (text) => {
          const r = parseFormula(text);
          if ('error' in r) {
            expect(r.offset).toBeGreaterThanOrEqual(0);
            expect(r.offset).toBeLessThanOrEqual(text.length);
          }
        },
      ),
    );
  });
});
