/**
 * The fits of a record written for a person: the orders fitted from each initial-rate table, each
 * rival fitted to each data set with its constants ± standard error and criteria, the ranking in a
 * plain sentence with the runs that drive it, the nested-law F tests, the next measurement, and the
 * activation parameters of each temperature series. Built from the JSON report's `fits`, so the
 * terminal, the pull-request comment and the site say the same. Record text is escaped by callers.
 */
import type { DataSetFitsJson, FittedValueJson, RecordFitsJson, RivalFitJson } from '../../model/index.ts';
import { numberText } from '../words/index.ts';

/** "the data favour X: Akaike weight 0.97 (rows 18, 17 and 24 of kx7-rate-table drive it most)". */
export function favouredSentence(set: DataSetFitsJson): string | undefined {
  const best = set.favoured;
  const ranked = set.rivals.filter((r) => r.weight !== undefined);
  if (!best || ranked.length === 0) return undefined;
  const shaky = ranked.filter((r) => r.unreliable).map((r) => r.record);
  if (ranked.length === 1)
    return `only ${best.record} could be fitted to ${set.observation}${shaky.length > 0 ? ', and its fit is unreliable' : ''}`;
  const close = ranked.filter((r) => r.record !== best.record && (r.delta_aicc ?? Infinity) < 2);
  const weight = `Akaike weight ${weightText(best.weight)}`;
  if (close.length > 0)
    return `the data of ${set.observation} do not tell ${[best.record, ...close.map((r) => r.record)].join(' and ')} apart (${weight} for ${best.record}; ΔAICc below 2)`;
  const rows = set.drivers?.length
    ? `; rows ${listText(set.drivers.map(String))} of ${set.observation} drive it most`
    : '';
  const caveat = shaky.length > 0 ? ` — but the fit of ${listText(shaky)} is unreliable, so the ranking is too` : '';
  return `the data favour ${best.record}: ${weight}${rows}${caveat}`;
}

/** A weight as a chemist reads it: 0.97, 0.003, < 0.001. */
export function weightText(w: number): string {
  if (!Number.isFinite(w)) return '—';
  if (w < 0.001) return '< 0.001';
  if (w > 0.999) return '> 0.999';
  return w >= 0.01 ? w.toFixed(2) : w.toPrecision(1);
}

/** value ± SE, with the unit; "not determined" where the data do not. */
export function valueText(q: FittedValueJson): string {
  const unit = q.unit ? ` ${q.unit}` : '';
  const se = Number.isFinite(q.standard_error) ? ` ± ${numberText(q.standard_error, 2)}` : '';
  return `${q.name} = ${numberText(q.value)}${se}${unit}${q.identifiable ? '' : ' (not determined by these data)'}`;
}

/** The record's fits, step by step. */
export function fitsText(fits: RecordFitsJson): string {
  const out: string[] = [];
  for (const o of fits.orders ?? [])
    out.push(
      `order in ${o.species} from ${o.observation}: ${numberText(o.value)} ± ${numberText(o.standard_error, 2)} (95 %: ${numberText(o.interval[0])} to ${numberText(o.interval[1])})`,
    );
  for (const set of fits.data_sets ?? []) out.push('', ...dataSetLines(set));
  for (const a of fits.activation ?? []) {
    out.push(
      '',
      `temperature series ${a.observation} (${a.constant}, ${a.points} points):`,
      `  Arrhenius: Ea = ${numberText(a.arrhenius.ea_kj_per_mol.value)} ± ${numberText(a.arrhenius.ea_kj_per_mol.standard_error, 2)} kJ/mol, ln A = ${numberText(a.arrhenius.ln_a.value)} ± ${numberText(a.arrhenius.ln_a.standard_error, 2)} (correlation ${a.arrhenius.correlation.toFixed(3)})`,
      `  Eyring: ΔH‡ = ${numberText(a.eyring.dh_kj_per_mol.value)} ± ${numberText(a.eyring.dh_kj_per_mol.standard_error, 2)} kJ/mol, ΔS‡ = ${numberText(a.eyring.ds_j_per_mol_k.value)} ± ${numberText(a.eyring.ds_j_per_mol_k.standard_error, 2)} J/(mol K) (standard state ${a.eyring.standard_concentration_m} M), ΔG‡(${a.eyring.reference_temperature_k} K) = ${numberText(a.eyring.dg_kj_per_mol.value)} ± ${numberText(a.eyring.dg_kj_per_mol.standard_error, 2)} kJ/mol`,
    );
    if (a.recorded)
      out.push(
        `  ${a.recorded.agrees ? 'agrees with' : 'disagrees with'} ${a.recorded.source}: ${a.recorded.quantity} = ${numberText(a.recorded.value_kj_per_mol)} kJ/mol`,
      );
  }
  return out.join('\n').replace(/^\n/, '') + '\n';
}

function dataSetLines(set: DataSetFitsJson): string[] {
  const what = set.kind.replace('_', ' ');
  const out = [`${what} ${set.observation} (record ${set.record}, ${set.points} points):`];
  for (const r of set.rivals) out.push(...rivalLines(r));
  const sentence = favouredSentence(set);
  if (sentence) out.push(`  ${sentence}`);
  for (const t of set.f_tests ?? [])
    out.push(
      `  F test, ${t.simpler} within ${t.complex}: F(${t.df1}, ${t.df2}) = ${numberText(t.f)}, p = ${numberText(t.p_value, 2)}${t.p_value < 0.05 ? ' — the larger law fits significantly better' : ' — the extra constants are not needed'}`,
    );
  const next = set.next_measurement;
  if (next)
    out.push(
      `  next: measure at ${next.symbol} = ${numberText(next.concentration_m, 2)} M (searched ${numberText(next.range_m[0], 2)}–${numberText(next.range_m[1], 2)} M), where ${next.rivals[0]} and ${next.rivals[1]} differ by ${numberText(next.separation_sigma, 2)} σ of the scatter`,
    );
  return out;
}

function rivalLines(r: RivalFitJson): string[] {
  const head = `  ${r.record} (${r.method.replace('_', ' ')})${r.law ? `: ${r.law}` : ''}`;
  if (r.issue && r.parameters.length === 0) return [`${head}`, `    not fitted: ${r.issue}`];
  const ranked =
    r.weight !== undefined ? `, ΔAICc ${numberText(r.delta_aicc ?? 0, 2)}, weight ${weightText(r.weight)}` : '';
  return [
    head,
    ...r.parameters.map((q) => `    ${valueText(q)}`),
    `    RSS ${numberText(r.rss ?? NaN)}, AICc ${numberText(r.aicc ?? NaN, 4)}, BIC ${numberText(r.bic ?? NaN, 4)}${ranked}${r.rejected ? ' — rejected by these data' : ''}${r.converged ? '' : ' — did not converge'}`,
    ...(r.fixed && Object.keys(r.fixed).length > 0
      ? [
          `    held, as these data cannot determine them (the fitted values above depend on them): ${Object.entries(
            r.fixed,
          )
            .map(([name, value]) => `${name} = ${numberText(value, 3)}`)
            .join(', ')}`,
        ]
      : []),
    ...(r.issue ? [`    ${r.issue}`] : []),
    ...(r.unreliable ? [`    unreliable, do not read these constants as measured: ${r.unreliable}`] : []),
  ];
}

function listText(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
