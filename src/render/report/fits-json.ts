/**
 * The JSON report's `fits` of one record, built from its derivation's fits and its system's data
 * sets (every rival fitted and ranked). Plain numbers, snake_case keys; nothing is computed here
 * beyond unit changes for display (kJ/mol).
 */
import type {
  ArrheniusFit,
  DataSetFits,
  Derivation,
  EyringFit,
  FittedParameter,
  LawFitResult,
  NonlinearFit,
  SystemDataSet,
  TimeCourseModelFit,
} from '../../engine/index.ts';
import type {
  ActivationFitsJson,
  DataSetFitsJson,
  FittedValueJson,
  RecordFitsJson,
  RivalFitJson,
} from '../../model/index.ts';

/** The `fits` section, or undefined for a record without data in its system. */
export function fitsJson(
  id: string,
  derivation: Derivation | undefined,
  systemFits: readonly SystemDataSet[] | undefined,
): RecordFitsJson | undefined {
  const own = derivation?.fits?.dataSets ?? [];
  const out: RecordFitsJson = {};
  const orders = own.flatMap((d) =>
    (d.orders?.orders ?? []).map((q) => ({ observation: d.observation, species: q.name, ...valueJson(q) })),
  );
  if (orders.length > 0) out.orders = orders;
  const sets = (systemFits ?? []).filter((s) => s.fits.some((f) => f.record === id)).map(systemDataSetJson);
  // Without its system (one record derived alone) the record's own fits stand for the data sets.
  if (!systemFits) sets.push(...own.filter((d) => d.data.kind !== 'temperature_series').map((d) => ownDataSet(id, d)));
  if (sets.length > 0) out.data_sets = sets;
  const activation = own.flatMap((d) => (d.arrhenius && d.eyring ? [activationJson(d, d.arrhenius, d.eyring)] : []));
  if (activation.length > 0) out.activation = activation;
  return Object.keys(out).length > 0 ? out : undefined;
}

/** A fitted parameter in the report's shape (kJ/mol where `scale` is 1e-3). */
export function valueJson(q: FittedParameter, scale = 1, unit?: string): FittedValueJson {
  return {
    name: q.name,
    value: q.value * scale,
    standard_error: q.standardError * scale,
    interval: [q.interval[0] * scale, q.interval[1] * scale],
    identifiable: q.identifiable,
    ...(unit && { unit }),
    ...(q.identifiabilityNote && { note: q.identifiabilityNote }),
  };
}

/** One data set of a system, every rival fitted and ranked, in the report's shape. */
export function systemDataSetJson(set: SystemDataSet): DataSetFitsJson {
  const rank = new Map(set.ranking.rivals.map((r) => [r.record, r]));
  const rivals = set.fits.flatMap((f): RivalFitJson[] => {
    const r = rank.get(f.record);
    const ranked = (method: string) =>
      r && r.method === method
        ? { weight: r.weight, delta_aicc: r.deltaAicc, ...(r.rejected && { rejected: true }) }
        : {};
    const laws = f.laws.map((l) => ({ ...lawJson(f.record, l), ...ranked(l.method) }));
    const tc = f.timeCourse;
    const courses: RivalFitJson[] = [];
    if (tc?.simulation)
      courses.push({
        ...modelJson(f.record, 'simulation', tc.simulation),
        fixed: Object.fromEntries(tc.simulation.fixed.map((x) => [x.name, x.value])),
        ...ranked('simulation'),
      });
    if (tc?.closedForm) courses.push({ ...modelJson(f.record, 'closed_form', tc.closedForm) });
    if (tc && !tc.simulation && !tc.closedForm)
      courses.push({ ...emptyFit(f.record, 'simulation'), issue: tc.issues.map((i) => i.message).join('; ') });
    return [...laws, ...courses];
  });
  const best = set.ranking.rivals[0];
  const out: DataSetFitsJson = {
    observation: set.observation,
    record: set.owner,
    kind: set.data.kind,
    points: pointsOf(set.data),
    rivals,
  };
  if (best) out.favoured = { record: best.record, weight: best.weight };
  if (set.drivers.length > 0) out.drivers = set.drivers;
  const tests = set.ranking.fTests.filter((t) => t.test.valid);
  if (tests.length > 0)
    out.f_tests = tests.map((t) => ({
      simpler: `${t.simpler.record} (${t.simpler.method})`,
      complex: `${t.complex.record} (${t.complex.method})`,
      f: t.test.f,
      df1: t.test.df1,
      df2: t.test.df2,
      p_value: t.test.pValue,
    }));
  if (set.next)
    out.next_measurement = {
      symbol: set.next.symbol,
      concentration_m: set.next.concentration,
      range_m: set.next.range,
      rivals: set.next.rivals,
      separation_sigma: Number(set.next.separation.toPrecision(3)),
      rates_m_per_s: set.next.rates,
    };
  return out;
}

