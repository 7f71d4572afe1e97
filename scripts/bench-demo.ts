/**
 * Benchmark: how long checking a catalogue takes, and how the route search grows with steps.
 * Run with `npm run bench:demo`. Figures vary with the machine's load: run it twice and report both.
 * The synthetic records are generated here (not stored); they are not chemistry, only load.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { deriveMechanism } from '../src/engine/derive.ts';
import { loadRecordSource } from '../src/records/index.ts';

const DEMO = 'content/mechanisms';
const demo = readdirSync(DEMO)
  .filter((f) => f.endsWith('.yaml'))
  .map((f) => ({ name: f, source: readFileSync(`${DEMO}/${f}`, 'utf8') }));

function time<T>(label: string, repeat: number, run: () => T): number {
  run(); // warm-up: module and JIT
  const start = performance.now();
  for (let i = 0; i < repeat; i++) run();
  const perRun = (performance.now() - start) / repeat;
  console.log(`${label.padEnd(52)} ${perRun.toFixed(2).padStart(9)} ms`);
  return perRun;
}

console.log(`node ${process.version}; ${demo.length} demo records\n`);
time('load + validate + derive every demo record', 20, () => {
  for (const { name, source } of demo) {
    const loaded = loadRecordSource(name, source);
    if (loaded.record) deriveMechanism(loaded.record);
  }
});
for (const { name, source } of demo) {
  time(`  ${name}`, 20, () => {
    const loaded = loadRecordSource(name, source);
    if (loaded.record) deriveMechanism(loaded.record);
  });
}

/** A linear sequence A0 -> A1 -> … -> An with a side equilibrium on each intermediate. */
function sequence(n: number): string {
  const steps = Array.from({ length: n }, (_, i) => `  - equation: A${i} -> A${i + 1}`);
  return `title: synthetic load\nsystem: bench\nstatus: proposed\nnotation: labels\nsteps:\n${steps.join('\n')}\n`;
}
console.log('\nroute search (steady state, linear sequence of n steps):');
for (const n of [4, 8, 12, 16]) {
  const loaded = loadRecordSource(`bench-${n}.yaml`, sequence(n));
  time(`  n = ${n}`, 3, () => deriveMechanism(loaded.record!));
}

/** `npm run bench:demo -- --site 10`: build the site of the demo copied ten times (ids suffixed) and time it. */
const siteCopies = Number(process.argv[process.argv.indexOf('--site') + 1] ?? 0);
if (process.argv.includes('--site') && siteCopies > 0) {
  const { mkdtempSync, writeFileSync, mkdirSync, rmSync } = await import('node:fs');
  const { tmpdir } = await import('node:os');
  const { join } = await import('node:path');
  const { execFileSync } = await import('node:child_process');
  const work = mkdtempSync(join(tmpdir(), 'mechatlas-bench-'));
  const content = join(work, 'content');
  mkdirSync(content);
  for (let copy = 0; copy < siteCopies; copy++) {
    for (const { name, source } of demo)
      writeFileSync(
        join(content, name.replace('.yaml', `-copy${copy}.yaml`)),
        source.replace(/^system: (.+)$/m, `system: $1-copy${copy}`),
      );
  }
  const start = performance.now();
  execFileSync(process.execPath, ['bin/mechatlas.mjs', 'build', '--content', content, '--out', join(work, 'site')], {
    stdio: 'ignore',
  });
  console.log(
    `\nsite build of ${demo.length * siteCopies} records: ${((performance.now() - start) / 1000).toFixed(1)} s (derivations + Astro build)`,
  );
  rmSync(work, { recursive: true, force: true });
}
