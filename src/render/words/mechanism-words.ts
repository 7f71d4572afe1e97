/**
 * Words and number formats for the mechanism page: the names of the derivation methods, orders
 * and their limits, quantities as written in a record made readable, and the observation checks
 * of several rate laws gathered into one row per measured order. Formatting only: every value
 * here comes from the engine's report.
 */
import type { ObservationJson } from '../report/record-report.ts';

const METHODS: Record<string, { name: string; about: string }> = {
  rds: {
    name: 'Rate-determining step with fast pre-equilibria',
    about: 'The rate is that of the rate-determining step; each intermediate before it is eliminated through the reversible steps treated as equilibria.',
  },
  steady_state: {
    name: 'Steady-state approximation',
    about: 'Every intermediate is taken to be at steady state (its net rate of formation is zero); conserved catalysts enter through their total concentration.',
  },
};

/** The method of a rate law in words, e.g. "Steady-state approximation". */
export function methodName(method: string): string {
  return METHODS[method]?.name ?? method;
}

/** One sentence saying what the method assumes. */
export function methodAbout(method: string): string {
  return METHODS[method]?.about ?? '';
}

/** A short column heading for a method. */
export function methodShort(method: string): string {
  return method === 'rds' ? 'pre-equilibrium' : method === 'steady_state' ? 'steady state' : method;
}

/** An order as the report gives it (1, 0, "1/2", "-1/2") with a true minus sign. */
export function orderText(order: number | string): string {
  return String(order).replace(/^-/, '−');
}

/** The limits of an order: "1" when they agree, otherwise "1 → 0" (low → high concentration). */
export function limitsText(low: number | string, high: number | string): string {
  return String(low) === String(high) ? orderText(low) : `${orderText(low)} → ${orderText(high)}`;
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '+': '⁺', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };
const superscript = (text: string) => [...text].map((c) => SUPERSCRIPT[c] ?? c).join('');

/** A number in plain or scientific notation with `digits` significant figures: 5.63 × 10⁻⁶. */
export function numberText(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(x)));
  if (exponent >= -3 && exponent < 5) return String(Number(x.toPrecision(digits))).replace(/^-/, '−');
  const [mantissa, exp] = x.toExponential(digits - 1).split('e') as [string, string];
  return `${String(Number(mantissa)).replace(/^-/, '−')} × 10${superscript(String(Number(exp)))}`;
}

/** A quantity as written in a record, made readable: `8.1e4 M^-1 s^-1` → `8.1 × 10⁴ M⁻¹ s⁻¹`. */
export function quantityText(text: string): string {
  return text
    .replace(/\+\/-/g, '±')
    .replace(/^([+-]?(?:\d+\.?\d*|\.\d+))[eE]([+-]?\d+)/, (_, m: string, e: string) => `${m} × 10${superscript(String(Number(e)))}`)
    .replace(/\^\(?([+-]?\d+)\)?/g, (_, e: string) => superscript(e));
}

/** A fraction as a percentage with up to three significant figures: 0.1295 → "13 %". */
export function percentText(x: number): string {
  const pct = x * 100;
  return `${pct < 1 && pct > 0 ? Number(pct.toPrecision(2)) : Math.round(pct)} %`;
}

/** The word of an observation check's status (never colour alone). */
export function verdictText(status: string): string {
  return status === 'pass' ? '✓ consistent' : status === 'fail' ? '✗ contradicted' : '? cannot tell';
}

/** What the rate law predicts for one observed order: at the conditions, a fixed value, or a range. */
export function predictionText(check: ObservationJson): string {
  if (check.range) return `${orderText(check.range[0])} to ${orderText(check.range[1])} (depends on the constants)`;
  if (check.predicted === undefined) return '—';
  return check.basis === 'limits' ? `${orderText(check.predicted)} (at any conditions)` : `${orderText(check.predicted)} at these conditions`;
}

export interface ObservationRow {
  observation: string;
  species: string;
  observed: number;
  tolerance: number;
  /** per method, the check */
  checks: Record<string, ObservationJson>;
}

/** The checks of every rate law, one row per observation and species, in the report's order. */
export function observationRows(checks: readonly ObservationJson[]): ObservationRow[] {
  const rows = new Map<string, ObservationRow>();
  for (const c of checks) {
    const key = JSON.stringify([c.id, c.species]);
    const row = rows.get(key) ?? { observation: c.id, species: c.species, observed: c.observed, tolerance: c.tolerance, checks: {} };
    row.checks[c.method] = c;
    rows.set(key, row);
  }
  return [...rows.values()];
}

/** A role in words: `third_body` → "third body". */
export function roleText(role: string | undefined): string {
  return role ? role.replace(/_/g, ' ') : 'not derived';
}

const ROLE_ORDER = ['reactant', 'product', 'catalyst', 'intermediate', 'inhibitor', 'third_body', 'solvent'];

/** Sort key of a role: reactants first, then products, catalysts, intermediates, the rest. */
export function roleRank(role: string | undefined): number {
  const i = ROLE_ORDER.indexOf(role ?? '');
  return i < 0 ? ROLE_ORDER.length : i;
}

/** The LaTeX of a grouped constant's name (`k_obs` → `k_\mathrm{obs}`). */
export function constantNameLatex(name: string): string {
  const m = /^([A-Za-z])_([A-Za-z0-9]+)$/.exec(name);
  return m ? `${m[1]}_\\mathrm{${m[2]}}` : `\\mathrm{${name.replace(/[^A-Za-z0-9]/g, '')}}`;
}

/** Molecularity in words: 2 → "bimolecular". */
export function molecularityText(n: number): string {
  return ['', 'unimolecular', 'bimolecular', 'termolecular'][n] ?? `${n} reactant molecules`;
}
