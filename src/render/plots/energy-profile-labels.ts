/**
 * The annotations of an energy profile: what is present at each state, the barrier of each step
 * measured from the minimum before it, and the overall change of one turnover. Labels carry a white
 * halo so they stay legible where they cross a line, in print as on screen.
 */
import type { EnergyBasis } from '../../engine/index.ts';
import type { EnergyProfile } from '../../engine/index.ts';
import type { ProfileLayout } from './energy-profile-layout.ts';
import { termsSvg } from './energy-profile-formula.ts';
import { coordinate as c, escapeXml, signedValue, speciesTerms, wrapTerms } from './svg-text.ts';

/** The markers of the energetic span, where one was computed. */
export interface SpanMarks {
  tdts_state?: number;
  tdi_state?: number;
}

const HALO = 'paint-order="stroke" stroke="#fff" stroke-width="3" stroke-linejoin="round"';
const CHAR_WIDTH = 6;
const LINE = 12;
/** Lines of species under a minimum before the rest is cut to "…" (the full list stays as a tooltip). */
export const MAX_LINES = 4;

/** Species below each minimum, the transition-state names and, with energies, every state's value. */
export function stateLabels(layout: ProfileLayout, marks: SpanMarks, withValues: boolean): string[] {
  return [...minimumLabels(layout, marks, withValues), ...transitionLabels(layout, marks, withValues)];
}

/** What is present at each minimum, below it (formulas with subscripts and charges), and its value. */
export function minimumLabels(layout: ProfileLayout, marks: SpanMarks, withValues: boolean): string[] {
  const out: string[] = [];
  for (const m of layout.minima) {
    // Centred labels stay within their slot and clear of the energy axis.
    const chars = Math.min(layout.slot * 0.96, 170, 2 * (m.x - layout.frame.left - 6)) / CHAR_WIDTH;
    const { lines, cut } = wrapTerms(speciesTerms(m.state.species), chars, MAX_LINES);
    const full = speciesTerms(m.state.species).join(' + ');
    const tip = cut ? `<title>${escapeXml(full)}</title>` : '';
    const spans = lines
      .map((line, k) => `<tspan x="${c(m.x)}" dy="${k === 0 ? 0 : LINE}">${termsSvg(line)}</tspan>`)
      .join('');
    out.push(`<text x="${c(m.x)}" y="${c(m.y + 15)}" text-anchor="middle" ${HALO}>${tip}${spans}</text>`);
    if (withValues) {
      const tag = marks.tdi_state === m.state.index ? ' · TDI' : '';
      out.push(
        `<text x="${c(m.x)}" y="${c(m.y - 6)}" text-anchor="middle" font-size="10" ${HALO}>${signedValue(m.value)}${tag}</text>`,
      );
    }
  }
  return out;
}

/** The name of each transition state (and its value, with energies) above its peak. */
export function transitionLabels(layout: ProfileLayout, marks: SpanMarks, withValues: boolean): string[] {
  const out: string[] = [];
  for (const t of layout.transitions) {
    const tag = marks.tdts_state === t.state.index ? ' · TDTS' : '';
    const name = `‡ ${stepName(t.state.step)}${tag}`;
    const nameY = withValues ? t.y - 20 : t.y - 8;
    out.push(
      `<text x="${c(t.x)}" y="${c(nameY)}" text-anchor="middle" font-style="italic" ${HALO}>${escapeXml(name)}</text>`,
    );
    if (withValues)
      out.push(
        `<text x="${c(t.x)}" y="${c(t.y - 7)}" text-anchor="middle" font-size="10" ${HALO}>${signedValue(t.value)}</text>`,
      );
  }
  return out;
}

/** A dashed level from each minimum and an arrow up to the next transition state, with the barrier. */
export function barrierArrows(layout: ProfileLayout, basis: EnergyBasis, arrowId: string): string[] {
  return layout.transitions.flatMap((t, k) => {
    const before = layout.minima[k];
    if (!before) return [];
    const start = before.x + layout.plateau / 2;
    const guide = `<line x1="${c(start)}" y1="${c(before.y)}" x2="${c(t.x + 6)}" y2="${c(before.y)}" stroke="#555" stroke-width="0.8" stroke-dasharray="3 3"/>`;
    // An arrow shorter than its own head would only be a smudge; the value still shows at the peak.
    if (before.y - t.y < 16) return [guide];
    const barrier = t.value - before.value;
    return [
      guide,
      `<line x1="${c(t.x)}" y1="${c(before.y)}" x2="${c(t.x)}" y2="${c(t.y + 4)}" stroke="#000" stroke-width="0.9" marker-end="url(#${arrowId})"/>`,
      // Halfway up a tall arrow; just above the level line of a short one, where the hump is widest.
      `<text x="${c(t.x + 4)}" y="${c(before.y - t.y < 40 ? before.y - 4 : (before.y + t.y) / 2 + 4)}" font-size="10" ${HALO}>Δ${basis}‡ ${signedValue(barrier)}</text>`,
    ];
  });
}

/** The change over one turnover: an arrow from the starting level to the last minimum, right of the profile. */
export function overallChange(layout: ProfileLayout, profile: EnergyProfile, arrowId: string): string[] {
  const first = layout.minima[0];
  const last = layout.minima[layout.minima.length - 1];
  if (!first || !last || profile.overall_change === undefined) return [];
  const x = last.x + layout.plateau / 2 + 20;
  // The starting level is carried only across the last step, to where the arrow needs it.
  const from = layout.transitions[layout.transitions.length - 1]?.x ?? first.x;
  const out = [
    `<line x1="${c(from)}" y1="${c(first.y)}" x2="${c(x + 6)}" y2="${c(first.y)}" stroke="#555" stroke-width="0.8" stroke-dasharray="1 3"/>`,
  ];
  if (Math.abs(last.y - first.y) >= 12) {
    const end = last.y + (last.y > first.y ? -4 : 4);
    out.push(
      `<line x1="${c(x)}" y1="${c(first.y)}" x2="${c(x)}" y2="${c(end)}" stroke="#000" stroke-width="1.2" marker-end="url(#${arrowId})"/>`,
    );
  }
  const mid = (first.y + last.y) / 2;
  out.push(
    `<text x="${c(x + 6)}" y="${c(mid - 8)}" font-size="10" ${HALO}>Δ<tspan font-size="8" dy="3">r</tspan><tspan dy="-3">${profile.basis}</tspan> ${signedValue(profile.overall_change)}</text>`,
    `<text x="${c(x + 6)}" y="${c(mid + 5)}" font-size="10" font-style="italic" ${HALO}>${profile.direction ?? ''}</text>`,
  );
  return out;
}

/** A step as named beside its transition state: `step 2` for a numbered step, else its label. */
export function stepName(label: string | undefined): string {
  if (label === undefined) return '';
  return /^\d+$/.test(label) ? `step ${label}` : label;
}
