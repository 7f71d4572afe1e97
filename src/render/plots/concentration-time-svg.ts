/**
 * Concentration–time curves of a simulation as a self-contained SVG string, on a linear or a log
 * time axis. Black only, each curve with its own dash pattern and markers and named both in the
 * legend and at its end, so it reads in black-and-white print; pure and deterministic.
 */
import type { ConcentrationSeries } from '../../engine/index.ts';
import { captionLines, curveName, endLabels, legend } from './concentration-time-labels.ts';
import { layoutTimePlot, selectCurves, type PlottedCurve, type TimePlotLayout } from './concentration-time-layout.ts';
import { markerSvg, strokeAttributes } from './curve-style.ts';
import type { ConcentrationUnit } from './concentration-scale.ts';
import { coordinate as c, escapeXml } from './svg-text.ts';

/** Axis type, size, ids and title of the drawing. */
export interface ConcentrationTimeSvgOptions {
  /** logarithmic time axis, so fast transients show beside the slow conversion (default false) */
  logTime?: boolean;
  /** accessible title; by default a sentence describing the plot */
  title?: string;
  /** prefix of element ids, so several plots can share one page (letters, digits, - and _) */
  idPrefix?: string;
  width?: number;
  height?: number;
  /** the concentration axis in this unit (the record's own) instead of the M-family unit that fits */
  unit?: ConcentrationUnit;
}

const MARKERS_PER_CURVE = 5;

/** Draws the series as an SVG document string; a series that failed gives a frame with its message. */
export function concentrationTimeSvg(series: ConcentrationSeries, options: ConcentrationTimeSvgOptions = {}): string {
  const width = options.width ?? 720;
  const height = options.height ?? 400;
  const id = (options.idPrefix ?? 'concentration-time').replace(/[^A-Za-z0-9_-]/g, '_');
  const logTime = options.logTime ?? false;
  const chosen = selectCurves(series);
  const left = 72;
  const right = width - 104;
  const drawnLegend = legend(chosen.curves, left, width - 12, 18);
  const top = 18 + drawnLegend.rows * 16 + 4;
  const layout0 = layoutTimePlot(series, chosen, { left, right, top, bottom: height - 44 }, logTime, options.unit);
  const caption = captionLines(series, layout0, Math.floor((width - left) / 5.4));
  const layout = layoutTimePlot(
    series,
    chosen,
    { left, right, top, bottom: height - 44 - 13 * caption.length },
    logTime,
    options.unit,
  );
  const title = options.title ?? describe(series, layout, logTime);
  const open = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(title)}" font-family="Helvetica, Arial, sans-serif" font-size="11" fill="#111">`;
  if (series.status !== 'ok' || series.times.length < 2 || layout.curves.length === 0) {
    const why =
      series.message ?? (series.status === 'ok' ? 'nothing changes in this simulation' : `simulation ${series.status}`);
    return [
      open,
      `<title>${escapeXml(title)}</title>`,
      frameBox(layout),
      `<text x="${c((left + right) / 2)}" y="${c((layout.frame.top + layout.frame.bottom) / 2)}" text-anchor="middle" font-style="italic">${escapeXml(why)}</text>`,
      '</svg>',
    ].join('\n');
  }
  const { frame } = layout;
  const clip = `${id}-frame`;
  const paths = layout.curves.map((curve) => pixelPoints(layout, series.times, curve));
  return [
    open,
    `<title>${escapeXml(title)}</title>`,
    `<defs><clipPath id="${clip}"><rect x="${c(frame.left - 5)}" y="${c(frame.top - 5)}" width="${c(frame.right - frame.left + 10)}" height="${c(frame.bottom - frame.top + 10)}"/></clipPath></defs>`,
    ...grid(layout),
    ...axes(layout),
    `<g clip-path="url(#${clip})">`,
    ...layout.curves.map((curve, i) => curveGroup(curve, paths[i]!, i, layout)),
    '</g>',
    ...endLabels(
      layout,
      paths.map((p) => p[p.length - 1]?.[1] ?? frame.bottom),
    ),
    ...drawnLegend.svg,
    ...caption.map(
      (line, k) =>
        `<text x="${c(left)}" y="${c(frame.bottom + 46 + 13 * k)}" font-size="10" font-style="italic">${escapeXml(line)}</text>`,
    ),
    '</svg>',
  ].join('\n');
}

/** The curve's points in pixels from the first drawn time, dropping points within 0.7 px of the last kept one. */
function pixelPoints(layout: TimePlotLayout, times: readonly number[], curve: PlottedCurve): [number, number][] {
  const scale = 10 ** curve.exponent;
  const out: [number, number][] = [];
  for (let k = layout.firstIndex; k < times.length; k++) {
    const point: [number, number] = [layout.x(times[k]!), layout.y(curve.values[k]! * scale)];
    const last = out[out.length - 1];
    if (last && k < times.length - 1 && Math.abs(point[0] - last[0]) < 0.7 && Math.abs(point[1] - last[1]) < 0.7)
      continue;
    out.push(point);
  }
  return out;
}

