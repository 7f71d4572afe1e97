/** Runs remembered per mechanism: the same inputs give the same run, made once; any other input its own. */
import { describe, expect, it } from 'vitest';
import { simulationBasis } from '../../../src/engine/derive.ts';
import { rememberedInitialRate } from '../../../src/engine/simulation/remembered-runs.ts';
import { simulationSetup } from '../../../src/engine/simulation/simulation-setup.ts';
import { deriveYaml } from '../../helpers/derive-yaml.ts';

const yaml = `title: A -> B
system: remembered-runs
status: proposed
notation: labels
steps:
  - { equation: A -> B, k: 2 s^-1 }
observations:
  - { id: one, concentrations: { A: 1 M } }
  - { id: same-mixture, concentrations: { A: 1 M } }
  - { id: other-mixture, concentrations: { A: 2 M } }
`;

describe('remembered initial-rate runs', () => {
  it('makes a run once per mechanism and inputs, and the check and the series share it', () => {
    const d = deriveYaml(yaml);
    const basis = simulationBasis(d)!;
    const [one, same, other] = d.simulation!;
    // The check ran each observation; the same mixture gives the same values.
    expect(same!.initialRate).toBe(one!.initialRate);
    // First order: r₀ = k[A]₀, twice as fast from 2 M.
    expect(one!.initialRate).toBeCloseTo(2, 6);
    expect(other!.initialRate).toBeCloseTo(4, 6);
    const mixtures = [
      { id: 'one', concentrations: { A: '1 M' } },
      { id: 'two', concentrations: { A: '2 M' } },
    ];
    const setup = (i: number) => simulationSetup(basis, d.constants!, mixtures[i]!);
    const a = setup(0);
    const b = setup(1);
    if ('missing' in a || 'missing' in b) throw new Error('not simulated');
    const first = rememberedInitialRate(basis.mechanism, a.model, a.y0, a.probe);
    expect(rememberedInitialRate(basis.mechanism, a.model, Float64Array.from(a.y0), a.probe)).toBe(first);
    expect(rememberedInitialRate(basis.mechanism, b.model, b.y0, b.probe)).not.toBe(first);
    // Another derivation of the same record is another mechanism: its runs are its own.
    const again = simulationBasis(deriveYaml(yaml))!;
    expect(rememberedInitialRate(again.mechanism, a.model, a.y0, a.probe)).not.toBe(first);
  });
});
