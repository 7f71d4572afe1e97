/**
 * Property tests (fast-check): a closed-form nonlinear steady-state law, at random positive
 * constants and concentrations, equals the steady state solved numerically (Newton on the full
 * mass-action balances, independent of any elimination), and its apparent orders equal the
 * numeric log–log slopes of that solution.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { numericOrderAt } from '../../src/engine/rate-law/numeric-order.ts';
import { apparentOrder } from '../../src/engine/rate-law/orders.ts';
import { solveSteadyStateNumeric } from '../../src/engine/rate-law/steady-state-numeric.ts';
import { acetaldehyde, CATALYST_DIMER, ETHANE, HYDROGEN_BROMINE } from '../helpers/chain-records.ts';
import { deriveYaml, steadyStateEquations } from '../helpers/derive-yaml.ts';
import { lawBy, relativelyClose } from '../helpers/rate-law-check.ts';

const header = 'title: property\nsystem: property\nstatus: proposed\n';

const mechanisms: Record<string, string> = {
  'H2 + Br2 (binomial, rational law)': `${header}${HYDROGEN_BROMINE}`,
  'acetaldehyde, acetyl termination (a radical beside a rational term)': `${header}${acetaldehyde('2 CH3CO• -> C4H6O2')}`,
  'ethane (quadratic)': `${header}${ETHANE}`,
  'catalyst with an off-cycle dimer (quadratic with a conservation)': `${header}approximation: steady_state\n${CATALYST_DIMER}`,
  'chain terminated by cross-combination R + X': `${header}notation: labels
species:
  X: { role: intermediate }
  R: { role: intermediate }
steps:
  - equation: X2 -> 2 X
  - equation: X + RH -> HX + R
  - equation: R + X2 -> RX + X
  - equation: R + X -> RX
`,
};

/** Log-uniform positive values over four decades for every symbol. */
const valuesFor = (symbols: readonly string[]) =>
  fc
    .array(fc.double({ min: -2, max: 2, noNaN: true }), { minLength: symbols.length, maxLength: symbols.length })
    .map((logs) => new Map(symbols.map((s, i) => [s, 10 ** logs[i]!])));

describe('closed-form nonlinear steady states equal the numeric steady state', () => {
  for (const [name, yaml] of Object.entries(mechanisms)) {
    it(name, () => {
      const d = deriveYaml(yaml);
      const derived = lawBy(d, 'steady_state');
      const law = derived.algebraic?.expression ?? derived.law.expression;
      expect(law, 'no closed form').toBeDefined();
      const system = steadyStateEquations(d);
      // Constants that cancel from the law still enter the balances the numeric solution needs.
      const inSystem = [...system.equations, system.rate].flatMap((p) => p.symbols());
      const symbols = [...new Set([...law!.symbols(), ...inSystem])].filter((s) => !system.unknowns.includes(s));
      const species = law!.symbols().filter((s) => s.startsWith('['));
      fc.assert(
        fc.property(valuesFor(symbols), fc.constantFrom(...species), (values, x) => {
          const solved = solveSteadyStateNumeric(system, values);
          fc.pre(solved !== undefined && solved.rate > 0);
          const ours = law!.evaluate(values);
          expect(relativelyClose(ours, solved!.rate, 1e-7), `${ours} vs ${solved!.rate}`).toBe(true);
          const slope = numericOrderAt(system, x, values);
          fc.pre(slope !== undefined);
          expect(Math.abs(apparentOrder(law!, x, values)! - slope!)).toBeLessThan(1e-4);
        }),
        { numRuns: 40 },
      );
    });
  }
});

describe('the long-chain law is the limit of the exact steady state for slow initiation', () => {
  for (const name of ['ethane (quadratic)', 'acetaldehyde, acetyl termination (a radical beside a rational term)']) {
    it(name, () => {
      const d = deriveYaml(mechanisms[name]!);
      const exact = lawBy(d, 'steady_state');
      const long = lawBy(d, 'long_chain');
      const [e, l] = [
        exact.algebraic?.expression ?? exact.law.expression!,
        long.algebraic?.expression ?? long.law.expression!,
      ];
      const symbols = [...new Set([...e.symbols(), ...l.symbols()])];
      fc.assert(
        fc.property(valuesFor(symbols), (values) => {
          // Initiation twenty decades slower than the rest: over these ranges the chains are at least
          // about 10^5 long, and the difference (of the order of 1/chain length) is below 1e-4.
          values.set('k_1', values.get('k_1')! * 1e-20);
          const [re, rl] = [e.evaluate(values), l.evaluate(values)];
          expect(Math.abs(rl - re) / re).toBeLessThan(1e-4);
        }),
        { numRuns: 30 },
      );
    });
  }
});
