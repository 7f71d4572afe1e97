/**
 * Property tests of the normalised form: whatever the law, the numerator over its factors
 * (1 + Σ K m)^p, with each K taken from its definition, equals the raw law at random positive
 * constants and concentrations. Three sources of laws: random rational functions (with and
 * without the derivation's factors), random Michaelis–Menten-family mechanisms (whose trade form,
 * written here from the textbook shape, must equal the raw law too), and random surface mechanisms.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Monomial, Polynomial, RationalFunction } from '../../../src/engine/exact/index.ts';
import { Rational } from '../../../src/engine/exact/rational.ts';
import type { Mechanism } from '../../../src/engine/mechanism/mechanism.ts';
import { formatterFor } from '../../../src/engine/rate-law/formatter.ts';
import { evaluateNormalised, normaliseLaw } from '../../../src/engine/rate-law/normalise-law.ts';
import type { NormalisedLaw } from '../../../src/engine/rate-law/normalised-law.ts';
import { deriveYaml } from '../../helpers/derive-yaml.ts';
import { namedValues } from '../../helpers/normalised-check.ts';
import { randomPoint, relativelyClose, seededRandom } from '../../helpers/rate-law-check.ts';

const CONSTANTS = ['k_1', 'k_-1', 'k_2', 'K_1', 'K_2'];
const CONCENTRATIONS = ['[A]', '[B]', '[C]', '[E]_T'];
const fmt = formatterFor({ steps: [{ label: '1' }, { label: '2' }], species: new Map() } as unknown as Mechanism);

/** Expects the normalised law to equal the raw one at `points` random positive points. */
function expectEqualAtRandomPoints(raw: RationalFunction, law: NormalisedLaw, seed: number, points = 5): void {
  const random = seededRandom(seed);
  for (let i = 0; i < points; i++) {
    const point = randomPoint(raw.symbols(), random);
    const [ours, expected] = [evaluateNormalised(law, point), raw.evaluate(point)];
    expect(relativelyClose(ours, expected, 1e-9), `${law.text}: ${ours} against ${expected}`).toBe(true);
  }
}

const exponent = fc.constantFrom(0, 0, 1, 1, 2, 0.5);
const monomial = (symbols: string[]) =>
  fc
    .tuple(...symbols.map(() => exponent))
    .map((es) => Monomial.fromFactors(symbols.map((s, i) => [s, Rational.fromNumber(es[i]!)])));
const term = fc
  .tuple(fc.integer({ min: 1, max: 9 }), monomial(CONSTANTS), monomial(CONCENTRATIONS))
  .map(([c, k, x]) => Polynomial.term(Rational.of(c), k.mul(x)));
const polynomial = (min: number) => fc.array(term, { minLength: min, maxLength: 4 }).map((ts) => Polynomial.sum(ts));

