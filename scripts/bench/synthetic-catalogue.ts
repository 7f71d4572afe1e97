/**
 * Deterministic synthetic catalogues for benchmarks: N records in a realistic mix of shapes
 * (fast pre-equilibria before a slow step, catalytic cycles of 2–8 steps, radical chains, plain
 * sequences), about two thirds with rate constants (so their observations are simulated), some
 * with Gibbs energies instead, most with observed orders, a few with a CSV data table, three
 * rival proposals per reaction system. Every value is invented and every record says so; the
 * records are load, not chemistry. The same size and seed always give the same files.
 *
 * Usage from code: `writeSyntheticCatalogue(folder, 1000)`; from the command line:
 * `npx tsx scripts/bench/synthetic-catalogue.ts OUT_FOLDER 1000`.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** A small deterministic generator (mulberry32): the same seed gives the same catalogue on every machine. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Step {
  equation: string;
  rds?: boolean;
  k?: string;
  K?: string;
  energy?: string;
}

interface Shape {
  kind: string;
  steps: Step[];
  /** species whose orders an observation reports, with a starting concentration */
  varied: [string, string][];
  fixed: [string, string][];
  tags: string[];
}

/** A number written with two significant figures, e.g. 3.4e-2. */
function sci(x: number): string {
  return x.toExponential(1);
}

function preEquilibrium(rnd: () => number, constants: boolean): Shape {
  const k = (lo: number, hi: number) => sci(10 ** (lo + (hi - lo) * rnd()));
  return {
    kind: 'pre-equilibrium',
    steps: [
      { equation: 'A + B <=> C', ...(constants && { K: `${k(0, 2)} M^-1` }) },
      { equation: 'C -> P', rds: true, ...(constants && { k: `${k(-3, -1)} s^-1` }) },
    ],
    varied: [
      ['A', '0.10 M'],
      ['B', '0.050 M'],
    ],
    fixed: [],
    tags: ['pre-equilibrium', 'synthetic'],
  };
}

function catalyticCycle(rnd: () => number, constants: boolean, length: number, energies: boolean): Shape {
  const steps: Step[] = [];
  const k = (lo: number, hi: number) => sci(10 ** (lo + (hi - lo) * rnd()));
  const rds = 1 + Math.floor(rnd() * (length - 1));
  for (let i = 0; i < length; i++) {
    const from = i === 0 ? 'Cat + S' : `X${i}`;
    const to = i === length - 1 ? 'Cat + P' : `X${i + 1}`;
    const reversible = i < rds;
    const step: Step = { equation: `${from} ${reversible ? '<=>' : '->'} ${to}` };
    if (i === rds) step.rds = true;
    if (energies) {
      const barrier = i === rds ? 70 + Math.round(rnd() * 20) : 30 + Math.round(rnd() * 25);
      step.energy = `{ barrier: ${barrier} kJ/mol, change: ${-Math.round(2 + rnd() * 20)} kJ/mol }`;
    } else if (constants) {
      step.k = `${k(i === rds ? -2 : 2, i === rds ? 0 : 5)} ${i === 0 ? 'M^-1 s^-1' : 's^-1'}`;
      if (reversible) step.K = `${k(-1, 2)}${i === 0 ? ' M^-1' : ''}`;
    }
    steps.push(step);
  }
  return {
    kind: `catalytic cycle of ${length} steps`,
    steps,
    varied: [['S', '0.20 M']],
    fixed: [['Cat', '1.0e-3 M']],
    tags: ['catalytic-cycle', 'synthetic'],
  };
}

function chain(rnd: () => number, constants: boolean): Shape {
  const k = (lo: number, hi: number) => sci(10 ** (lo + (hi - lo) * rnd()));
  const with_ = (step: Step, value: string): Step => (constants ? { ...step, k: value } : step);
  return {
    kind: 'radical chain',
    steps: [
      with_({ equation: 'R2 -> 2 R' }, `${k(-7, -5)} s^-1`),
      with_({ equation: 'R + H -> RH + Q' }, `${k(4, 6)} M^-1 s^-1`),
      with_({ equation: 'Q + R2 -> QR + R' }, `${k(5, 7)} M^-1 s^-1`),
      with_({ equation: '2 R -> R2' }, `${k(8, 9)} M^-1 s^-1`),
    ],
    varied: [
      ['R2', '0.010 M'],
      ['H', '0.50 M'],
    ],
    fixed: [],
    tags: ['chain', 'synthetic'],
  };
}

function sequence(rnd: () => number, constants: boolean, length: number): Shape {
  const k = (lo: number, hi: number) => sci(10 ** (lo + (hi - lo) * rnd()));
  const steps: Step[] = [{ equation: 'A + B -> I1', ...(constants && { k: `${k(-1, 1)} M^-1 s^-1` }) }];
  for (let i = 1; i < length; i++) {
    const to = i === length - 1 ? 'P' : `I${i + 1}`;
    steps.push({ equation: `I${i} -> ${to}`, ...(constants && { k: `${k(1, 3)} s^-1` }) });
  }
  return {
    kind: `sequence of ${length} steps`,
    steps,
    varied: [
      ['A', '0.10 M'],
      ['B', '0.20 M'],
    ],
    fixed: [],
    tags: ['sequence', 'synthetic'],
  };
}

