/**
 * An energy profile as a self-contained SVG string: one smooth hump per elementary step between
 * flat minima, every state labelled with what is present, barriers and the overall change marked.
 * Without a full set of energies it is a neutral sequence of states with no heights. The drawing
 * is as wide as its number of steps needs, so labels of a long cycle keep their room.
 * Black and grey only, told apart by line style, so it prints in black and white; pure and
 * deterministic, so pages and tests can compare it byte for byte.
 */
import type { EnergyBasis } from '../../engine/index.ts';
import type { EnergyProfile } from '../../engine/index.ts';
import { layoutProfile, type ProfileLayout } from './energy-profile-layout.ts';
import { barrierArrows, overallChange, stateLabels, stepName, type SpanMarks } from './energy-profile-labels.ts';
import { sequenceDrawing, sequenceNote } from './energy-profile-sequence.ts';
import { coordinate as c, escapeXml, signedValue } from './svg-text.ts';

/** Size, ids and title of the drawing. */
export interface EnergyProfileSvgOptions {
  /** prefix of element ids, so several plots can share one page (letters, digits, - and _) */
  idPrefix?: string;
  /** accessible title; by default a sentence describing the profile */
  title?: string;
  /** by default sized to the number of steps */
  width?: number;
  height?: number;
}

/** Horizontal room per step, px: enough for about 24 characters of species under each minimum. */
export const SLOT_WIDTH = 150;

/** The width that gives every step its slot, within the plot's margins. */
export function profileWidth(steps: number): number {
  return Math.max(440, 68 + 84 + 96 + Math.max(1, steps) * SLOT_WIDTH);
}

/** What the plot reads: a profile, with the energetic span's results where they exist. */
export type PlottedProfile = EnergyProfile & SpanMarks & { span?: number };

const BASIS_NAME: Record<EnergyBasis, string> = { G: 'Gibbs energy', H: 'Enthalpy', E: 'Energy' };

/** Draws the profile of one turnover as an SVG document string. */
export function energyProfileSvg(profile: PlottedProfile, options: EnergyProfileSvgOptions = {}): string {
  const steps = profile.states.filter((s) => s.kind === 'transition').length;
  const schematic = profile.schematic || profile.states.some((s) => s.energy === undefined);
  const width = options.width ?? profileWidth(steps);
  const height = options.height ?? (schematic ? 150 : 400);
  const id = (options.idPrefix ?? 'energy-profile').replace(/[^A-Za-z0-9_-]/g, '_');
  const layout = layoutProfile(profile, width, height);
  const title = options.title ?? describe(profile, schematic);
  const arrow = `${id}-arrow`;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(title)}" font-family="Helvetica, Arial, sans-serif" font-size="11" fill="#111">`,
    `<title>${escapeXml(title)}</title>`,
    `<defs><marker id="${arrow}" viewBox="0 0 8 8" refX="7" refY="4" markerWidth="7" markerHeight="7" orient="auto-start-reverse"><path d="M0,0.5 L8,4 L0,7.5 z" fill="#000"/></marker></defs>`,
    ...(schematic ? sequenceDrawing(layout, profile, arrow) : energeticDrawing(layout, profile, arrow)),
    '</svg>',
  ].join('\n');
}

function energeticDrawing(layout: ProfileLayout, profile: PlottedProfile, arrow: string): string[] {
  const schematic = false;
  return [
    ...axes(layout, profile.basis, schematic, arrow),
    profilePath(layout, schematic),
    ...(schematic ? [] : barrierArrows(layout, profile.basis, arrow)),
    ...(schematic ? [] : overallChange(layout, profile, arrow)),
    ...stateLabels(layout, profile, !schematic),
    caption(layout, profile, schematic),
  ];
}

