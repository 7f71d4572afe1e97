/**
 * Test helper for the fitting stage: a saturation record written inline (substrate S binds the
 * catalyst C before a rate-determining step with B, or B binds first), seeded noise, and
 * initial-rate tables generated from a law written out here by hand — never from the engine.
 */
import { loadRecordSource } from '../../src/records/index.ts';
import type { InitialRateData, KineticData } from '../../src/engine/index.ts';
import type { MechanismRecord } from '../../src/model/index.ts';

/** mulberry32 with Box–Muller: a small seeded normal generator (common practice for test noise). */
export function normals(seed: number): () => number {
  let a = seed >>> 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

/** A catalytic record where `first` binds the catalyst in a fast pre-equilibrium before the rds. */
export function saturationRecord(id: string, first: 'S' | 'B', status = 'proposed'): MechanismRecord {
  const other = first === 'S' ? 'B' : 'S';
  const yaml = `title: ${id}
system: fixture-saturation
status: ${status}
notation: labels
species:
  C: { role: catalyst }
  C${first}: { role: intermediate }
steps:
  - equation: C + ${first} <=> C${first}
    label: bind
  - equation: C${first} + ${other} -> C + P
    label: turn
    rds: true
approximation: rds
observations:
  - id: table-1
    T: 298.15 K
    concentrations: { C: 1.0 mM }
`;
  const loaded = loadRecordSource(`${id}.yaml`, yaml);
  if (!loaded.record) throw new Error(JSON.stringify(loaded.diagnostics));
  return loaded.record;
}

/** r = k [C]_T [S][B] / (1 + K [S]), the law of S binding first, written by hand. */
export function sBindsFirst(k: number, K: number, c: { C: number; S: number; B: number }): number {
  return (k * c.C * c.S * c.B) / (1 + K * c.S);
}

/** A 20-run table: S over 0.02–1.28 M at B = 0.2 M, B over 0.05–0.8 M at S = 0.08 M, 5 % log-normal noise. */
export function saturationTable(k: number, K: number, seed: number, rsd = 0.05): InitialRateData {
  const normal = normals(seed);
  const design = [
    ...[0.02, 0.04, 0.08, 0.16, 0.32, 0.64, 1.28].flatMap((S) => [S, S].map((s) => ({ C: 1e-3, S: s, B: 0.2 }))),
    ...[0.05, 0.1, 0.4, 0.8].flatMap((B) => [B, B].map((b) => ({ C: 1e-3, S: 0.08, B: b }))),
  ].slice(0, 20);
  return {
    kind: 'initial_rates',
    observation: 'table-1',
    species: ['S', 'B'],
    concentrations: design.map((c) => [c.S, c.B]),
    rates: design.map((c) => sBindsFirst(k, K, c) * Math.exp(rsd * normal())),
  };
}

/** The data as the catalogue would pass it. */
export const asData = (d: InitialRateData): KineticData[] => [d];
