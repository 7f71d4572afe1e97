/**
 * The words mechatlas uses for what the engine returns: derivation methods, species roles,
 * molecularity, observation verdicts and diagnostic severities. One table each, so the terminal,
 * the pull-request report and the site say the same thing.
 */

const METHODS: Readonly<Record<string, { name: string; short: string; law: string; about: string }>> = {
  rds: {
    name: 'rate-determining step with fast pre-equilibria',
    short: 'pre-equilibrium',
    law: 'rate-determining-step law',
    about:
      'The rate is that of the rate-determining step; each intermediate before it is eliminated through the reversible steps treated as equilibria.',
  },
  steady_state: {
    name: 'steady-state approximation',
    short: 'steady state',
    law: 'steady-state law',
    about:
      'Every intermediate is taken to be at steady state (its net rate of formation is zero); conserved catalysts enter through their total concentration.',
  },
  long_chain: {
    name: 'long-chain approximation',
    short: 'long chain',
    law: 'long-chain law',
    about:
      'The chain carriers are at steady state and the chains are long: initiation balances termination, the propagation steps alone fix the ratio of the carriers, and the rate is that of propagation.',
  },
};

/** A rate-law method in words, lower case: "steady-state approximation"; "no rate law" for none. */
export function methodName(method: string | undefined): string {
  if (method === undefined) return 'no rate law';
  return METHODS[method]?.name ?? method.replace(/_/g, ' ');
}

/** A method as a short column heading: "pre-equilibrium", "steady state". */
export function methodShort(method: string): string {
  return METHODS[method]?.short ?? method.replace(/_/g, ' ');
}

const LAW_SHAPES: Readonly<Record<string, string>> = {
  michaelis_menten: 'Michaelis–Menten',
  competitive_inhibition: 'Michaelis–Menten with competitive inhibition',
  uncompetitive_inhibition: 'Michaelis–Menten with uncompetitive inhibition',
  mixed_inhibition: 'Michaelis–Menten with mixed inhibition',
  noncompetitive_inhibition: 'Michaelis–Menten with noncompetitive inhibition',
  substrate_inhibition: 'Michaelis–Menten with substrate inhibition',
  reversible_michaelis_menten: 'reversible Michaelis–Menten (Haldane)',
};

/** The trade's name of a rate-law shape: "Michaelis–Menten with competitive inhibition". */
export function lawShapeWords(shape: string): string {
  return LAW_SHAPES[shape] ?? shape.replace(/_/g, ' ');
}

/** The law a method gives: "steady-state law". */
export function methodLaw(method: string): string {
  return METHODS[method]?.law ?? `${method.replace(/_/g, ' ')} law`;
}

/** One sentence saying what the method assumes. */
export function methodAbout(method: string): string {
  return METHODS[method]?.about ?? '';
}

/** The first letter in capitals, for a heading. */
export function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Roles in the order a reader looks for them: what goes in, what comes out, what carries the reaction, the rest. */
export const ROLE_ORDER = [
  'reactant',
  'product',
  'catalyst',
  'intermediate',
  'inhibitor',
  'third_body',
  'solvent',
  'off_route',
] as const;

/** A role in words (`third_body` → "third body"); `fallback` where no role was derived. */
export function roleWords(role: string | undefined, fallback = 'no role derived'): string {
  return role ? role.replace(/_/g, ' ') : fallback;
}

/** Sort key of a role (in words or as the report writes it) by ROLE_ORDER; unknown roles last. */
export function roleRank(role: string | undefined): number {
  const i = (ROLE_ORDER as readonly string[]).indexOf((role ?? '').replace(/ /g, '_'));
  return i < 0 ? ROLE_ORDER.length : i;
}

/** Molecularity in words: 2 → "bimolecular". */
export function molecularityText(n: number): string {
  return ['', 'unimolecular', 'bimolecular', 'termolecular'][n] ?? `${n} reactant molecules`;
}

/** The outcome of an observation check as a symbol, a word and a class name, so it never rests on colour alone. */
export function verdictMark(status: string | undefined): { symbol: string; word: string; className: string } {
  switch (status) {
    case 'pass':
      return { symbol: '\u2713', word: 'consistent', className: 'pass' };
    case 'fail':
      return { symbol: '\u2717', word: 'contradicted', className: 'fail' };
    case 'not_excluded':
      return { symbol: '~', word: 'not excluded', className: 'open' };
    case 'unknown':
      return { symbol: '?', word: 'no prediction', className: 'unknown' };
    default:
      return { symbol: '\u2013', word: 'not judged', className: 'unknown' };
  }
}

/** The verdicts of observation checks, in the order a summary counts them. */
export const VERDICTS = ['pass', 'fail', 'not_excluded', 'unknown'] as const;

/** "2 consistent, 1 not excluded": how many checks had each verdict, those with none left out. */
export function verdictCounts(counts: Readonly<Partial<Record<(typeof VERDICTS)[number], number>>>): string {
  return VERDICTS.filter((v) => (counts[v] ?? 0) > 0)
    .map((v) => `${counts[v]} ${verdictMark(v).word}`)
    .join(', ');
}

/** Where a rival stands against every observation, as a symbol, a word and a class name. */
export function standingMark(standing: string): { symbol: string; word: string; className: string } {
  switch (standing) {
    case 'survives':
      return { symbol: '\u2713', word: 'survives', className: 'pass' };
    case 'undecided':
      return { symbol: '?', word: 'undecided', className: 'unknown' };
    default:
      return { symbol: '\u2717', word: 'ruled out', className: 'fail' };
  }
}

/** Severities in order of urgency. */
export const SEVERITIES = ['error', 'warning', 'info'] as const;

/** A severity in words: `info` is a note. */
export function severityWord(severity: string): string {
  return severity === 'info' ? 'note' : severity;
}

/** "1 error", "3 warnings", "2 notes": a count of diagnostics of one severity. */
export function severityCount(count: number, severity: string): string {
  return plural(count, severityWord(severity));
}

/** "1 record", "3 records". */
export function plural(count: number, word: string): string {
  return `${count} ${word}${count === 1 ? '' : 's'}`;
}
