/**
 * Record notes: Markdown with $math$, rendered safely. The pipeline sanitises before KaTeX runs
 * (so only KaTeX produces markup), keeps no raw HTML, and allows links only to http(s) and DOIs.
 */
import rehypeKatex, { type Options as KatexOptions } from 'rehype-katex';
import rehypeSanitize, { defaultSchema, type Options as SanitizeSchema } from 'rehype-sanitize';
import rehypeStringify from 'rehype-stringify';
import remarkMath from 'remark-math';
import remarkParse from 'remark-parse';
import remarkRehype from 'remark-rehype';
import { unified } from 'unified';
import { MAX_MATH_HTML } from './math.ts';
import { capNotesMath, KATEX_OPTIONS } from './notes-math-cap.ts';

const schema: SanitizeSchema = {
  ...defaultSchema,
  protocols: { ...defaultSchema.protocols, href: ['http', 'https'] },
  // remark-math marks math with these classes; keep them so rehype-katex finds the math after sanitising.
  attributes: {
    ...defaultSchema.attributes,
    code: [['className', 'language-math', 'math-inline', 'math-display']],
  },
};

interface MdNode {
  type: string;
  value?: string | undefined;
  children?: MdNode[] | undefined;
  position?: { start: { offset?: number | undefined } } | undefined;
  data?: unknown;
}

/** A flow math node shaped as remark-math shapes one (its hast is `pre > code.math-display`). */
function displayMath(value: string): MdNode {
  const code = {
    type: 'element',
    tagName: 'code',
    properties: { className: ['language-math', 'math-display'] },
    children: [{ type: 'text', value }],
  };
  return { type: 'math', value, data: { hName: 'pre', hChildren: [code] } };
}

/**
 * A paragraph that is only `$$ … $$` on one line is display math, as people mean it; remark-math
 * reads it as inline math (double dollars inside a paragraph), so it would render small.
 */
function remarkLoneDisplayMath() {
  return (tree: unknown, file: { value: unknown }) => {
    const source = String(file.value);
    const walk = (node: MdNode) => {
      if (!node.children) return;
      node.children = node.children.map((child) => {
        const only = child.type === 'paragraph' && child.children?.length === 1 ? child.children[0] : undefined;
        const at = only?.position?.start.offset;
        if (only?.type === 'inlineMath' && at !== undefined && source.startsWith('$$', at))
          return displayMath(only.value ?? '');
        walk(child);
        return child;
      });
    };
    walk(tree as MdNode);
  };
}

/** The most typeset HTML all formulas of one record's notes may add up to (the rest stay source). */
const MAX_NOTES_MATH_HTML = 1_000_000;

const processor = unified()
  .use(remarkParse)
  .use(remarkMath)
  .use(remarkLoneDisplayMath)
  .use(remarkRehype)
  .use(rehypeSanitize, schema)
  .use(capNotesMath, { perFormula: MAX_MATH_HTML, total: MAX_NOTES_MATH_HTML })
  .use(rehypeKatex, KATEX_OPTIONS as KatexOptions)
  .use(rehypeStringify);

/** HTML of a record's notes. */
export function renderNotes(markdown: string): string {
  return String(processor.processSync(markdown));
}
