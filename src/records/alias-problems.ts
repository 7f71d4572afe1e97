/**
 * Aliases that name no earlier anchor, or sit inside the collection they name (which would make
 * the data circular), must be caught before `toJS`, which would throw or build a cycle that
 * validation could not finish.
 */
import { isAlias, visit } from 'yaml';
import type { Alias, Document } from 'yaml';
import { diagnostic } from '../model/index.ts';
import type { Diagnostic } from '../model/index.ts';
import type { RecordLocator } from './source-positions.ts';

/** Every alias in document order, and a `record/yaml` error for each one that cannot resolve. */
export function findAliasProblems(
  doc: Document.Parsed,
  locator: RecordLocator,
): { aliases: Alias[]; diagnostics: Diagnostic[] } {
  const anchors = new Set<string>();
  const aliases: Alias[] = [];
  const diagnostics: Diagnostic[] = [];
  const report = (node: Alias, message: string): void => {
    const range = node.range ?? [0, 0];
    const position = locator.span(range[0], range[1]);
    diagnostics.push(diagnostic('record/yaml', 'error', message, { ...position, actual: `*${node.source}` }));
  };
  const names = (outer: unknown, name: string): boolean =>
    typeof outer === 'object' && outer !== null && 'anchor' in outer && outer.anchor === name;
  visit(doc, {
    Node(_key, node, path) {
      if (!isAlias(node)) {
        if (node.anchor !== undefined) anchors.add(node.anchor);
        return;
      }
      aliases.push(node);
      const name = node.source;
      if (!anchors.has(name)) report(node, `the alias *${name} has no anchor &${name} before it`);
      else if (path.some((outer) => names(outer, name))) {
        report(node, `the alias *${name} is inside the value it refers to`);
      }
    },
  });
  return { aliases, diagnostics };
}
