/**
 * What a mechanism page shows, as plain JSON built from a catalogue record (the site renders it
 * and recomputes no chemistry): the report, the steps with their marks, the overall equation in
 * LaTeX with catalysts over the arrow, the species with their roles, and the figures.
 */
import type { CatalogueRecord } from '../catalogue/index.ts';
import type { Observation, RecordReport, Reference, VerdictCounts } from '../model/index.ts';
import {
  concentrationTimeSvg,
  energyProfileSvg,
  recordConcentrationUnit,
  overallLatex,
  primaryChecks,
  recordReport,
  sbmlDocument,
  superscript,
  tallyVerdicts,
  type ConcentrationUnit,
} from '../render/index.ts';

export interface StepView {
  index: number;
  label: string;
  equation: string;
  reversible: boolean;
  rds: boolean;
  molecularity: number;
  sigma?: number;
  k?: string;
  kRev?: string;
  K?: string;
  barrier?: string;
  change?: string;
  /** atoms and charge: balanced, not balanced, or not checked (no composition) */
  balance: 'balanced' | 'unbalanced' | 'unchecked';
  note?: string;
}

export interface SpeciesView {
  symbol: string;
  role?: string;
  buffered: boolean;
  name?: string;
  formula?: string;
  /** from the composition, where the species has one */
  charge?: number;
  inchi?: string;
  smiles?: string;
  aliases: string[];
}

/** An observation as the record gives it: where and under which conditions it was measured. */
export interface ObservationView {
  id: string;
  source?: string;
  T?: string;
  /** [symbol, quantity as written] */
  concentrations: [string, string][];
  orders: [string, string][];
  note?: string;
}

export interface RecordView {
  id: string;
  file: string;
  source: string;
  title: string;
  system?: string;
  status?: string;
  /** one line on why the record has its status (disfavoured, withdrawn) */
  statusReason?: string;
  /** how the symbols are written: labels belong to the record's system, formulas to the catalogue */
  notation: 'formulas' | 'labels';
  /** symbol → species page slug (under /s/), filled in when the catalogue's pages are known */
  speciesSlugs: Record<string, string>;
  tags: string[];
  contributors: string[];
  added?: string;
  notes?: string;
  references: Reference[];
  /** the observations as written in the record (the checks against them are in `report`) */
  observationsGiven: ObservationView[];
  steps: StepView[];
  species: SpeciesView[];
  overallLatex?: string;
  report: RecordReport;
  /** the energy profile as SVG (schematic when the steps record no energies) */
  energySvg?: string;
  /** the mass-action model as SBML Level 3 Version 2, where the steps could be read */
  sbml?: string;
  /** concentration–time curves of the simulation, where constants allow one */
  concentrationSvg?: string;
  errors: number;
  warnings: number;
  /** no errors and no observation contradicted by the primary rate law */
  survives: boolean;
  /** the primary rate law's checks counted by verdict (not excluded apart from consistent) */
  verdicts: VerdictCounts;
}

