/**
 * The words of a concentration–time plot: a legend above the frame (line sample, marker, species,
 * magnification and role), a label at the end of every curve, moved apart where curves end close
 * together, and a caption under the time axis saying what was simulated and what is not drawn.
 */
import type { ConcentrationSeries } from '../../engine/index.ts';
import type { PlottedCurve, TimePlotLayout } from './concentration-time-layout.ts';
import { markerSvg, strokeAttributes } from './curve-style.ts';
import { coordinate as c, escapeXml } from './svg-text.ts';
import { powerOfTen } from './time-axis.ts';

const CHAR_WIDTH = 6.2;
const SAMPLE = 30;
const ROW = 16;
const HALO = 'paint-order="stroke" stroke="#fff" stroke-width="3" stroke-linejoin="round"';

/** A curve's name as shown: the species, cut to `maxChars` with "…", and its magnification. */
export function curveName(curve: PlottedCurve, maxChars: number): { text: string; cut: boolean } {
  const cut = curve.species.length > maxChars;
  const name = cut ? `${curve.species.slice(0, Math.max(1, maxChars - 1))}…` : curve.species;
  const times = curve.exponent === 1 ? '10' : powerOfTen(curve.exponent);
  return { text: curve.exponent > 0 ? `${name} ×${times}` : name, cut };
}

/** Legend entries flowed into rows between `left` and `right`; returns the drawing and the row count. */
export function legend(
  curves: readonly PlottedCurve[],
  left: number,
  right: number,
  firstBaseline: number,
): { svg: string[]; rows: number } {
  const svg: string[] = [];
  let x = left;
  let row = 0;
  for (const curve of curves) {
    const { text, cut } = curveName(curve, 22);
    const words = curve.role ? `${text} (${curve.role.replace('_', ' ')})` : text;
    const width = SAMPLE + 6 + words.length * CHAR_WIDTH;
    if (x > left && x + width > right) {
      x = left;
      row++;
    }
    const y = firstBaseline + row * ROW;
    const tip = cut ? `<title>${escapeXml(curve.species)}</title>` : '';
    svg.push(
      `<path d="M${c(x)},${c(y - 4)} h${SAMPLE}" ${strokeAttributes(curve.style)}/>`,
      markerSvg(curve.style.marker, x + SAMPLE / 2, y - 4),
      `<text x="${c(x + SAMPLE + 6)}" y="${c(y)}">${tip}${escapeXml(words)}</text>`,
    );
    x += width + 18;
  }
  return { svg, rows: curves.length === 0 ? 0 : row + 1 };
}

/** Names at the right-hand ends of the curves, spread at least 12 px apart within the frame. */
export function endLabels(layout: TimePlotLayout, ends: readonly number[]): string[] {
  const { right, top, bottom } = layout.frame;
  const placed = spreadApart(ends, 12, top + 4, bottom);
  return layout.curves.flatMap((curve, i) => {
    const { text, cut } = curveName(curve, 12);
    const tip = cut ? `<title>${escapeXml(curve.species)}</title>` : '';
    const yEnd = ends[i]!;
    const yLabel = placed[i]!;
    return [
      `<line x1="${c(right + 1)}" y1="${c(yEnd)}" x2="${c(right + 6)}" y2="${c(yLabel - 3.5)}" stroke="#555" stroke-width="0.8"/>`,
      `<text x="${c(right + 8)}" y="${c(yLabel)}" ${HALO}>${tip}${escapeXml(text)}</text>`,
    ];
  });
}

/** Baselines as close to the wanted ones as possible, `gap` apart, kept within [lo, hi]. */
export function spreadApart(wanted: readonly number[], gap: number, lo: number, hi: number): number[] {
  const order = wanted.map((y, i) => ({ y: y + 4, i })).sort((a, b) => a.y - b.y || a.i - b.i);
  const out = new Array<number>(wanted.length);
  let previous = -Infinity;
  for (const item of order) {
    previous = Math.max(item.y, previous + gap, lo);
    item.y = previous;
  }
  // Pushed below the frame: slide the run back up, keeping the spacing.
  let limit = hi;
  for (let k = order.length - 1; k >= 0; k--) {
    order[k]!.y = Math.min(order[k]!.y, limit);
    limit = order[k]!.y - gap;
  }
  for (const item of order) out[item.i] = item.y;
  return out;
}

/** The caption: the observation simulated, how far it ran, magnified curves, and species not drawn. */
export function captionLines(series: ConcentrationSeries, layout: TimePlotLayout, maxChars: number): string[] {
  const parts: string[] = [];
  const conversion =
    series.conversion !== undefined
      ? ` to ${(series.conversion * 100).toFixed(series.conversion > 0.999 ? 2 : 1)} % conversion`
      : '';
  parts.push(`mass-action simulation of observation ${series.observation ?? '?'}${conversion}`);
  if (layout.curves.some((c) => c.exponent > 0))
    parts.push('a curve marked ×10ⁿ is drawn 10ⁿ times larger than the axis reads');
  if (layout.constant.length > 0) parts.push(`constant, not drawn: ${layout.constant.join(', ')}`);
  if (layout.absent.length > 0) parts.push(`absent throughout: ${layout.absent.join(', ')}`);
  return joinWrapped(parts, maxChars);
}

/** Parts joined with " · ", a new line started wherever the next part would overflow. */
function joinWrapped(parts: readonly string[], maxChars: number): string[] {
  const lines: string[] = [];
  for (const part of parts) {
    const last = lines[lines.length - 1];
    if (last !== undefined && last.length + 3 + part.length <= maxChars) lines[lines.length - 1] = `${last} · ${part}`;
    else lines.push(part);
  }
  return lines;
}
