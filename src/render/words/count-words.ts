/**
 * Counts in sentences that read right at every number: "no record has errors", "1 record has
 * 2 errors", "1 of the 2 live rivals survives". A count is always of the thing it names.
 */

/** "no record", "1 record", "3 records" (irregular plurals given as `plural`). */
export function countWords(count: number, word: string, plural = `${word}s`): string {
  return count === 0 ? `no ${word}` : `${count} ${count === 1 ? word : plural}`;
}

/** "both live rivals survive", "1 of the 2 live rivals survives", "no live rival survives". */
export function survivorsText(survivors: number, live: number): string {
  if (live === 0) return 'no live rival';
  if (survivors === 0)
    return live === 1 ? 'the one live rival does not survive' : `none of the ${live} live rivals survives`;
  if (survivors === live)
    return live === 1
      ? 'the one live rival survives'
      : live === 2
        ? 'both live rivals survive'
        : `all ${live} live rivals survive`;
  return `${survivors} of the ${live} live rivals ${survivors === 1 ? 'survives' : 'survive'}`;
}
