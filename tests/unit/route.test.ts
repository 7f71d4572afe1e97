/**
 * The route finder on generated mechanisms (fast-check): properties that hold whatever the
 * labels, step order and lengths — not expected outputs copied from the engine.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deriveYaml, overallSides } from '../helpers/derive-yaml.ts';

const header = 'title: generated\nsystem: generated\nstatus: proposed\nnotation: labels\n';

describe('route finder', () => {
  it('a linear sequence in any order sums to its first reactant → last product, every step once', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 0, max: 5040 }), (n, seed) => {
        const steps = Array.from({ length: n }, (_, i) => `  - equation: X${i} ${i % 2 ? '<=>' : '->'} X${i + 1}`);
        // A deterministic shuffle: record order must not change the route.
        const order = steps.map((s, i) => ({ s, key: (i * 7919 + seed) % 10007 })).sort((a, b) => a.key - b.key);
        const d = deriveYaml(`${header}steps:\n${order.map((o) => o.s).join('\n')}\n`);
        expect(d.stoichiometricNumbers).toEqual(Array(n).fill(1));
        expect(overallSides(d)).toEqual({ reactants: { X0: 1 }, products: { [`X${n}`]: 1 }, catalysts: [] });
      }),
      { numRuns: 40 },
    );
  });

  it('a catalytic cycle of any length regenerates its catalyst and turns over once', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 6 }), (n) => {
        // C + S -> C1; C1 -> C2; … ; C(n-1) -> C + P
        const forms = ['C', ...Array.from({ length: n - 1 }, (_, i) => `C${i + 1}`)];
        const steps = forms.map((f, i) => {
          const left = i === 0 ? 'C + S' : f;
          const right = i === n - 1 ? 'C + P' : forms[i + 1];
          return `  - equation: ${left} -> ${right}`;
        });
        const d = deriveYaml(`${header}steps:\n${steps.join('\n')}\n`);
        expect(overallSides(d)).toEqual({ reactants: { S: 1 }, products: { P: 1 }, catalysts: ['C'] });
        for (const f of forms.slice(1)) expect(d.roles!.get(f)).toBe('intermediate');
      }),
      { numRuns: 10 },
    );
  });

  it('a step and its written-out reverse never form a route on their own', () => {
    const d = deriveYaml(`${header}steps:\n  - equation: A -> B\n  - equation: B -> A\n  - equation: B -> P\n`);
    expect(d.stoichiometricNumbers).toEqual([1, 0, 1]);
  });

  it('a dissociation before a bimolecular step gets σ = 2 for that step', () => {
    // Horiuti numbers for A2 ⇌ 2 A, A + B → P: the second step runs twice per turnover.
    const d = deriveYaml(`${header}steps:\n  - equation: A2 <=> 2 A\n  - equation: A + B -> P\n`);
    expect(d.stoichiometricNumbers).toEqual([1, 2]);
    expect(overallSides(d)).toEqual({ reactants: { A2: 1, B: 2 }, products: { P: 2 }, catalysts: [] });
  });
});
