/**
 * The normalised law as the commands show it: in the JSON report (additive snake_case fields) and
 * in `mechatlas derive`, for a surface record whose rate-determining step holds the site balance
 * squared. Values are computed here from the record's constants.
 */
import { describe, expect, it } from 'vitest';
import { runMain } from './run-cli.ts';

const FILE = 'tests/fixtures/ok/surface-langmuir-hinshelwood.yaml';
// The record's constants: K_1 = 2.0e3 M^-1 (CO), K_2 = 50 M^-1 (O2, dissociative), k_3 = 1.0e4 M^-1 s^-1.
const K1 = 2.0e3;
const K2 = 50;
const k3 = 1.0e4;

describe('the normalised law in the reports', () => {
  it('JSON: normalised with named constants, definitions, units and values; grouped gains unit and value', async () => {
    const { code, stdout } = await runMain(['check', '--format', 'json', FILE]);
    expect(code).toBe(0);
    const law = JSON.parse(stdout).records[0].rate_laws[0];
    expect(law.method).toBe('rds');
    const n = law.normalised;
    expect(Object.keys(n)).toEqual(['text', 'latex', 'constants', 'numerator', 'factors']);
    expect(n.factors.map((f: { power: number }) => f.power)).toEqual([2]);
    const byName = Object.fromEntries(n.constants.map((c: { name: string }) => [c.name, c]));
    expect(Object.keys(byName)).toEqual(['k_obs', 'K_O2', 'K_CO']);
    expect(Object.keys(byName.k_obs)).toEqual([
      'name',
      'latex',
      'meaning',
      'definition_text',
      'definition_latex',
      'unit',
      'unit_latex',
      'value',
    ]);
    // k_obs = k_3 K_1 K_2^½ / 2 (σ = 2 for the slow step); the report gives six significant figures.
    expect(byName.k_obs.value / ((k3 * K1 * Math.sqrt(K2)) / 2)).toBeCloseTo(1, 5);
    expect(byName.k_obs.unit).toBe('M^(-5/2) s^-1');
    expect([byName.K_CO.value, byName.K_CO.unit]).toEqual([K1, 'M^-1']);
    expect([byName.K_O2.value, byName.K_O2.unit]).toEqual([K2, 'M^-1']);
    // The oxygen term is (K_O2[O2])^½, as the trade writes dissociative adsorption.
    const oxygen = n.factors[0].terms.find((t: { constant?: string }) => t.constant === 'K_O2');
    expect(oxygen).toEqual({ constant: 'K_O2', power: '1/2', sign: 1, factors: { '[O2]': '1/2' } });
    expect(law.grouped).toMatchObject({ name: 'k_obs', unit: 'M^(-5/2) s^-1' });
    expect(law.grouped.value).toBeCloseTo(byName.k_obs.value, 6);
  });

  it('derive: the site balance squared in the trace, then the normalised law and its constants', async () => {
    const { code, stdout } = await runMain(['derive', FILE]);
    expect(code).toBe(0);
    expect(stdout).toContain('· site balance for @:');
    expect(stdout).toContain('holds the free @ to the power 2');
    expect(stdout).toContain('normalised (each denominator from 1, terms collected by concentration):');
    expect(stdout).toContain('r = k_obs*[CO]*[@]_T^2*[O2]^(1/2) / (1 + K_O2^(1/2)*[O2]^(1/2) + K_CO*[CO])^2');
    expect(stdout).toMatch(/K_CO = K_1 = 2000 M\^-1/);
  });
});
