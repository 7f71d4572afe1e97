/**
 * Cross-checks of the engine's exact steady-state and pre-equilibrium rate laws against two
 * independent computations:
 * (a) the steady state solved numerically in the test — d[X]/dt written by hand from mass action
 *     for each bound form of the enzyme, plus the enzyme balance, solved by the test's own Gaussian
 *     elimination at random constants and concentrations (fast-check);
 * (b) mathjs, a general-purpose computer algebra library: published rate laws typed in as mathjs
 *     expressions, evaluated at random points, and differentiated symbolically by mathjs to get
 *     the apparent order x ∂ln r/∂x, compared with the engine's `apparentOrder` and order limits.
 */
import fc from 'fast-check';
import { all, create, type EvalFunction } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { apparentOrder } from '../../src/engine/rate-law/orders.ts';
import { deriveYaml, errorRules } from '../helpers/derive-yaml.ts';
import { gaussianSolve } from '../helpers/gaussian-elimination.ts';
import { lawBy, relativelyClose, seededRandom } from '../helpers/rate-law-check.ts';

const header = (system: string) => `title: cross-check\nsystem: ${system}\nstatus: proposed\nnotation: labels\n`;

/** A positive value, log-uniform over six decades. */
const positive = fc.double({ min: -3, max: 3, noNaN: true }).map((e) => 10 ** e);

/** The engine's law evaluated at named values. */
function engineRate(
  expression: { evaluate(v: ReadonlyMap<string, number>): number },
  values: Record<string, number>,
): number {
  return expression.evaluate(new Map(Object.entries(values)));
}

