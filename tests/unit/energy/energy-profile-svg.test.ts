/**
 * The energy-profile SVG: real text for every label, accessible name, escaped user text,
 * deterministic output, schematic mode. Writes the demo drawings to test-artifacts/ for review.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { deriveMechanism } from '../../../src/engine/derive.ts';
import { energyAnalysis } from '../../../src/engine/energy/energy-analysis.ts';
import { energyProfileSvg, profileWidth } from '../../../src/render/plots/energy-profile-svg.ts';
import { loadRecordSource } from '../../../src/records/index.ts';

function energyOf(yaml: string, id = 'svg-case') {
  const loaded = loadRecordSource(`${id}.yaml`, yaml);
  if (!loaded.record) throw new Error(JSON.stringify(loaded.diagnostics));
  const derivation = deriveMechanism(loaded.record);
  const { energy } = energyAnalysis(loaded.record, derivation.mechanism!, derivation.route!);
  if (!energy) throw new Error('no energy result');
  return energy;
}

const header = 'title: svg case\nsystem: svg\nstatus: proposed\nnotation: labels\n';
const texts = (svg: string) => [...svg.matchAll(/<text[^>]*>(.*?)<\/text>/g)].map((m) => m[1]!.replace(/<[^>]+>/g, ''));

function save(name: string, svg: string): void {
  mkdirSync('test-artifacts', { recursive: true });
  writeFileSync(`test-artifacts/${name}`, svg);
}

describe('energy profile SVG', () => {
  it('draws the demo KX-7 cycle with every state, barrier and the overall change labelled', () => {
    const yaml = readFileSync('content/mechanisms/kx7-hydroarylation-alkene-first.yaml', 'utf8');
    const energy = energyOf(yaml, 'kx7-hydroarylation-alkene-first');
    const svg = energyProfileSvg(energy, { idPrefix: 'kx7' });
    save('energy-profile-kx7-alkene-first.svg', svg);
    expect(svg).toMatch(
      /^<svg [^>]*role="img" aria-label="Gibbs energy profile of 2 elementary steps; overall change −56\.0 kJ\/mol \(exergonic\); energetic span 80\.0 kJ\/mol"/,
    );
    expect(svg).toContain('<title>Gibbs energy profile of 2 elementary steps;');
    const all = texts(svg);
    expect(all).toEqual(
      expect.arrayContaining([
        'Gibbs energy / kJ mol⁻¹',
        'reaction coordinate',
        'Cat + A + B',
        'CatA + B',
        'Cat + P',
        '‡ bind',
        '‡ ar · TDTS',
        '−6.0 · TDI',
        '74.0',
        'ΔG‡ 45.0',
        'ΔG‡ 80.0',
        'ΔrG −56.0',
        'exergonic',
      ]),
    );
    expect(svg).toContain('energetic span δE = 80.0 kJ mol⁻¹ (TDI: state 1, TDTS: ‡ ar)');
    // Same input, same bytes.
    expect(energyProfileSvg(energy, { idPrefix: 'kx7' })).toBe(svg);
  });

  it('draws a profile without energies as a neutral sequence of states: no heights, no taller rds', () => {
    const energy = energyOf(`${header}species:\n  E: { role: catalyst }\nsteps:
  - { equation: E + S <=> ES, label: bind }
  - { equation: ES -> EP, label: chem, rds: true }
  - { equation: EP <=> E + P, label: release }
`);
    const svg = energyProfileSvg(energy, { idPrefix: 'schematic' });
    save('energy-profile-schematic.svg', svg);
    expect(texts(svg)).toEqual(
      expect.arrayContaining([
        'Sequence of states: no energies recorded, so no heights are drawn',
        'chem',
        'E + S',
        'E + P',
      ]),
    );
    // No energy axis, no humps, no barriers: nothing the record does not give.
    expect(svg).not.toMatch(/Gibbs energy \/|ΔG‡|<path d="M[^"]* C/);
    const named = (label: string) =>
      Number(new RegExp(`<text x="[\\d.]+" y="([\\d.]+)"[^>]*>${label}<`).exec(svg)?.[1]);
    expect(named('chem')).toBe(named('bind'));
    expect(named('chem')).toBe(named('release'));
  });

  it('is as wide as its steps need, and writes formulas with subscripts and charges in tspans', () => {
    const energy = energyOf(`${header}steps:
  - { equation: H3O+ + CHF3 -> CHF3H+ + H2O, energy: { barrier: 20 kJ/mol, change: -5 kJ/mol } }
`);
    const svg = energyProfileSvg(energy);
    expect(svg).toMatch(/^<svg [^>]*width="440"/);
    expect(svg).toContain(
      'H<tspan dy="3" font-size="8">3</tspan><tspan dy="-3">O</tspan><tspan dy="-3" font-size="8">+</tspan>',
    );
    expect(svg).toContain('CHF<tspan dy="3" font-size="8">3</tspan>');
    expect(profileWidth(8)).toBeGreaterThan(profileWidth(2));
  });

  it('escapes species names and titles, and keeps ids safe', () => {
    const energy = energyOf(`${header}steps:
  - { equation: A<b> -> "C&D", label: x, energy: { barrier: 20 kJ/mol, change: -5 kJ/mol } }
`);
    const svg = energyProfileSvg(energy, { idPrefix: 'a"b c', title: 'Tom & "Jerry" <profile>' });
    expect(svg).toContain('A&lt;b&gt;');
    expect(svg).toContain('C&amp;D');
    expect(svg).toContain('aria-label="Tom &amp; &quot;Jerry&quot; &lt;profile&gt;"');
    expect(svg).toContain('id="a_b_c-arrow"');
    expect(svg).not.toMatch(/<b>|"C&D"/);
  });

  it('wraps a long list of species into lines and keeps the full list as a tooltip', () => {
    const many = Array.from({ length: 9 }, (_, i) => `Reagent${i}`).join(' + ');
    const energy = energyOf(`${header}steps:
  - { equation: ${many} -> P, energy: { barrier: 20 kJ/mol, change: -5 kJ/mol } }
`);
    const svg = energyProfileSvg(energy);
    expect(svg).toMatch(/<text [^>]*><title>Reagent0 \+ Reagent1 \+ [^<]*Reagent8<\/title><tspan/);
    const label = /<title>Reagent0[^<]*<\/title>(.*?)<\/text>/.exec(svg)![1]!;
    // One tspan with its own x per line (the others inside set the digits as subscripts).
    expect(label.match(/<tspan x=/g)).toHaveLength(4);
    expect(label).toContain('…');
  });
});
