/**
 * Numbers as a reader sees them: typeset for pages and plots (5.63 × 10⁻⁶, a true minus sign),
 * plain for terminals (5.63e-6), percentages and reaction orders. One place, so the CLI, the
 * site and the figures print the same value the same way.
 */

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '-': '⁻',
  '+': '⁺',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** Digits and signs as Unicode superscripts (`-12` → `⁻¹²`); other characters are kept. */
export function superscript(text: string): string {
  return [...text].map((c) => SUPERSCRIPT[c] ?? c).join('');
}

/** A leading hyphen-minus as a true minus sign (U+2212). */
export function trueMinus(text: string): string {
  return text.replace(/^-/, '\u2212');
}

/** Every hyphen-minus that stands before a number (at the start or after a space, bracket, = or ±) as a true minus. */
export function trueMinusSigns(text: string): string {
  return text.replace(/(^|[\s(=±~≈<>,;])(?<!\^\()-(?=\.?\d)/g, '$1\u2212');
}

/** A number in plain or scientific notation with `digits` significant figures: 5.63 × 10⁻⁶. */
export function numberText(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(x)));
  if (exponent >= -3 && exponent < 5) return trueMinus(String(Number(x.toPrecision(digits))));
  const [mantissa, exp] = x.toExponential(digits - 1).split('e') as [string, string];
  return `${trueMinus(String(Number(mantissa)))} × 10${superscript(String(Number(exp)))}`;
}

/** Three significant figures for a terminal; exponent form outside 0.001–10 000 (`1.23e-5`). */
export function plainNumber(x: number): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  if (Math.abs(x) >= 1e-3 && Math.abs(x) < 1e4) return String(Number(x.toPrecision(3)));
  const [mantissa, exponent] = x.toExponential(2).split('e');
  return `${Number(mantissa)}e${Number(exponent)}`;
}

/** A fraction as a percentage: "< 0.01 %", "0.25 %", "5.3 %", "13 %". */
export function percentText(x: number): string {
  const p = x * 100;
  if (p < 0.01) return '< 0.01 %';
  return `${p < 1 ? p.toFixed(2) : p < 10 ? p.toFixed(1) : p.toFixed(0)} %`;
}

/** A value with fixed decimals and a true minus sign, as typeset; −0.0 prints as 0.0. */
export function signedValue(x: number, decimals = 1): string {
  const text = x.toFixed(decimals);
  if (Number(text) === 0) return (0).toFixed(decimals);
  return trueMinus(text);
}

/** An order as the report gives it (1, 0.5556, "1/2", "-1/2"): numbers to at most three decimals, fractions as written, a true minus sign. */
export function orderText(order: number | string): string {
  return trueMinus(typeof order === 'number' ? String(Number(order.toFixed(3))) : order);
}

/** The limits of an order as [X] → 0 and [X] → ∞: one value where they agree, else `low → high`. */
export function limitsText(low: number | string, high: number | string): string {
  return String(low) === String(high) ? orderText(low) : `${orderText(low)} \u2192 ${orderText(high)}`;
}

/** A quantity as written in a record, made readable: `8.1e4 M^-1 s^-1` → `8.1 × 10⁴ M⁻¹ s⁻¹`. */
export function quantityText(text: string): string {
  return trueMinusSigns(text.trim())
    .replace(/\+\/-/g, '±')
    .replace(
      /^([+\u2212-]?(?:\d+\.?\d*|\.\d+))[eE]([+-]?\d+)/,
      (_, m: string, e: string) => `${m} × 10${superscript(String(Number(e)))}`,
    )
    .replace(/\^\(?([+-]?\d+)\)?/g, (_, e: string) => superscript(e));
}

/** M^(1−n) s⁻¹ written with superscripts: s⁻¹, M⁻¹ s⁻¹, M s⁻¹ (the unit of a rate constant of molecularity n). */
export function rateConstantUnit(molecularity: number): string {
  const power = 1 - molecularity;
  if (power === 0) return 's⁻¹';
  return `M${power === 1 ? '' : superscript(String(power))} s⁻¹`;
}
