/**
 * A short plain-text note (a step's or an observation's `note`) as safe HTML, with the notation
 * chemists type in plain text set properly: rate and equilibrium constants written `k_-1`,
 * `k_-bind`, `K_M`, `k_obs` as typeset symbols, numbers like `7.2e3` as 7.2 × 10³, unit powers
 * `s^-1` as s⁻¹, and a hyphen before a number as a true minus. Everything else is escaped text.
 */
import { quantityText, trueMinusSigns } from '../render/index.ts';
import { escapeHtml, renderMath } from './math.ts';

// A constant: k or K, an underscore, an optional minus (reverse step), then a label of letters and digits.
const CONSTANT = /\b([kK])_(-?)([A-Za-z0-9]+)\b/g;
// A number in e-notation with an optional unit of letters and powers after it.
const E_NUMBER = /(^|[\s(=≈~<>])([+-]?\d+(?:\.\d+)?[eE][+-]?\d+)/g;
const POWER = /\^\(?([+-]?\d+)\)?/g;

/** HTML for a plain-text note: escaped, with constants typeset by KaTeX and numbers made readable. */
export function plainNoteHtml(note: string): string {
  const pieces: string[] = [];
  let last = 0;
  for (const m of note.matchAll(CONSTANT)) {
    pieces.push(textHtml(note.slice(last, m.index)));
    const [, letter, minus, label] = m as unknown as [string, string, string, string];
    const sub = /^\d+$/.test(label) ? label : `\\mathrm{${label}}`;
    pieces.push(renderMath(`${letter}_{${minus ? '-' : ''}${sub}}`));
    last = m.index + m[0].length;
  }
  pieces.push(textHtml(note.slice(last)));
  return pieces.join('');
}

function textHtml(text: string): string {
  const readable = trueMinusSigns(text)
    .replace(E_NUMBER, (_, before: string, n: string) => before + quantityText(n))
    .replace(POWER, (power: string) => quantityText(power));
  return escapeHtml(readable);
}
