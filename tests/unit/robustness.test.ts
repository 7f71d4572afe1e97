/**
 * Bad or odd input never crashes the engine (fast-check): generated records with random
 * mechanisms, constants, observations and energies always derive to values and diagnostics.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deriveMechanism } from '../../src/engine/derive.ts';
import { loadRecordSource } from '../../src/records/index.ts';

const symbols = ['A', 'B', 'C', 'I', 'J', 'E', 'ES', 'P', 'Q', 'M', 'X2', 'X'];
const term = fc
  .tuple(fc.integer({ min: 1, max: 3 }), fc.constantFrom(...symbols))
  .map(([n, s]) => (n === 1 ? s : `${n} ${s}`));
const side = fc
  .uniqueArray(term, { minLength: 1, maxLength: 3, selector: (t) => t.split(' ').at(-1) })
  .map((ts) => ts.join(' + '));
const step = fc.record({
  left: side,
  right: side,
  arrow: fc.constantFrom('->', '<=>'),
  rds: fc.boolean(),
  k: fc.option(fc.constantFrom('1 s^-1', '2.5e3 M^-1 s^-1', '7 M^-2 s^-1', '3 s', 'x', '1e9 M^-1 s^-1', '1e-4 s^-1'), {
    freq: 1,
    nil: undefined,
  }),
  K: fc.option(fc.constantFrom('0.5', '2 M', '1e-3 M^-1'), { nil: undefined }),
  barrier: fc.option(fc.integer({ min: -20, max: 120 }), { nil: undefined }),
  change: fc.option(fc.integer({ min: -80, max: 60 }), { nil: undefined }),
});
const record = fc.record({
  steps: fc.array(step, { minLength: 1, maxLength: 5 }),
  approximation: fc.constantFrom('auto', 'rds', 'steady_state', 'both'),
  declared: fc.dictionary(
    fc.constantFrom(...symbols),
    fc.constantFrom(
      '{ role: catalyst }',
      '{ role: intermediate }',
      '{ role: inhibitor }',
      '{ buffered: true }',
      '{ solvent: true }',
      '{ third_body: true }',
      '{ role: reactant }',
    ),
    { maxKeys: 3 },
  ),
  concentrations: fc.dictionary(fc.constantFrom(...symbols), fc.constantFrom('0.1 M', '0 M', '1e-6 M', '5 mM'), {
    maxKeys: 4,
  }),
  orders: fc.dictionary(fc.constantFrom(...symbols), fc.constantFrom('1', '0.5 ± 0.1', '-1', '2'), { maxKeys: 3 }),
});

type Generated = typeof record extends fc.Arbitrary<infer T> ? T : never;

function yamlOf(r: Generated): string {
  const steps = r.steps
    .map((s) => {
      const lines = [`  - equation: ${s.left} ${s.arrow} ${s.right}`];
      if (s.rds) lines.push('    rds: true');
      if (s.k) lines.push(`    k: ${s.k}`);
      if (s.K && s.arrow === '<=>') lines.push(`    K: ${s.K}`);
      if (s.barrier !== undefined)
        lines.push(
          `    energy: { barrier: ${s.barrier} kJ/mol${s.change === undefined ? '' : `, change: ${s.change} kJ/mol`} }`,
        );
      return lines.join('\n');
    })
    .join('\n');
  const declared = Object.entries(r.declared);
  const species = declared.length > 0 ? `species:\n${declared.map(([k, v]) => `  ${k}: ${v}`).join('\n')}\n` : '';
  const conc = Object.entries(r.concentrations)
    .map(([k, v]) => `${k}: ${v}`)
    .join(', ');
  const ord = Object.entries(r.orders)
    .map(([k, v]) => `${k}: ${v}`)
    .join(', ');
  return `title: generated\nsystem: generated\nstatus: favoured\nnotation: labels\napproximation: ${r.approximation}\n${species}steps:\n${steps}\nobservations:\n  - id: obs\n    concentrations: { ${conc} }\n    orders: { ${ord} }\n`;
}

describe('robustness', () => {
  it('keeps a product at a fractional power when an observation lacks it', () => {
    // X2 <=> 2 X + P before the slow step puts [P]^(-1/2) in the law; [P] = 0 cannot be substituted.
    const yaml = `title: t\nsystem: s\nstatus: proposed\nnotation: labels\nsteps:\n  - { equation: X2 <=> 2 X + P, K: 1e-3 M^2 }\n  - { equation: X + A -> Q, rds: true, k: 2 M^-1 s^-1 }\nobservations:\n  - id: o\n    concentrations: { X2: 0.1 M, A: 0.2 M }\n    orders: { A: 1 }\n`;
    const loaded = loadRecordSource('t.yaml', yaml);
    const derivation = deriveMechanism(loaded.record!);
    expect(derivation.rateLaws?.[0]?.orders.get('P')?.low.toString()).toBe('-1/2');
    expect(derivation.observations?.[0]?.status).toBe('pass');
  });

  it('derives any generated record without throwing', () => {
    fc.assert(
      fc.property(record, (r) => {
        const loaded = loadRecordSource('generated.yaml', yamlOf(r));
        if (!loaded.record) return;
        const derivation = deriveMechanism(loaded.record);
        expect(Array.isArray(derivation.diagnostics)).toBe(true);
        for (const d of derivation.diagnostics) expect(typeof d.message).toBe('string');
      }),
      { numRuns: 400 },
    );
  }, 120_000);
});

describe('robustness of the loader', () => {
  it('turns any text into diagnostics, never an exception', () => {
    const yamlish = fc.stringMatching(/^[\w\s:\-\[\]{},&*!|>'"#%@`.+=<]{0,120}$/);
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 200 }), yamlish), (text) => {
        const loaded = loadRecordSource('fuzz.yaml', text);
        for (const d of loaded.diagnostics) expect(d.rule.startsWith('record/')).toBe(true);
        if (loaded.record) deriveMechanism(loaded.record);
      }),
      { numRuns: 500 },
    );
  });
});
