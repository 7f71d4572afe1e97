/**
 * The rivals of one reaction system fitted to the same data set: a rival whose Akaike weight
 * falls below 0.01 against another is rejected by those data (the other is over a hundred times
 * more likely to be the better description). For a record marked favoured this is an error;
 * otherwise a warning. Shown on the system, so no single-record fixture can show it: tested in
 * tests/catalogue/system-fits.test.ts.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const fitRivalRejected = {
  id: 'fit/rival-rejected',
  summary: 'the data reject this rival in favour of another (Akaike weight below 0.01)',
} as const satisfies RuleDefinition;
