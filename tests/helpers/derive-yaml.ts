/** Test helper: derive a record written inline as YAML, failing loudly if it does not load. */
import { deriveMechanism, type Derivation } from '../../src/engine/derive.ts';
import { formatterFor } from '../../src/engine/rate-law/formatter.ts';
import type { NonlinearSystem } from '../../src/engine/rate-law/rate-law.ts';
import { steadyStateSystem } from '../../src/engine/rate-law/steady-state-system.ts';
import { loadRecordSource } from '../../src/records/index.ts';

/** Loads YAML text as record `id` and derives it; throws if the record itself is invalid. */
export function deriveYaml(yaml: string, id = 'inline-record'): Derivation {
  const loaded = loadRecordSource(`${id}.yaml`, yaml);
  if (!loaded.record) throw new Error(`record did not load: ${JSON.stringify(loaded.diagnostics)}`);
  return deriveMechanism(loaded.record);
}

/** The overall equation's sides as plain objects with numeric coefficients. */
export function overallSides(d: Derivation): {
  reactants: Record<string, number>;
  products: Record<string, number>;
  catalysts: string[];
} {
  const side = (m: ReadonlyMap<string, { toNumber(): number }>) =>
    Object.fromEntries([...m].map(([k, v]) => [k, v.toNumber()]));
  if (!d.overall) throw new Error(`no overall equation: ${JSON.stringify(d.diagnostics)}`);
  return { reactants: side(d.overall.reactants), products: side(d.overall.products), catalysts: d.overall.catalysts };
}

/** Rules of the error-severity diagnostics. */
export function errorRules(d: Derivation): string[] {
  return d.diagnostics.filter((x) => x.severity === 'error').map((x) => x.rule);
}

/** The full steady-state equations of a derived record, for a numeric solution independent of any closed form. */
export function steadyStateEquations(d: Derivation): NonlinearSystem {
  const system = d.rateLawContext && steadyStateSystem(d.rateLawContext, formatterFor(d.rateLawContext.mechanism));
  if (!system) throw new Error(`no steady-state system: ${JSON.stringify(d.diagnostics)}`);
  return { unknowns: system.unknowns, equations: system.equations, rate: system.rate.polynomial };
}
