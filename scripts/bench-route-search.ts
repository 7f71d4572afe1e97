/**
 * Benchmark of the route search's work budget: how long the search takes, and how many budget
 * units it spends, on the demo records and on synthetic meshes of interlocking cycles (not
 * chemistry, only load) that are too tangled to search exhaustively. Run with
 * `npm run bench:route`; `-- --unlimited` also times the 14-step mesh with no budget (about a
 * minute: what the search cost before it had one). Figures vary with the machine's load: run it
 * twice and report both.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { buildMechanism } from '../src/engine/mechanism/mechanism.ts';
import { ROUTE_SEARCH_BUDGET, SearchBudget } from '../src/engine/route/search-budget.ts';
import { deriveRoute } from '../src/engine/route/route.ts';
import type { Mechanism } from '../src/engine/mechanism/mechanism.ts';
import { loadRecordSource } from '../src/records/index.ts';

function mechanismOf(name: string, source: string): Mechanism {
  const loaded = loadRecordSource(name, source);
  return buildMechanism(loaded.record!).mechanism!;
}

/** The whole route stage (declarations, chain, roles) under a budget of `limit` units. */
function run(label: string, mechanism: Mechanism, limit = ROUTE_SEARCH_BUDGET): void {
  const budget = new SearchBudget(limit);
  const start = performance.now();
  const result = deriveRoute(mechanism, budget);
  const ms = performance.now() - start;
  const failed = result.diagnostics.filter((d) => d.severity === 'error').map((d) => d.rule);
  const outcome = result.route ? `σ = [${result.route.sigma.join(', ')}]` : failed.join(', ');
  console.log(
    `${label.padEnd(44)} ${ms.toFixed(0).padStart(7)} ms ${String(budget.used).padStart(8)} units  ${outcome}`,
  );
}

/** n steps X_i%5 + Y_i%3 -> X_(i+1)%5 + Y_(i+2)%3 + P_i: five X forms and three Y forms interlocked. */
function mesh(n: number): string {
  const steps = Array.from(
    { length: n },
    (_, i) => `  - equation: X${i % 5} + Y${i % 3} -> X${(i + 1) % 5} + Y${(i + 2) % 3} + P${i}`,
  );
  return `title: load\nsystem: bench\nstatus: proposed\nnotation: labels\nsteps:\n${steps.join('\n')}\n`;
}

console.log(`node ${process.version}; budget ${ROUTE_SEARCH_BUDGET} units\n`);
for (const f of readdirSync('content/mechanisms').filter((x) => x.endsWith('.yaml')))
  run(`  ${f.replace('.yaml', '')}`, mechanismOf(f, readFileSync(`content/mechanisms/${f}`, 'utf8')));
console.log('');
for (const n of [8, 10, 12, 14, 16]) run(`  mesh of ${n} steps`, mechanismOf('mesh.yaml', mesh(n)));
if (process.argv.includes('--unlimited'))
  run('  mesh of 14 steps, no budget', mechanismOf('mesh.yaml', mesh(14)), Infinity);
