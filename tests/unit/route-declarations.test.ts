/**
 * Declared roles never steer the route silently, and the route search keeps to its budget:
 * properties over generated mechanisms and hand-built cases, not outputs copied from the engine.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SearchBudget } from '../../src/engine/route/search-budget.ts';
import { stoichiometricNumbers } from '../../src/engine/route/stoichiometric-numbers.ts';
import { buildMechanism } from '../../src/engine/mechanism/mechanism.ts';
import { loadRecordSource } from '../../src/records/index.ts';
import { deriveYaml, errorRules } from '../helpers/derive-yaml.ts';

const header = 'title: generated\nsystem: generated\nstatus: proposed\nnotation: labels\n';

/** A catalytic cycle C + S → C1 → … → C + P, with an optional dead-end binding and a side sequence feeding S. */
function cycle(n: number, deadEnd: boolean, feed: number): string[] {
  const forms = ['C', ...Array.from({ length: n - 1 }, (_, i) => `C${i + 1}`)];
  const steps = forms.map((f, i) => `${i === 0 ? 'C + S' : f} -> ${i === n - 1 ? 'C + P' : forms[i + 1]}`);
  if (deadEnd) steps.push('C + I <=> CI');
  for (let i = 0; i < feed; i++) steps.push(`F${i} -> ${i === feed - 1 ? 'S' : `F${i + 1}`}`);
  return steps;
}

describe('declared roles', () => {
  it('declaring every species with the role derived for it changes neither σ nor the roles', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 4 }), fc.boolean(), fc.integer({ min: 0, max: 2 }), (n, deadEnd, feed) => {
        const steps = cycle(n, deadEnd, feed)
          .map((e) => `  - equation: ${e}`)
          .join('\n');
        const plain = deriveYaml(`${header}steps:\n${steps}\n`);
        const declared = [...plain.roles!]
          .filter(([, role]) => role === 'intermediate' || role === 'catalyst')
          .map(([sp, role]) => `  ${sp}: { role: ${role} }`);
        const again = deriveYaml(`${header}species:\n${declared.join('\n')}\nsteps:\n${steps}\n`);
        expect(errorRules(again)).toEqual([]);
        expect(again.stoichiometricNumbers).toEqual(plain.stoichiometricNumbers);
        expect(again.roles).toEqual(plain.roles);
      }),
      { numRuns: 12 },
    );
  });

  it('a declaration that only a shorter route could honour is an error, and the full route stands', () => {
    // A → I → P: declaring P a catalyst could only hold on a route without step 2.
    const d = deriveYaml(
      `${header}species:\n  P: { role: catalyst }\nsteps:\n  - equation: A -> I\n  - equation: I -> P\n`,
    );
    expect(d.stoichiometricNumbers).toEqual([1, 1]);
    const mismatch = d.diagnostics.find((x) => x.rule === 'roles/declared-mismatch')!;
    expect(mismatch.path).toEqual(['species', 'P', 'role']);
    expect(mismatch.message).toContain('formed net');
  });

  it('a species found only off the route is never a catalyst', () => {
    const d = deriveYaml(
      `${header}steps:\n  - equation: E + S <=> ES\n  - equation: ES -> E + P\n  - equation: E + I <=> EI\n  - equation: S -> X\n`,
    );
    for (const [sp, role] of d.roles!)
      if (d.stoichiometricNumbers!.every((x, i) => x === 0 || !d.mechanism!.steps[i]!.change.has(sp)))
        expect(role).not.toBe('catalyst');
  });
});

describe('the route search budget', () => {
  const mesh = (n: number) =>
    Array.from(
      { length: n },
      (_, i) => `  - equation: X${i % 5} + Y${i % 3} -> X${(i + 1) % 5} + Y${(i + 2) % 3} + P${i}`,
    ).join('\n');

  it('counts its work and says when it is spent', () => {
    const budget = new SearchBudget(3);
    expect([budget.take(), budget.take(2), budget.take()]).toEqual([true, true, false]);
    expect(budget.exhausted).toBe(true);
    expect(budget.remaining).toBe(0);
  });

  it('a tangled mechanism stops with route/search-limit instead of searching on', () => {
    const loaded = loadRecordSource('mesh.yaml', `${header}steps:\n${mesh(14)}\n`);
    const mechanism = buildMechanism(loaded.record!).mechanism!;
    const budget = new SearchBudget();
    const result = stoichiometricNumbers(mechanism.steps, { budget });
    expect(result.numbers).toBeUndefined();
    expect(result.diagnostics.map((d) => d.rule)).toEqual(['route/search-limit']);
    expect(budget.exhausted).toBe(true);
  });

  it('a smaller budget stops a search a larger one finishes, with the same answer once finished', () => {
    const loaded = loadRecordSource('mesh.yaml', `${header}steps:\n${mesh(6)}\n`);
    const steps = buildMechanism(loaded.record!).mechanism!.steps;
    const small = stoichiometricNumbers(steps, { budget: new SearchBudget(5) });
    expect(small.diagnostics.map((d) => d.rule)).toEqual(['route/search-limit']);
    const large = stoichiometricNumbers(steps, { budget: new SearchBudget(1e6) });
    const usual = stoichiometricNumbers(steps);
    expect(large.numbers).toEqual(usual.numbers);
    expect(large.diagnostics.map((d) => d.rule)).not.toContain('route/search-limit');
  });
});
