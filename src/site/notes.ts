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

const schema: SanitizeSchema = {
  ...defaultSchema,
  protocols: { ...defaultSchema.protocols, href: ['http', 'https'] },
  // remark-math marks math with these classes; keep them so rehype-katex finds the math after sanitising.
  attributes: {
    ...defaultSchema.attributes,
    code: [['className', 'language-math', 'math-inline', 'math-display']],
  },
};

const processor = unified()
  .use(remarkParse)
  .use(remarkMath)
  .use(remarkRehype)
  .use(rehypeSanitize, schema)
  .use(rehypeKatex, { trust: false, strict: 'ignore', maxSize: 10, maxExpand: 200, output: 'htmlAndMathml', throwOnError: false, errorColor: '#8a1c1c' } as KatexOptions)
  .use(rehypeStringify);

/** HTML of a record's notes. */
export function renderNotes(markdown: string): string {
  return String(processor.processSync(markdown));
}
