// The one sentence that reports a search; the page announces it through an aria-live region.
import type { SearchOutcome } from './search-catalogue.ts';
import { roleWords } from './search-doc.ts';

/** The sentence announced to screen readers after each search. */
export function outcomeSummary(outcome: SearchOutcome): string {
  const m = outcome.mechanisms.length;
  const s = outcome.species.length;
  const filters = [
    outcome.filters.role && `role ${roleWords(outcome.filters.role)}`,
    outcome.filters.status && `status ${outcome.filters.status}`,
  ]
    .filter(Boolean)
    .join(', ');
  const within = filters ? ` (${filters})` : '';
  if (outcome.query === '' && !outcome.browsing) return 'Type a species name, formula, symbol, title or tag.';
  const counted = `${m} ${m === 1 ? 'mechanism' : 'mechanisms'} and ${s} species`;
  if (outcome.browsing) return `${counted}${within}.`;
  if (m + s === 0) {
    const hint =
      outcome.didYouMean.length > 0 ? ` Formulas match with case: try ${outcome.didYouMean.join(' or ')}.` : '';
    return `Nothing matches “${outcome.query}”${within}.${hint}`;
  }
  return `${counted} match “${outcome.query}”${within}.`;
}
