import { describe, expect, it } from 'vitest';
import { doiUrl, httpUrl, mentionsHazard, sourceUrl } from '../../src/site/index.ts';

describe('doiUrl', () => {
  it.each([
    ['10.5555/chmg.2026.0007', 'https://doi.org/10.5555/chmg.2026.0007'],
    ['doi:10.1000/xyz123', 'https://doi.org/10.1000/xyz123'],
    ['https://doi.org/10.1000/xyz123', 'https://doi.org/10.1000/xyz123'],
    // Encoded per segment: the slash stays, quotes, angle brackets and # do not pass through.
    ['10.1000/a"b<c>#d?e', 'https://doi.org/10.1000/a%22b%3Cc%3E%23d%3Fe'],
    ['10.1002/(SICI)1097-4628', 'https://doi.org/10.1002/(SICI)1097-4628'],
  ])('%s', (doi, url) => expect(doiUrl(doi)).toBe(url));

  it.each(['javascript:alert(1)', '11.1000/x', '10.1/x', 'notebook 14, p. 32', ''])('refuses %s', (doi) =>
    expect(doiUrl(doi)).toBeUndefined(),
  );
});

describe('httpUrl', () => {
  it('keeps http and https', () => {
    expect(httpUrl('https://example.org/a b')).toBe('https://example.org/a%20b');
    expect(httpUrl('http://example.org/')).toBe('http://example.org/');
  });
  it.each([
    'javascript:alert(1)',
    'JaVaScRiPt:alert(1)',
    ' javascript:alert(1)',
    'data:text/html,<script>alert(1)</script>',
    'vbscript:x',
    '/relative',
    'ftp://x.org/',
    'https://user:pw@x.org/',
  ])('refuses %s', (url) => {
    expect(httpUrl(url)).toBeUndefined();
  });
});

describe('sourceUrl', () => {
  it('links DOIs and web addresses, not notebook pages', () => {
    expect(sourceUrl('10.5555/x.1')).toBe('https://doi.org/10.5555/x.1');
    expect(sourceUrl('https://example.org/data')).toBe('https://example.org/data');
    expect(sourceUrl('notebook 7, p. 12')).toBeUndefined();
    expect(sourceUrl('javascript:alert(1)')).toBeUndefined();
  });
});

describe('mentionsHazard', () => {
  it.each([
    [{ title: 'x', tags: ['scale-up'] }, true],
    [{ title: 'x', tags: ['Scaleup'] }, true],
    [{ title: 'x', tags: [], notes: 'The step is strongly exothermic.' }, true],
    [{ title: 'x', tags: [], notes: 'risk of thermal runaway' }, true],
    [{ title: 'Toxic gas evolution', tags: [] }, true],
    [{ title: 'x', tags: ['hazards'] }, true],
    [{ title: 'x', tags: ['aqueous', 'halide'], notes: 'a quiet reaction' }, false],
  ])('%o → %s', (view, expected) => expect(mentionsHazard(view)).toBe(expected));
});
