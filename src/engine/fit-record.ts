/**
 * The fitting stage of a derivation: one record's data sets (read by the catalogue from its
 * tables) fitted against the record's own rate laws. Orders fitted from initial-rate tables take
 * the place of hand-entered ones in the observation checks; each law is fitted in its apparent
 * constants; a temperature series gives Arrhenius and Eyring parameters, compared with the step
 * energies; a time course is fitted by the integrated law and by the mass-action simulation. The
 * result is the derivation with its `fits`, so a cache of derivations holds the fits too.
 */
import type { MechanismRecord } from '../model/index.ts';
import { diagnostic, type Diagnostic } from '../model/index.ts';
import type { Derivation } from './derive.ts';
import { energyConditions, readStepEnergies } from './energy/index.ts';
import { compareActivation, activationDiagnostic, type RecordedBarrier } from './fitting/activation-check.ts';
import { fitArrhenius, fitEyring } from './fitting/activation-parameters.ts';
import { fitInitialRateOrders } from './fitting/initial-rate-orders.ts';
import type { InitialRateData, KineticData, TimeCourseData } from './fitting/kinetic-data.ts';
import { fitLawToRates, missingSymbols, pointConcentrations } from './fitting/law-fit.ts';
import { lawFunction, restrictLaw, steadyTermConstants, unseenConstants } from './fitting/law-function.ts';
import type { DataSetFits, LawFitResult, RecordFits } from './fitting/record-fits.ts';
import { fitTimeCourse, type TimeCourseFit, type TimeCourseInput } from './fitting/time-course-fit.ts';
import { checkObservations } from './observations/check-observations.ts';
import { contradiction, openVerdict, type ObservationCheck } from './observations/judge-order.ts';
import { isFittedCheck, observationsWithFittedOrders, type FittedOrders } from './observations/fitted-orders.ts';
import type { DerivedRateLaw } from './rate-law/derive-rate-laws.ts';
import { observationValues } from './rate-law/numeric-values.ts';
import { parseQuantity, toCanonical } from './units/quantity.ts';
import { CONCENTRATION, sameDimension } from './units/dimension.ts';

/** The derivation with the record's data fitted: `fits`, observation checks and diagnostics updated. */
export function fitDerivation(
  derivation: Derivation,
  record: MechanismRecord,
  data: readonly KineticData[],
): Derivation {
  if (data.length === 0 || !derivation.mechanism) return derivation;
  const diagnostics: Diagnostic[] = [];
  const dataSets: DataSetFits[] = [];
  const fittedOrders: FittedOrders[] = [];
  const indexOf = new Map((record.observations ?? []).map((o, i) => [o.id, i]));
  for (const set of data) {
    const observationIndex = indexOf.get(set.observation) ?? 0;
    const fits: DataSetFits = { observation: set.observation, observationIndex, data: set, laws: [] };
    if (set.kind === 'initial_rates') {
      fits.orders = fitInitialRateOrders(set);
      const orders = fits.orders.orders.filter((q) => q.identifiable && fits.orders!.fit.dof >= 1);
      if (orders.length > 0)
        fittedOrders.push({
          observationIndex,
          orders: orders.map((q) => ({ species: q.name, value: q.value, halfWidth: q.interval[1] - q.value })),
          middle: middles(
            set,
            orders.map((q) => q.name),
          ),
        });
      fits.laws = fitLaws(derivation, record, set, observationIndex);
      diagnostics.push(...identifiability(fits.laws, set.observation, observationIndex));
    } else if (set.kind === 'temperature_series') {
      fits.arrhenius = fitArrhenius(set);
      fits.eyring = fitEyring(set, set.order);
      const barrier = recordedBarrier(derivation, record, set.constant);
      const comparison = barrier && compareActivation(fits.eyring, barrier);
      if (comparison) {
        fits.activation = comparison;
        const d = activationDiagnostic(comparison, set.observation, observationIndex);
        if (d) diagnostics.push(d);
      }
    } else {
      const input = timeCourseInput(derivation, record, set, observationIndex);
      if (input) {
        fits.timeCourse = fitTimeCourse(input);
        diagnostics.push(...timeCourseReliability(fits.timeCourse, set.observation, observationIndex));
      }
    }
    dataSets.push(fits);
  }
  const judged = judgeFittedOrders(derivation, record, fittedOrders, data);
  return {
    ...derivation,
    ...(judged.observations && { observations: judged.observations }),
    fits: { dataSets } satisfies RecordFits,
    diagnostics: [...judged.keep(derivation.diagnostics), ...judged.diagnostics, ...diagnostics],
  };
}

