/**
 * "Did you mean …?" suggestions for misspelt field names and values. Transpositions count as one
 * edit, because swapped letters (`rsd` for `rds`) are the commonest typing slip.
 */

/** Optimal string alignment distance: insertions, deletions, substitutions and adjacent swaps. */
export function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[] = new Array<number>(rows * cols).fill(0);
  const at = (i: number, j: number): number => d[i * cols + j] ?? 0;
  for (let i = 0; i < rows; i += 1) d[i * cols] = i;
  for (let j = 0; j < cols; j += 1) d[j] = j;
  for (let i = 1; i < rows; i += 1) {
    for (let j = 1; j < cols; j += 1) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(at(i - 1, j) + 1, at(i, j - 1) + 1, at(i - 1, j - 1) + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) {
        best = Math.min(best, at(i - 2, j - 2) + 1);
      }
      d[i * cols + j] = best;
    }
  }
  return at(a.length, b.length);
}

/**
 * The candidate nearest to `name`, if it is close enough to be a slip rather than a different
 * word: at most one edit per three letters (at least one, never all). Ties go to the earlier
 * candidate, so callers list the likelier names first.
 */
export function closestName(name: string, candidates: Iterable<string>): string | undefined {
  const allowed = Math.max(1, Math.floor(name.length / 3));
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    if (candidate === name) continue;
    const distance = Math.min(
      editDistance(name, candidate),
      // Case slips (`Equation`) are as likely as letter slips; count them as one edit.
      name.toLowerCase() === candidate.toLowerCase() ? 1 : Infinity,
    );
    // Replacing every letter of a short name ('x' → 'k') is a different word, not a slip.
    if (distance <= allowed && distance < name.length && distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best;
}
