/**
 * The version of the derivation engine, as a hash of its code: the files of src/engine,
 * src/model and src/records (which turns a record's text into what the engine derives from) and
 * the package's dependencies. A cached derivation is used only by the same engine.
 * The compiled command carries the hash computed when it was compiled (scripts/compile-cli.mjs);
 * run from source (tests, the site build), the hash is computed from the source files it runs.
 */
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import manifest from '../../package.json' with { type: 'json' };

declare const __MECHATLAS_ENGINE_HASH__: string | undefined;

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true })
    .flatMap((e) =>
      e.isDirectory() ? sourceFiles(join(folder, e.name)) : e.name.endsWith('.ts') ? [join(folder, e.name)] : [],
    )
    .sort();
}

/** The hash of the engine's source files under `root` (the package folder), or undefined when they are not there. */
export function engineSourceHash(root: string): string | undefined {
  const folders = ['src/engine', 'src/model', 'src/records'].map((f) => join(root, f));
  if (!folders.every((f) => existsSync(f))) return undefined;
  const hash = createHash('sha256');
  hash.update(JSON.stringify(manifest.dependencies));
  for (const file of folders.flatMap(sourceFiles)) {
    hash.update(`\0${relative(root, file).split('\\').join('/')}\0`);
    hash.update(readFileSync(file));
  }
  return hash.digest('hex');
}

/** The package folder of this source file: the nearest folder above it with src/engine. */
function sourceRoot(): string | undefined {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    if (existsSync(join(dir, 'src', 'engine')) && existsSync(join(dir, 'package.json'))) return dir;
    const parent = dirname(dir);
    if (parent === dir) return undefined;
    dir = parent;
  }
}

let computed: string | undefined | null = null;

/**
 * The engine's version hash, or undefined where it cannot be known (then nothing is cached).
 * MECHATLAS_PACKAGE_ROOT names the package folder where this code runs from a bundle elsewhere
 * (the site build's chunks).
 */
export function engineVersion(): string | undefined {
  if (typeof __MECHATLAS_ENGINE_HASH__ === 'string') return __MECHATLAS_ENGINE_HASH__;
  if (computed === null) {
    const root = process.env['MECHATLAS_PACKAGE_ROOT'] ?? sourceRoot();
    computed = root === undefined ? undefined : engineSourceHash(root);
  }
  return computed;
}
