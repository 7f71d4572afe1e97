import { Monomial } from './monomial.ts';

/**
 * A binary max-heap of monomials in the graded lexicographic order: it hands exact division the
 * leading monomial of a remainder without re-sorting the remainder after every step.
 */
export class MonomialHeap {
  private readonly items: Monomial[] = [];

  /** Number of entries (duplicates included). */
  get size(): number {
    return this.items.length;
  }

  /** Adds a monomial. */
  push(m: Monomial): void {
    const a = this.items;
    a.push(m);
    for (let i = a.length - 1; i > 0;) {
      const parent = (i - 1) >> 1;
      if (Monomial.compare(a[i]!, a[parent]!) <= 0) break;
      [a[i], a[parent]] = [a[parent]!, a[i]!];
      i = parent;
    }
  }

  /** Removes and returns the largest monomial, or undefined when empty. */
  pop(): Monomial | undefined {
    const a = this.items;
    const top = a[0];
    const last = a.pop();
    if (a.length === 0 || last === undefined) return top;
    a[0] = last;
    for (let i = 0; ;) {
      const [l, r] = [2 * i + 1, 2 * i + 2];
      let big = i;
      if (l < a.length && Monomial.compare(a[l]!, a[big]!) > 0) big = l;
      if (r < a.length && Monomial.compare(a[r]!, a[big]!) > 0) big = r;
      if (big === i) break;
      [a[i], a[big]] = [a[big]!, a[i]!];
      i = big;
    }
    return top;
  }
}
