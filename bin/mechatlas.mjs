#!/usr/bin/env node
// The `mechatlas` command: runs the compiled CLI in lib/ (built by `npm ci`, or `npm run compile`).
// Exit 3 means mechatlas itself failed (never a stack trace alone); a closed pipe (`| head`) ends quietly.
process.stdout.on('error', (error) => {
  if (error?.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw error;
});
let cli;
try {
  cli = await import('../lib/mechatlas.mjs');
} catch (error) {
  if (error?.code !== 'ERR_MODULE_NOT_FOUND' || !String(error.message).includes('lib/mechatlas.mjs')) throw error;
  process.stderr.write('mechatlas: the compiled command is missing; run `npm run compile` (npm ci does it)\n');
  process.exit(3);
}
try {
  process.exitCode = await cli.main(process.argv.slice(2));
} catch (error) {
  process.stderr.write(cli.internalFailure(error));
  process.exitCode = 3;
}
