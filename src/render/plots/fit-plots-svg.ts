/**
 * The three plots of a fitted data set, each a self-contained SVG string: measured against fitted
 * (the measured points with each rival's fitted curve), the residuals of each rival, and the
 * log–log order plot (ln r against ln[X] with the fitted power-law slope and the band of its 95 %
 * interval). Black and grey only; rivals told apart by dash and marker, named in the legend.
 */
import type { FitPlotSeries } from '../../engine/index.ts';
import { curveStyle, markerSvg } from './curve-style.ts';
import { clipPath, drawFrame, openSvg, paddedRange, polyline, type LegendEntry } from './fit-plot-frame.ts';
import { coordinate as c, escapeXml } from './svg-text.ts';
import { numberText } from '../words/index.ts';

/** Size and the prefix of element ids (several plots share a page). */
export interface FitPlotOptions {
  idPrefix?: string;
  width?: number;
  height?: number;
}

const MEASURED = { marker: 'circle-filled' as const };

function sizes(options: FitPlotOptions) {
  return {
    width: options.width ?? 640,
    height: options.height ?? 360,
    id: (options.idPrefix ?? 'fit').replace(/[^A-Za-z0-9_-]/g, '_'),
  };
}

function xTitle(plot: FitPlotSeries): string {
  return plot.kind === 'initial_rates' ? `[${plot.x}] / M` : 't / s';
}

function heldText(plot: FitPlotSeries): string {
  const held = Object.entries(plot.heldAt ?? {});
  return held.length === 0
    ? ''
    : ` (others held at ${held.map(([s, v]) => `[${s}] = ${numberText(v, 3)} M`).join(', ')})`;
}

/** Measured points and each rival's fitted curve. */
export function fittedCurvesSvg(plot: FitPlotSeries, options: FitPlotOptions = {}): string {
  const { width, height, id } = sizes(options);
  const rates = plot.kind === 'initial_rates';
  const rivals = [...new Set(plot.curves.map((k) => k.record))];
  const xs = [...plot.observed.map((p) => p.x), ...plot.curves.flatMap((k) => k.points.map(([x]) => x))];
  const ys = [...plot.observed.map((p) => p.y), ...plot.curves.flatMap((k) => k.points.map(([, y]) => y))];
  const xAxis = { ...range(xs, rates), log: rates, title: xTitle(plot) };
  const yAxis = { ...range(ys, rates), log: rates, title: rates ? 'initial rate / M s⁻¹' : 'concentration / M' };
  const series = plot.y.length > 1 ? (j: number) => ` ${plot.y[j]}` : () => '';
  const legend: LegendEntry[] = [
    ...plot.y.map((_, j) => ({ label: `measured${series(j)}`, style: { marker: markerOf(j) }, markerOnly: true })),
    // A time course's curves are drawn through the measured times, so their markers would hide the points.
    ...rivals.map((r, i) => ({ label: r, style: curveStyle(i + 1), lineOnly: !rates })),
  ];
  const title = `Measured ${rates ? 'initial rates' : 'concentrations'} of ${plot.y.join(', ')} against ${xTitle(plot)} with each rival's fitted ${rates ? 'rate law' : 'curve'}${heldText(plot)}`;
  const frame = drawFrame(width, height, xAxis, yAxis, legend);
  const clip = `${id}-clip`;
  const out = [...openSvg(width, height, title), clipPath(clip, frame.box), ...frame.svg];
  plot.curves.forEach((k) => {
    const style = curveStyle(rivals.indexOf(k.record) + 1);
    out.push(
      polyline(
        k.points.map(([x, y]) => [frame.x(x), frame.y(y)]),
        style,
        clip,
      ),
    );
  });
  for (const p of plot.observed) out.push(markerSvg(markerOf(p.series), frame.x(p.x), frame.y(p.y)));
  out.push('</svg>');
  return out.filter(Boolean).join('\n');
}

