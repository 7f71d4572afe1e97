/**
 * A small reader of built HTML for tests: the start tags with their attributes (quoted, unquoted
 * or bare), skipping comments and the raw text of <script> and <style>; and the text of an element.
 * Enough to check what a browser would treat as markup, without a parser dependency.
 */

export interface Tag {
  name: string;
  attrs: [name: string, value: string][];
  /** offset of the `<` in the document */
  at: number;
}

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: '\u00a0' };

/** Decodes the character references Astro and KaTeX write. */
export function decodeEntities(text: string): string {
  return text.replace(/&(#x[0-9a-f]+|#[0-9]+|[a-z]+);/gi, (whole, ref: string) => {
    if (ref[0] === '#')
      return String.fromCodePoint(
        ref[1] === 'x' || ref[1] === 'X' ? parseInt(ref.slice(2), 16) : parseInt(ref.slice(1), 10),
      );
    return ENTITIES[ref.toLowerCase()] ?? whole;
  });
}

/** Every start tag of the document, attribute values decoded. */
export function startTags(html: string): Tag[] {
  const tags: Tag[] = [];
  let i = 0;
  while (i < html.length) {
    const lt = html.indexOf('<', i);
    if (lt < 0) break;
    if (html.startsWith('<!--', lt)) {
      const end = html.indexOf('-->', lt + 4);
      i = end < 0 ? html.length : end + 3;
      continue;
    }
    const nameMatch = /^<([A-Za-z][A-Za-z0-9:-]*)/.exec(html.slice(lt, lt + 64));
    if (!nameMatch) {
      i = lt + 1;
      continue;
    }
    const name = nameMatch[1]!.toLowerCase();
    let j = lt + nameMatch[0].length;
    const attrs: [string, string][] = [];
    while (j < html.length) {
      while (/[\s/]/.test(html[j] ?? '')) j++;
      if (html[j] === '>' || j >= html.length) break;
      const attr = /^[^\s/>=]+/.exec(html.slice(j, j + 256));
      if (!attr) {
        j++;
        continue;
      }
      j += attr[0].length;
      while (/\s/.test(html[j] ?? '')) j++;
      let value = '';
      if (html[j] === '=') {
        j++;
        while (/\s/.test(html[j] ?? '')) j++;
        const quote = html[j];
        if (quote === '"' || quote === "'") {
          const end = html.indexOf(quote, j + 1);
          value = html.slice(j + 1, end < 0 ? html.length : end);
          j = end < 0 ? html.length : end + 1;
        } else {
          const unquoted = /^[^\s>]*/.exec(html.slice(j))![0];
          value = unquoted;
          j += unquoted.length;
        }
      }
      attrs.push([attr[0].toLowerCase(), decodeEntities(value)]);
    }
    tags.push({ name, attrs, at: lt });
    i = j + 1;
    if (name === 'script' || name === 'style') {
      const close = html.toLowerCase().indexOf(`</${name}`, i);
      i = close < 0 ? html.length : close;
    }
  }
  return tags;
}

/** The value of an attribute of a tag, if present. */
export function attr(tag: Tag, name: string): string | undefined {
  return tag.attrs.find(([n]) => n === name)?.[1];
}

/** The text inside the first element matching an opening-tag pattern, tags stripped and entities decoded. */
export function elementText(html: string, open: RegExp, closeName: string): string | undefined {
  const m = open.exec(html);
  if (!m) return undefined;
  const start = m.index + m[0].length;
  const end = html.indexOf(`</${closeName}>`, start);
  return decodeEntities(html.slice(start, end).replace(/<[^>]*>/g, '')).trim();
}
