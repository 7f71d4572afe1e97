/**
 * The concentration–time SVG: structure (axes with units, a legend entry, a curve and an end
 * label per species), accessible name, escaped user text, magnified small curves, species not
 * drawn named in the caption, deterministic output. Writes drawings to test-artifacts/ for review.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { deriveMechanism, simulationBasis } from '../../../src/engine/derive.ts';
import { concentrationTimeSvg } from '../../../src/render/plots/concentration-time-svg.ts';
import {
  firstObservationSeries,
  type ConcentrationSeries,
} from '../../../src/engine/simulation/concentration-series.ts';
import type { Role } from '../../../src/model/mechanism-record.ts';
import { loadRecordSource } from '../../../src/records/index.ts';

const texts = (svg: string) =>
  [...svg.matchAll(/<text[^>]*>(.*?)<\/text>/g)].map((m) =>
    m[1]!.replace(/<title>.*?<\/title>/g, '').replace(/<[^>]+>/g, ''),
  );
const curves = (svg: string) => [...svg.matchAll(/<g data-species="([^"]*)">/g)].map((m) => m[1]);

function save(name: string, svg: string): void {
  mkdirSync('test-artifacts', { recursive: true });
  writeFileSync(`test-artifacts/${name}`, svg);
}

/** A → I → P with first-order constants, sampled analytically: a hand-made series, no engine needed. */
function handSeries(
  names: [string, string, string],
  options: { k1?: number; k2?: number; extra?: { species: string; role?: Role; held: boolean; value: number }[] } = {},
): ConcentrationSeries {
  const k1 = options.k1 ?? 1;
  const k2 = options.k2 ?? 1e3;
  const a0 = 2e-3;
  const times = [0, ...Array.from({ length: 121 }, (_, i) => 1e-4 * 10 ** (i / 20))];
  const a = times.map((t) => a0 * Math.exp(-k1 * t));
  const b = times.map((t) => ((a0 * k1) / (k2 - k1)) * (Math.exp(-k1 * t) - Math.exp(-k2 * t)));
  const extra = options.extra ?? [];
  return {
    status: 'ok',
    observation: 'run-1',
    unit: 'M',
    times,
    species: [...names, ...extra.map((e) => e.species)],
    roles: ['reactant', 'intermediate', 'product', ...extra.map((e) => e.role)],
    held: [false, false, false, ...extra.map((e) => e.held)],
    values: [a, b, a.map((x, k) => a0 - x - b[k]!), ...extra.map((e) => times.map(() => e.value))],
    conversion: 0.9999,
  };
}