function pickShape(rnd: () => number, index: number): Shape {
  const constants = index % 3 !== 2; // two thirds with constants, so simulated
  const roll = rnd();
  if (roll < 0.25) return preEquilibrium(rnd, constants);
  if (roll < 0.65) return catalyticCycle(rnd, constants, 2 + Math.floor(rnd() * 7), constants && rnd() < 0.25);
  if (roll < 0.8) return chain(rnd, constants);
  return sequence(rnd, constants, 2 + Math.floor(rnd() * 4));
}

/** The YAML of synthetic record number `index` (0-based) of a catalogue; `data` names a CSV file to reference. */
export function syntheticRecord(index: number, seed = 11, data?: string): string {
  const rnd = seededRandom(seed * 1_000_003 + index);
  const shape = pickShape(rnd, index);
  const system = `synthetic-system-${String(Math.floor(index / 3)).padStart(5, '0')}`;
  const lines = [
    `# Synthetic benchmark record (invented; not chemistry): ${shape.kind}.`,
    `title: Synthetic proposal ${index} — ${shape.kind} (invented)`,
    `system: ${system}`,
    `status: ${index % 7 === 0 ? 'favoured' : 'proposed'}`,
    'notation: labels',
    `tags: [${shape.tags.join(', ')}]`,
    'contributors: [bench.generator]',
    'steps:',
  ];
  for (const s of shape.steps) {
    lines.push(`  - equation: ${s.equation}`);
    if (s.rds) lines.push('    rds: true');
    if (s.k) lines.push(`    k: ${s.k}`);
    if (s.K) lines.push(`    K: ${s.K}`);
    if (s.energy) lines.push(`    energy: ${s.energy}`);
  }
  if (shape.steps.some((s) => s.energy)) lines.push('energy: { basis: G, standard_state: 1 M, T: 298.15 K }');
  lines.push(`approximation: ${rnd() < 0.5 ? 'auto' : 'steady_state'}`);
  if (rnd() < 0.85 || data) {
    lines.push('observations:');
    const concentrations = [...shape.varied, ...shape.fixed].map(([s, c]) => `${s}: ${c}`).join(', ');
    const orders = shape.varied.map(([s]) => `${s}: ${(0.5 + rnd()).toFixed(2)} ± 0.1`).join(', ');
    lines.push(`  - id: synthetic-rates-${index}`, '    source: invented for the benchmark', '    T: 298.15 K');
    lines.push(`    concentrations: { ${concentrations} }`, `    orders: { ${orders} }`);
    if (data)
      lines.push(
        `  - id: synthetic-temperatures-${index}`,
        '    data:',
        '      kind: temperature_series',
        '      constant: k_1',
        `      file: ../data/${data}`,
      );
  }
  lines.push('notes: |', `  Invented benchmark record ${index}; generated by scripts/bench/synthetic-catalogue.ts.`);
  return lines.join('\n') + '\n';
}

/** An invented temperature series (Eyring-like, with a little deterministic noise). */
export function syntheticTemperatureSeries(seed: number): string {
  const rnd = seededRandom(seed);
  const rows = ['# invented benchmark data: k against T', 'T / K, k / s^-1'];
  for (const T of [288, 298, 308, 318, 328]) {
    const k = (T / 298) * Math.exp((-70000 / 8.314) * (1 / T - 1 / 298)) * 1e-3 * (1 + 0.03 * (rnd() - 0.5));
    rows.push(`${T}, ${k.toExponential(3)}`);
  }
  return rows.join('\n') + '\n';
}

/** Writes a catalogue of `size` records into `<folder>/mechanisms` (and CSV files into `<folder>/data`). */
export function writeSyntheticCatalogue(folder: string, size: number, seed = 11): string {
  const mechanisms = join(folder, 'mechanisms');
  const dataFolder = join(folder, 'data');
  mkdirSync(mechanisms, { recursive: true });
  mkdirSync(dataFolder, { recursive: true });
  for (let i = 0; i < size; i++) {
    // One record in twenty references a CSV table (a temperature series of its own).
    const data = i % 20 === 5 ? `synthetic-${String(i).padStart(5, '0')}.csv` : undefined;
    if (data) writeFileSync(join(dataFolder, data), syntheticTemperatureSeries(seed + i));
    writeFileSync(join(mechanisms, `synthetic-${String(i).padStart(5, '0')}.yaml`), syntheticRecord(i, seed, data));
  }
  return mechanisms;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [out, size] = process.argv.slice(2);
  if (!out || !size) {
    console.error('usage: tsx scripts/bench/synthetic-catalogue.ts OUT_FOLDER SIZE');
    process.exit(2);
  }
  console.log(writeSyntheticCatalogue(out, Number(size)));
}
