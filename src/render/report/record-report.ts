/**
 * The JSON report of one record (DESIGN.md "Contracts"): snake_case keys, additive only.
 * Pure: built from a loaded record and its derivation; the CLI and the site both use it.
 */
import type {
  ApparentConstant,
  Derivation,
  DerivedRateLaw,
  NormalisedLaw,
  NormalisedTerm,
  ObservationCheck,
  Polynomial,
  Rational,
  SimulationCheck,
  SystemDataSet,
} from '../../engine/index.ts';
import { fitsJson } from './fits-json.ts';
import type {
  ApparentConstantJson,
  Diagnostic,
  DiagnosticJson,
  NormalisedLawJson,
  NormalisedTermJson,
  ObservationJson,
  RateLawJson,
  RecordReport,
  SimulationJson,
  TermJson,
} from '../../model/index.ts';

export interface RecordInput {
  id: string;
  file: string;
  record?: { title: string; system: string; status: string };
  derivation?: Derivation;
  /** the data sets of the record's system, each rival fitted and ranked (absent when not fitted as a system) */
  systemFits?: readonly SystemDataSet[];
  /** every diagnostic of the record, placed (file, line, column) */
  diagnostics: readonly Diagnostic[];
}

/** Builds the report object of one record. */
export function recordReport(input: RecordInput): RecordReport {
  const { record, derivation } = input;
  const out: RecordReport = { id: input.id, file: input.file, diagnostics: input.diagnostics.map(diagnosticJson) };
  if (record) Object.assign(out, { title: record.title, system: record.system, status: record.status });
  if (derivation?.overall) {
    const { overall } = derivation;
    out.overall = {
      reactants: coefficients(overall.reactants),
      products: coefficients(overall.products),
      catalysts: overall.catalysts,
      text: overall.text,
    };
  }
  if (derivation?.stoichiometricNumbers) {
    out.stoichiometric_numbers = derivation.stoichiometricNumbers;
    if (derivation.routeSource) out.stoichiometric_numbers_source = derivation.routeSource;
  }
  if (derivation?.roles) out.roles = Object.fromEntries(derivation.roles);
  const chain = derivation?.route?.chain;
  if (chain) {
    const numbered = (steps: number[]) => steps.map((i) => i + 1);
    out.chain = {
      carriers: chain.carriers,
      propagation: numbered(chain.propagation),
      initiation: numbered(chain.initiation),
      termination: numbered(chain.termination),
      source: chain.source,
    };
  }
  if (derivation && derivation.buffered.length > 0) out.buffered = derivation.buffered;
  if (derivation?.rateLaws) out.rate_laws = derivation.rateLaws.map(rateLawJson);
  if (derivation?.observations) out.observations = derivation.observations.map(observationJson);
  if (derivation?.simulation) out.simulation = derivation.simulation.map(simulationJson);
  if (derivation?.energy && !derivation.energy.schematic) out.energy = derivation.energy;
  if (derivation?.constantsFromEnergies?.length) out.constants_from_energies = derivation.constantsFromEnergies;
  const fits = fitsJson(input.id, derivation, input.systemFits);
  if (fits) out.fits = fits;
  // Keep the documented key order: diagnostics last.
  const { diagnostics, ...rest } = out;
  return { ...rest, diagnostics };
}

/** A diagnostic in the report's snake_case shape. */
export function diagnosticJson(d: Diagnostic): DiagnosticJson {
  const out: DiagnosticJson = { rule: d.rule, severity: d.severity, message: d.message };
  if (d.file !== undefined) out.file = d.file;
  if (d.line !== undefined) out.line = d.line;
  if (d.column !== undefined) out.column = d.column;
  if (d.endLine !== undefined) out.end_line = d.endLine;
  if (d.endColumn !== undefined) out.end_column = d.endColumn;
  if (d.note !== undefined) out.note = d.note;
  return out;
}

