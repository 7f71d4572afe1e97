// The HTML reader the safe-pages test relies on must see what a browser would run.
import { describe, expect, it } from 'vitest';
import { attr, decodeEntities, elementText, startTags } from './html-scan.ts';

describe('startTags', () => {
  it('reads quoted, unquoted and bare attributes, decoded', () => {
    const [img, a] = startTags('<img src=x onerror=alert(1)><a href="java&#115;cript:x" download>t</a>');
    expect(img).toMatchObject({
      name: 'img',
      attrs: [
        ['src', 'x'],
        ['onerror', 'alert(1)'],
      ],
    });
    expect(attr(a!, 'href')).toBe('javascript:x');
    expect(attr(a!, 'download')).toBe('');
  });

  it('finds handlers after a slash and in upper case', () => {
    expect(startTags('<svg/onload=alert(1)>')[0]!.attrs).toEqual([['onload', 'alert(1)']]);
    expect(startTags('<IMG SRC=x ONERROR="a()">')[0]).toMatchObject({
      name: 'img',
      attrs: [
        ['src', 'x'],
        ['onerror', 'a()'],
      ],
    });
  });

  it('treats markup inside attribute values, comments and escaped text as text', () => {
    const tags = startTags('<meta content="<script>alert(1)</script>"><!-- <script> --><p>&lt;script&gt;</p>');
    expect(tags.map((t) => t.name)).toEqual(['meta', 'p']);
  });

  it('skips the raw text of script and style', () => {
    expect(startTags('<style>a<b{}</style><script>if (a<b) x()</script><i>').map((t) => t.name)).toEqual([
      'style',
      'script',
      'i',
    ]);
  });
});

describe('text', () => {
  it('decodes entities and strips tags', () => {
    expect(decodeEntities('&lt;a&gt; &amp; &quot;&#39;&#x41;')).toBe('<a> & "\'A');
    expect(elementText('<h1 class="x">&lt;b&gt; <span>y</span></h1>', /<h1[^>]*>/, 'h1')).toBe('<b> y');
  });
});
