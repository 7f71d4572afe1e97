/**
 * A size cap on the math of a record's notes, run after sanitising and before rehype-katex: each
 * formula is typeset once to measure it, and one that would be larger than the cap per formula,
 * or would take the notes past the cap for all of them, is left as its source in a
 * `code.math-too-large` element with a notice (rehype-katex passes over it). A page stays a page,
 * not megabytes of nested boxes, whatever a note holds.
 */
import katex from 'katex';

/** The options rehype-katex typesets notes with; the cap measures with the same ones. */
export const KATEX_OPTIONS = {
  trust: false,
  strict: 'ignore' as const,
  maxSize: 10,
  maxExpand: 200,
  output: 'htmlAndMathml' as const,
  throwOnError: false,
  errorColor: '#8a1c1c',
};

interface HastNode {
  type: string;
  tagName?: string;
  value?: string;
  properties?: Record<string, unknown>;
  children?: HastNode[];
}

const MATH_CLASSES = ['math-inline', 'math-display'];

function textOf(node: HastNode): string {
  return node.type === 'text' ? (node.value ?? '') : (node.children ?? []).map(textOf).join('');
}

/** The unified plugin: `perFormula` and `total` are the caps in characters of HTML. */
export function capNotesMath(options: { perFormula: number; total: number }) {
  return (tree: HastNode) => {
    let total = 0;
    const visit = (node: HastNode) => {
      const classes = (node.properties?.['className'] as string[] | undefined) ?? [];
      if (node.tagName === 'code' && classes.some((c) => MATH_CLASSES.includes(c))) {
        const source = textOf(node);
        const size = katex.renderToString(source, {
          ...KATEX_OPTIONS,
          displayMode: classes.includes('math-display'),
        }).length;
        if (size <= options.perFormula && total + size <= options.total) {
          total += size;
          return;
        }
        const why =
          size > options.perFormula
            ? `this formula would be ${size.toLocaleString('en')} characters of HTML (at most ${options.perFormula.toLocaleString('en')})`
            : `the formulas of these notes would be more than ${options.total.toLocaleString('en')} characters of HTML`;
        node.properties = { className: ['math-too-large'], title: `not typeset: ${why}` };
        node.children = [{ type: 'text', value: source }];
        return;
      }
      for (const child of node.children ?? []) visit(child);
    };
    visit(tree);
  };
}
