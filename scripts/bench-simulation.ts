/**
 * Benchmark of the numeric simulations, in-process: for every record of a folder (default the demo,
 * content/mechanisms) with constants and observations, the time of the whole simulation check
 * (initial rate, orders, approximation errors), of the simulated orders alone, and of the
 * concentration series of the first observation, alone and after the check (whose run it reuses).
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

/**
 * Median CPU time (user + system) of `run`, in ms, each time on a fresh derivation from `prepare`
 * (untimed): runs are remembered per mechanism, so a second run on the same one would cost nothing.
 * On a loaded machine CPU time varies less than wall time.
 */
function timed<T>(prepare: () => T, run: (prepared: T) => unknown): number {
  const times: number[] = [];
  for (let i = 0; i < REPEATS; i++) {
    const prepared = prepare();
    const start = process.cpuUsage();
    run(prepared);
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
let totalAfterCheck = 0;
for (const file of readdirSync(folder)
  .filter((f) => f.endsWith('.yaml'))
  .sort()) {
  const loaded = loadRecordSource(file, readFileSync(join(folder, file), 'utf8'));
  const record = loaded.record;
  if (!record) continue;
  const observations = record.observations ?? [];
  const prepare = () => {
    const derivation = deriveMechanism(record, { simulate: false });
    return { basis: simulationBasis(derivation), constants: derivation.constants ?? new Map<string, number>() };
  };
  const { basis, constants } = prepare();
  if (!basis || observations.length === 0) continue;
  const usable = observations.filter((o) => !('missing' in simulationSetup(basis, constants, o)));
  if (usable.length === 0) continue;
  const check = timed(prepare, (p) => checkApproximations(observations, p.basis!, p.constants));
  const orders = timed(prepare, (p) => {
    for (const o of usable) {
      const setup = simulationSetup(p.basis!, p.constants, o);
      if (!('missing' in setup)) simulatedOrders(p.basis!, setup, Object.keys(o.orders ?? {}));
    }
  });
  const series = timed(prepare, (p) => concentrationSeries(p.basis!, p.constants, usable[0]!));
  const afterCheck = timed(
    () => {
      const p = prepare();
      checkApproximations(observations, p.basis!, p.constants);
      return p;
    },
    (p) => concentrationSeries(p.basis!, p.constants, usable[0]!),
  );
  totalCheck += check;
  totalOrders += orders;
  totalSeries += series;
  totalAfterCheck += afterCheck;
  const name = file.replace(/\.yaml$/, '').padEnd(36);
  console.log(
    `${name} check ${ms(check)}   orders ${ms(orders)}   series ${ms(series)} (after the check ${ms(afterCheck)})   ${usable.length} obs.`,
  );
}
console.log(
  `\n${'total'.padEnd(36)} check ${ms(totalCheck)}   orders ${ms(totalOrders)}   series ${ms(totalSeries)} (after the check ${ms(totalAfterCheck)})`,
);
