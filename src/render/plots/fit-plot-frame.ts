/**
 * The frame of a fit plot: linear or logarithmic axes (decades labelled 10ⁿ), ticks, axis titles
 * with units, and a legend of curve styles in rows above the frame. Black on white, so it reads in
 * print; pure and deterministic.
 */
import { niceTicks } from './axis-ticks.ts';
import { powerOfTen } from './time-axis.ts';
import { markerSvg, strokeAttributes, type CurveStyle } from './curve-style.ts';
import { coordinate as c, escapeXml } from './svg-text.ts';
import { numberText } from '../words/index.ts';

/** One axis: its data range, whether logarithmic, and its title (with the unit). */
export interface Axis {
  lo: number;
  hi: number;
  log: boolean;
  title: string;
}

/** A legend entry: a curve style, a marker only, or a grey band. */
export interface LegendEntry {
  label: string;
  style?: CurveStyle;
  markerOnly?: boolean;
  /** a line without its marker */
  lineOnly?: boolean;
  band?: boolean;
}

/** The frame drawn, and the mapping from data to pixels. */
export interface Frame {
  svg: string[];
  x(v: number): number;
  y(v: number): number;
  box: { left: number; right: number; top: number; bottom: number };
}

/** Pads a range so points do not sit on the frame; a log range must be positive. */
export function paddedRange(values: readonly number[], log: boolean): [number, number] {
  const finite = values.filter((v) => Number.isFinite(v) && (!log || v > 0));
  if (finite.length === 0) return log ? [0.1, 10] : [-1, 1];
  let [lo, hi] = [Math.min(...finite), Math.max(...finite)];
  if (log) return lo === hi ? [lo / 3, hi * 3] : [lo / Math.pow(hi / lo, 0.05), hi * Math.pow(hi / lo, 0.05)];
  if (lo === hi) [lo, hi] = [lo - Math.abs(lo || 1) * 0.5, hi + Math.abs(hi || 1) * 0.5];
  const pad = (hi - lo) * 0.06;
  return [lo - pad, hi + pad];
}

/** Draws the axes and legend and returns the mapping. */
export function drawFrame(width: number, height: number, xAxis: Axis, yAxis: Axis, legend: LegendEntry[]): Frame {
  const svg: string[] = [];
  const perRow = Math.max(1, Math.floor((width - 80) / 270));
  const rows = Math.ceil(legend.length / perRow);
  const box = { left: 78, right: width - 16, top: 14 + rows * 16 + 6, bottom: height - 46 };
  const scale = (axis: Axis, a: number, b: number) => {
    const f = (v: number) => (axis.log ? Math.log10(v) : v);
    const [l, h] = [f(axis.lo), f(axis.hi)];
    return (v: number) => a + ((f(v) - l) / (h - l || 1)) * (b - a);
  };
  const x = scale(xAxis, box.left, box.right);
  const y = scale(yAxis, box.bottom, box.top);
  svg.push(
    `<rect x="${box.left}" y="${box.top}" width="${c(box.right - box.left)}" height="${c(box.bottom - box.top)}" fill="none" stroke="#000" stroke-width="1"/>`,
  );
  for (const t of ticks(xAxis)) {
    const px = c(x(t));
    svg.push(`<line x1="${px}" y1="${box.bottom}" x2="${px}" y2="${box.bottom + 4}" stroke="#000"/>`);
    svg.push(`<text x="${px}" y="${box.bottom + 16}" text-anchor="middle">${tickLabel(t, xAxis.log)}</text>`);
  }
  for (const t of ticks(yAxis)) {
    const py = c(y(t));
    svg.push(`<line x1="${box.left - 4}" y1="${py}" x2="${box.left}" y2="${py}" stroke="#000"/>`);
    svg.push(`<text x="${box.left - 7}" y="${c(y(t) + 4)}" text-anchor="end">${tickLabel(t, yAxis.log)}</text>`);
  }
  svg.push(
    `<text x="${c((box.left + box.right) / 2)}" y="${height - 12}" text-anchor="middle" class="axis-title">${escapeXml(xAxis.title)}</text>`,
    `<text transform="translate(16 ${c((box.top + box.bottom) / 2)}) rotate(-90)" text-anchor="middle" class="axis-title">${escapeXml(yAxis.title)}</text>`,
  );
  legend.forEach((entry, i) => {
    const lx = 80 + (i % perRow) * 270;
    const ly = 14 + Math.floor(i / perRow) * 16;
    if (entry.band) svg.push(`<rect x="${lx}" y="${ly - 5}" width="28" height="10" fill="#d9d9d9" stroke="none"/>`);
    else if (entry.style && !entry.markerOnly)
      svg.push(`<line x1="${lx}" y1="${ly}" x2="${lx + 28}" y2="${ly}" ${strokeAttributes(entry.style)}/>`);
    if (entry.style && !entry.lineOnly) svg.push(markerSvg(entry.style.marker, lx + 14, ly));
    svg.push(`<text x="${lx + 34}" y="${ly + 4}" class="legend">${escapeXml(truncate(entry.label, 40))}</text>`);
  });
  return { svg, x, y, box };
}

/** The opening tag and title of a plot. */
export function openSvg(width: number, height: number, title: string): string[] {
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(title)}" font-family="Helvetica, Arial, sans-serif" font-size="11" fill="#111">`,
    `<title>${escapeXml(title)}</title>`,
  ];
}

/** A polyline through pixel points, clipped by the caller's clip path. */
export function polyline(points: readonly [number, number][], style: CurveStyle, clip: string): string {
  if (points.length < 2) return '';
  const d = points.map(([px, py], i) => `${i === 0 ? 'M' : 'L'}${c(px)},${c(py)}`).join(' ');
  return `<path d="${d}" ${strokeAttributes(style)} clip-path="url(#${clip})"/>`;
}

/** A clip path for the frame. */
export function clipPath(id: string, box: Frame['box']): string {
  return `<defs><clipPath id="${id}"><rect x="${box.left}" y="${box.top}" width="${c(box.right - box.left)}" height="${c(box.bottom - box.top)}"/></clipPath></defs>`;
}

function ticks(axis: Axis): number[] {
  if (!axis.log) return niceTicks(axis.lo, axis.hi, 5);
  const [a, b] = [Math.ceil(Math.log10(axis.lo) - 1e-9), Math.floor(Math.log10(axis.hi) + 1e-9)];
  const decades = Array.from({ length: Math.max(0, b - a + 1) }, (_, k) => Math.pow(10, a + k));
  if (decades.length >= 2) return decades;
  // Less than a decade: ticks at 1, 2 and 5 times a power of ten.
  return niceTicks(axis.lo, axis.hi, 4).filter((t) => t > 0);
}

function tickLabel(v: number, log: boolean): string {
  if (log) {
    const e = Math.log10(v);
    if (Math.abs(e - Math.round(e)) < 1e-9) return powerOfTen(Math.round(e));
  }
  return escapeXml(numberText(v, 3));
}

function truncate(text: string, n: number): string {
  return text.length <= n ? text : `${text.slice(0, n - 1)}…`;
}
