import { Rational } from './rational.ts';

/**
 * Exact powers of rationals with rational exponents. A fractional power is exact only when the
 * root is itself rational (4^(1/2) = 2, but 2^(1/2) is not), so the answer may be undefined.
 */

/** base^exponent exactly, or undefined when the result is not rational (or is 0 to a negative power). */
export function rationalPower(base: Rational, exponent: Rational): Rational | undefined {
  if (exponent.isZero()) return Rational.ONE;
  let root = base;
  if (!exponent.isInteger()) {
    const k = exponent.den;
    if (base.sign() < 0 && k % 2n === 0n) return undefined;
    const num = integerRoot(base.num < 0n ? -base.num : base.num, k);
    const den = integerRoot(base.den, k);
    if (num === undefined || den === undefined) return undefined;
    root = Rational.of(base.num < 0n ? -num : num, den);
  }
  const n = exponent.num;
  if (n >= 0n) return Rational.of(root.num ** n, root.den ** n);
  if (root.isZero()) return undefined;
  return Rational.of(root.den ** -n, root.num ** -n);
}

/** The exact k-th root of a non-negative bigint, or undefined when it is not a perfect k-th power. */
export function integerRoot(n: bigint, k: bigint): bigint | undefined {
  if (n < 0n || k < 1n) throw new RangeError('integerRoot needs n >= 0 and k >= 1');
  if (n < 2n || k === 1n) return n;
  // Binary search between 0 and 2^(ceil(bits/k)), which bounds the root from above.
  let lo = 0n;
  let hi = 1n << (BigInt(n.toString(2).length) / k + 1n);
  while (lo < hi) {
    const mid = (lo + hi) / 2n;
    if (mid ** k < n) lo = mid + 1n;
    else hi = mid;
  }
  return lo ** k === n ? lo : undefined;
}
