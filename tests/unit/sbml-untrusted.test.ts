/**
 * SBML written from untrusted record text: parsed by a real, strict XML parser (saxes, which
 * enforces XML 1.0 well-formedness including the characters XML forbids), with control
 * characters in names, labels whose constant ids would coincide (`1` reversible gives k_-1,
 * written k_m1; a step labelled `m1` gives k_m1), and a coefficient written as a power.
 */
import { SaxesParser } from 'saxes';
import { describe, expect, it } from 'vitest';
import { sbmlDocument } from '../../src/render/sbml/sbml.ts';
import { loadRecordSource } from '../../src/records/index.ts';
import { deriveYaml } from '../helpers/derive-yaml.ts';

/** Every element with its attributes, or the parser's first error. */
function parseXml(xml: string): { elements: { name: string; attributes: Record<string, string> }[]; error?: string } {
  const parser = new SaxesParser({ xmlns: false });
  const elements: { name: string; attributes: Record<string, string> }[] = [];
  let error: string | undefined;
  parser.on('error', (e) => void (error ??= e.message));
  parser.on('opentag', (tag) =>
    elements.push({ name: tag.name, attributes: tag.attributes as Record<string, string> }),
  );
  parser.write(xml).close();
  return error === undefined ? { elements } : { elements, error };
}

function sbmlOf(yaml: string): string {
  const derivation = deriveYaml(yaml);
  const record = loadRecordSource('untrusted.yaml', yaml).record!;
  return sbmlDocument('untrusted', record, derivation.mechanism!, derivation.constants ?? new Map());
}

const hostile = `title: "Bell \\a, escape \\e[2K, nul-free \\x01 and <tags> & 'quotes' \\uFFFE"
system: untrusted
status: proposed
notation: labels
species:
  A: { name: "line one\\nline two\\ttab \\x0b vertical" }
steps:
  - { equation: A <=> B, label: "1", k: 1 s^-1, k_rev: 2 s^-1 }
  - { equation: B -> 3 C, label: m1, k: 3 s^-1 }
  - { equation: C <=> D, label: m1_2, k: 1 s^-1, K: 2 }
`;

describe('SBML from untrusted text', () => {
  const sbml = sbmlOf(hostile);
  const parsed = parseXml(sbml);

  it('is well-formed XML 1.0 to a strict parser', () => {
    expect(parsed.error).toBeUndefined();
    expect(parseXml('<a>\u0001</a>').error).toBeDefined(); // the parser does reject what XML forbids
  });

  it('keeps the text readable: markup as entities, forbidden characters as visible escapes', () => {
    const model = parsed.elements.find((e) => e.name === 'model')!;
    expect(model.attributes['name']).toBe(
      "Bell \\u0007, escape \\u001b[2K, nul-free \\u0001 and <tags> & 'quotes' \\ufffe",
    );
    const species = parsed.elements.find((e) => e.name === 'species' && e.attributes['id'] === 's_A')!;
    expect(species.attributes['name']).toBe('line one\nline two\ttab \\u000b vertical');
  });

  it('gives every id once, and the kinetic laws the parameter of their own step', () => {
    const ids = parsed.elements.map((e) => e.attributes['id']).filter((id) => id !== undefined);
    expect(new Set(ids).size).toBe(ids.length);
    const byName = new Map(
      parsed.elements.filter((e) => e.name === 'parameter').map((e) => [e.attributes['name'], e.attributes['id']]),
    );
    expect([...byName.keys()]).toEqual(['k_1', 'k_-1', 'k_m1', 'k_m1_2', 'k_-m1_2']);
    expect(new Set(byName.values()).size).toBe(5);
    // The reverse of step 1 and the forward of step m1 are different parameters with their own values.
    const value = (name: string) =>
      parsed.elements.find((e) => e.name === 'parameter' && e.attributes['name'] === name)!.attributes['value'];
    expect([value('k_-1'), value('k_m1')]).toEqual(['2', '3']);
    const laws = [...sbml.matchAll(/<reaction [\s\S]*?<\/reaction>/g)].map((m) => m[0]);
    expect(laws[0]).toContain(`<ci> ${byName.get('k_-1')} </ci>`);
    expect(laws[1]).toContain(`<ci> ${byName.get('k_m1')} </ci>`);
    expect(laws[1]).not.toContain(`<ci> ${byName.get('k_-1')} </ci>`);
  });

  it('writes a coefficient as a power, not one factor per particle', () => {
    const big = sbmlOf(`title: t
system: s
status: proposed
notation: labels
steps:
  - { equation: 2 A <=> 1000 B, k: 1 M^-1 s^-1, k_rev: 1 s^-1 }
`);
    expect(parseXml(big).error).toBeUndefined();
    expect(big).toContain('<apply><power/><ci> s_B </ci><cn type="integer"> 1000 </cn></apply>');
    expect(big).toContain('<apply><power/><ci> s_A </ci><cn type="integer"> 2 </cn></apply>');
    expect(big.length).toBeLessThan(5000);
  });
});
