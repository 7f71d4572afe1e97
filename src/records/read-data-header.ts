/**
 * A data column's header: its name and, optionally, its unit, written as the quantity-calculus
 * convention for table headings has it, `H2O2 / mM` (IUPAC Green Book, "quantity / unit" — from
 * memory), or as `H2O2 (mM)` or `H2O2 [mM]`. Species symbols contain no spaces, so the name ends at
 * the first space.
 */

/** A header cell read: the column name and the unit text, if any; or why it cannot be read. */
export type DataHeader = { name: string; unit?: string } | { problem: string };

/** Reads one header cell. */
export function readDataHeader(text: string): DataHeader {
  const trimmed = text.trim();
  if (trimmed === '') return { problem: 'a column has no name' };
  const space = trimmed.search(/\s/);
  if (space < 0) return { name: trimmed };
  const name = trimmed.slice(0, space);
  const rest = trimmed.slice(space).trim();
  const unit = /^\/\s*(.+)$/.exec(rest)?.[1] ?? /^\((.+)\)$/.exec(rest)?.[1] ?? /^\[(.+)\]$/.exec(rest)?.[1];
  if (unit === undefined || unit.trim() === '')
    return {
      problem: `the header '${trimmed}' cannot be read: write the name, then ' / ' and the unit, as in 'rate / M s^-1'`,
    };
  return { name, unit: unit.trim() };
}

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A cell's number: YAML numbers as they are, text when it is a plain decimal number; undefined otherwise. */
export function cellNumber(value: unknown): number | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? value : undefined;
  if (typeof value !== 'string') return undefined;
  const text = value.trim().replaceAll('\u2212', '-');
  if (!NUMBER.test(text)) return undefined;
  const x = Number(text);
  return Number.isFinite(x) ? x : undefined;
}
