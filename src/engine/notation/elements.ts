/**
 * The atom symbols a formula may use, and how nuclides are written.
 *
 * - The 118 element symbols, in order of atomic number (from memory of the IUPAC periodic table,
 *   2016 names for 113, 115, 117 and 118).
 * - `D` and `T` stand for deuterium and tritium, as chemists write them (`D2O`, `HDO`). They are
 *   symbols of their own for balance: D balances only with D, never with H.
 * - Any other nuclide is written with its mass number in square brackets: `[13C]`, `[18O]`,
 *   `[15N]H3`. It counts as the symbol `13C`, `18O`…, again only balancing with itself.
 *   `[2H]` and `[3H]` are read as `D` and `T`, so both spellings balance with each other.
 *   Brackets were chosen over a leading superscript or caret because a digit glued to the front
 *   of a species is its coefficient in a step (`2NO`), and `^` already introduces a charge.
 */

const ELEMENTS_BY_ATOMIC_NUMBER: readonly string[] = [
  'H',
  'He',
  'Li',
  'Be',
  'B',
  'C',
  'N',
  'O',
  'F',
  'Ne',
  'Na',
  'Mg',
  'Al',
  'Si',
  'P',
  'S',
  'Cl',
  'Ar',
  'K',
  'Ca',
  'Sc',
  'Ti',
  'V',
  'Cr',
  'Mn',
  'Fe',
  'Co',
  'Ni',
  'Cu',
  'Zn',
  'Ga',
  'Ge',
  'As',
  'Se',
  'Br',
  'Kr',
  'Rb',
  'Sr',
  'Y',
  'Zr',
  'Nb',
  'Mo',
  'Tc',
  'Ru',
  'Rh',
  'Pd',
  'Ag',
  'Cd',
  'In',
  'Sn',
  'Sb',
  'Te',
  'I',
  'Xe',
  'Cs',
  'Ba',
  'La',
  'Ce',
  'Pr',
  'Nd',
  'Pm',
  'Sm',
  'Eu',
  'Gd',
  'Tb',
  'Dy',
  'Ho',
  'Er',
  'Tm',
  'Yb',
  'Lu',
  'Hf',
  'Ta',
  'W',
  'Re',
  'Os',
  'Ir',
  'Pt',
  'Au',
  'Hg',
  'Tl',
  'Pb',
  'Bi',
  'Po',
  'At',
  'Rn',
  'Fr',
  'Ra',
  'Ac',
  'Th',
  'Pa',
  'U',
  'Np',
  'Pu',
  'Am',
  'Cm',
  'Bk',
  'Cf',
  'Es',
  'Fm',
  'Md',
  'No',
  'Lr',
  'Rf',
  'Db',
  'Sg',
  'Bh',
  'Hs',
  'Mt',
  'Ds',
  'Rg',
  'Cn',
  'Nh',
  'Fl',
  'Mc',
  'Lv',
  'Ts',
  'Og',
];

/** The 118 element symbols. */
export const ELEMENT_SYMBOLS: ReadonlySet<string> = new Set(ELEMENTS_BY_ATOMIC_NUMBER);

/** Hydrogen isotopes with symbols of their own, and their mass numbers. */
export const HYDROGEN_ISOTOPES: ReadonlyMap<string, number> = new Map([
  ['D', 2],
  ['T', 3],
]);

/** True for a symbol that may stand alone in a formula: an element, `D` or `T`. */
export function isAtomSymbol(symbol: string): boolean {
  return ELEMENT_SYMBOLS.has(symbol) || HYDROGEN_ISOTOPES.has(symbol);
}

/** Atomic number of an element symbol (1 for D and T), or undefined. */
export function atomicNumber(symbol: string): number | undefined {
  if (HYDROGEN_ISOTOPES.has(symbol)) return 1;
  const index = ELEMENTS_BY_ATOMIC_NUMBER.indexOf(symbol);
  return index < 0 ? undefined : index + 1;
}

/**
 * The balance symbol of a nuclide written `[<mass><element>]`, or an error message.
 * Deuterium and tritium fold into `D` and `T` so that `[2H]2O` and `D2O` are the same atoms.
 */
export function nuclideSymbol(massNumber: number, element: string): { symbol: string } | { error: string } {
  const z = ELEMENT_SYMBOLS.has(element) ? atomicNumber(element) : undefined;
  if (z === undefined) return { error: `unknown element '${element}'` };
  // A < Z is impossible (a nucleus has at least its protons); 300 is far above any known nuclide.
  if (massNumber < z || massNumber > 300) {
    return { error: `mass number ${massNumber} is impossible for ${element} (atomic number ${z})` };
  }
  if (element === 'H' && massNumber === 2) return { symbol: 'D' };
  if (element === 'H' && massNumber === 3) return { symbol: 'T' };
  return { symbol: `${massNumber}${element}` };
}

/** The element and mass number behind a balance symbol: `13C` → C, 13; `D` → H, 2; `Fe` → Fe. */
export function splitNuclide(symbol: string): { element: string; massNumber?: number } {
  const hydrogen = HYDROGEN_ISOTOPES.get(symbol);
  if (hydrogen !== undefined) return { element: 'H', massNumber: hydrogen };
  const match = /^(\d+)([A-Z][a-z]?)$/.exec(symbol);
  if (match) return { element: match[2]!, massNumber: Number(match[1]) };
  return { element: symbol };
}
