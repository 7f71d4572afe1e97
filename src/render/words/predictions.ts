/** What a rate law predicts for an observed order, in words. */
import type { ObservationJson } from '../../model/index.ts';
import { orderLikeMeasured } from './measured-precision.ts';
import { orderText } from './numbers.ts';

/**
 * What the rate law predicts for one observed order: at the conditions, a value whatever the
 * constants, the orders it allows for some constants (which are not given), or why there is none.
 * A value at the conditions (a number the constants give) is rounded to the decimals of the measured
 * order it is compared with; a limit of the rate law is exact and written as it is.
 */
export function predictionText(check: ObservationJson): string {
  if (check.range) return `${orderText(check.range[0])} to ${orderText(check.range[1])} for some constants (not given)`;
  if (check.predicted === undefined) return check.reason ? `no prediction: ${check.reason}` : '—';
  return check.basis === 'limits'
    ? `${orderText(check.predicted)} (at any conditions)`
    : `${orderLikeMeasured(check.predicted, check.observed, check.tolerance)} at these conditions`;
}
