#!/usr/bin/env node
// The `mechatlas` command: runs the compiled CLI in lib/ (built by `npm ci`, or `npm run compile`).
let cli;
try {
  cli = await import('../lib/mechatlas.mjs');
} catch (error) {
  if (error?.code !== 'ERR_MODULE_NOT_FOUND' || !String(error.message).includes('lib/mechatlas.mjs')) throw error;
  process.stderr.write('mechatlas: the compiled command is missing; run `npm run compile` (npm ci does it)\n');
  process.exit(3);
}
process.exitCode = await cli.main(process.argv.slice(2));