/** A derived rate law in the report's shape. */
export function rateLawJson(derived: DerivedRateLaw): RateLawJson {
  const { law, presented } = derived;
  const out: RateLawJson = {
    method: law.method,
    orders: Object.fromEntries(
      [...derived.orders].map(([sp, o]) => [sp, { low: o.low.toJSON(), high: o.high.toJSON() }]),
    ),
    derivation: [...law.trace, ...(presented?.trace ?? [])],
  };
  if (presented) {
    Object.assign(out, { text: presented.text, latex: presented.latex });
    out.structure = {
      numerator: termsJson(presented.expression.numerator),
      denominator: termsJson(presented.expression.denominator),
    };
  }
  if (derived.algebraic) {
    const { expression, text, latex, roots } = derived.algebraic;
    Object.assign(out, { text, latex });
    // The outer fraction in the root symbols, and each root with the polynomial it is the positive root of.
    out.structure = {
      numerator: termsJson(expression.outer.numerator),
      denominator: termsJson(expression.outer.denominator),
      roots: expression.roots.map((root, i) => ({
        symbol: root.symbol,
        polynomial: termsJson(root.polynomial),
        closed_form: roots[i]!.text,
        closed_form_latex: roots[i]!.latex,
      })),
    };
  }
  if (presented?.grouped) {
    const g = presented.grouped;
    out.grouped = { name: g.name, value_text: g.valueText, value_latex: g.valueLatex, text: g.text, latex: g.latex };
    Object.assign(
      out.grouped,
      { unit: g.unitText, unit_latex: g.unitLatex },
      g.value !== undefined && { value: sixFigures(g.value) },
    );
  }
  if (derived.normalised) out.normalised = normalisedJson(derived.normalised);
  if (law.absorbed.length > 0) out.absorbed = law.absorbed;
  if (law.catalystBalances.length > 0) {
    out.catalyst_balances = law.catalystBalances.map((b) => ({
      catalyst: b.catalyst,
      total: b.total,
      forms: b.forms.map((f) => ({ species: f.species, fraction: f.text, fraction_latex: f.latex })),
    }));
  }
  if (derived.restingStates.length > 0) out.resting_states = derived.restingStates;
  if (!law.expression && !law.algebraic) out.numeric_only = true;
  return out;
}

/** A normalised law in the report's shape. */
function normalisedJson(n: NormalisedLaw): NormalisedLawJson {
  const terms = (ts: readonly NormalisedTerm[]): NormalisedTermJson[] =>
    ts.map((t) => ({
      ...(t.constant !== undefined && { constant: t.constant }),
      power: t.power.toJSON(),
      sign: t.sign,
      factors: Object.fromEntries(t.concentrations.factors.map(([symbol, e]) => [symbol, e.toJSON()])),
    }));
  const out: NormalisedLawJson = {
    text: n.text,
    latex: n.latex,
    constants: n.constants.map(constantJson),
    numerator: terms(n.numerator),
    factors: n.factors.map((f) => ({ power: f.power, terms: terms(f.terms) })),
  };
  if (n.trade)
    out.trade = { ...n.trade, inhibitors: [...n.trade.inhibitors], constants: n.trade.constants.map(constantJson) };
  return out;
}

function constantJson(c: ApparentConstant): ApparentConstantJson {
  const out: ApparentConstantJson = {
    name: c.name,
    latex: c.latex,
    meaning: c.meaning,
    definition_text: c.definitionText,
    definition_latex: c.definitionLatex,
    unit: c.unitText,
    unit_latex: c.unitLatex,
  };
  if (c.relationText !== undefined)
    Object.assign(out, { relation_text: c.relationText, relation_latex: c.relationLatex });
  if (c.value !== undefined) out.value = sixFigures(c.value);
  return out;
}

function sixFigures(x: number): number {
  return Number(x.toPrecision(6));
}

function termsJson(p: Polynomial): TermJson[] {
  return p.terms.map((t) => ({
    coefficient: t.coefficient.toJSON(),
    factors: Object.fromEntries(t.monomial.factors.map(([symbol, e]) => [symbol, e.toJSON()])),
  }));
}

/** An observation check in the report's shape. */
export function observationJson(check: ObservationCheck): ObservationJson {
  const out: ObservationJson = {
    id: check.observation,
    species: check.species,
    method: check.method,
    observed: check.observed,
    tolerance: check.tolerance,
    basis: check.basis,
    status: check.status,
  };
  if (check.predicted !== undefined) out.predicted = check.predicted;
  if (check.range) out.range = check.range;
  if (check.limits) out.limits = check.limits;
  if (check.reason !== undefined) out.reason = check.reason;
  return out;
}

function simulationJson(check: SimulationCheck): SimulationJson {
  const out: SimulationJson = {
    observation: check.observation,
    status: check.status,
    orders: check.orders,
    approximation_error: check.approximationError,
  };
  if (check.message !== undefined) out.message = check.message;
  if (check.initialRate !== undefined) out.initial_rate = Number(check.initialRate.toPrecision(6));
  if (check.time !== undefined) out.time_s = Number(check.time.toPrecision(4));
  return out;
}

function coefficients(m: ReadonlyMap<string, Rational>): Record<string, number | string> {
  return Object.fromEntries([...m].map(([sp, c]) => [sp, c.toJSON()]));
}