/** Each varied species' geometric mean over the table: where a power-law order fitted over the range holds. */
function middles(set: InitialRateData, species: readonly string[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const s of species) {
    const j = set.species.indexOf(s);
    const logs = set.concentrations.map((row) => Math.log(row[j]!));
    out.set(s, Number(Math.exp(logs.reduce((a, b) => a + b, 0) / logs.length).toPrecision(4)));
  }
  return out;
}

/** The fitted orders judged by the existing checks, replacing the hand-entered checks of the same species. */
function judgeFittedOrders(
  derivation: Derivation,
  record: MechanismRecord,
  fitted: readonly FittedOrders[],
  sets: readonly KineticData[],
) {
  const { rateLawContext, rateLaws, orderSymbols } = derivation;
  const none = { keep: (d: Diagnostic[]) => d, diagnostics: [] as Diagnostic[], observations: undefined };
  if (fitted.length === 0 || !rateLawContext || !rateLaws || !orderSymbols) return none;
  const merged = observationsWithFittedOrders(record, fitted);
  // Judge only the observations with fitted orders (the others keep their checks), at their own index.
  const only = merged.observations.map((o, i) =>
    fitted.some((f) => f.observationIndex === i)
      ? { ...o, orders: onlyFitted(o.orders, o.id, merged.replaced) }
      : { id: o.id },
  );
  const judged = checkObservations(
    { observations: only, status: record.status },
    rateLawContext,
    rateLaws,
    derivation.constants ?? new Map(),
    orderSymbols,
  );
  const hand = (index: number, species: string) => record.observations?.[index]?.orders?.[species] !== undefined;
  const replacedPath = (d: Diagnostic) =>
    d.rule === 'observation/order' &&
    d.path?.[0] === 'observations' &&
    d.path[2] === 'orders' &&
    merged.replaced.has(`${record.observations?.[d.path[1] as number]?.id}\u0000${d.path[3]}`);
  const chords = judged.checks.map((c) => chordCheck(c, derivation, record, fitted, sets));
  const primary = rateLaws[0]!.law.method;
  const fromFits = chords.flatMap((c) => {
    if (c.method !== primary) return [];
    const index = only.findIndex((o) => o.id === c.observation);
    const d =
      c.status === 'fail'
        ? contradiction(c, record.status, index)
        : c.status === 'pass'
          ? undefined
          : openVerdict(c, index);
    if (!d) return [];
    return hand(index, c.species) ? [d] : [{ ...d, path: ['observations', index, 'data'] }];
  });
  const observations = [
    ...(derivation.observations ?? []).filter((c) => !isFittedCheck(c, merged.replaced)),
    ...chords,
  ];
  return {
    keep: (d: Diagnostic[]) => d.filter((x) => !replacedPath(x)),
    diagnostics: [...merged.diagnostics, ...fromFits],
    observations,
  };
}

function onlyFitted(
  orders: Record<string, string | number> | undefined,
  id: string,
  replaced: ReadonlySet<string>,
): Record<string, string | number> {
  return Object.fromEntries(Object.entries(orders ?? {}).filter(([s]) => replaced.has(`${id}\u0000${s}`)));
}

/** Every rate law of the record with a normalised form, fitted in its apparent constants to the table. */
export function fitLaws(
  derivation: Derivation,
  record: MechanismRecord,
  set: InitialRateData,
  observationIndex: number,
): LawFitResult[] {
  const { rateLaws, rateLawContext, orderSymbols } = derivation;
  if (!rateLaws || !rateLawContext || !orderSymbols) return [];
  const observation = record.observations?.[observationIndex] ?? { id: set.observation };
  const fixed = observationValues(observation, observationIndex, rateLawContext).values;
  const symbolOf = (species: string) => orderSymbols.find((s) => s.species === species)?.symbol;
  // A species the table varies is read from the table, even where the observation also lists it.
  for (const s of set.species) {
    const symbol = symbolOf(s);
    if (symbol) fixed.delete(symbol);
  }
  const points = pointConcentrations(set, fixed, symbolOf);
  return rateLaws.map((derived) => fitOneLaw(derived, set, points));
}

