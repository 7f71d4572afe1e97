/**
 * Laws with radicals, their derivation lines and the long-chain lines are valid KaTeX: each renders
 * with throwOnError, as the mechanism page renders them.
 */
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { acetaldehyde, CATALYST_DIMER, ETHANE, HYDROGEN_BROMINE } from '../helpers/chain-records.ts';
import { deriveYaml } from '../helpers/derive-yaml.ts';

const header = 'title: latex\nsystem: latex\nstatus: proposed\n';

describe('KaTeX renders every closed form and derivation line', () => {
  const records = {
    'hydrogen–bromine': HYDROGEN_BROMINE,
    'acetaldehyde, methyl termination': acetaldehyde('2 CH3• -> C2H6'),
    'acetaldehyde, acetyl termination': acetaldehyde('2 CH3CO• -> C4H6O2'),
    ethane: ETHANE,
    'catalyst dimer': `approximation: steady_state\n${CATALYST_DIMER}`,
  };
  for (const [name, body] of Object.entries(records)) {
    it(name, () => {
      const d = deriveYaml(`${header}${body}`);
      const latex = d.rateLaws!.flatMap((r) => [
        r.algebraic?.latex ?? r.presented?.latex ?? '',
        ...r.law.trace.map((t) => t.latex),
        ...(r.algebraic?.roots.map((root) => root.latex) ?? []),
      ]);
      expect(latex.length).toBeGreaterThan(3);
      for (const l of latex) expect(() => katex.renderToString(`r = ${l}`, { throwOnError: true })).not.toThrow();
    });
  }
});
