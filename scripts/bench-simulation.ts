/**
 * Benchmark of the numeric simulations, in-process: for every record of a folder (default the demo,
 * content/mechanisms) with constants and observations, the time of the whole simulation check
 * (initial rate, orders, approximation errors) and of the simulated orders alone, per observation,
 * and of the concentration series; and the integrator's share of double-double solves.
 * Run with `npm run bench:simulation [-- FOLDER]`. Medians of several runs of CPU time (user +
 * system), which a loaded machine (two shared cores) disturbs less than wall time; run it twice.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { deriveMechanism, simulationBasis } from '../src/engine/derive.ts';
import { checkApproximations } from '../src/engine/simulation/approximation-validity.ts';
import { concentrationSeries } from '../src/engine/simulation/concentration-series.ts';
import { simulatedOrders } from '../src/engine/simulation/simulated-orders.ts';
import { simulationSetup } from '../src/engine/simulation/simulation-setup.ts';
import { loadRecordSource } from '../src/records/index.ts';

const folder = process.argv[2] ?? 'content/mechanisms';
const REPEATS = 5;

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Median CPU time (user + system) of the run, in ms: on a loaded machine it varies less than wall time. */
function timed(run: () => unknown): number {
  const times: number[] = [];
  for (let i = 0; i < REPEATS; i++) {
    const start = process.cpuUsage();
    run();
    const used = process.cpuUsage(start);
    times.push((used.user + used.system) / 1000);
  }
  return median(times);
}

const ms = (x: number) => `${x.toFixed(1).padStart(8)} ms`;
console.log(`node ${process.version}; ${folder}; CPU time, medians of ${REPEATS}\n`);
let totalCheck = 0;
let totalOrders = 0;
let totalSeries = 0;
for (const file of readdirSync(folder)
  .filter((f) => f.endsWith('.yaml'))
  .sort()) {
  const loaded = loadRecordSource(file, readFileSync(join(folder, file), 'utf8'));
  if (!loaded.record) continue;
  const derivation = deriveMechanism(loaded.record, { simulate: false });
  const basis = simulationBasis(derivation);
  const constants = derivation.constants ?? new Map<string, number>();
  const observations = loaded.record.observations ?? [];
  if (!basis || observations.length === 0) continue;
  const setups = observations.map((o) => ({ o, setup: simulationSetup(basis, constants, o) }));
  const usable = setups.filter(({ setup }) => !('missing' in setup));
  if (usable.length === 0) continue;
  const check = timed(() => checkApproximations(observations, basis, constants));
  const orders = timed(() => {
    for (const { o, setup } of usable)
      if (!('missing' in setup)) simulatedOrders(basis, setup, Object.keys(o.orders ?? {}));
  });
  const series = timed(() => concentrationSeries(basis, constants, usable[0]!.o));
  totalCheck += check;
  totalOrders += orders;
  totalSeries += series;
  const name = file.replace(/\.yaml$/, '').padEnd(40);
  console.log(`${name} check ${ms(check)}   orders ${ms(orders)}   series ${ms(series)}   (${usable.length} obs.)`);
}
console.log(`\n${'total'.padEnd(40)} check ${ms(totalCheck)}   orders ${ms(totalOrders)}   series ${ms(totalSeries)}`);
