/**
 * Benchmark of the symbolic steady state: reversible catalytic cycles of n steps (the law by
 * King–Altman/Bareiss), reversible linear chains (the work budget), and the nonlinear closed forms.
 * Run with `npx tsx scripts/bench-symbolic.ts`. Medians of several runs; figures vary with the
 * machine's load, so run it twice and report both.
 */
import { performance } from 'node:perf_hooks';
import { deriveMechanism } from '../src/engine/derive.ts';
import { buildMechanism } from '../src/engine/mechanism/mechanism.ts';
import { deriveRateLaws } from '../src/engine/rate-law/derive-rate-laws.ts';
import { deriveRoute } from '../src/engine/route/route.ts';
import { loadRecordSource } from '../src/records/index.ts';

const header = 'title: synthetic load\nsystem: bench\nstatus: proposed\nnotation: labels\n';

/** E + S ⇌ X1 ⇌ X2 ⇌ … ⇌ E + P: one catalyst, n forms, every step reversible. */
function reversibleCycle(n: number): string {
  const form = (i: number) => (i === 0 ? 'E' : `X${i}`);
  const steps = Array.from({ length: n }, (_, i) => {
    const left = i === 0 ? 'E + S' : form(i);
    const right = i === n - 1 ? 'E + P' : form(i + 1);
    return `  - equation: ${left} <=> ${right}`;
  });
  return `${header}approximation: steady_state\nspecies:\n  E: { role: catalyst }\nsteps:\n${steps.join('\n')}\n`;
}

/** A ⇌ I1 ⇌ I2 ⇌ … ⇌ P: n reversible steps, n − 1 intermediates (σ given: the route search has its own limit). */
function reversibleChain(n: number): string {
  const steps = Array.from({ length: n }, (_, i) => {
    const left = i === 0 ? 'A' : `I${i}`;
    const right = i === n - 1 ? 'P' : `I${i + 1}`;
    return `  - { equation: ${left} <=> ${right}, times: 1 }`;
  });
  return `${header}approximation: steady_state\nsteps:\n${steps.join('\n')}\n`;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Times the rate-law stage alone (the law: steady state, orders, presentation) and the whole derivation. */
function time(label: string, source: string, runs: number): void {
  const loaded = loadRecordSource('bench.yaml', source);
  if (!loaded.record) throw new Error(`${label}: ${JSON.stringify(loaded.diagnostics)}`);
  const record = loaded.record;
  const mechanism = buildMechanism(record).mechanism!;
  const route = deriveRoute(mechanism).route!;
  const law = () => deriveRateLaws(record.approximation ?? 'auto', mechanism, route);
  const whole = () => deriveMechanism(record, { simulate: false });
  let last = whole(); // warm-up: module and JIT
  law();
  const lawTimes: number[] = [];
  const wholeTimes: number[] = [];
  for (let i = 0; i < runs; i++) {
    let start = performance.now();
    law();
    lawTimes.push(performance.now() - start);
    start = performance.now();
    last = whole();
    wholeTimes.push(performance.now() - start);
  }
  const derived = last.rateLaws?.[0];
  const what = derived?.law.expression ? 'closed form' : derived ? 'numeric only' : 'no law';
  const rules = [...new Set(last.diagnostics.filter((d) => d.rule.startsWith('rate/')).map((d) => d.rule))];
  console.log(
    `${label.padEnd(14)} law ${median(lawTimes).toFixed(1).padStart(8)} ms   derive ${median(wholeTimes).toFixed(1).padStart(8)} ms   ${what}${rules.length ? ` (${rules.join(', ')})` : ''}`,
  );
}

const only = process.argv[2];
console.log(
  `node ${process.version}; the rate-law stage alone, and the whole derivation without simulation; medians\n`,
);
if (!only || only === 'cycle') {
  console.log('reversible catalytic cycle of n steps (steady state):');
  for (const n of [4, 6, 8, 10, 12]) time(`  n = ${n}`, reversibleCycle(n), 9);
}
if (!only || only === 'chain') {
  console.log('\nreversible linear chain of n steps (steady state):');
  for (const n of [10, 20, 40]) time(`  n = ${n}`, reversibleChain(n), 3);
}