/** Each rival's residuals, with the zero line. */
export function residualsSvg(plot: FitPlotSeries, options: FitPlotOptions = {}): string {
  const { width, height } = sizes(options);
  const rates = plot.kind === 'initial_rates';
  const xs = plot.residuals.flatMap((r) => r.points.map(([x]) => x));
  const ys = [0, ...plot.residuals.flatMap((r) => r.points.map(([, y]) => y))];
  const xAxis = { ...range(xs, rates), log: rates, title: xTitle(plot) };
  const yAxis = {
    ...range(ys, false),
    log: false,
    title: rates ? 'residual of ln r (measured − fitted)' : 'residual / M (measured − fitted)',
  };
  const legend = plot.residuals.map((r, i) => ({ label: r.record, style: curveStyle(i + 1), markerOnly: true }));
  const title = `Residuals of each rival's fit against ${xTitle(plot)}: points scattered evenly about zero mean a fit without a trend left`;
  const frame = drawFrame(width, height, xAxis, yAxis, legend);
  const out = [...openSvg(width, height, title), ...frame.svg];
  out.push(
    `<line x1="${frame.box.left}" y1="${c(frame.y(0))}" x2="${frame.box.right}" y2="${c(frame.y(0))}" stroke="#000" stroke-width="0.8" stroke-dasharray="3 3"/>`,
  );
  plot.residuals.forEach((r, i) => {
    // Rivals side by side at each x, a few pixels apart, so equal residuals do not hide each other.
    const shift = (i - (plot.residuals.length - 1) / 2) * 5;
    for (const [x, y] of r.points)
      if (Number.isFinite(y)) out.push(markerSvg(curveStyle(i + 1).marker, frame.x(x) + shift, frame.y(y)));
  });
  out.push('</svg>');
  return out.join('\n');
}

/** ln r against ln[X] with the fitted power-law order and the band of its 95 % interval; undefined without an order. */
export function orderPlotSvg(plot: FitPlotSeries, options: FitPlotOptions = {}): string | undefined {
  const line = plot.orderLine;
  if (!line || plot.kind !== 'initial_rates') return undefined;
  const { width, height, id } = sizes(options);
  const [lo, hi] = line.range;
  const at = (x: number, slope: number) => Math.exp(line.lnRMiddle + slope * (Math.log(x) - line.lnXMiddle));
  const ends = [lo, hi].flatMap((x) => [at(x, line.slope - line.halfWidth), at(x, line.slope + line.halfWidth)]);
  const xAxis = { lo, hi, log: true, title: xTitle(plot) };
  const yAxis = {
    ...range([...plot.observed.map((p) => p.y), ...ends], true),
    log: true,
    title: 'initial rate / M s⁻¹',
  };
  const order = `order ${numberText(line.slope, 3)} ± ${numberText(line.halfWidth, 2)} (95 %)`;
  const legend: LegendEntry[] = [
    { label: 'measured', style: MEASURED, markerOnly: true },
    { label: `fitted slope: ${order}`, style: { marker: 'square' }, lineOnly: true },
    { label: 'slope within its 95 % interval', band: true },
  ];
  const title = `Log–log plot of the initial rate against [${plot.x}]: fitted ${order}${heldText(plot)}`;
  const frame = drawFrame(width, height, xAxis, yAxis, legend);
  const clip = `${id}-order-clip`;
  const grid = Array.from({ length: 24 }, (_, g) => lo * Math.pow(hi / lo, g / 23));
  const upper = grid.map((x) => [
    frame.x(x),
    frame.y(Math.max(at(x, line.slope - line.halfWidth), at(x, line.slope + line.halfWidth))),
  ]);
  const lower = grid.map((x) => [
    frame.x(x),
    frame.y(Math.min(at(x, line.slope - line.halfWidth), at(x, line.slope + line.halfWidth))),
  ]);
  const band = [...upper, ...lower.reverse()]
    .map(([px, py], i) => `${i === 0 ? 'M' : 'L'}${c(px!)},${c(py!)}`)
    .join(' ');
  const out = [...openSvg(width, height, title), clipPath(clip, frame.box), ...frame.svg];
  out.push(`<path d="${band} Z" fill="#d9d9d9" stroke="none" clip-path="url(#${clip})"/>`);
  out.push(
    polyline(
      grid.map((x) => [frame.x(x), frame.y(at(x, line.slope))]),
      { marker: 'square' },
      clip,
    ),
  );
  for (const p of plot.observed) out.push(markerSvg(MEASURED.marker, frame.x(p.x), frame.y(p.y)));
  out.push(
    `<text x="${frame.box.right - 6}" y="${frame.box.bottom - 8}" text-anchor="end" font-style="italic">${escapeXml(`slope ${numberText(line.slope, 3)}`)}</text>`,
  );
  out.push('</svg>');
  return out.join('\n');
}

function range(values: readonly number[], log: boolean): { lo: number; hi: number } {
  const [lo, hi] = paddedRange(values, log);
  return { lo, hi };
}

function markerOf(series: number) {
  return (['circle-filled', 'diamond', 'triangle-filled', 'square'] as const)[series % 4]!;
}