function ownDataSet(id: string, d: DataSetFits): DataSetFitsJson {
  return {
    ...systemDataSetJson({
      observation: d.observation,
      owner: id,
      data: d.data,
      fits: [],
      drivers: [],
      ranking: { rivals: [], fTests: [] },
    }),
    rivals: [
      ...d.laws.map((l) => lawJson(id, l)),
      ...(d.timeCourse?.simulation ? [modelJson(id, 'simulation', d.timeCourse.simulation)] : []),
      ...(d.timeCourse?.closedForm ? [modelJson(id, 'closed_form', d.timeCourse.closedForm)] : []),
    ],
  };
}

function pointsOf(data: DataSetFits['data']): number {
  return data.kind === 'initial_rates'
    ? data.rates.length
    : data.kind === 'time_course'
      ? data.times.length
      : data.T.length;
}

function emptyFit(record: string, method: string): RivalFitJson {
  return { record, method, parameters: [], converged: false };
}

function lawJson(record: string, l: LawFitResult): RivalFitJson {
  if (!l.fit) return { ...emptyFit(record, l.method), law: l.law, ...(l.issue && { issue: l.issue.message }) };
  const units = new Map(l.constants.map((c) => [c.name, c.unit]));
  return {
    ...fitJson(record, l.method, l.fit.fit, l.fit.criteria, units),
    law: l.law,
  };
}

function modelJson(record: string, method: string, m: TimeCourseModelFit): RivalFitJson {
  return {
    ...fitJson(record, method, m.fit, m.criteria, new Map()),
    ...(m.unreliable && { unreliable: m.unreliable.join('; ') }),
  };
}

function fitJson(
  record: string,
  method: string,
  fit: NonlinearFit,
  criteria: { aicc: number; bic: number },
  units: ReadonlyMap<string, string>,
): RivalFitJson {
  const issues = fit.issues.filter((i) => i.kind !== 'not-identifiable').map((i) => i.message);
  return {
    record,
    method,
    parameters: fit.parameters.map((q) => valueJson(q, 1, units.get(q.name))),
    rss: fit.rss,
    points: fit.n,
    aicc: criteria.aicc,
    bic: criteria.bic,
    converged: fit.converged,
    ...(fit.parameters.length > 1 && { correlation: fit.correlation }),
    ...(issues.length > 0 && { issue: issues.join('; ') }),
  };
}

function activationJson(d: DataSetFits, arrhenius: ArrheniusFit, eyring: EyringFit): ActivationFitsJson {
  const kj = 1e-3;
  const data = d.data as Extract<DataSetFits['data'], { kind: 'temperature_series' }>;
  const out: ActivationFitsJson = {
    observation: d.observation,
    constant: data.constant,
    order: data.order,
    points: data.T.length,
    arrhenius: {
      ea_kj_per_mol: valueJson(arrhenius.activationEnergy, kj, 'kJ/mol'),
      ln_a: valueJson(arrhenius.lnPreExponential),
      correlation: arrhenius.correlation,
    },
    eyring: {
      dh_kj_per_mol: valueJson(eyring.enthalpy, kj, 'kJ/mol'),
      ds_j_per_mol_k: valueJson(eyring.entropy, 1, 'J/(mol K)'),
      dg_kj_per_mol: valueJson(eyring.gibbs, kj, 'kJ/mol'),
      reference_temperature_k: eyring.referenceTemperature,
      standard_concentration_m: eyring.standardConcentration,
      correlation: eyring.correlation,
    },
  };
  if (d.activation)
    out.recorded = {
      quantity: d.activation.quantity,
      value_kj_per_mol: d.activation.recorded * kj,
      source: d.activation.source,
      agrees: d.activation.agrees,
    };
  return out;
}
