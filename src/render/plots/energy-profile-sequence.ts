/**
 * The profile of a mechanism whose steps record no energies (or only some): a neutral sequence of
 * states, every minimum on one line joined by an arrow named for its step. No heights are drawn,
 * so nothing suggests a barrier the record does not give, nor which step is tallest.
 */
import type { EnergyProfile } from '../../engine/index.ts';
import type { ProfileLayout } from './energy-profile-layout.ts';
import { minimumLabels, stepName } from './energy-profile-labels.ts';
import { coordinate as c, escapeXml } from './svg-text.ts';

const HALO = 'paint-order="stroke" stroke="#fff" stroke-width="3" stroke-linejoin="round"';

/** The note saying why no heights are drawn. */
export function sequenceNote(profile: EnergyProfile): string {
  const some = profile.states.some((s) => s.index > 0 && s.energy !== undefined);
  return some
    ? 'Sequence of states: energies incomplete, so no heights are drawn'
    : 'Sequence of states: no energies recorded, so no heights are drawn';
}

/** Plateaus for the minima on one baseline, arrows between them named for their steps, and the species. */
export function sequenceDrawing(layout: ProfileLayout, profile: EnergyProfile, arrowId: string): string[] {
  const half = layout.plateau / 2;
  const out: string[] = [];
  for (const m of layout.minima)
    out.push(
      `<line x1="${c(m.x - half)}" y1="${c(m.y)}" x2="${c(m.x + half)}" y2="${c(m.y)}" stroke="#000" stroke-width="2.5" stroke-linecap="round"/>`,
    );
  layout.transitions.forEach((t, k) => {
    const a = layout.minima[k];
    const b = layout.minima[k + 1];
    if (!a || !b) return;
    out.push(
      `<line x1="${c(a.x + half + 6)}" y1="${c(a.y)}" x2="${c(b.x - half - 6)}" y2="${c(b.y)}" stroke="#555" stroke-width="1" marker-end="url(#${arrowId})"/>`,
      `<text x="${c(t.x)}" y="${c(t.y - 8)}" text-anchor="middle" font-style="italic" ${HALO}>${escapeXml(stepName(t.state.step))}</text>`,
    );
  });
  out.push(...minimumLabels(layout, {}, false));
  out.push(
    `<text x="${c(layout.frame.left)}" y="${c(layout.frame.top)}" font-style="italic" font-size="12">${escapeXml(sequenceNote(profile))}</text>`,
  );
  return out;
}
