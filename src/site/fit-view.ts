/**
 * The fits of a reaction system as its page shows them: per data set, the plain sentence of which
 * rival the data favour and the runs that drive it, each rival's fitted constants and criteria in
 * a table, the next measurement, and the three plots (measured against fitted, residuals, the
 * log–log order plot) drawn at build time. Everything comes from the JSON report's shape of the
 * fits and the engine's plot series; nothing is fitted here.
 */
import type { SystemDataSet } from '../catalogue/index.ts';
import {
  favouredSentence,
  fittedCurvesSvg,
  numberText,
  orderPlotSvg,
  residualsSvg,
  valueText,
  weightText,
} from '../render/index.ts';
import { systemDataSetJson } from '../render/index.ts';

/** One row of a data set's fit table. */
export interface FitRow {
  record: string;
  method: string;
  law?: string;
  parameters: string[];
  rss?: string;
  aicc?: string;
  bic?: string;
  weight?: string;
  rejected: boolean;
  issue?: string;
}

/** One data set of a system page. */
export interface SystemFitView {
  observation: string;
  owner: string;
  kind: string;
  points: number;
  sentence?: string;
  next?: string;
  rows: FitRow[];
  curvesSvg?: string;
  residualsSvg?: string;
  orderSvg?: string;
}

/** The fits views of a system's data sets. */
export function systemFitViews(sets: readonly SystemDataSet[] | undefined): SystemFitView[] {
  return (sets ?? []).map((set, k) => {
    const json = systemDataSetJson(set);
    const view: SystemFitView = {
      observation: set.observation,
      owner: set.owner,
      kind: set.data.kind.replace('_', ' '),
      points: json.points,
      rows: json.rivals.map((r) => ({
        record: r.record,
        method: r.method.replace('_', ' '),
        ...(r.law && { law: r.law }),
        parameters: r.parameters.map(valueText),
        ...(r.rss !== undefined && { rss: numberText(r.rss, 3) }),
        ...(r.aicc !== undefined && { aicc: numberText(r.aicc, 4) }),
        ...(r.bic !== undefined && { bic: numberText(r.bic, 4) }),
        ...(r.weight !== undefined && { weight: weightText(r.weight) }),
        rejected: r.rejected === true,
        ...((r.issue || r.unreliable) && {
          issue: [r.unreliable && `Unreliable fit: ${r.unreliable}`, r.issue].filter(Boolean).join('; '),
        }),
      })),
    };
    const sentence = favouredSentence(json);
    if (sentence) view.sentence = sentence;
    const n = json.next_measurement;
    if (n)
      view.next = `To tell ${n.rivals[0]} from ${n.rivals[1]}, measure at ${n.symbol} = ${numberText(n.concentration_m, 2)} M (searched ${numberText(n.range_m[0], 2)} to ${numberText(n.range_m[1], 2)} M): their predicted rates differ there by ${numberText(n.separation_sigma, 2)} times the scatter of these data.`;
    if (set.plot) {
      const idPrefix = `fit-${k}`;
      view.curvesSvg = fittedCurvesSvg(set.plot, { idPrefix });
      view.residualsSvg = residualsSvg(set.plot, { idPrefix });
      const order = orderPlotSvg(set.plot, { idPrefix });
      if (order) view.orderSvg = order;
    }
    return view;
  });
}
