/** What a rate law predicts for an observed order, in words. */
import type { ObservationJson } from '../../model/index.ts';
import { orderText } from './numbers.ts';

/** What the rate law predicts for one observed order: at the conditions, a fixed value, or a range. */
export function predictionText(check: ObservationJson): string {
  if (check.range) return `${orderText(check.range[0])} to ${orderText(check.range[1])} (depends on the constants)`;
  if (check.predicted === undefined) return '—';
  return check.basis === 'limits'
    ? `${orderText(check.predicted)} (at any conditions)`
    : `${orderText(check.predicted)} at these conditions`;
}
