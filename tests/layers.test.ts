/**
 * The layering of src/, read from the import graph: each layer imports only the layers below it,
 * through their index.ts, and no file imports itself through a circle of imports (type-only
 * imports count: a circle of types is still a circle to a reader).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../', import.meta.url));
const SRC = join(ROOT, 'src');

/** What each layer may import besides itself. */
const ALLOWED: Record<string, readonly string[]> = {
  model: [],
  engine: ['model'],
  records: ['model'],
  render: ['model', 'engine'],
  catalogue: ['model', 'engine', 'records'],
  cli: ['model', 'catalogue', 'render'],
  search: ['model'],
  site: ['model', 'catalogue', 'render', 'search'],
  astro: ['site', 'render/words', 'astro'],
};

/** The layer a file of src/ belongs to. */
function layerOf(file: string): string {
  const [top] = relative(SRC, file).split('/');
  if (top === 'pages' || top === 'components' || top === 'layouts' || top === 'styles' || top === 'content.config.ts')
    return 'astro';
  return top!;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(ts|astro|mjs)$/.test(name) ? [path] : [];
  });
}

/** Relative imports of a file, resolved to absolute paths (JSON, CSS and packages left out). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const specifiers = [
    ...text.matchAll(
      /(?:^|\n)\s*(?:import|export)\b[^'"]*?from\s*['"](\.[^'"]+)['"]|import\(\s*['"](\.[^'"]+)['"]\s*\)/g,
    ),
  ].map((m) => m[1] ?? m[2]!);
  return specifiers.filter((s) => /\.(ts|astro|mjs)$/.test(s)).map((s) => resolve(dirname(file), s));
}

const files = sourceFiles(SRC);
const graph = new Map(files.map((f) => [f, importsOf(f)]));
const name = (f: string) => relative(ROOT, f);

describe('the layers of src/', () => {
  it('import only the layers below them', () => {
    const upward: string[] = [];
    for (const [file, targets] of graph) {
      const from = layerOf(file);
      for (const target of targets) {
        const to = layerOf(target);
        if (to === from) continue;
        const words = relative(SRC, target).startsWith('render/words/');
        const ok = ALLOWED[from]?.includes(to) || (words && ALLOWED[from]?.includes('render/words'));
        if (!ok) upward.push(`${name(file)} → ${name(target)}`);
      }
    }
    expect(upward).toEqual([]);
  });

  it('reach another layer only through its index.ts', () => {
    const deep: string[] = [];
    for (const [file, targets] of graph) {
      for (const target of targets) {
        if (layerOf(target) === layerOf(file) || layerOf(target) === 'astro') continue;
        const entry = /^src\/[a-z]+\/index\.ts$|^src\/render\/words\/index\.ts$|^src\/search\/[a-z-]+\.ts$/.test(
          name(target),
        );
        if (!entry) deep.push(`${name(file)} → ${name(target)}`);
      }
    }
    expect(deep).toEqual([]);
  });

  it('has no circle of imports', () => {
    const circles: string[] = [];
    const state = new Map<string, 'open' | 'done'>();
    const path: string[] = [];
    const visit = (file: string): void => {
      state.set(file, 'open');
      path.push(file);
      for (const next of graph.get(file) ?? []) {
        if (state.get(next) === 'open') circles.push([...path.slice(path.indexOf(next)), next].map(name).join(' → '));
        else if (!state.has(next) && graph.has(next)) visit(next);
      }
      path.pop();
      state.set(file, 'done');
    };
    for (const file of files) if (!state.has(file)) visit(file);
    expect(circles).toEqual([]);
  });

  it('keeps the engine free of the file system, the console and Astro', () => {
    const impure = files
      .filter((f) => layerOf(f) === 'engine' || layerOf(f) === 'model' || layerOf(f) === 'render')
      .filter((f) => /from ['"](node:|astro|fs['"]|path['"])|\bconsole\.|\bprocess\./.test(readFileSync(f, 'utf8')))
      .map(name);
    expect(impure).toEqual([]);
  });
});
