import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { content, formatText, monomialContent, Polynomial, primitivePart } from '../../../src/engine/exact/index.ts';
import { arbGeneralPolynomial, poly } from './helpers.ts';

describe('contents and primitive part', () => {
  it.each([
    ['6*x^2*y + 4*x*y^3', '2', 'x*y', '3*x + 2*y^2'],
    ['1/2*x + 1/3', '1/6', '1', '3*x + 2'],
    ['-4/3*k*S^2 - 2/3*k*S', '2/3', 'k*S', '-2*S - 1'],
    ['k*O2^(1/2)/NO + k*O2^(3/2)', '1', 'k*O2^(1/2)/NO', '1 + O2*NO'],
  ])('%s = %s · %s · (%s)', (p, c, m, pp) => {
    const x = poly(p);
    expect(content(x).toString()).toBe(c);
    expect(formatText(monomialContent(x))).toBe(formatText(poly(m)));
    expect(formatText(primitivePart(x))).toBe(formatText(poly(pp)));
  });

  it('content · monomial content · primitive part = p', () => {
    fc.assert(
      fc.property(arbGeneralPolynomial, (p) => {
        const rebuilt = primitivePart(p).mulTerm(content(p), monomialContent(p));
        expect(rebuilt.equals(p)).toBe(true);
        if (!p.isZero()) expect(content(primitivePart(p)).toString()).toBe('1');
      }),
      { numRuns: 60 },
    );
  });

  it('gives zero content for the zero polynomial', () => {
    expect(content(Polynomial.ZERO).isZero()).toBe(true);
    expect(primitivePart(Polynomial.ZERO).isZero()).toBe(true);
  });
});
