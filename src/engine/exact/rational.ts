/**
 * Exact rational numbers: bigint numerator and denominator, denominator > 0, reduced by gcd.
 * Immutable; `Rational.of` is the one normalising constructor.
 */
export class Rational {
  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);

  private constructor(
    readonly num: bigint,
    readonly den: bigint,
  ) {}

  /** Normalises num/den; throws only on a zero denominator (a programmer mistake). */
  static of(num: bigint | number, den: bigint | number = 1n): Rational {
    let n = toBigInt(num);
    let d = toBigInt(den);
    if (d === 0n) throw new RangeError('Rational with zero denominator');
    if (d < 0n) {
      n = -n;
      d = -d;
    }
    const g = gcd(n, d);
    return new Rational(n / g, d / g);
  }

  /** Reads an integer, `p/q`, or a finite decimal such as `-0.25` or `1e-3` exactly. */
  static parse(text: string): Rational | undefined {
    const t = text.trim();
    const fraction = /^([+-]?\d+)\s*\/\s*(\d+)$/.exec(t);
    if (fraction) return fraction[2] === '0' ? undefined : Rational.of(BigInt(fraction[1]!), BigInt(fraction[2]!));
    const decimal = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(t);
    if (!decimal || (decimal[2] === '' && (decimal[3] ?? '') === '')) return undefined;
    const [, sign, whole, frac = '', exp = '0'] = decimal;
    let num = BigInt((whole || '0') + frac);
    let den = 10n ** BigInt(frac.length);
    const e = Number(exp);
    if (Math.abs(e) > 400) return undefined;
    if (e >= 0) num *= 10n ** BigInt(e);
    else den *= 10n ** BigInt(-e);
    return Rational.of(sign === '-' ? -num : num, den);
  }

  /** The exact value of a finite double (every double is a dyadic rational m·2^e). */
  static fromNumber(x: number): Rational {
    if (!Number.isFinite(x)) throw new RangeError(`not a finite number: ${x}`);
    if (Number.isSafeInteger(x)) return Rational.of(BigInt(x));
    const view = new DataView(new ArrayBuffer(8));
    view.setFloat64(0, x);
    const bits = view.getBigUint64(0);
    const sign = bits >> 63n === 1n ? -1n : 1n;
    const biased = Number((bits >> 52n) & 0x7ffn);
    const fraction = bits & ((1n << 52n) - 1n);
    const mantissa = biased === 0 ? fraction : fraction | (1n << 52n);
    const exponent = (biased === 0 ? 1 : biased) - 1075;
    return exponent >= 0
      ? Rational.of(sign * (mantissa << BigInt(exponent)))
      : Rational.of(sign * mantissa, 1n << BigInt(-exponent));
  }

  // Integers (most exponents and coefficients) skip the gcd of the normalising constructor.
  add(o: Rational): Rational {
    if (this.den === 1n && o.den === 1n) return new Rational(this.num + o.num, 1n);
    return Rational.of(this.num * o.den + o.num * this.den, this.den * o.den);
  }
  sub(o: Rational): Rational {
    if (this.den === 1n && o.den === 1n) return new Rational(this.num - o.num, 1n);
    return Rational.of(this.num * o.den - o.num * this.den, this.den * o.den);
  }
  mul(o: Rational): Rational {
    if (this.den === 1n && o.den === 1n) return new Rational(this.num * o.num, 1n);
    return Rational.of(this.num * o.num, this.den * o.den);
  }
  div(o: Rational): Rational {
    return Rational.of(this.num * o.den, this.den * o.num);
  }
  neg(): Rational {
    return new Rational(-this.num, this.den);
  }
  abs(): Rational {
    return this.num < 0n ? this.neg() : this;
  }
  inverse(): Rational {
    return Rational.of(this.den, this.num);
  }
  compare(o: Rational): -1 | 0 | 1 {
    const d = this.den === o.den ? this.num - o.num : this.num * o.den - o.num * this.den;
    return d < 0n ? -1 : d > 0n ? 1 : 0;
  }
  equals(o: Rational): boolean {
    return this.num === o.num && this.den === o.den;
  }
  sign(): -1 | 0 | 1 {
    return this.num < 0n ? -1 : this.num > 0n ? 1 : 0;
  }
  isZero(): boolean {
    return this.num === 0n;
  }
  isInteger(): boolean {
    return this.den === 1n;
  }
  /** The nearest double (within an ulp or so), also when numerator and denominator are huge. */
  toNumber(): number {
    const limit = 1n << 53n;
    if (this.num < limit && -this.num < limit && this.den < limit) return Number(this.num) / Number(this.den);
    // Keep 64 significant bits of the quotient, then scale back by a power of two.
    const shift = bitLength(this.den) - bitLength(this.num < 0n ? -this.num : this.num) + 64;
    const q = shift >= 0 ? (this.num << BigInt(shift)) / this.den : this.num / (this.den << BigInt(-shift));
    return Number(q) * 2 ** -Math.min(shift, 1000) * 2 ** -Math.max(shift - 1000, 0);
  }
  /** `3`, `-1/2`. */
  toString(): string {
    return this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
  }
  toJSON(): number | string {
    return this.den === 1n &&
      this.num <= BigInt(Number.MAX_SAFE_INTEGER) &&
      -this.num <= BigInt(Number.MAX_SAFE_INTEGER)
      ? Number(this.num)
      : this.toString();
  }
}

/** Greatest common divisor of two bigints, always ≥ 1 unless both are 0 (then 1). */
export function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x === 0n ? 1n : x;
}

/** Least common multiple of positive bigints. */
export function lcm(a: bigint, b: bigint): bigint {
  return (a / gcd(a, b)) * b;
}

function bitLength(x: bigint): number {
  return x === 0n ? 0 : x.toString(2).length;
}

function toBigInt(x: bigint | number): bigint {
  if (typeof x === 'bigint') return x;
  if (!Number.isSafeInteger(x)) throw new RangeError(`not a safe integer: ${x}`);
  return BigInt(x);
}
