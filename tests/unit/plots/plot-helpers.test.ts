/**
 * The small helpers of the concentration–time plot: log and linear time ticks, the concentration
 * unit and magnification, curve styles told apart without colour, and end labels moved apart.
 */
import { describe, expect, it } from 'vitest';
import { spreadApart } from '../../../src/render/plots/concentration-time-labels.ts';
import { concentrationUnit, magnificationExponent } from '../../../src/render/plots/concentration-scale.ts';
import { curveStyle } from '../../../src/render/plots/curve-style.ts';
import { linearTicks, logTicks, powerOfTen, timeUnit } from '../../../src/render/plots/time-axis.ts';

describe('log time ticks', () => {
  it('labels every decade inside the range, with minor ticks at 2…9', () => {
    const { major, minor } = logTicks(1e-3, 2e2);
    expect(major.map((t) => t.label)).toEqual(['10⁻³', '10⁻²', '10⁻¹', '10⁰', '10¹', '10²']);
    expect(major.map((t) => t.value)).toEqual([1e-3, 1e-2, 0.1, 1, 10, 100]);
    expect(minor).toContain(2e-3);
    expect(minor).toContain(9);
    expect(minor.every((v) => v > 1e-3 && v < 2e2)).toBe(true);
  });

  it('labels every second decade beyond eight, and drops minor ticks beyond six', () => {
    const { major, minor } = logTicks(1e-6, 1e5);
    expect(major.map((t) => t.label)).toEqual(['10⁻⁶', '10⁻⁴', '10⁻²', '10⁰', '10²', '10⁴']);
    expect(minor).toEqual([1e-5, 1e-3, 0.1, 10, 1e3, 1e5]);
  });

  it('has no ticks for a bad range', () => {
    expect(logTicks(0, 10)).toEqual({ major: [], minor: [] });
    expect(logTicks(10, 1)).toEqual({ major: [], minor: [] });
  });

  it('writes powers of ten with superscripts', () => {
    expect([powerOfTen(-12), powerOfTen(0), powerOfTen(5)]).toEqual(['10⁻¹²', '10⁰', '10⁵']);
  });
});

describe('linear time axis', () => {
  it('picks s, min, h or d so that tick numbers stay short', () => {
    expect([timeUnit(500), timeUnit(2000), timeUnit(2e5), timeUnit(1e7)].map((u) => u.unit)).toEqual([
      's',
      'min',
      'h',
      'd',
    ]);
    expect(linearTicks(2.5).major.map((t) => t.label)).toEqual(['0.0', '0.5', '1.0', '1.5', '2.0', '2.5']);
  });
});

describe('concentration scale', () => {
  it('chooses the unit that keeps the largest value at 0.1 or above', () => {
    expect([0.5, 0.08, 2e-4, 3e-5, 1e-8, 1e-15].map((c) => concentrationUnit(c).symbol)).toEqual([
      'M',
      'mM',
      'mM',
      'µM',
      'nM',
      'pM',
    ]);
  });

  it('magnifies a curve below 1/20 of the tallest by the power of ten that brings it within a decade', () => {
    expect(magnificationExponent(0.1, 0.2)).toBe(0);
    expect(magnificationExponent(0.009, 0.2)).toBe(1);
    expect(magnificationExponent(1.67e-6, 0.2)).toBe(5);
    expect(magnificationExponent(0, 0.2)).toBe(0);
  });
});

describe('curve styles', () => {
  it('gives 64 curves distinct pairs of dash pattern and marker', () => {
    const pairs = new Set(
      Array.from({ length: 64 }, (_, i) => `${curveStyle(i).dash ?? 'solid'}|${curveStyle(i).marker}`),
    );
    expect(pairs.size).toBe(64);
    expect(curveStyle(0)).toEqual({ marker: 'circle' });
  });
});

describe('end labels', () => {
  it('moves labels apart by at least the gap, staying inside the frame and in order', () => {
    const placed = spreadApart([100, 101, 102, 300, 395], 12, 20, 400);
    const sorted = [...placed].sort((a, b) => a - b);
    sorted.slice(1).forEach((y, k) => expect(y - sorted[k]!).toBeGreaterThanOrEqual(12 - 1e-9));
    expect(Math.max(...placed)).toBeLessThanOrEqual(400);
    expect(placed[0]!).toBeLessThan(placed[1]!);
    expect(placed[3]).toBe(304);
  });
});