function fitOneLaw(
  derived: DerivedRateLaw,
  set: InitialRateData,
  points: ReturnType<typeof pointConcentrations>,
): LawFitResult {
  const normalised = derived.normalised;
  const base = { method: derived.law.method, law: normalised?.text ?? '', constants: [] };
  if (!normalised)
    return { ...base, issue: { kind: 'model-failed', message: 'the law has no normalised form to fit' } };
  const known = new Map(normalised.constants.flatMap((c) => (c.value !== undefined ? [[c.name, c.value]] : [])));
  // A constant whose terms vanish at every point (an inhibitor's K with no inhibitor) is held, not fitted.
  const unseen = unseenConstants(normalised, points);
  const whole = lawFunction(normalised);
  const fn = restrictLaw(
    whole,
    whole.constants.filter((c) => !unseen.includes(c)),
    known,
  );
  const constants = normalised.constants
    .filter((c) => !unseen.includes(c.name))
    .map((c) => ({ name: c.name, unit: c.unitText, latex: c.latex }));
  const signature = [
    ...normalised.numerator.map((t) => `n:${t.concentrations.key}`),
    ...normalised.factors.flatMap((f) => f.terms.map((t) => `f${f.power}:${t.concentrations.key}`)),
  ];
  const missing = missingSymbols(fn, points);
  if (missing.length > 0)
    return {
      ...base,
      constants,
      issue: {
        kind: 'model-failed',
        message: `the law needs ${missing.join(', ')}, which neither the table nor the observation's concentrations give`,
      },
    };
  const fitted = fitLawToRates(fn, set, points, known);
  return 'issue' in fitted
    ? { ...base, constants, signature, issue: fitted.issue }
    : { ...base, constants, signature, fit: fitted };
}

/** fit/not-identifiable warnings: one per law, naming the constants these data do not determine. */
function identifiability(laws: readonly LawFitResult[], observation: string, index: number): Diagnostic[] {
  return laws.flatMap((l) => {
    const weak = l.fit?.fit.parameters.filter((p) => !p.identifiable) ?? [];
    if (weak.length === 0) return [];
    const method = l.method === 'rds' ? 'rate-determining-step' : l.method.replace('_', '-');
    return [
      diagnostic(
        'fit/not-identifiable',
        'warning',
        `observation ${observation}: the data do not determine ${weak.map((p) => p.name).join(', ')} of the ${method} law ${l.law} (${weak[0]!.identifiabilityNote})`,
        {
          path: ['observations', index, 'data'],
          note: 'measure where the term matters (for a K, concentrations around 1/K), or fit the simpler law',
        },
      ),
    ];
  });
}

/** fit/not-identifiable warnings for a time-course fit that is not to be trusted: one per model (closed form, simulation). */
function timeCourseReliability(fit: TimeCourseFit, observation: string, index: number): Diagnostic[] {
  const models = [
    ['closed-form law', fit.closedForm],
    ['mass-action simulation', fit.simulation],
  ] as const;
  return models.flatMap(([what, m]) =>
    m?.unreliable
      ? [
          diagnostic(
            'fit/not-identifiable',
            'warning',
            `observation ${observation}: the ${what} fit of the time course is unreliable: ${m.unreliable.join('; ')}`,
            {
              path: ['observations', index, 'data'],
              note: 'do not read its constants as measured; measure where the missing constants matter, or give the steps better starting constants',
            },
          ),
        ]
      : [],
  );
}

/** The barrier the record gives for a measured constant: a step's for k_label, the energetic span for k_obs. */
function recordedBarrier(
  derivation: Derivation,
  record: MechanismRecord,
  constant: string,
): RecordedBarrier | undefined {
  const mechanism = derivation.mechanism!;
  const { basis, T } = energyConditions(record).conditions;
  if (constant === 'k_obs') {
    const energy = derivation.energy;
    if (!energy || energy.schematic || energy.span === undefined) return undefined;
    return { value: energy.span * 1000, basis, T, source: 'the energetic span of the record’s profile' };
  }
  const step = mechanism.steps.find((s) => `k_${s.label}` === constant);
  if (!step) return undefined;
  const barrier = readStepEnergies(record, mechanism).energies[step.index]?.barrier;
  return barrier === undefined ? undefined : { value: barrier, basis, T, source: `the barrier of step ${step.label}` };
}

