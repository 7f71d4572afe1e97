/**
 * How curves are told apart without colour: each gets a dash pattern and a marker shape, so a
 * black-and-white print (or a reader who cannot tell colours apart) still matches curve to legend.
 * Eight patterns and eight markers; beyond eight curves the markers shift, so no pair repeats
 * before 64 curves.
 */
import { coordinate as c } from './svg-text.ts';

/** The line and marker of one curve. */
export interface CurveStyle {
  /** stroke-dasharray, or undefined for a solid line */
  dash?: string;
  marker: MarkerShape;
}

/** A marker's outline, and whether it is filled black or white. */
export type MarkerShape =
  | 'circle'
  | 'square'
  | 'triangle'
  | 'diamond'
  | 'circle-filled'
  | 'square-filled'
  | 'triangle-filled'
  | 'diamond-filled';

const DASHES: readonly (string | undefined)[] = [
  undefined,
  '8 4',
  '2 3',
  '10 3 2 3',
  '4 2',
  '14 4',
  '1.5 2.5 1.5 6',
  '6 2 1 2 1 2',
];
const MARKERS: readonly MarkerShape[] = [
  'circle',
  'square-filled',
  'triangle',
  'diamond-filled',
  'circle-filled',
  'square',
  'triangle-filled',
  'diamond',
];

/** The style of the i-th curve (0-based). */
export function curveStyle(i: number): CurveStyle {
  const marker = MARKERS[(i + Math.floor(i / DASHES.length) * 3) % MARKERS.length]!;
  const dash = DASHES[i % DASHES.length];
  return dash === undefined ? { marker } : { dash, marker };
}

/** The stroke attributes of a curve: black, 1.6 px, with its dash pattern. */
export function strokeAttributes(style: CurveStyle): string {
  return `fill="none" stroke="#000" stroke-width="1.6" stroke-linejoin="round"${style.dash ? ` stroke-dasharray="${style.dash}"` : ''}`;
}

/** A marker centred on (x, y), about 7 px across; open markers are filled white so lines do not show through. */
export function markerSvg(shape: MarkerShape, x: number, y: number): string {
  const fill = shape.endsWith('-filled') ? '#000' : '#fff';
  const paint = `fill="${fill}" stroke="#000" stroke-width="1.1"`;
  switch (shape.replace('-filled', '')) {
    case 'circle':
      return `<circle cx="${c(x)}" cy="${c(y)}" r="3.3" ${paint}/>`;
    case 'square':
      return `<rect x="${c(x - 3)}" y="${c(y - 3)}" width="6" height="6" ${paint}/>`;
    case 'triangle':
      return `<path d="M${c(x)},${c(y - 4)} L${c(x + 3.8)},${c(y + 2.8)} L${c(x - 3.8)},${c(y + 2.8)} Z" ${paint}/>`;
    default:
      return `<path d="M${c(x)},${c(y - 4.2)} L${c(x + 3.6)},${c(y)} L${c(x)},${c(y + 4.2)} L${c(x - 3.6)},${c(y)} Z" ${paint}/>`;
  }
}