function curveGroup(curve: PlottedCurve, points: [number, number][], index: number, layout: TimePlotLayout): string {
  const d = points.map(([x, y], k) => `${k === 0 ? 'M' : 'L'}${c(x)},${c(y)}`).join(' ');
  const { left, right } = layout.frame;
  // Markers staggered between curves, so that curves lying on top of each other still show theirs.
  const n = layout.curves.length;
  const marks = Array.from(
    { length: MARKERS_PER_CURVE },
    (_, k) => left + ((k + (index + 1) / (n + 1)) / MARKERS_PER_CURVE) * (right - left),
  ).map((x) => markerSvg(curve.style.marker, x, yAt(points, x)));
  const name = `${curveName(curve, 200).text}${curve.role ? ` (${curve.role.replace('_', ' ')})` : ''}`;
  return `<g data-species="${escapeXml(curve.species)}"><title>${escapeXml(name)}</title><path d="${d}" ${strokeAttributes(curve.style)}/>${marks.join('')}</g>`;
}

/** Linear interpolation of a polyline at x (points in increasing x). */
function yAt(points: readonly [number, number][], x: number): number {
  const after = points.findIndex(([px]) => px >= x);
  if (after <= 0) return points[Math.max(0, after)]?.[1] ?? 0;
  const [x0, y0] = points[after - 1]!;
  const [x1, y1] = points[after]!;
  return x1 === x0 ? y1 : y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

function frameBox(layout: TimePlotLayout): string {
  const { left, right, top, bottom } = layout.frame;
  return `<rect x="${c(left)}" y="${c(top)}" width="${c(right - left)}" height="${c(bottom - top)}" fill="none" stroke="#000" stroke-width="1"/>`;
}

function grid(layout: TimePlotLayout): string[] {
  const { left, right, top, bottom } = layout.frame;
  const line = (x1: number, y1: number, x2: number, y2: number) =>
    `<line x1="${c(x1)}" y1="${c(y1)}" x2="${c(x2)}" y2="${c(y2)}" stroke="#ddd" stroke-width="0.8"/>`;
  return [
    ...layout.timeTicks.major.map((t) => line(layout.x(t.value), top, layout.x(t.value), bottom)),
    ...layout.concentrationTicks.slice(1).map((t) => line(left, layout.y(t.value), right, layout.y(t.value))),
  ];
}

function axes(layout: TimePlotLayout): string[] {
  const { left, right, top, bottom } = layout.frame;
  const mid = (top + bottom) / 2;
  const tick = (x1: number, y1: number, x2: number, y2: number) =>
    `<line x1="${c(x1)}" y1="${c(y1)}" x2="${c(x2)}" y2="${c(y2)}" stroke="#000" stroke-width="1"/>`;
  return [
    frameBox(layout),
    ...layout.timeTicks.major.flatMap((t) => [
      tick(layout.x(t.value), bottom, layout.x(t.value), bottom + 5),
      `<text x="${c(layout.x(t.value))}" y="${c(bottom + 17)}" text-anchor="middle" font-size="10">${escapeXml(t.label)}</text>`,
    ]),
    ...layout.timeTicks.minor.map((v) => tick(layout.x(v), bottom, layout.x(v), bottom + 3)),
    ...layout.concentrationTicks.flatMap((t) => [
      tick(left - 5, layout.y(t.value), left, layout.y(t.value)),
      `<text x="${c(left - 8)}" y="${c(layout.y(t.value) + 3.5)}" text-anchor="end" font-size="10">${escapeXml(t.label)}</text>`,
    ]),
    `<text x="18" y="${c(mid)}" text-anchor="middle" font-size="12" transform="rotate(-90 18 ${c(mid)})">${escapeXml(layout.concentrationLabel)}</text>`,
    `<text x="${c((left + right) / 2)}" y="${c(bottom + 32)}" text-anchor="middle" font-size="12">${escapeXml(layout.timeLabel)}</text>`,
  ];
}

function describe(series: ConcentrationSeries, layout: TimePlotLayout, logTime: boolean): string {
  if (series.status !== 'ok') return `No concentration–time curves: ${series.message ?? series.status}`;
  const names = layout.curves.map((curve) => curveName(curve, 200).text).join(', ');
  return `Simulated concentrations against time${logTime ? ' (log time axis)' : ''} for observation ${series.observation ?? '?'}: ${names}`;
}
