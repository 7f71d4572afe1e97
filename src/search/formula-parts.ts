/**
 * A species symbol split for display in the browser: counts as subscripts, a trailing charge or
 * radical dot as a superscript (`H3O+` → H, ₃, O, ⁺), so search results read like the pages'
 * typeset formulas without shipping a typesetter. The rules follow the ones the pages use.
 */

/** One piece of a formula: plain text, a subscript or a superscript. */
export interface FormulaPart {
  text: string;
  kind: 'text' | 'sub' | 'sup';
}

/** The pieces of a symbol as written (`CH3CH(OCH3)2`, `SO4^2-`, `Fe3+`, `CF3•`, `ES`). */
export function formulaParts(symbol: string): FormulaPart[] {
  let body = symbol;
  let charge = '';
  const explicit = /\^\{?(\d*[+-]+|[+-]\d*)\}?$/.exec(body);
  const trailing = /(\d*)([+-])$/.exec(body);
  if (explicit && explicit.index > 0) {
    charge = explicit[1]!;
    body = body.slice(0, explicit.index);
  } else if (trailing && trailing.index > 0) {
    const before = body.slice(0, trailing.index);
    // `Fe3+` (an element, or a bracket) carries charge 3+; in `NH4+` the 4 is a count.
    const digitsAreCharge = trailing[1] !== '' && (before.endsWith(']') || /^[A-Z][a-z]?$/.test(before));
    charge = digitsAreCharge ? `${trailing[1]}${trailing[2]}` : trailing[2]!;
    body = digitsAreCharge ? before : body.slice(0, -1);
  }
  if (/[•·.]$/.test(body) && body.length > 1) {
    charge = `•${charge}`;
    body = body.slice(0, -1);
  }
  const parts: FormulaPart[] = [];
  for (const m of body.matchAll(/(?<=[A-Za-z)\]])\d+|[^\d]+|\d+/g)) {
    const isCount = /^\d+$/.test(m[0]) && m.index > 0 && /[A-Za-z)\]]/.test(body[m.index - 1]!);
    parts.push({ text: m[0], kind: isCount ? 'sub' : 'text' });
  }
  if (charge) parts.push({ text: charge.replace(/-/g, '\u2212'), kind: 'sup' });
  return parts;
}
