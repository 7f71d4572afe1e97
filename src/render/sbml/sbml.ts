/**
 * SBML Level 3 Version 2 core (sbml.org) of a derived mechanism, so the full mass-action model
 * can be simulated elsewhere: one compartment of 1 L, species in mol/L with the first
 * observation's starting concentrations, buffered species and solvents as boundary species,
 * every step a reaction whose kinetic law (in extent per time: the compartment size times the
 * mass-action rate) is written in MathML.
 */
import {
  CONCENTRATION,
  parseQuantity,
  Rational,
  sameDimension,
  toCanonical,
  type Mechanism,
  type Step,
} from '../../engine/index.ts';
import type { MechanismRecord } from '../../model/index.ts';
import { sbmlIds, uniqueIds } from './sbml-ids.ts';
import { xmlText } from './xml-text.ts';

/** The SBML document as a string; constants given or from energies, by symbol (k_1, k_-1). */
export function sbmlDocument(
  id: string,
  record: MechanismRecord,
  mechanism: Mechanism,
  constants: ReadonlyMap<string, number>,
): string {
  const ids = sbmlIds([...mechanism.species.keys()]);
  const constantIds = parameterIds(mechanism);
  const start = startingConcentrations(record, [...mechanism.species.keys()]);
  const species = [...mechanism.species.values()].map((s) => {
    const boundary = s.buffered || s.solvent;
    return `      <species id="${ids.get(s.symbol)}" name="${xml(s.entry?.name ?? s.symbol)}" compartment="c" initialConcentration="${num(start.get(s.symbol) ?? 0)}" substanceUnits="mole" hasOnlySubstanceUnits="false" boundaryCondition="${boundary}" constant="${boundary}"/>`;
  });
  const parameters = mechanism.steps.flatMap((step) => {
    const names = [`k_${step.label}`, ...(step.reversible ? [`k_-${step.label}`] : [])];
    return names.map((name) => {
      const value = reverseOrForward(name, step, constants);
      return `      <parameter id="${constantIds.get(name)}" name="${xml(name)}"${value === undefined ? '' : ` value="${num(value)}"`} constant="true"/>`;
    });
  });
  const reactionIds = uniqueIds(mechanism.steps.map((step) => `r_${parameterId(step.label)}`));
  const reactions = mechanism.steps.map((step, i) => reaction(step, reactionIds[i]!, ids, constantIds));
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<sbml xmlns="http://www.sbml.org/sbml/level3/version2/core" level="3" version="2">',
    `  <model id="${parameterId(`m_${id.replace(/-/g, '_')}`)}" name="${xml(record.title)}" substanceUnits="mole" timeUnits="second" volumeUnits="litre" extentUnits="mole">`,
    '    <notes><body xmlns="http://www.w3.org/1999/xhtml"><p>Written by mechatlas from a catalogue record. Rate constants in mol/L and s; the kinetic laws are mass action. A derived model, not a measurement.</p></body></notes>',
    '    <listOfCompartments>',
    '      <compartment id="c" name="reaction volume" spatialDimensions="3" size="1" units="litre" constant="true"/>',
    '    </listOfCompartments>',
    '    <listOfSpecies>',
    ...species,
    '    </listOfSpecies>',
    '    <listOfParameters>',
    ...parameters,
    '    </listOfParameters>',
    '    <listOfReactions>',
    ...reactions,
    '    </listOfReactions>',
    '  </model>',
    '</sbml>',
    '',
  ].join('\n');
}

/**
 * The SId of each rate constant by name: `k_1`, and `k_m1` for the reverse k_-1; unique, so a
 * step labelled `m1` and the reverse of step `1` never share a parameter.
 */
function parameterIds(mechanism: Mechanism): Map<string, string> {
  const names = mechanism.steps.flatMap((step) => [
    `k_${step.label}`,
    ...(step.reversible ? [`k_-${step.label}`] : []),
  ]);
  const ids = uniqueIds(names.map(parameterId));
  return new Map(names.map((name, i) => [name, ids[i]!]));
}

function reaction(
  step: Step,
  id: string,
  ids: ReadonlyMap<string, string>,
  constantIds: ReadonlyMap<string, string>,
): string {
  const refs = (terms: Step['reactants']) =>
    terms.map(
      (t) =>
        `          <speciesReference species="${ids.get(t.species)}" stoichiometry="${t.coefficient.toNumber()}" constant="true"/>`,
    );
  // A coefficient is a power, never one factor per particle (a coefficient of 10^9 stays one line).
  const factor = (t: Step['reactants'][number]) =>
    t.coefficient.equals(Rational.ONE)
      ? `          <ci> ${ids.get(t.species)} </ci>`
      : `          <apply><power/><ci> ${ids.get(t.species)} </ci><cn type="integer"> ${t.coefficient.toString()} </cn></apply>`;
  const side = (name: string, terms: Step['reactants']) =>
    [`          <ci> ${constantIds.get(name)} </ci>`, ...terms.map(factor)].join('\n');
  const forward = `<apply><times/>\n${side(`k_${step.label}`, step.reactants)}\n        </apply>`;
  const rate = step.reversible
    ? `<apply><minus/>\n        ${forward}\n        <apply><times/>\n${side(`k_-${step.label}`, step.products)}\n        </apply></apply>`
    : forward;
  return [
    `      <reaction id="r_${parameterId(step.label)}" name="step ${xml(step.label)}: ${xml(step.text)}" reversible="${step.reversible}">`,
    '        <listOfReactants>',
    ...refs(step.reactants),
    '        </listOfReactants>',
    '        <listOfProducts>',
    ...refs(step.products),
    '        </listOfProducts>',
    '        <kineticLaw><math xmlns="http://www.w3.org/1998/Math/MathML">',
    `        <apply><times/><ci> c </ci>${rate}</apply>`,
    '        </math></kineticLaw>',
    '      </reaction>',
  ].join('\n');
}

function reverseOrForward(name: string, step: Step, constants: ReadonlyMap<string, number>): number | undefined {
  const direct = constants.get(name);
  if (direct !== undefined || !name.startsWith('k_-')) return direct;
  const k = constants.get(`k_${step.label}`);
  const K = constants.get(`K_${step.label}`);
  return k !== undefined && K !== undefined ? k / K : undefined;
}

function startingConcentrations(record: MechanismRecord, symbols: string[]): Map<string, number> {
  const out = new Map<string, number>();
  const first = (record.observations ?? []).find((o) => o.concentrations);
  for (const [sp, text] of Object.entries(first?.concentrations ?? {})) {
    const q = parseQuantity(text);
    if (
      symbols.includes(sp) &&
      !('error' in q) &&
      q.quantity.value >= 0 &&
      sameDimension(q.quantity.unit.dimension, CONCENTRATION)
    )
      out.set(sp, toCanonical(q.quantity));
  }
  return out;
}

/** An SBML SId: `(_|letter)(_|letter|digit)*`. */
export function parameterId(text: string): string {
  const id = text.replace(/-/g, 'm').replace(/[^A-Za-z0-9_]/g, '_');
  return /^[A-Za-z_]/.test(id) ? id : `_${id}`;
}

function num(x: number): string {
  return Number.isFinite(x) ? String(x) : '0';
}

function xml(text: string): string {
  return xmlText(text);
}
