/**
 * Which columns each kind of data table takes and needs. Any name that is not one of the fixed
 * ones is a species symbol (checked against the mechanism by the engine), except in a temperature
 * series, which holds no concentrations.
 */
import { uncertaintyOf, type DataKind } from '../model/index.ts';

/** How a column is used. */
export type ColumnRole = 'species' | 'rate' | 'time' | 'temperature' | 'constant' | 'replicate' | 'uncertainty';

const FIXED: Record<string, ColumnRole> = {
  rate: 'rate',
  t: 'time',
  T: 'temperature',
  k: 'constant',
  replicate: 'replicate',
};

/** The fixed columns a kind takes besides species, and those it needs. */
const KINDS: Record<DataKind, { takes: readonly string[]; needs: readonly string[]; species: boolean; label: string }> =
  {
    initial_rates: { takes: ['rate', 'replicate'], needs: ['rate'], species: true, label: 'an initial-rate table' },
    time_course: { takes: ['t', 'replicate'], needs: ['t'], species: true, label: 'a time course' },
    temperature_series: {
      takes: ['T', 'k', 'replicate'],
      needs: ['T', 'k'],
      species: false,
      label: 'a temperature series',
    },
  };

/** The role of a column name. */
export function columnRole(name: string): ColumnRole {
  if (uncertaintyOf(name) !== undefined) return 'uncertainty';
  return FIXED[name] ?? 'species';
}

/** Why a column does not belong in a table of this kind, or undefined when it does. */
export function columnMisfit(kind: DataKind, name: string, names: readonly string[]): string | undefined {
  const spec = KINDS[kind];
  const of = uncertaintyOf(name);
  if (of !== undefined) {
    if (of === 'replicate') return 'a replicate label has no uncertainty';
    return names.includes(of) ? undefined : `the uncertainty column '${name}' has no column '${of}' beside it`;
  }
  const role = columnRole(name);
  if (role === 'species')
    return spec.species
      ? undefined
      : `${spec.label} has the columns ${spec.takes.join(', ')} and u(k); '${name}' is not one of them`;
  return spec.takes.includes(name) ? undefined : `${spec.label} has no column '${name}'`;
}

/** What a table of this kind lacks, in words (empty when it has all it needs). */
export function missingColumns(kind: DataKind, names: readonly string[]): string[] {
  const spec = KINDS[kind];
  const missing = spec.needs.filter((n) => !names.includes(n)).map((n) => `${spec.label} needs a column '${n}'`);
  if (spec.species && !names.some((n) => columnRole(n) === 'species'))
    missing.push(`${spec.label} needs at least one column named by a species symbol`);
  return missing;
}

/** Whether the column holds a quantity (and so needs a unit). */
export function needsUnit(name: string): boolean {
  return columnRole(name) !== 'replicate';
}
