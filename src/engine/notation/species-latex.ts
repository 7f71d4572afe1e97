/**
 * A species symbol as LaTeX for KaTeX: counts as subscripts, charges and radical dots as
 * superscripts (`SO4^2-` → `\mathrm{SO_4^{2-}}`). Species symbols are user text, so every
 * character outside the formula alphabet is escaped or dropped: nothing the user wrote can
 * become a LaTeX command.
 */

const ESCAPES: Record<string, string> = {
  '{': '\\{',
  '}': '\\}',
  _: '\\_',
  '#': '\\#',
  $: '\\$',
  '%': '\\%',
  '&': '\\&',
  '~': '\\sim ',
  '\\': '\\backslash ',
  ' ': '\\ ',
};

/** The LaTeX of a species symbol, wrapped in \mathrm{…}; surface-site marks (`CO@`, `@a`) stay as written, kinds as subscripts. */
export function speciesLatex(symbol: string): string {
  const marks = /(@[a-z0-9]*)+$/.exec(symbol);
  if (!marks) return formulaLatex(symbol);
  const sites = marks[0].replace(/@([a-z0-9]*)/g, (_, kind: string) => (kind ? `@_{${kind}}` : '@'));
  return marks.index === 0
    ? `\\mathrm{${sites}}`
    : `\\mathrm{${formulaLatex(symbol.slice(0, marks.index)).slice(8, -1)}${sites}}`;
}

function formulaLatex(symbol: string): string {
  const { body: withoutCharge, charge } = splitCharge(symbol);
  let body = withoutCharge;
  const radical = /[•·.]$/.test(body) && body.length > 1;
  if (radical) body = body.slice(0, -1);
  const excited = body.endsWith('*') && body.length > 1;
  if (excited) body = body.slice(0, -1);
  const sup = [radical ? '\\bullet' : '', excited ? '*' : '', charge].join('');
  return `\\mathrm{${bodyLatex(body)}${sup ? `^{${sup}}` : ''}}`;
}

/** Separates a trailing charge, read as the formula parser reads it (`Fe3+`, `Fe+3`, `SO4^2-`, `NH4+`, `[X]3+`). */
function splitCharge(symbol: string): { body: string; charge: string } {
  const explicit = /\^\{?(\d*[+-]+|[+-]\d*)\}?$/.exec(symbol);
  if (explicit && explicit.index > 0)
    return { body: symbol.slice(0, explicit.index), charge: normaliseCharge(explicit[1]!) };
  const signFirst = /(?<=[A-Za-z)\]])([+-])(\d+)$/.exec(symbol);
  if (signFirst) return { body: symbol.slice(0, signFirst.index), charge: `${signFirst[2]}${signFirst[1]}` };
  const trailing = /(\d*)([+-]+)$/.exec(symbol);
  if (!trailing || trailing.index + trailing[1]!.length === 0) return { body: symbol, charge: '' };
  const before = symbol.slice(0, trailing.index);
  const digitsAreCharge =
    trailing[1] !== '' && trailing[2]!.length === 1 && (before.endsWith(']') || /^[A-Z][a-z]?$/.test(before));
  if (digitsAreCharge) return { body: before, charge: `${trailing[1]}${trailing[2]}` };
  return { body: symbol.slice(0, trailing.index + trailing[1]!.length), charge: trailing[2]! };
}

function normaliseCharge(text: string): string {
  const m = /^([+-])(\d+)$/.exec(text);
  return m ? `${m[2]}${m[1]}` : text;
}

function bodyLatex(body: string): string {
  let out = '';
  for (let i = 0; i < body.length; i++) {
    const c = body[i]!;
    if (/\d/.test(c) && i > 0 && /[A-Za-z)\]]/.test(body[i - 1]!)) {
      const digits = /^\d+/.exec(body.slice(i))![0];
      out += `_{${digits}}`;
      i += digits.length - 1;
    } else if (/[A-Za-z0-9()[\]+\-'·.*•=@]/.test(c)) {
      out += c === '•' ? '{}^{\\bullet}' : c === '·' ? '\\cdot ' : c;
    } else if (c in ESCAPES) {
      out += ESCAPES[c];
    } else if (/\p{L}/u.test(c) && c.length === 1 && /[α-ωΑ-Ω]/.test(c)) {
      out += `\\text{${c}}`;
    }
  }
  return out;
}
