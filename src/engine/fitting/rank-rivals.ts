/**
 * Rivals fitted to the same data set, ranked: each rival is represented by its best law (lowest
 * AICc), the Akaike weights are taken across rivals, and every pair of laws where one is nested in
 * the other (the simpler law is the larger with some K set to zero) gets the extra-sum-of-squares F
 * test. A rival is rejected by the data when its weight against the best alone, 1/(1 + e^{Δ/2}),
 * falls below 0.01 (Δ > 2 ln 99 ≈ 9.2 in AICc), a hundred-to-one against it.
 */
import { akaikeWeights, type InformationCriteria } from './information-criteria.ts';
import { nestedFTest, type FTestResult } from './nested-f-test.ts';

/** One law of one rival, fitted. */
export interface Candidate {
  record: string;
  method: string;
  criteria: InformationCriteria;
  rss: number;
  /** the number of fitted parameters */
  parameters: number;
  /** the law's terms, for telling whether one law is nested in another */
  signature?: readonly string[];
}

/** A rival's place in the ranking. */
export interface RivalRank {
  record: string;
  /** the law that represents it (its lowest AICc) */
  method: string;
  aicc: number;
  deltaAicc: number;
  weight: number;
  /** the weight against the best rival alone */
  pairwiseWeight: number;
  rejected: boolean;
}

/** The ranking of one data set. */
export interface Ranking {
  rivals: RivalRank[];
  best?: string;
  fTests: { simpler: Candidate; complex: Candidate; test: FTestResult }[];
}

/** Below this pairwise weight a rival is rejected (a hundred to one against it). */
export const REJECTED_WEIGHT = 0.01;

/** Ranks the rivals by AICc; candidates without a finite AICc take no part. */
export function rankRivals(candidates: readonly Candidate[], n: number): Ranking {
  const byRecord = new Map<string, Candidate>();
  for (const c of candidates) {
    if (!Number.isFinite(c.criteria.aicc)) continue;
    const seen = byRecord.get(c.record);
    if (!seen || c.criteria.aicc < seen.criteria.aicc) byRecord.set(c.record, c);
  }
  const chosen = [...byRecord.values()];
  const { deltas, weights } = akaikeWeights(chosen.map((c) => c.criteria.aicc));
  const rivals = chosen
    .map((c, i) => {
      const pairwiseWeight = 1 / (1 + Math.exp(deltas[i]! / 2));
      return {
        record: c.record,
        method: c.method,
        aicc: c.criteria.aicc,
        deltaAicc: deltas[i]!,
        weight: weights[i]!,
        pairwiseWeight: deltas[i] === 0 ? 0.5 : pairwiseWeight,
        rejected: deltas[i]! > 0 && pairwiseWeight < REJECTED_WEIGHT,
      };
    })
    .sort((a, b) => a.deltaAicc - b.deltaAicc);
  const fTests: Ranking['fTests'] = [];
  for (const simpler of candidates)
    for (const complex of candidates)
      if (simpler !== complex && isNested(simpler, complex))
        fTests.push({ simpler, complex, test: nestedFTest(simpler, complex, n) });
  return { rivals, ...(rivals[0] && { best: rivals[0].record }), fTests };
}

/** True when the simpler law's terms are all in the complex law's, which has more parameters. */
export function isNested(simpler: Candidate, complex: Candidate): boolean {
  const a = simpler.signature;
  const b = complex.signature;
  if (!a || !b || simpler.parameters >= complex.parameters) return false;
  const set = new Set(b);
  return (
    a.every((t) => set.has(t)) &&
    a.filter((t) => t.startsWith('n:')).length === b.filter((t) => t.startsWith('n:')).length
  );
}
