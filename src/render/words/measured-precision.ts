/**
 * Numbers shown beside the measurement they are compared with: a predicted order carries no more
 * decimals than the measured order it is checked against (a prediction of 0.5556 beside a
 * measured 0.52 ± 0.08 reads 0.56), so one value is never printed two ways on two pages.
 */
import { decimalPlaces, measurementDecimals } from '../../engine/index.ts';
import { trueMinus } from './numbers.ts';

export { decimalPlaces, measurementDecimals };

/**
 * An order rounded to `decimals` places with a true minus sign; an exact fraction ("1/2") is
 * kept as written, and a value that rounds to zero prints as 0, never −0.
 */
export function orderToDecimals(order: number | string, decimals: number): string {
  if (typeof order === 'string') return trueMinus(order);
  const text = order.toFixed(decimals);
  return Number(text) === 0 ? (0).toFixed(decimals) : trueMinus(text);
}

/** A predicted order to the precision of the measurement it is compared with. */
export function orderLikeMeasured(order: number | string, observed: number, tolerance: number): string {
  return orderToDecimals(order, measurementDecimals(observed, tolerance));
}

/** A measured order as `0.52 ± 0.08`, both to the same decimals, with true minus signs. */
export function measuredOrderText(observed: number, tolerance: number): string {
  const d = measurementDecimals(observed, tolerance);
  return `${orderToDecimals(observed, d)} ± ${tolerance.toFixed(d)}`;
}
