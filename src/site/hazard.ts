/** Whether a record calls for the safety caution near the top of its page. */

/** Mentions in tags, title or notes that call for the safety caution near the top of a page. */
const HAZARD_WORDS = /scale[\s-]?up|exotherm|runaway|toxic|hazard/i;

/** True when the record speaks of scale-up, exotherms, runaway, toxicity or hazards. */
export function mentionsHazard(view: { title: string; tags: readonly string[]; notes?: string }): boolean {
  return [view.title, ...view.tags, view.notes ?? ''].some((text) => HAZARD_WORDS.test(text));
}
