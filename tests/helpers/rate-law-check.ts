/**
 * Test helpers for rate-law reference checks: seeded random points, comparison of an exact rate
 * law with a formula written independently in the test, and order limits as plain strings.
 */
import { expect } from 'vitest';
import type { RationalFunction } from '../../src/engine/exact/index.ts';
import type { Derivation } from '../../src/engine/derive.ts';
import type { DerivedRateLaw } from '../../src/engine/rate-law/derive-rate-laws.ts';
import type { RateLawMethod } from '../../src/engine/rate-law/rate-law.ts';

/** Reads one symbol's value; throws on a symbol the formula did not declare (a typo in the test). */
export type Lookup = (symbol: string) => number;

/** A rate law written by hand as a JavaScript function of the engine's symbols. */
export interface Formula {
  symbols: readonly string[];
  rate: (v: Lookup) => number;
}

/** A small deterministic generator (mulberry32), so every run checks the same points. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Positive values for the symbols, log-uniform over four decades (10^-2 … 10^2). */
export function randomPoint(symbols: readonly string[], random: () => number): Map<string, number> {
  return new Map(symbols.map((s) => [s, 10 ** (4 * random() - 2)]));
}

/** A lookup over a point that refuses undeclared symbols. */
export function lookupIn(point: ReadonlyMap<string, number>): Lookup {
  return (symbol) => {
    const value = point.get(symbol);
    if (value === undefined) throw new Error(`the formula uses ${symbol}, which it does not declare`);
    return value;
  };
}

/** |a − b| ≤ tolerance · max(|a|, |b|). */
export function relativelyClose(a: number, b: number, tolerance: number): boolean {
  return Math.abs(a - b) <= tolerance * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * Expects the engine's exact law to have exactly the formula's symbols and to equal it at
 * `points` random positive points (relative tolerance 1e-12 by default).
 */
export function expectSameLaw(
  expression: RationalFunction | undefined,
  formula: Formula,
  { points = 8, seed = 1, tolerance = 1e-12 } = {},
): void {
  expect(expression, 'the engine gave no exact expression').toBeDefined();
  expect([...expression!.symbols()].sort()).toEqual([...formula.symbols].sort());
  const random = seededRandom(seed);
  for (let i = 0; i < points; i++) {
    const point = randomPoint(formula.symbols, random);
    const ours = expression!.evaluate(point);
    const expected = formula.rate(lookupIn(point));
    expect(
      relativelyClose(ours, expected, tolerance),
      `at ${JSON.stringify(Object.fromEntries(point))}: engine ${ours}, formula ${expected}`,
    ).toBe(true);
  }
}

/** The order limits of a derived law as `{ species: [low, high] }`, each an exact rational in text (`1/2`, `-1`). */
export function orderTable(derived: DerivedRateLaw): Record<string, [string, string]> {
  return Object.fromEntries([...derived.orders].map(([sp, o]) => [sp, [o.low.toString(), o.high.toString()]]));
}

/** The one rate law of a method, failing when it is missing. */
export function lawBy(d: Derivation, method: RateLawMethod): DerivedRateLaw {
  const found = d.rateLaws?.find((r) => r.law.method === method);
  if (!found) throw new Error(`no ${method} rate law: ${JSON.stringify(d.diagnostics)}`);
  return found;
}

/** The constant symbols (k_…, k_-…, K_…) named in a piece of text, sorted. */
export function constantTokens(text: string): string[] {
  return [...new Set(text.match(/\b[kK]_-?[A-Za-z0-9]+/g) ?? [])].sort();
}
