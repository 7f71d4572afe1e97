/** Species slugs: surface-site symbols spell the site out, so CO@ and CO get their own pages. */
import { describe, expect, it } from 'vitest';
import { speciesSlugs } from '../../src/site/index.ts';

describe('species slugs', () => {
  it('spell a surface site as "at site" and keep excited states apart', () => {
    const slugs = speciesSlugs(['CO', 'CO@', '@', '@a', 'O@t1', 'NO2*']);
    expect(Object.fromEntries(slugs)).toEqual({
      CO: 'co',
      'CO@': 'co-at-site',
      '@': 'at-site',
      '@a': 'at-site-a',
      'O@t1': 'o-at-site-t1',
      'NO2*': 'no2-excited',
    });
  });
});
