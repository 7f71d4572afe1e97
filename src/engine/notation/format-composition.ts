/**
 * Element counts in Hill order, for messages. Apart from the parser because it only reads a
 * finished composition and has its own ordering rule.
 */
import type { Composition } from './composition.ts';
import { splitNuclide } from './elements.ts';

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
  for (const [kind, n] of c.sites ?? []) parts.push(`${n} site${n === 1 ? '' : 's'} @${kind}`);
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
