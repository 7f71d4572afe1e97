/**
 * SBML Level 3 Version 2 export: a well-formed document whose identifiers follow the SId
 * grammar of the SBML L3V2 specification (section 3.1.7, from memory), whose kinetic laws refer
 * only to declared ids, and whose species carry the attributes L3 requires.
 */
import { describe, expect, it } from 'vitest';
import { sbmlDocument } from '../../src/render/sbml/sbml.ts';
import { sbmlIds } from '../../src/render/sbml/sbml-ids.ts';
import { deriveYaml } from '../helpers/derive-yaml.ts';
import { loadRecordSource } from '../../src/records/index.ts';

const SID = /^[A-Za-z_][A-Za-z0-9_]*$/;

const yaml = `title: Iodide & peroxide <test>
system: peroxide
status: proposed
species:
  H2O: { solvent: true }
steps:
  - { equation: H2O2 + I- <=> H2O + IO-, k: 1.1e-2 M^-1 s^-1, K: 2 }
  - { equation: H2O2 + IO- -> H2O + O2 + I-, k: 3 M^-1 s^-1 }
observations:
  - id: run-1
    concentrations: { H2O2: 0.1 M, I-: 10 mM, H2O: 55 M }
`;

/** Checks that start and end tags nest properly (enough for a document we generate ourselves). */
function wellFormed(xml: string): boolean {
  const stack: string[] = [];
  for (const m of xml.matchAll(/<(\/?)([A-Za-z][\w:.-]*)[^>]*?(\/?)>/g)) {
    const [, closing, name, selfClosing] = m;
    if (selfClosing) continue;
    if (closing) {
      if (stack.pop() !== name) return false;
    } else stack.push(name!);
  }
  return stack.length === 0;
}

describe('SBML export', () => {
  const derivation = deriveYaml(yaml);
  const record = loadRecordSource('peroxide.yaml', yaml).record!;
  const sbml = sbmlDocument('peroxide-test', record, derivation.mechanism!, derivation.constants!);

  it('is well formed, declares L3V2, escapes text', () => {
    expect(sbml.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    expect(sbml).toContain('level="3" version="2"');
    expect(wellFormed(sbml.replace(/<\?xml[^>]*>/, ''))).toBe(true);
    expect(sbml).toContain('Iodide &amp; peroxide &lt;test&gt;');
  });

  it('uses valid, declared identifiers everywhere', () => {
    const ids = [...sbml.matchAll(/ id="([^"]+)"/g)].map((m) => m[1]!);
    for (const id of ids) expect(id).toMatch(SID);
    expect(new Set(ids).size).toBe(ids.length);
    const referenced = [...sbml.matchAll(/<ci> (\S+) <\/ci>/g), ...sbml.matchAll(/species="([^"]+)"/g)].map(
      (m) => m[1]!,
    );
    for (const r of referenced) expect(ids).toContain(r);
  });

  it('gives every species the attributes L3 requires, the solvent as a boundary species', () => {
    const species = [...sbml.matchAll(/<species [^>]*\/>/g)].map((m) => m[0]);
    expect(species).toHaveLength(5);
    for (const s of species)
      for (const attr of ['compartment=', 'hasOnlySubstanceUnits=', 'boundaryCondition=', 'constant='])
        expect(s).toContain(attr);
    expect(species.find((s) => s.includes('name="H2O"'))).toContain('boundaryCondition="true"');
    expect(species.find((s) => s.includes('name="I-"'))).toContain('initialConcentration="0.01"');
  });

  it('writes the reverse constant from k and K, and stoichiometry always', () => {
    expect(sbml).toContain('<parameter id="k_m1" name="k_-1" value="0.0055" constant="true"/>');
    expect([...sbml.matchAll(/<speciesReference [^>]*\/>/g)].every((m) => m[0].includes('stoichiometry='))).toBe(true);
  });

  it('makes unique SIds from trade symbols', () => {
    const ids = sbmlIds(['I-', 'Fe3+', '[Co(NH3)6]3+', 'A*', 'Br•', 'Br.', 'e-']);
    for (const id of ids.values()) expect(id).toMatch(SID);
    expect(new Set(ids.values()).size).toBe(7);
  });
});
