/** "Did you mean …?" suggestions. */
import { describe, expect, it } from 'vitest';
import { closestName, editDistance } from '../../src/records/index.ts';

describe('editDistance', () => {
  it.each([
    ['rds', 'rds', 0],
    ['rsd', 'rds', 1],
    ['sytem', 'system', 1],
    ['equaton', 'equation', 1],
    ['kitten', 'sitting', 3],
    ['', 'abc', 3],
  ])('%s → %s is %i', (a, b, distance) => {
    expect(editDistance(a, b)).toBe(distance);
    expect(editDistance(b, a)).toBe(distance);
  });
});

describe('closestName', () => {
  const stepFields = ['equation', 'label', 'rds', 'times', 'k', 'k_rev', 'K', 'energy', 'note'];

  it.each([
    ['rsd', 'rds'],
    ['equaton', 'equation'],
    ['Equation', 'equation'],
    ['NOTE', 'note'],
    ['k_ref', 'k_rev'],
    ['time', 'times'],
  ])('suggests %s → %s', (typo, field) => {
    expect(closestName(typo, stepFields)).toBe(field);
  });

  it.each(['colour', 'mechanism', 'x'])('suggests nothing for %s, which is not a slip', (word) => {
    expect(closestName(word, stepFields)).toBeUndefined();
  });

  it('prefers the earlier candidate on a tie', () => {
    expect(closestName('kk', ['k', 'K'])).toBe('k');
  });
});