describe('(a) steady state solved numerically in the test', () => {
  it('Michaelis–Menten with reversible product release', () => {
    // E + S ⇌ ES (k1, k-1); ES ⇌ E + P (k2, k-2). Unknowns [E], [ES].
    const d = deriveYaml(`${header('reversible-mm')}steps:
  - equation: E + S <=> ES
  - equation: ES <=> E + P
`);
    expect(errorRules(d)).toEqual([]);
    const law = lawBy(d, 'steady_state').law.expression!;
    const arb = fc.record({
      k1: positive,
      km1: positive,
      k2: positive,
      km2: positive,
      ET: positive,
      S: positive,
      P: positive,
    });
    fc.assert(
      fc.property(arb, (c) => {
        // d[ES]/dt = k1[E][S] − k-1[ES] − k2[ES] + k-2[E][P] = 0;  [E] + [ES] = [E]_T.
        const x = gaussianSolve(
          [
            [c.k1 * c.S + c.km2 * c.P, -(c.km1 + c.k2)],
            [1, 1],
          ],
          [0, c.ET],
        )!;
        const [E, ES] = x as [number, number];
        // Rate of the overall S -> P: d[P]/dt = k2[ES] − k-2[E][P]; its size is set by the two terms.
        const forward = c.k2 * ES;
        const reverse = c.km2 * E * c.P;
        const ours = engineRate(law, {
          k_1: c.k1,
          'k_-1': c.km1,
          k_2: c.k2,
          'k_-2': c.km2,
          '[E]_T': c.ET,
          '[S]': c.S,
          '[P]': c.P,
        });
        expect(Math.abs(ours - (forward - reverse)) <= 1e-9 * (forward + reverse)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });

  it('a catalytic cycle with two intermediates, every step reversible', () => {
    // E + S ⇌ ES (1); ES ⇌ EP (2); EP ⇌ E + P (3). Unknowns [E], [ES], [EP].
    const d = deriveYaml(`${header('two-intermediates')}steps:
  - equation: E + S <=> ES
  - equation: ES <=> EP
  - equation: EP <=> E + P
`);
    expect(errorRules(d)).toEqual([]);
    const law = lawBy(d, 'steady_state').law.expression!;
    const arb = fc.record({
      k1: positive,
      km1: positive,
      k2: positive,
      km2: positive,
      k3: positive,
      km3: positive,
      ET: positive,
      S: positive,
      P: positive,
    });
    fc.assert(
      fc.property(arb, (c) => {
        const [E, ES, EP] = gaussianSolve(
          [
            // d[ES]/dt = k1[E][S] − (k-1 + k2)[ES] + k-2[EP]
            [c.k1 * c.S, -(c.km1 + c.k2), c.km2],
            // d[EP]/dt = k-3[E][P] + k2[ES] − (k-2 + k3)[EP]
            [c.km3 * c.P, c.k2, -(c.km2 + c.k3)],
            [1, 1, 1],
          ],
          [0, 0, c.ET],
        )! as [number, number, number];
        const forward = c.k3 * EP;
        const reverse = c.km3 * E * c.P;
        expect(E > 0 && ES > 0 && EP > 0).toBe(true);
        const ours = engineRate(law, {
          k_1: c.k1,
          'k_-1': c.km1,
          k_2: c.k2,
          'k_-2': c.km2,
          k_3: c.k3,
          'k_-3': c.km3,
          '[E]_T': c.ET,
          '[S]': c.S,
          '[P]': c.P,
        });
        expect(Math.abs(ours - (forward - reverse)) <= 1e-9 * (forward + reverse)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });

  it('competitive and uncompetitive inhibition together (mixed), every binding step at steady state', () => {
    // E + S ⇌ ES (1); ES -> E + P (2); E + I ⇌ EI (3); ES + I ⇌ ESI (4). Unknowns [E], [ES], [EI], [ESI].
    const d = deriveYaml(`${header('mixed-inhibition')}steps:
  - equation: E + S <=> ES
  - equation: ES -> E + P
  - equation: E + I <=> EI
  - equation: ES + I <=> ESI
`);
    expect(errorRules(d)).toEqual([]);
    const law = lawBy(d, 'steady_state').law.expression!;
    const arb = fc.record({
      k1: positive,
      km1: positive,
      k2: positive,
      k3: positive,
      km3: positive,
      k4: positive,
      km4: positive,
      ET: positive,
      S: positive,
      I: positive,
    });
    fc.assert(
      fc.property(arb, (c) => {
        const x = gaussianSolve(
          [
            // d[ES]/dt = k1[E][S] − (k-1 + k2 + k4[I])[ES] + k-4[ESI]
            [c.k1 * c.S, -(c.km1 + c.k2 + c.k4 * c.I), 0, c.km4],
            // d[EI]/dt = k3[E][I] − k-3[EI]
            [c.k3 * c.I, 0, -c.km3, 0],
            // d[ESI]/dt = k4[ES][I] − k-4[ESI]
            [0, c.k4 * c.I, 0, -c.km4],
            [1, 1, 1, 1],
          ],
          [0, 0, 0, c.ET],
        )!;
        const rate = c.k2 * x[1]!;
        const ours = engineRate(law, {
          k_1: c.k1,
          'k_-1': c.km1,
          k_2: c.k2,
          k_3: c.k3,
          'k_-3': c.km3,
          k_4: c.k4,
          'k_-4': c.km4,
          '[E]_T': c.ET,
          '[S]': c.S,
          '[I]': c.I,
        });
        expect(relativelyClose(ours, rate, 1e-9)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
});

const math = create(all!);

/** A published law typed into mathjs; `names` maps each mathjs variable to the engine's symbol. */
interface MathjsCase {
  title: string;
  yaml: string;
  method: 'rds' | 'steady_state';
  expression: string;
  names: Record<string, string>;
  /** mathjs variables to take orders in */
  orderIn: string[];
  /** skip points where the net rate nearly cancels (reversible laws) */
  wellAwayFromEquilibrium?: (scope: Record<string, number>) => boolean;
  /**
   * mathjs names of products: for a reversible law the reported limits are those of initial rates,
   * so the other products are taken as absent when the limits are compared
   */
  products?: string[];
}

const enzyme = (steps: string, extra = '') => `${header('enzyme')}${extra}steps:\n${steps}`;

const mathjsCases: MathjsCase[] = [
  {
    // G. E. Briggs & J. B. S. Haldane, Biochem. J. 19 (1925) 338 (from memory): v = k2 [E]T [S]/(K_M + [S]).
    title: 'Briggs–Haldane',
    yaml: enzyme('  - equation: E + S <=> ES\n  - equation: ES -> E + P\n'),
    method: 'steady_state',
    expression: 'k2 * cET * cS / ((km1 + k2) / k1 + cS)',
    names: { k1: 'k_1', km1: 'k_-1', k2: 'k_2', cET: '[E]_T', cS: '[S]' },
    orderIn: ['cS', 'cET'],
  },
  {
    // J. B. S. Haldane, Enzymes (1930), the reversible Michaelis–Menten law (from memory):
    // v = (V_f[S]/K_mS − V_r[P]/K_mP)/(1 + [S]/K_mS + [P]/K_mP) with V_f = k2[E]T, V_r = k-1[E]T,
    // K_mS = (k-1 + k2)/k1, K_mP = (k-1 + k2)/k-2.
    title: 'Haldane reversible Michaelis–Menten',
    yaml: enzyme('  - equation: E + S <=> ES\n  - equation: ES <=> E + P\n'),
    method: 'steady_state',
    expression:
      '(k2 * cET * cS / ((km1 + k2) / k1) - km1 * cET * cP / ((km1 + k2) / km2)) / (1 + cS / ((km1 + k2) / k1) + cP / ((km1 + k2) / km2))',
    names: { k1: 'k_1', km1: 'k_-1', k2: 'k_2', km2: 'k_-2', cET: '[E]_T', cS: '[S]', cP: '[P]' },
    orderIn: ['cS', 'cP'],
    wellAwayFromEquilibrium: (v) => v['k1']! * v['k2']! * v['cS']! > 4 * v['km1']! * v['km2']! * v['cP']!,
    products: ['cP'],
  },
  {
    // A. Cornish-Bowden, Fundamentals of Enzyme Kinetics, mixed inhibition at rapid equilibrium
    // (from memory): v = V[S]/(K_S(1 + [I]/K_ic) + [S](1 + [I]/K_iu)); here K_S = 1/K_1, K_ic = 1/K_3,
    // K_iu = 1/K_4 (the engine's K are association constants of the steps as written).
    title: 'mixed inhibition, rapid equilibrium',
    yaml: enzyme(
      '  - equation: E + S <=> ES\n  - { equation: ES -> E + P, rds: true }\n  - equation: E + I <=> EI\n  - equation: ES + I <=> ESI\n',
    ),
    method: 'rds',
    expression: 'k2 * cET * cS / ((1 / K1) * (1 + cI * K3) + cS * (1 + cI * K4))',
    names: { k2: 'k_2', K1: 'K_1', K3: 'K_3', K4: 'K_4', cET: '[E]_T', cS: '[S]', cI: '[I]' },
    orderIn: ['cS', 'cI'],
  },
  {
    // F. A. Lindemann (1922), Atkins & de Paula, Physical Chemistry (from memory).
    title: 'Lindemann–Hinshelwood',
    yaml: `${header('lindemann')}species:\n  M: { third_body: true }\nsteps:\n  - equation: A + M <=> A* + M\n  - equation: A* -> P\n`,
    method: 'steady_state',
    expression: 'k1 * k2 * cA * cM / (km1 * cM + k2)',
    names: { k1: 'k_1', km1: 'k_-1', k2: 'k_2', cA: '[A]', cM: '[M]' },
    orderIn: ['cA', 'cM'],
  },
  {
    // C. K. Ingold, Structure and Mechanism in Organic Chemistry, SN1 with the common ion (from memory).
    title: 'SN1 with the common ion',
    yaml: `${header('sn1')}approximation: steady_state\nsteps:\n  - equation: RX <=> R+ + X-\n  - equation: R+ + Nu -> RNu\n`,
    method: 'steady_state',
    expression: 'k1 * k2 * cRX * cNu / (km1 * cX + k2 * cNu)',
    names: { k1: 'k_1', km1: 'k_-1', k2: 'k_2', cRX: '[RX]', cX: '[X-]', cNu: '[Nu]' },
    orderIn: ['cX', 'cNu', 'cRX'],
  },
  {
    // IUPAC Gold Book, "rate-controlling step", doi:10.1351/goldbook.R05139 (read from a stored copy).
    title: 'Gold Book rate-controlling step',
    yaml: `${header('gold-book')}steps:\n  - equation: A + B <=> C\n  - equation: C + D -> P\n`,
    method: 'steady_state',
    expression: 'k1 * k2 * cA * cB * cD / (km1 + k2 * cD)',
    names: { k1: 'k_1', km1: 'k_-1', k2: 'k_2', cA: '[A]', cB: '[B]', cD: '[D]' },
    orderIn: ['cD', 'cA'],
  },
];

/** The species an order symbol belongs to: `[S]` → S, `[E]_T` → E. */
const speciesOf = (symbol: string) => /^\[(.*)\](?:_T)?$/.exec(symbol)![1]!;

describe('(b) published laws evaluated and differentiated by mathjs', () => {
  for (const c of mathjsCases) {
    it(`${c.title}: value and apparent orders agree with mathjs`, () => {
      const d = deriveYaml(c.yaml);
      expect(errorRules(d)).toEqual([]);
      const derived = lawBy(d, c.method);
      const law = derived.law.expression!;
      expect([...law.symbols()].sort()).toEqual(Object.values(c.names).sort());
      const value = math.compile(c.expression);
      const slopes = new Map<string, EvalFunction>(
        c.orderIn.map((x) => [x, math.derivative(c.expression, x, { simplify: false }) as unknown as EvalFunction]),
      );
      const mathjsOrder = (x: string, scope: Record<string, number>) =>
        ((slopes.get(x)!.evaluate(scope) as number) * scope[x]!) / (value.evaluate(scope) as number);
      const toEngine = (scope: Record<string, number>) =>
        new Map(Object.entries(scope).map(([k, v]) => [c.names[k]!, v]));

      const random = seededRandom(7);
      let checked = 0;
      for (let i = 0; i < 40 && checked < 12; i++) {
        const scope = Object.fromEntries(Object.keys(c.names).map((k) => [k, 10 ** (4 * random() - 2)]));
        if (c.wellAwayFromEquilibrium && !c.wellAwayFromEquilibrium(scope)) continue;
        checked++;
        const at = toEngine(scope);
        expect(relativelyClose(law.evaluate(at), value.evaluate(scope) as number, 1e-12)).toBe(true);
        for (const x of c.orderIn) {
          const ours = apparentOrder(law, c.names[x]!, at)!;
          const theirs = mathjsOrder(x, scope);
          expect(
            Math.abs(ours - theirs) <= 1e-9 * Math.max(1, Math.abs(theirs)),
            `${x}: engine ${ours}, mathjs ${theirs}`,
          ).toBe(true);
        }
      }
      expect(checked).toBeGreaterThanOrEqual(8);

      // The engine's exact order limits against mathjs's apparent order far out at either end.
      for (const x of c.orderIn) {
        const limits = derived.orders.get(speciesOf(c.names[x]!))!;
        const absent = (k: string) => (c.products ?? []).includes(k) && k !== x;
        const moderate = Object.fromEntries(
          Object.keys(c.names).map((k) => [k, absent(k) ? 0 : k.startsWith('c') ? 1 : 0.5 + random()]),
        );
        const near = (conc: number) => mathjsOrder(x, { ...moderate, [x]: conc });
        expect(near(1e-9)).toBeCloseTo(limits.low.toNumber(), 6);
        expect(near(1e9)).toBeCloseTo(limits.high.toNumber(), 6);
      }
    });
  }
});