function axes(layout: ProfileLayout, basis: EnergyBasis, schematic: boolean, arrow: string): string[] {
  const { left, right, top, bottom } = layout.frame;
  const mid = (top + bottom) / 2;
  const label = schematic ? BASIS_NAME[basis] : `${BASIS_NAME[basis]} / kJ mol⁻¹`;
  const ticks = layout.ticks.flatMap((t) => [
    `<line x1="${c(left - 5)}" y1="${c(layout.y(t))}" x2="${c(left)}" y2="${c(layout.y(t))}" stroke="#000" stroke-width="1"/>`,
    `<text x="${c(left - 8)}" y="${c(layout.y(t) + 3.5)}" text-anchor="end" font-size="10">${signedValue(t, decimalsFor(layout.ticks))}</text>`,
  ]);
  return [
    `<line x1="${c(left)}" y1="${c(bottom)}" x2="${c(left)}" y2="${c(top - 10)}" stroke="#000" stroke-width="1" marker-end="url(#${arrow})"/>`,
    `<line x1="${c(left)}" y1="${c(bottom)}" x2="${c(right + 60)}" y2="${c(bottom)}" stroke="#000" stroke-width="1" marker-end="url(#${arrow})"/>`,
    ...ticks,
    `<text x="18" y="${c(mid)}" text-anchor="middle" font-size="12" transform="rotate(-90 18 ${c(mid)})">${escapeXml(label)}</text>`,
    `<text x="${c((left + right) / 2)}" y="${c(bottom + 30)}" text-anchor="middle" font-size="12">reaction coordinate</text>`,
  ];
}

// Plateaus joined by cubic curves that leave each minimum and cross each peak horizontally, so the
// line is smooth and every state sits exactly at its own height. A schematic line is dashed.
function profilePath(layout: ProfileLayout, schematic: boolean): string {
  const half = layout.plateau / 2;
  const first = layout.minima[0]!;
  const d = [`M${c(first.x - half)},${c(first.y)} H${c(first.x + half)}`];
  layout.transitions.forEach((t, k) => {
    const a = layout.minima[k]!;
    const b = layout.minima[k + 1]!;
    const [from, to] = [a.x + half, b.x - half];
    const [up, down] = [(t.x - from) / 2, (to - t.x) / 2];
    d.push(`C${c(from + up)},${c(a.y)} ${c(t.x - up)},${c(t.y)} ${c(t.x)},${c(t.y)}`);
    d.push(`C${c(t.x + down)},${c(t.y)} ${c(to - down)},${c(b.y)} ${c(to)},${c(b.y)} H${c(b.x + half)}`);
  });
  const dash = schematic ? ' stroke-dasharray="7 4"' : '';
  return `<path d="${d.join(' ')}" fill="none" stroke="#000" stroke-width="2" stroke-linecap="round" stroke-linejoin="round"${dash}/>`;
}

function caption(layout: ProfileLayout, profile: PlottedProfile, schematic: boolean): string {
  const x = c(layout.frame.left + 8);
  const y = c(layout.frame.top - 10);
  if (schematic) {
    return `<text x="${x}" y="${y}" font-style="italic" font-size="12">${schematicNote(profile)}</text>`;
  }
  if (profile.span === undefined) return '';
  const tdts = profile.states.find((s) => s.kind === 'transition' && s.index === profile.tdts_state);
  const what = `energetic span δE = ${signedValue(profile.span)} kJ mol⁻¹ (TDI: state ${profile.tdi_state ?? '?'}, TDTS: ‡ ${stepName(tdts?.step)})`;
  return `<text x="${x}" y="${y}" font-size="11">${escapeXml(what)}</text>`;
}

function describe(profile: PlottedProfile, schematic: boolean): string {
  const steps = profile.states.filter((s) => s.kind === 'transition').length;
  const parts = [
    `${BASIS_NAME[profile.basis]} profile of ${steps} elementary step${steps === 1 ? '' : 's'}${schematic ? `, ${schematicNote(profile)}` : ''}`,
  ];
  if (!schematic && profile.overall_change !== undefined)
    parts.push(`overall change ${signedValue(profile.overall_change)} kJ/mol (${profile.direction})`);
  if (!schematic && profile.span !== undefined) parts.push(`energetic span ${signedValue(profile.span)} kJ/mol`);
  return parts.join('; ');
}

function decimalsFor(ticks: readonly number[]): number {
  const step = ticks.length > 1 ? Math.abs(ticks[1]! - ticks[0]!) : 1;
  return step >= 1 ? 0 : Math.min(3, Math.ceil(-Math.log10(step)));
}

function schematicNote(profile: EnergyProfile): string {
  return sequenceNote(profile).toLowerCase();
}
