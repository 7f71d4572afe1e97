/**
 * Positive roots in closed form (Descartes' rule of signs), laws with radicals, their order
 * limits from Newton polygons, and how they are written.
 */
import { describe, expect, it } from 'vitest';
import {
  AlgebraicFunction,
  PositiveRoot,
  RationalFunction,
  algebraicOrderLimits,
  formatAlgebraicLatex,
  formatAlgebraicText,
  scaleRoot,
} from '../../../src/engine/exact/index.ts';
import { apparentOrder } from '../../../src/engine/rate-law/orders.ts';
import { poly, rf } from './helpers.ts';

const root = (symbol: string, text: string) => {
  const r = PositiveRoot.of(symbol, poly(text));
  if (!(r instanceof PositiveRoot)) throw new Error(`no root: ${JSON.stringify(r)}`);
  return r;
};
const at = (entries: Record<string, number>) => new Map(Object.entries(entries));

describe('PositiveRoot', () => {
  it('a binomial a·x^n = b: the radical, exact where the ratio is a perfect power of monomials', () => {
    expect(root('x', 'k5*x^2 - k1*B').exactMonomial()!.monomial.exponent('B').toString()).toBe('1/2');
    const r = root('x', '2*k4*x^2 - k1');
    expect(r.exactMonomial()).toBeUndefined(); // (1/2)^(1/2) is irrational
    expect(r.value(at({ k1: 8, k4: 1 }))).toBeCloseTo(2, 14);
  });

  it('a quadratic: the one positive root, without cancellation for either sign of b', () => {
    // x² + b x − c = 0 with b = ±3, c = 4: roots 1, −4 (b = 3) and 4, −1 (b = −3).
    expect(root('x', 'x^2 + b*x - c').value(at({ b: 3, c: 4 }))).toBeCloseTo(1, 14);
    expect(root('x', 'x^2 - b*x - c').value(at({ b: 3, c: 4 }))).toBeCloseTo(4, 14);
    // b² ≫ 4ac: the naive formula would lose every digit here.
    expect(root('x', 'x^2 + b*x - c').value(at({ b: 1e8, c: 1 }))).toBeCloseTo(1e-8, 20);
  });

  it('reports a degree above two, and coefficient signs that allow no or two positive roots', () => {
    expect(PositiveRoot.of('x', poly('x^4 + a*x - b'))).toEqual({ kind: 'degree', degree: 4 });
    expect(PositiveRoot.of('x', poly('x^2 - a*x + b'))).toMatchObject({ kind: 'sign' });
    expect(PositiveRoot.of('x', poly('x^2 + a'))).toMatchObject({ kind: 'sign' });
  });

  it('a quadratic in x² is solved as one in y = x²', () => {
    const r = root('x', 'x^4 + x^2 - 2'); // y² + y − 2 = 0: y = 1, x = 1
    expect(r.kind).toBe('quadratic');
    expect(r.value(new Map())).toBeCloseTo(1, 14);
  });
});

describe('scaleRoot draws the concentrations out of a root', () => {
  it('a homogeneous quadratic: x = [E]·ρ with ρ free of [E]', () => {
    const scaled = scaleRoot(poly('k3*x^2 - k1*E*x - k4*E^2'), 'x', 'r', (s) => s === 'E')!;
    expect(scaled.scale.exponent('E').toString()).toBe('1');
    expect(scaled.polynomial.symbols()).toEqual(['k1', 'k3', 'k4', 'r']);
  });

  it('nothing to draw out where the coefficients mix concentrations', () => {
    expect(scaleRoot(poly('x^2 + x - E'), 'x', 'r', (s) => s === 'E')).toBeUndefined();
  });
});

describe('laws with radicals: orders from the Newton polygon', () => {
  it('first-order and second-order loss of an intermediate: order 2 → 1 in its source', () => {
    // 2k₂I² + k₃I = k₁A: I ≈ k₁A/k₃ (A → 0) and I ≈ (k₁A/2k₂)^½ (A → ∞); r = k₂I².
    const I = root('r1', '2*k2*r1^2 + k3*r1 - k1*A');
    const law = new AlgebraicFunction(rf('k2*r1^2'), [I]);
    const limits = algebraicOrderLimits(law, 'A')!;
    expect([limits.low.toString(), limits.high.toString()]).toEqual(['2', '1']);
    const k3 = algebraicOrderLimits(law, 'k3')!;
    expect([k3.low.toString(), k3.high.toString()]).toEqual(['0', '-2']);
  });

  it('the apparent order by implicit differentiation agrees with a finite difference', () => {
    const law = new AlgebraicFunction(rf('k2*r1^2'), [root('r1', '2*k2*r1^2 + k3*r1 - k1*A')]);
    const values = at({ k1: 2, k2: 0.7, k3: 1.3, A: 0.9 });
    const h = 1e-6;
    const up = law.evaluate(at({ k1: 2, k2: 0.7, k3: 1.3, A: 0.9 * (1 + h) }));
    const down = law.evaluate(at({ k1: 2, k2: 0.7, k3: 1.3, A: 0.9 * (1 - h) }));
    const slope = Math.log(up / down) / Math.log((1 + h) / (1 - h));
    expect(law.logDerivative('A', values)).toBeCloseTo(slope, 6);
  });

  it('no limit where the dominant terms could cancel', () => {
    const law = new AlgebraicFunction(rf('A - r1'), [root('r1', 'r1^2 - A^2')]);
    expect(algebraicOrderLimits(law, 'A')).toBeUndefined();
  });

  it('is written with the closed form inline, in text and in LaTeX', () => {
    const law = new AlgebraicFunction(rf('k2*A*r1'), [root('r1', '2*k4*r1^2 - k1')]);
    expect(formatAlgebraicText(law)).toBe('A*k2*(k1 / (2*k4))^(1/2)');
    expect(formatAlgebraicLatex(law)).toBe('A k2 \\sqrt{\\frac{k1}{2 k4}}');
    expect(law.symbols()).toEqual(['A', 'k1', 'k2', 'k4']);
  });

  it('with a product absent: the root is solved again with it at zero', () => {
    const law = new AlgebraicFunction(RationalFunction.of(poly('r1')), [root('r1', 'r1^2 + P*r1 - A')]);
    const zero = law.withZero('P')!;
    expect(zero.evaluate(at({ A: 4 }))).toBeCloseTo(2, 14);
    // ρ = √A once P is gone: order ½ in A at conditions where [P] = 0.
    expect(apparentOrder(law, 'A', at({ A: 4, P: 0 }))).toBeCloseTo(0.5, 12);
  });
});