describe('concentration–time SVG', () => {
  it('draws axes with units, a legend entry, a curve and an end label for every species', () => {
    const svg = concentrationTimeSvg(handSeries(['A', 'I', 'P']), { logTime: true, idPrefix: 'hand' });
    save('concentration-time-hand-log.svg', svg);
    expect(svg).toMatch(
      /^<svg [^>]*role="img" aria-label="Simulated concentrations against time \(log time axis\) for observation run-1: A, I ×10³, P"/,
    );
    expect(svg).toContain('<title>Simulated concentrations against time (log time axis)');
    const all = texts(svg);
    expect(all).toEqual(
      expect.arrayContaining([
        'time / s',
        'concentration / mM',
        'A (reactant)',
        'I ×10³ (intermediate)',
        'P (product)',
        'A',
        'I ×10³',
        'P',
      ]),
    );
    expect(curves(svg)).toEqual(['A', 'I', 'P']);
    // One path per curve inside its group, each with its own dash pattern (the first solid).
    const dashes = [...svg.matchAll(/<g data-species="[^"]*"><title>[^<]*<\/title><path d="M[^"]+" ([^/]*)\/>/g)].map(
      (m) => /stroke-dasharray="([^"]+)"/.exec(m[1]!)?.[1] ?? 'solid',
    );
    expect(dashes).toEqual(['solid', '8 4', '2 3']);
    expect(svg).toContain('a curve marked ×10ⁿ is drawn 10ⁿ times larger than the axis reads');
    expect(concentrationTimeSvg(handSeries(['A', 'I', 'P']), { logTime: true, idPrefix: 'hand' })).toBe(svg);
  });

  it('labels the decades of a log time axis and chooses a unit for a linear one', () => {
    const log = concentrationTimeSvg(handSeries(['A', 'I', 'P']), { logTime: true });
    expect(texts(log)).toEqual(expect.arrayContaining(['10⁻⁴', '10⁻³', '10⁻²', '10⁻¹', '10⁰', '10¹', '10²']));
    const linear = concentrationTimeSvg(handSeries(['A', 'I', 'P']), { logTime: false });
    save('concentration-time-hand-linear.svg', linear);
    expect(texts(linear)).toEqual(expect.arrayContaining(['time / s', '0', '20', '40', '60', '80', '100']));
    expect(texts(linear)).not.toContain('10⁰');
    const slow = handSeries(['A', 'I', 'P'], { k1: 1e-3, k2: 1 });
    slow.times = slow.times.map((t) => t * 1000);
    expect(texts(concentrationTimeSvg(slow, {}))).toContain('time / h');
  });

  it('escapes hostile species names, titles and ids', () => {
    const series = handSeries(['<script>alert(1)</script>', 'B&C', '"Q"']);
    const svg = concentrationTimeSvg(series, { title: 'Tom & "Jerry" <plot>', idPrefix: 'a"b c' });
    save('concentration-time-hostile.svg', svg);
    expect(svg).not.toContain('<script>');
    expect(svg).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(svg).toContain('data-species="B&amp;C"');
    expect(svg).toContain('&quot;Q&quot;');
    expect(svg).toContain('aria-label="Tom &amp; &quot;Jerry&quot; &lt;plot&gt;"');
    expect(svg).toContain('<clipPath id="a_b_c-frame">');
    // Long names are cut at the curve end, and the full name stays as a tooltip.
    expect(svg).toMatch(
      /<text [^>]*><title>&lt;script&gt;alert\(1\)&lt;\/script&gt;<\/title>&lt;script&gt;ale…<\/text>/,
    );
  });

  it('leaves out species held constant or absent, and says so', () => {
    const series = handSeries(['A', 'I', 'P'], {
      extra: [
        { species: 'H2O', role: 'solvent', held: true, value: 55.5 },
        { species: 'M', role: 'third_body', held: false, value: 0.02 },
        { species: 'X', role: 'inhibitor', held: false, value: 0 },
      ],
    });
    const svg = concentrationTimeSvg(series, { logTime: true });
    expect(curves(svg)).toEqual(['A', 'I', 'P']);
    expect(svg).toContain('constant, not drawn: H2O, M');
    expect(svg).toContain('absent throughout: X');
    expect(texts(svg)).toContain('concentration / mM');
  });

  it('draws a frame with the reason when there is nothing to plot', () => {
    const svg = concentrationTimeSvg({
      status: 'skipped',
      message: 'not simulated: needs the rate constant of step 2',
      unit: 'M',
      times: [],
      species: [],
      roles: [],
      held: [],
      values: [],
    });
    expect(svg).toMatch(
      /role="img" aria-label="No concentration–time curves: not simulated: needs the rate constant of step 2"/,
    );
    expect(texts(svg)).toEqual(['not simulated: needs the rate constant of step 2']);
    expect(curves(svg)).toEqual([]);
  });

  it('draws the demo KX-7 ternary-adduct simulation, intermediates magnified', () => {
    const id = 'kx7-hydroarylation-ternary-adduct';
    const loaded = loadRecordSource(`${id}.yaml`, readFileSync(`content/mechanisms/${id}.yaml`, 'utf8'));
    const derivation = deriveMechanism(loaded.record!);
    const series = firstObservationSeries(
      loaded.record!.observations!,
      simulationBasis(derivation)!,
      derivation.constants!,
    )!;
    const svg = concentrationTimeSvg(series, { logTime: true, idPrefix: id });
    save('concentration-time-kx7-ternary-log.svg', svg);
    save('concentration-time-kx7-ternary-linear.svg', concentrationTimeSvg(series, { idPrefix: id }));
    expect(series.status).toBe('ok');
    expect(curves(svg)).toEqual(['A', 'B', 'Cat', 'CatA', 'CatAB', 'P']);
    expect(texts(svg)).toEqual(
      expect.arrayContaining([
        'A (reactant)',
        'Cat ×10² (catalyst)',
        'CatAB ×10⁵ (intermediate)',
        'P (product)',
        'concentration / M',
        'time / s',
      ]),
    );
  });
});
