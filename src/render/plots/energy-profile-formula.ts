/**
 * Species formulas in SVG text: subscript counts and superscript charges as `tspan`s shifted with
 * `dy` (which every SVG renderer honours, unlike baseline-shift), each shift undone before the next
 * plain character so a line ends on its own baseline. The typesetting rules are the engine's
 * (speciesLatex), so a formula reads the same in the figures as on the pages.
 */
import { speciesLatex } from '../../engine/index.ts';
import { escapeXml } from './svg-text.ts';

const SHIFT = 3;
const SMALL = 8;
// Symbols the LaTeX route understands; anything else is shown as escaped text.
const TYPESET = /^[A-Za-z0-9()[\]+\-^•·.*@']+$/;

type Piece = { text: string; shift: -1 | 0 | 1 };

/** One line of species terms (`2 CHF3 + Cl•`, `+ H3O+ …`) as SVG text content with tspans. */
export function termsSvg(line: string): string {
  const pieces: Piece[] = [];
  line.split(/( )/).forEach((token) => {
    if (token === ' ' || token === '' || token === '+' || token === '…' || /^\d+(\.\d+)?$/.test(token))
      pieces.push({ text: token, shift: 0 });
    else {
      const cut = token.endsWith('…');
      pieces.push(...formulaPieces(cut ? token.slice(0, -1) : token));
      if (cut) pieces.push({ text: '…', shift: 0 });
    }
  });
  return piecesSvg(pieces);
}

/** One species symbol as SVG text content with subscripts and charges. */
export function formulaSvg(symbol: string): string {
  return piecesSvg(formulaPieces(symbol));
}

function formulaPieces(symbol: string): Piece[] {
  if (!TYPESET.test(symbol)) return [{ text: symbol, shift: 0 }];
  let latex = speciesLatex(symbol);
  latex = latex.replace(/^\\mathrm\{/, '').replace(/\}$/, '');
  const pieces: Piece[] = [];
  const push = (text: string, shift: Piece['shift']) => {
    if (text) pieces.push({ text, shift });
  };
  let i = 0;
  while (i < latex.length) {
    const rest = latex.slice(i);
    const script = /^([_^])\{((?:[^{}]|\{[^{}]*\})*)\}/.exec(rest);
    if (script) {
      push(plain(script[2]!), script[1] === '_' ? 1 : -1);
      i += script[0].length;
      continue;
    }
    const command = /^\\([A-Za-z]+) ?(?:\{([^{}]*)\})?/.exec(rest);
    if (command) {
      push(command[1] === 'cdot' ? '·' : command[1] === 'bullet' ? '•' : (command[2] ?? ''), 0);
      i += command[0].length;
      continue;
    }
    if (rest.startsWith('{}')) {
      i += 2;
      continue;
    }
    push(rest[0]!, 0);
    i += 1;
  }
  return pieces;
}

function plain(latex: string): string {
  return latex
    .replace(/\\bullet/g, '•')
    .replace(/\\cdot ?/g, '·')
    .replace(/[{}]/g, '')
    .replace(/-/g, '\u2212');
}

function piecesSvg(pieces: readonly Piece[]): string {
  let out = '';
  let offset = 0;
  for (const p of pieces) {
    const target = p.shift * SHIFT;
    const text = escapeXml(p.text);
    if (target === offset && p.shift === 0) out += text;
    else {
      const size = p.shift === 0 ? '' : ` font-size="${SMALL}"`;
      out += `<tspan dy="${target - offset}"${size}>${text}</tspan>`;
    }
    offset = target;
  }
  if (offset !== 0) out += `<tspan dy="${-offset}">\u200b</tspan>`;
  return out;
}
