/**
 * `npm run bench [-- --sizes 100,1000 --builds 100 --rounds 3 --json FILE]`: the catalogue at a
 * group's scale. For each size a synthetic catalogue is generated (synthetic-catalogue.ts), then,
 * in rounds that alternate the measurements (so load on the machine falls on all of them alike):
 * the floor (read + YAML parse + ajv of the same files), cold and warm `check`, `check` of the
 * whole catalogue and of the one file after editing one record, the minimal Astro baseline of as
 * many pages, cold and warm `build`. Each is a whole process (wall time and peak resident memory);
 * the medians are printed beside the floor and the baseline as ratios and written to a JSON file.
 * `--builds` lists the sizes at which the site is built (building takes longest).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { parseArgs } from 'node:util';
import { writeSyntheticCatalogue } from './synthetic-catalogue.ts';

const root = resolve(import.meta.dirname, '..', '..');
const { values } = parseArgs({
  options: {
    sizes: { type: 'string', default: '100,1000,10000' },
    builds: { type: 'string' },
    rounds: { type: 'string', default: '1' },
    json: { type: 'string', default: 'bench-results.json' },
    keep: { type: 'boolean', default: false },
  },
});
const sizes = values.sizes.split(',').map(Number);
const buildSizes = new Set((values.builds ?? values.sizes).split(',').filter(Boolean).map(Number));
const rounds = Number(values.rounds);

interface Run {
  seconds: number;
  peakMiB?: number;
  status: number | null;
}

/** Runs a whole process in `cwd` and measures its wall time and peak resident memory (GNU time). */
function measure(cwd: string, command: string[], env: Record<string, string> = {}): Run {
  const memo = join(cwd, '.bench-rss');
  const useTime = existsSync('/usr/bin/time');
  const argv = useTime ? ['/usr/bin/time', '-f', '%M', '-o', memo, ...command] : command;
  const start = performance.now();
  const done = spawnSync(argv[0]!, argv.slice(1), {
    cwd,
    env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', CI: '1', ...env },
    stdio: ['ignore', 'ignore', 'pipe'],
    maxBuffer: 64 * 1024 * 1024,
  });
  const seconds = (performance.now() - start) / 1000;
  if (done.status !== 0 && done.status !== 1)
    console.error(`  ${command.join(' ')} exited ${done.status}: ${done.stderr.toString().slice(-600)}`);
  const kib = useTime ? Number.parseInt(readFileSync(memo, 'utf8').trim().split('\n').pop() ?? '', 10) : NaN;
  return { seconds, status: done.status, ...(Number.isFinite(kib) && { peakMiB: kib / 1024 }) };
}

const cli = join(root, 'bin', 'mechatlas.mjs');
const node = process.execPath;

function median(runs: Run[]): Run {
  const by = (f: (r: Run) => number | undefined) => {
    const xs = runs
      .map(f)
      .filter((x): x is number => x !== undefined)
      .sort((a, b) => a - b);
    return xs.length === 0 ? undefined : xs[Math.floor((xs.length - 1) / 2)];
  };
  const peak = by((r) => r.peakMiB);
  return { seconds: by((r) => r.seconds)!, status: runs[0]!.status, ...(peak !== undefined && { peakMiB: peak }) };
}

/** Edits one record the way a person does (a changed title), so its content hash changes. */
function editRecord(file: string, round: number): void {
  const text = readFileSync(file, 'utf8');
  writeFileSync(file, text.replace(/^title: (.*?)( \(edit \d+\))?$/m, `title: $1 (edit ${round})`));
}

const results: Record<string, unknown>[] = [];
const work = mkdtempSync(join(tmpdir(), 'mechatlas-bench-'));
console.log(
  `node ${process.version}, ${cpus().length} cores; sizes ${sizes.join(', ')}; ${rounds} round(s); in ${work}`,
);
for (const size of sizes) {
  const folder = join(work, `size-${size}`);
  const content = writeSyntheticCatalogue(join(folder, 'content'), size);
  const first = join(content, 'synthetic-00000.yaml');
  const cache = join(folder, '.mechatlas-cache');
  const runs: Record<string, Run[]> = {};
  const add = (name: string, run: Run) => (runs[name] ??= []).push(run);
  const withBuild = buildSizes.has(size);
  for (let round = 0; round < rounds; round++) {
    add('floor', measure(folder, [node, join(root, 'scripts/bench/floor.mjs'), content]));
    rmSync(cache, { recursive: true, force: true });
    add('check cold', measure(folder, [node, cli, 'check', content, '--format', 'json']));
    add('check warm', measure(folder, [node, cli, 'check', content, '--format', 'json']));
    editRecord(first, round);
    add('check after one edit', measure(folder, [node, cli, 'check', content, '--format', 'json']));
    editRecord(first, round + 100);
    add('check of the edited record', measure(folder, [node, cli, 'check', first, '--format', 'json']));
    if (!withBuild) continue;
    const baselineOut = join(folder, 'baseline-site');
    add(
      'astro baseline',
      measure(
        join(root, 'scripts/bench/astro-baseline'),
        [node, join(root, 'node_modules/astro/astro.js'), 'build', '--outDir', baselineOut],
        {
          BENCH_CONTENT: content,
        },
      ),
    );
    rmSync(baselineOut, { recursive: true, force: true });
    rmSync(cache, { recursive: true, force: true });
    const site = join(folder, 'site');
    add('build cold', measure(folder, [node, cli, 'build', '--content', content, '--out', site]));
    add('build warm', measure(folder, [node, cli, 'build', '--content', content, '--out', site]));
  }
  const m = Object.fromEntries(Object.entries(runs).map(([k, v]) => [k, median(v)]));
  const floor = m['floor']!;
  const baseline = m['astro baseline'];
  console.log(`\n${size} records (medians of ${rounds}):`);
  const row = (name: string, against?: Run, label = '') => {
    const r = m[name];
    if (!r) return;
    const ratio = against ? `  ${(r.seconds / against.seconds).toFixed(1).padStart(6)}× ${label}` : '';
    const mem = r.peakMiB !== undefined ? `${r.peakMiB.toFixed(0).padStart(6)} MiB` : '';
    const memRatio =
      against?.peakMiB !== undefined && r.peakMiB !== undefined
        ? ` (${(r.peakMiB / against.peakMiB).toFixed(1)}× memory)`
        : '';
    console.log(`  ${name.padEnd(28)} ${r.seconds.toFixed(2).padStart(8)} s ${mem}${ratio}${memRatio}`);
  };
  row('floor');
  row('check cold', floor, 'floor');
  row('check warm', floor, 'floor');
  row('check after one edit', floor, 'floor');
  row('check of the edited record', floor, 'floor');
  row('astro baseline');
  row('build cold', baseline, 'baseline');
  row('build warm', baseline, 'baseline');
  results.push({ size, rounds, medians: m, runs });
}
const report = { date: new Date().toISOString(), node: process.version, cores: cpus().length, results };
writeFileSync(values.json, JSON.stringify(report, null, 2) + '\n');
console.log(`\nwritten to ${values.json}`);
if (!values.keep) rmSync(work, { recursive: true, force: true });
