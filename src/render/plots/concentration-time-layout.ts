/**
 * Where everything of a concentration–time plot goes: which species get a curve (in the order
 * reactants, catalyst, intermediates, inhibitors, products), their magnification and style, the
 * frame, and the two axes with their ticks. Species held constant, or constant anyway (a third
 * body), and species absent throughout get no curve; the caption names them.
 */
import type { Role } from '../../model/index.ts';
import type { ConcentrationSeries } from '../../engine/index.ts';
import { niceTicks } from './axis-ticks.ts';
import { concentrationUnit, magnificationExponent, type ConcentrationUnit } from './concentration-scale.ts';
import { curveStyle, type CurveStyle } from './curve-style.ts';
import { linearTicks, logTicks, tickLabel, timeUnit, type AxisTicks, type Tick } from './time-axis.ts';

/** One species drawn as a curve. */
export interface PlottedCurve {
  species: string;
  role?: Role;
  /** concentrations / M at the series' times */
  values: number[];
  /** drawn 10^exponent times larger than the axis says */
  exponent: number;
  style: CurveStyle;
}

/** Positions and axes of the drawing. */
export interface TimePlotLayout {
  frame: { left: number; right: number; top: number; bottom: number };
  curves: PlottedCurve[];
  /** species not drawn: held or unchanging, and absent throughout */
  constant: string[];
  absent: string[];
  /** index of the first time drawn (t = 0 has no place on a log axis) */
  firstIndex: number;
  /** x of a time in s, y of a magnified concentration in M */
  x: (t: number) => number;
  y: (molar: number) => number;
  /** tick values in s (time) and M (concentration) */
  timeTicks: AxisTicks;
  concentrationTicks: Tick[];
  timeLabel: string;
  concentrationLabel: string;
  unit: ConcentrationUnit;
}

const ROLE_ORDER: Partial<Record<Role, number>> = {
  reactant: 0,
  catalyst: 1,
  intermediate: 2,
  inhibitor: 3,
  product: 4,
};

/** Chooses the curves of a series; the frame's top and bottom come from the legend and caption sizes. */
export function selectCurves(series: ConcentrationSeries): {
  curves: PlottedCurve[];
  constant: string[];
  absent: string[];
} {
  const constant: string[] = [];
  const absent: string[] = [];
  const kept: Omit<PlottedCurve, 'exponent' | 'style'>[] = [];
  series.species.forEach((species, i) => {
    const values = series.values[i] ?? [];
    const peak = Math.max(0, ...values);
    const low = Math.min(...values);
    if (!(peak > 0)) absent.push(species);
    else if (series.held[i] || peak - low <= 1e-9 * peak) constant.push(species);
    else kept.push(Object.assign({ species, values }, series.roles[i] && { role: series.roles[i] }));
  });
  const rank = (c: { role?: Role }) => (c.role ? (ROLE_ORDER[c.role] ?? 5) : 5);
  kept.sort((a, b) => rank(a) - rank(b));
  const tallest = Math.max(0, ...kept.map((c) => Math.max(...c.values)));
  const curves = kept.map((c, i) => ({
    ...c,
    exponent: magnificationExponent(Math.max(...c.values), tallest),
    style: curveStyle(i),
  }));
  return { curves, constant, absent };
}

/** Lays out the axes for the chosen curves inside the given frame. */
export function layoutTimePlot(
  series: ConcentrationSeries,
  chosen: ReturnType<typeof selectCurves>,
  frame: TimePlotLayout['frame'],
  logTime: boolean,
  fixedUnit?: ConcentrationUnit,
): TimePlotLayout {
  const { times } = series;
  const end = times[times.length - 1] ?? 1;
  const firstIndex = logTime
    ? Math.max(
        0,
        times.findIndex((t) => t > 0),
      )
    : 0;
  const start = logTime ? (times[firstIndex] ?? end / 1e3) : 0;
  const span = frame.right - frame.left;
  const x = logTime
    ? (t: number) => frame.left + (Math.log10(Math.max(t, start) / start) / Math.log10(end / start)) * span
    : (t: number) => frame.left + (t / end) * span;
  const unitOfTime = timeUnit(end);
  const timeTicks = logTime
    ? logTicks(start, end)
    : scaleTicks(linearTicks(end / unitOfTime.seconds), unitOfTime.seconds);

  const tallest = Math.max(0, ...chosen.curves.map((c) => Math.max(...c.values) * 10 ** c.exponent));
  const unit = fixedUnit ?? concentrationUnit(tallest);
  const shown = niceTicks(0, tallest * unit.perMolar, 5);
  const step = shown.length > 1 ? shown[1]! - shown[0]! : tallest * unit.perMolar || 1;
  // A little headroom, so that no curve runs along the top of the frame.
  const topValue = Math.max(step, Math.ceil((1.04 * tallest * unit.perMolar) / step - 1e-9) * step);
  const ticks = niceTicks(0, topValue, 5).map((v) => ({ value: v / unit.perMolar, label: tickLabel(v, step) }));
  const y = (molar: number) => frame.bottom - ((molar * unit.perMolar) / topValue) * (frame.bottom - frame.top);
  return {
    frame,
    ...chosen,
    firstIndex,
    x,
    y,
    timeTicks,
    concentrationTicks: ticks,
    timeLabel: `time / ${logTime ? 's' : unitOfTime.unit}`,
    concentrationLabel: `concentration / ${unit.symbol}`,
    unit,
  };
}

function scaleTicks(ticks: AxisTicks, seconds: number): AxisTicks {
  return {
    major: ticks.major.map((t) => ({ value: t.value * seconds, label: t.label })),
    minor: ticks.minor.map((v) => v * seconds),
  };
}