/** Builds the page data of one catalogue record. */
export function recordView(checked: CatalogueRecord): RecordView {
  const report = recordReport(checked);
  const { record, derivation, source } = checked;
  const count = (s: string) => report.diagnostics.filter((d) => d.severity === s).length;
  const view: RecordView = {
    id: checked.id,
    file: checked.file,
    source,
    title: record?.title ?? checked.id,
    notation: record?.notation ?? 'formulas',
    speciesSlugs: {},
    tags: record?.tags ?? [],
    contributors: record?.contributors ?? [],
    references: record?.references ?? [],
    observationsGiven: (record?.observations ?? []).map(observationView),
    steps: [],
    species: [],
    report,
    errors: count('error'),
    warnings: count('warning'),
    survives: false,
    verdicts: tallyVerdicts(primaryChecks(report)),
  };
  if (record)
    Object.assign(
      view,
      { system: record.system, status: record.status },
      record.added && { added: record.added },
      record.status_reason && { statusReason: record.status_reason },
      record.notes && { notes: record.notes },
    );
  const mechanism = derivation?.mechanism;
  if (mechanism && record) {
    view.steps = mechanism.steps.map((step): StepView => {
      const entry = record.steps[step.index]!;
      const balance = derivation.balance?.[step.index] ?? 'unchecked';
      const out: StepView = {
        index: step.index,
        label: step.label,
        equation: step.text,
        reversible: step.reversible,
        rds: step.rds,
        molecularity: step.molecularity,
        balance,
      };
      const sigma = derivation.stoichiometricNumbers?.[step.index];
      if (sigma !== undefined) out.sigma = sigma;
      for (const [key, field] of [
        ['k', 'k'],
        ['kRev', 'k_rev'],
        ['K', 'K'],
      ] as const)
        if (entry[field] !== undefined) out[key] = String(entry[field]);
      if (entry.energy?.barrier !== undefined) out.barrier = String(entry.energy.barrier);
      if (entry.energy?.change !== undefined) out.change = String(entry.energy.change);
      if (entry.note) out.note = entry.note;
      return out;
    });
    view.species = [...mechanism.species.values()].map((s) => {
      const out: SpeciesView = { symbol: s.symbol, buffered: s.buffered, aliases: s.entry?.aliases ?? [] };
      const role = derivation.roles?.get(s.symbol);
      if (role) out.role = role;
      if (s.entry?.name) out.name = s.entry.name;
      const formula = s.entry?.formula ?? (mechanism.notation === 'formulas' ? s.symbol : undefined);
      if (formula) out.formula = formula;
      if (s.composition) out.charge = s.composition.charge;
      if (s.entry?.inchi) out.inchi = s.entry.inchi;
      if (s.entry?.smiles) out.smiles = s.entry.smiles;
      return out;
    });
  }
  if (derivation?.energy)
    view.energySvg = energyProfileSvg(derivation.energy, {
      idPrefix: `energy-${checked.id}`,
      title: `Energy profile of ${view.title}`,
    });
  const series = checked.series;
  if (series?.status === 'ok')
    view.concentrationSvg = concentrationTimeSvg(series, {
      ...plotUnitOf(
        view.observationsGiven,
        series.values.filter((_, i) => !series.held[i] && series.roles[i] !== 'third_body'),
      ),
      logTime: true,
      idPrefix: `concentration-${checked.id}`,
      title: `Simulated concentrations against time for ${view.title} (observation ${series.observation}, log time axis)`,
    });
  if (record && derivation?.mechanism)
    view.sbml = sbmlDocument(checked.id, record, derivation.mechanism, derivation.constants ?? new Map());
  if (derivation?.overall)
    view.overallLatex = overallLatex(
      derivation.overall.reactants,
      derivation.overall.products,
      derivation.overall.catalysts,
    );
  const failed = (report.observations ?? []).some(
    (o) => o.status === 'fail' && o.method === report.rate_laws?.[0]?.method,
  );
  view.survives = view.errors === 0 && !failed;
  return view;
}

/**
 * The concentration axis in the record's own unit where it writes one outside the molar family
 * (a gas-phase record in molecule cm⁻³), scaled by a power of ten so the ticks read 0–1000.
 */
function plotUnitOf(given: readonly ObservationView[], values: readonly number[][]): { unit?: ConcentrationUnit } {
  const unit = recordConcentrationUnit(given.flatMap((o) => o.concentrations.map(([, q]) => q)));
  if (MOLAR_FAMILY.includes(unit.text)) return {};
  const tallest = Math.max(0, ...values.flat()) / unit.molar;
  const power = tallest > 0 ? Math.floor(Math.log10(tallest)) : 0;
  const scaled = power >= 3 || power <= -3 ? power : 0;
  const symbol = scaled === 0 ? unit.display : `10${superscript(String(scaled))} ${unit.display}`;
  return { unit: { symbol, perMolar: 1 / unit.molar / 10 ** scaled } };
}

const MOLAR_FAMILY = ['M', 'mM', 'µM', 'uM', 'nM', 'pM', 'mol/L', 'mol dm^-3', 'mol/dm^3', 'mol L^-1'];

function observationView(o: Observation): ObservationView {
  const pairs = (m: Record<string, string | number> | undefined) =>
    Object.entries(m ?? {}).map(([k, v]): [string, string] => [k, String(v)]);
  const out: ObservationView = { id: o.id, concentrations: pairs(o.concentrations), orders: pairs(o.orders) };
  if (o.source !== undefined) out.source = o.source;
  if (o.T !== undefined) out.T = String(o.T);
  if (o.note !== undefined) out.note = o.note;
  return out;
}
