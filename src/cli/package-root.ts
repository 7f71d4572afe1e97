/** The package's own folder (where astro.config.mjs is), from this file's place in src/cli/ or lib/. */
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The folder holding astro.config.mjs above this module: the site the commands serve or build. */
export function packageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!existsSync(join(dir, 'astro.config.mjs'))) {
    const parent = dirname(dir);
    if (parent === dir) throw new Error('cannot find the package folder (astro.config.mjs)');
    dir = parent;
  }
  return dir;
}