describe('normalised law = raw law', () => {
  it('for random rational functions, factored or not', () => {
    fc.assert(
      fc.property(
        polynomial(1),
        fc.array(fc.tuple(polynomial(2), fc.integer({ min: 1, max: 3 })), { minLength: 1, maxLength: 2 }),
        fc.boolean(),
        fc.integer(),
        (numerator, factors, giveFactors, seed) => {
          const kept = factors.filter(([p]) => !p.isZero());
          fc.pre(!numerator.isZero() && kept.length > 0);
          const denominator = Polynomial.product(kept.map(([p, n]) => p.pow(n)));
          const raw = RationalFunction.of(numerator, denominator);
          const factored = { numerator, factors: kept.map(([base, power]) => ({ base, power })) };
          const options = {
            constantSymbols: new Set<string>(),
            stepLabels: ['1', '2'],
            ...(giveFactors && { factored }),
          };
          expectEqualAtRandomPoints(raw, normaliseLaw(raw, options, fmt), seed);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('for random Michaelis–Menten-family mechanisms, and their trade form too', () => {
    const kinds = fc.record({
      competitive: fc.boolean(),
      uncompetitive: fc.boolean(),
      secondInhibitor: fc.boolean(),
      substrate: fc.boolean(),
      product: fc.boolean(),
      rds: fc.boolean(),
    });
    fc.assert(
      fc.property(kinds, fc.integer(), (k, seed) => {
        const steps = [
          '  - equation: E + S <=> ES',
          `  - { equation: ES -> E + P${k.rds ? ', rds: true' : ''} }`,
          ...(k.competitive ? ['  - equation: E + I <=> EI'] : []),
          ...(k.uncompetitive ? ['  - equation: ES + I <=> ESI'] : []),
          ...(k.secondInhibitor ? ['  - equation: E + J <=> EJ'] : []),
          ...(k.substrate && !k.rds ? ['  - equation: ES + S <=> SES'] : []),
          ...(k.product ? ['  - equation: E + P <=> EP'] : []),
        ];
        const d = deriveYaml(
          `title: t\nsystem: t\nstatus: proposed\nnotation: labels\napproximation: ${k.rds ? 'rds' : 'steady_state'}\nsteps:\n${steps.join('\n')}\n`,
        );
        const derived = d.rateLaws![0]!;
        const raw = derived.law.expression!;
        const law = derived.normalised!;
        expectEqualAtRandomPoints(raw, law, seed);
        expect(law.trade, law.text).toBeDefined();
        // The textbook shape in the named constants, whatever inhibitors there are.
        const trade = law.trade!;
        const single = trade.inhibitors.length === 1;
        const random = seededRandom(seed);
        for (let i = 0; i < 3; i++) {
          const point = randomPoint(raw.symbols(), random);
          const n = namedValues(law, point);
          const c = (s: string) => point.get(s)!;
          const over = (prime: boolean) =>
            trade.inhibitors.reduce((s, x) => {
              const name = `K_i${prime ? "'" : ''}${single ? '' : `,${x}`}`;
              const has = [...law.constants, ...trade.constants].some((q) => q.name === name);
              return s + (has ? c(`[${x}]`) / n(name) : 0);
            }, 1);
          const squared = trade.shape === 'substrate_inhibition' ? c('[S]') ** 2 / n('K_si') : 0;
          const textbook =
            (n('k_cat') * c('[E]_T') * c('[S]')) / (n('K_M') * over(false) + c('[S]') * over(true) + squared);
          expect(relativelyClose(textbook, raw.evaluate(point), 1e-9), trade.text).toBe(true);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('for random surface mechanisms: adsorbates, dissociative or not, reacting with each other or the gas', () => {
    const kinds = fc.record({
      dissociativeA: fc.boolean(),
      adsorbB: fc.boolean(),
      spectator: fc.boolean(),
    });
    fc.assert(
      fc.property(kinds, fc.integer(), (k, seed) => {
        const steps = [
          k.dissociativeA ? '  - equation: A2 + 2 S <=> 2 AS' : '  - equation: A + S <=> AS',
          ...(k.adsorbB ? ['  - equation: B + S <=> BS', '  - { equation: AS + BS -> P + 2 S, rds: true }'] : []),
          ...(!k.adsorbB ? ['  - { equation: AS + B -> P + S, rds: true }'] : []),
          ...(k.spectator ? ['  - equation: C + S <=> CS'] : []),
        ];
        const d = deriveYaml(`title: t\nsystem: t\nstatus: proposed\nnotation: labels\nsteps:\n${steps.join('\n')}\n`);
        const derived = d.rateLaws![0]!;
        expect(derived.law.expression, JSON.stringify(d.diagnostics)).toBeDefined();
        expectEqualAtRandomPoints(derived.law.expression!, derived.normalised!, seed);
        expect(derived.normalised!.factors.map((f) => f.power)).toEqual([k.adsorbB ? 2 : 1]);
      }),
      { numRuns: 16 },
    );
  });
});
