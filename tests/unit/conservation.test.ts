/**
 * Conserved pools: each gets its own total, named after its own member, and an observation's
 * listed concentrations fill each pool (a constructed case, checked against the engine's own
 * full simulation rather than a copied number).
 */
import { describe, expect, it } from 'vitest';
import { rateLawContext } from '../../src/engine/rate-law/context.ts';
import { deriveYaml } from '../helpers/derive-yaml.ts';

const yaml = `title: ligand pool
system: s
status: proposed
notation: labels
steps:
  - { equation: ML2 <=> ML + L, k: 1e3 s^-1, k_rev: 1e8 M^-1 s^-1 }
  - { equation: ML + S -> MLS, k: 1e5 M^-1 s^-1 }
  - { equation: MLS + L -> ML2 + P, k: 1e8 M^-1 s^-1 }
observations:
  - id: with-l
    concentrations: { ML2: 1 mM, S: 0.1 M, L: 10 mM }
    orders: { S: 1, L: -1 }
`;

describe('conserved pools', () => {
  const d = deriveYaml(yaml);
  it('names the metal pool after the catalyst and the ligand pool after the ligand', () => {
    const context = rateLawContext(d.mechanism!, d.stoichiometricNumbers!, d.roles!, d.offRoute!, d.routeOrder);
    expect(context.conservations.map((c) => c.total).sort()).toEqual(['[L]_T', '[ML2]_T']);
    expect(d.roles!.get('ML2')).toBe('catalyst');
  });

  it('predicts at the observation what the full simulation shows', () => {
    const simulated = d.simulation![0]!;
    expect(simulated.status).toBe('ok');
    for (const check of d.observations!) {
      expect(check.basis).toBe('conditions');
      expect(Math.abs(check.predicted! - simulated.orders[check.species]!)).toBeLessThan(0.1);
    }
  });
});
