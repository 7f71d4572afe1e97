#!/usr/bin/env node
/**
 * Compiles the `mechatlas` command into one JavaScript file, lib/mechatlas.mjs, which bin/ runs:
 * no TypeScript loader at run time. Packages stay external (node_modules); our own code, the
 * record schema and the version from package.json are bundled in. Run by `npm ci` (prepare)
 * and before the tests.
 */
import { build } from 'esbuild';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../', import.meta.url));

await build({
  absWorkingDir: root,
  entryPoints: ['src/cli/main.ts'],
  outfile: 'lib/mechatlas.mjs',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  packages: 'external',
  sourcemap: 'linked',
  legalComments: 'none',
  logLevel: 'warning',
});
