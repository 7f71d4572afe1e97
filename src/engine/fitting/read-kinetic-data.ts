/**
 * A record's data table (as src/records read it, with every cell's place) turned into kinetic
 * data in canonical units, with the checks that need the engine: units of the right kind, species
 * of the mechanism, absolute temperatures above zero, enough points, and whether the data vary
 * what a fit must find. Problems are diagnostics at their cell; nothing throws.
 */
import {
  DATA_COLUMN_NAMES,
  diagnostic,
  uncertaintyOf,
  type DataColumn,
  type DataTable,
  type Diagnostic,
  type RuleId,
  type SourceSpot,
} from '../../model/index.ts';
import { readColumnUnit, type ColumnQuantity } from './column-units.ts';
import type { KineticData } from './kinetic-data.ts';
import { checkDataPoints } from './check-data-points.ts';

const QUANTITY: Record<string, ColumnQuantity> = { rate: 'rate', t: 'time', T: 'temperature', k: 'rate constant' };

/** Converts a table to canonical units and checks it; `species` are the mechanism's symbols. */
export function readKineticData(
  table: DataTable,
  species: readonly string[],
): { data?: KineticData; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const report = (rule: RuleId, at: SourceSpot, message: string, severity: 'error' | 'warning' = 'error') =>
    diagnostics.push(diagnostic(rule, severity, message, { file: at.file, line: at.line, column: at.column }));
  const values = new Map<string, number[]>();
  let order: number | undefined;
  for (const column of table.columns) {
    if (column.name === 'replicate') continue;
    const of = uncertaintyOf(column.name);
    const base = of ?? column.name;
    const quantity = QUANTITY[base] ?? 'concentration';
    if (quantity === 'concentration' && of === undefined && !species.includes(column.name)) {
      const known = species.length <= 12 ? ` (the mechanism has ${species.join(', ')})` : '';
      report('data/columns', column.at, `'${column.name}' is not a species of this mechanism${known}`);
      continue;
    }
    const unit = readColumnUnit(column.unit ?? '', quantity, of !== undefined);
    if ('problem' in unit) {
      report('data/units', column.unitAt ?? column.at, unit.problem);
      continue;
    }
    if (quantity === 'rate constant' && of === undefined) order = unit.order;
    values.set(column.name, convert(column, unit.factor, unit.offset));
  }
  const temperatures = table.columns.find((c) => c.name === 'T');
  values.get('T')?.forEach((T, r) => {
    if (!(T > 0))
      report(
        'data/range',
        temperatures!.cells[r]!,
        `an absolute temperature must be above 0 K; this is ${T.toFixed(2)} K`,
      );
  });
  if (diagnostics.some((d) => d.severity === 'error')) return { diagnostics };
  const data = assemble(table, values, order ?? 1);
  diagnostics.push(...checkDataPoints(table, data));
  return diagnostics.some((d) => d.severity === 'error') ? { diagnostics } : { data, diagnostics };
}

function convert(column: DataColumn, factor: number, offset: number): number[] {
  // Empty cells stay NaN here and are read back as "not measured" below.
  return column.values.map((v) => (v === undefined ? NaN : v * factor + offset));
}

function assemble(table: DataTable, values: Map<string, number[]>, order: number): KineticData {
  const rows = Array.from({ length: table.rows }, (_, r) => r);
  const fixed: readonly string[] = DATA_COLUMN_NAMES;
  const speciesColumns = table.columns
    .map((c) => c.name)
    .filter((n) => !fixed.includes(n) && uncertaintyOf(n) === undefined);
  const replicateColumn = table.columns.find((c) => c.name === 'replicate');
  const replicates = replicateColumn ? { replicates: replicateColumn.labels.slice() } : {};
  const optional = (name: string) => values.get(name);
  const observation = table.observation;
  if (table.kind === 'initial_rates') {
    const u = optional('u(rate)');
    return {
      kind: 'initial_rates',
      observation,
      species: speciesColumns,
      concentrations: rows.map((r) => speciesColumns.map((s) => values.get(s)![r]!)),
      rates: values.get('rate')!,
      ...(u ? { rateUncertainties: u } : {}),
      ...replicates,
    };
  }
  if (table.kind === 'time_course') {
    const measured = (x: number | undefined) => (x === undefined || Number.isNaN(x) ? undefined : x);
    const hasUncertainty = speciesColumns.some((s) => values.has(`u(${s})`));
    return {
      kind: 'time_course',
      observation,
      times: values.get('t')!,
      species: speciesColumns,
      concentrations: rows.map((r) => speciesColumns.map((s) => measured(values.get(s)![r]))),
      ...(hasUncertainty
        ? { uncertainties: rows.map((r) => speciesColumns.map((s) => measured(values.get(`u(${s})`)?.[r]))) }
        : {}),
      ...replicates,
    };
  }
  const u = optional('u(k)');
  return {
    kind: 'temperature_series',
    observation,
    T: values.get('T')!,
    k: values.get('k')!,
    order,
    constant: table.constant ?? 'k_obs',
    ...(u ? { kUncertainties: u } : {}),
    ...replicates,
  };
}