/** What a time-course fit needs: starting concentrations, the overall stoichiometry and the primary law (of any rival, on any record's observation). */
export function timeCourseInput(
  derivation: Derivation,
  record: MechanismRecord,
  set: TimeCourseData,
  index: number,
): TimeCourseInput | undefined {
  const { mechanism, overall, rateLawContext, orderSymbols } = derivation;
  if (!mechanism || !overall) return undefined;
  const observation = record.observations?.[index] ?? { id: set.observation };
  const start = new Map<string, number>();
  for (const [species, text] of Object.entries(observation.concentrations ?? {})) {
    const q = parseQuantity(text);
    if (!('error' in q) && sameDimension(q.quantity.unit.dimension, CONCENTRATION))
      start.set(species, toCanonical(q.quantity));
  }
  const stoichiometry = new Map<string, number>();
  for (const [s, c] of overall.reactants) stoichiometry.set(s, -c.toNumber());
  for (const [s, c] of overall.products) stoichiometry.set(s, c.toNumber());
  const held = new Set([...mechanism.species.values()].filter((s) => s.buffered || s.solvent).map((s) => s.symbol));
  const input: TimeCourseInput = {
    data: set,
    start,
    stoichiometry,
    mechanism,
    constants: derivation.constants ?? new Map(),
    held,
  };
  const primary = derivation.rateLaws?.[0]?.normalised;
  if (primary && rateLawContext && orderSymbols) {
    const fn = lawFunction(primary);
    const symbolOf = (species: string) => orderSymbols.find((s) => s.species === species)?.symbol;
    const conditions = observationValues(observation, index, rateLawContext).values;
    const moving = new Set([...stoichiometry.keys()].map(symbolOf));
    const fixed = new Map([...conditions].filter(([symbol]) => !moving.has(symbol)));
    // A species the observation does not list starts at zero (the record format says so) and,
    // off the overall equation (an inhibitor never added), stays there.
    for (const s of fn.symbols) if (!fixed.has(s) && !moving.has(s) && /^\[[^\]]+\]$/.test(s)) fixed.set(s, 0);
    const known = new Map(primary.constants.flatMap((c) => (c.value !== undefined ? [[c.name, c.value]] : [])));
    const definitions = new Map(primary.constants.map((c) => [c.name, c.definition]));
    const atStart = new Map(fixed);
    for (const [s] of stoichiometry) {
      const symbol = symbolOf(s);
      if (symbol && !fixed.has(symbol)) atStart.set(symbol, start.get(s) ?? 0);
    }
    const unseen = unseenConstants(primary, [atStart]);
    const steady = steadyTermConstants(primary, new Set(fixed.keys()));
    const free = fn.constants.filter((c) => !unseen.includes(c) && !steady.includes(c));
    if (fn.symbols.every((s) => fixed.has(s) || moving.has(s)))
      input.law = { fn: restrictLaw(fn, free, known), definitions, known, fixed, symbolOf };
  }
  return input;
}

/**
 * A fitted order is a chord: the slope of ln r against ln[X] over the measured range, which for a
 * law whose order changes across the range (saturation) is not the local order at any one
 * concentration. Where the record gives every constant of a law, the law's own rates at the same
 * points are fitted the same way, and that chord is the prediction the fitted order is judged by.
 */
function chordCheck(
  check: ObservationCheck,
  derivation: Derivation,
  record: MechanismRecord,
  fitted: readonly FittedOrders[],
  sets: readonly KineticData[],
): ObservationCheck {
  if (check.basis !== 'conditions') return check;
  const index = (record.observations ?? []).findIndex((o) => o.id === check.observation);
  const set = sets.find((s) => s.observation === check.observation);
  const law = derivation.rateLaws?.find((l) => l.law.method === check.method);
  if (!set || set.kind !== 'initial_rates' || !law?.normalised || !fitted.some((f) => f.observationIndex === index))
    return check;
  if (!law.normalised.constants.every((c) => c.value !== undefined)) return check;
  const symbolOf = (species: string) => derivation.orderSymbols?.find((s) => s.species === species)?.symbol;
  const observation = record.observations![index]!;
  const fixed = observationValues(observation, index, derivation.rateLawContext!).values;
  for (const s of set.species) fixed.delete(symbolOf(s) ?? '');
  const points = pointConcentrations(set, fixed, symbolOf);
  const fn = lawFunction(law.normalised);
  if (missingSymbols(fn, points).length > 0) return check;
  const values = law.normalised.constants.map((c) => c.value!);
  const rates = points.map((p) => fn.rate(values, p));
  if (!rates.every((r) => r > 0 && Number.isFinite(r))) return check;
  const chord = fitInitialRateOrders({ species: set.species, concentrations: set.concentrations, rates });
  const order = chord.orders.find((q) => q.name === check.species)?.value;
  if (order === undefined || !Number.isFinite(order)) return check;
  const predicted = Number(order.toPrecision(4));
  const status = Math.abs(predicted - check.observed) <= check.tolerance + 1e-12 ? 'pass' : 'fail';
  return { ...check, predicted, status };
}
