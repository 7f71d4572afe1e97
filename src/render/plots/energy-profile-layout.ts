/**
 * Where each state of an energy profile goes on the page. Minima sit at regular steps along the
 * reaction coordinate with a transition state halfway between; heights come from the energies,
 * or, for a schematic profile, from a fixed pattern in which the declared rds hump is the tallest.
 */
import type { EnergyProfile, ProfileState } from '../../engine/index.ts';
import { niceTicks } from './axis-ticks.ts';

/** A state with its position on the page. */
export interface PlacedState {
  state: ProfileState;
  x: number;
  y: number;
  /** the height used for drawing, kJ/mol or schematic units */
  value: number;
}

/** Everything the drawing needs to know about positions. */
export interface ProfileLayout {
  width: number;
  height: number;
  /** the plot frame: axes run along its left and bottom edges */
  frame: { left: number; right: number; top: number; bottom: number };
  minima: PlacedState[];
  transitions: PlacedState[];
  /** width of a minimum's plateau and distance between neighbouring minima, px */
  plateau: number;
  slot: number;
  /** y of an energy (kJ/mol); meaningful only when the profile is not schematic */
  y: (value: number) => number;
  /** tick values for the energy axis; none for a schematic profile */
  ticks: number[];
  /** true when heights follow the schematic pattern rather than energies */
  schematic: boolean;
}

// Room kept clear above the highest peak (two label lines) and below the lowest minimum (three
// lines of species): labels stay inside the frame whatever the energies.
const HEAD_ROOM = 36;
const FOOT_ROOM = 60;
const SIDE = 48;

/** Positions every state of the profile in a width × height drawing. */
export function layoutProfile(profile: EnergyProfile, width: number, height: number): ProfileLayout {
  const frame = { left: 68, right: width - 84, top: 28, bottom: height - 52 };
  const schematic = profile.schematic || profile.states.some((s) => s.energy === undefined);
  const value = (s: ProfileState) => (schematic ? 0 : s.energy!);
  const values = profile.states.map(value);
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values);
  const range = hi - lo > 0 ? hi - lo : 1;
  const yTop = frame.top + HEAD_ROOM;
  const yBottom = frame.bottom - FOOT_ROOM;
  const y = (v: number) => yTop + ((hi - v) / range) * (yBottom - yTop);
  const steps = Math.max(1, profile.states.filter((s) => s.kind === 'transition').length);
  const slot = (frame.right - frame.left - 2 * SIDE) / steps;
  const plateau = Math.min(0.42 * slot, 58);
  const minima: PlacedState[] = [];
  const transitions: PlacedState[] = [];
  for (const state of profile.states) {
    const x = frame.left + SIDE + (state.kind === 'minimum' ? state.index : state.index - 0.5) * slot;
    const placed = { state, x, y: y(value(state)), value: value(state) };
    (state.kind === 'minimum' ? minima : transitions).push(placed);
  }
  // Ticks over the energies drawn, so none falls in the head or foot room kept for labels.
  const ticks = schematic ? [] : niceTicks(lo, lo + range, 5);
  return { width, height, frame, minima, transitions, plateau, slot, y, ticks, schematic };
}
