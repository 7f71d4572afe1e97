/**
 * The catalogue search, free of the DOM so it runs the same in the browser and in tests. Two
 * matchers over the prebuilt indexes: symbols and formulas are matched exactly and with case
 * (CO is not Co; `Cl` finds Cl2 and HCl), words are matched loosely (case, accents and small
 * typos forgiven). A query written with chemistry capitals (CO, HCl, KX-7) is taken literally
 * everywhere. Results are ranked in tiers, so an exact formula always beats a near name.
 */
import Fuse, { type FuseResult, type IFuseOptions } from 'fuse.js';
import {
  FORMULA_KEYS,
  TEXT_KEYS,
  type MechanismDoc,
  type SearchBundle,
  type SearchDoc,
  type SearchOccurrence,
  type SpeciesDoc,
} from './search-doc.ts';

export interface SearchFilters {
  role?: string;
  status?: string;
}

/** How a species was matched. */
export type MatchHow = 'symbol' | 'formula' | 'name' | 'alias' | 'role';

/** A matched species inside a mechanism result: an index into `doc.species`. */
export interface SpeciesHit {
  index: number;
  how: MatchHow;
  /** the text that matched (the symbol, formula, name or alias) */
  term: string;
  score: number;
}

export interface MechanismResult {
  kind: 'mechanism';
  doc: MechanismDoc;
  score: number;
  /** matched species, best first (with a role filter: the species with that role) */
  hits: SpeciesHit[];
  /** other fields that matched: title, tags, system, status */
  fields: string[];
  /**
   * species: a species of the mechanism matched (symbol, formula, name, alias, role); words: only
   * its title, tags, system or status did — listed apart, so a tag never passes for a species
   */
  through: 'species' | 'words';
}

export interface SpeciesResult {
  kind: 'species';
  doc: SpeciesDoc;
  score: number;
  how?: MatchHow;
  term?: string;
  /** where it occurs, narrowed by the filters */
  occurrences: SearchOccurrence[];
}

export interface SearchOutcome {
  query: string;
  filters: SearchFilters;
  /** the query was matched with case everywhere (it is written like a formula) */
  literal: boolean;
  /** the query reads as a formula or symbol: some species' symbol or formula contains it exactly */
  formulaLike: boolean;
  /** no query, only filters: everything that passes the filters */
  browsing: boolean;
  mechanisms: MechanismResult[];
  species: SpeciesResult[];
  /** when nothing matched: symbols or formulas that differ from the query only in case */
  didYouMean: string[];
}

/** Rank tiers: lower is better; the fraction inside a tier orders results within it. */
const TIER = { formulaEqual: 0, formulaPart: 1, wordEqual: 2, wordPart: 3, fuzzy: 4 } as const;

const TEXT_THRESHOLD = 0.25;

/** A query with capitals beyond a capitalised word is written like a formula or a code: CO, HCl, Fe3+, KX-7. */
export function isLiteralQuery(query: string): boolean {
  return !/\s/.test(query) && /[A-Z]/.test(query) && !/^[A-Z][a-z]+$/.test(query);
}

/** Creates the search over a bundle; the indexes are parsed once. */
export function createCatalogueSearch(bundle: SearchBundle): (query: string, filters?: SearchFilters) => SearchOutcome {
  const docs = bundle.docs;
  const base: IFuseOptions<SearchDoc> = {
    includeMatches: true,
    includeScore: true,
    ignoreLocation: true,
    shouldSort: false,
  };
  const textIndex = () => Fuse.parseIndex<SearchDoc>(bundle.textIndex as never);
  const loose = new Fuse(
    docs,
    { ...base, keys: [...TEXT_KEYS], threshold: TEXT_THRESHOLD, ignoreDiacritics: true },
    textIndex(),
  );
  const literal = new Fuse(docs, { ...base, keys: [...TEXT_KEYS], threshold: 0, isCaseSensitive: true }, textIndex());
  const formulas = new Fuse(
    docs,
    { ...base, keys: [...FORMULA_KEYS], threshold: 0, isCaseSensitive: true },
    Fuse.parseIndex<SearchDoc>(bundle.formulaIndex as never),
  );

  return (rawQuery, filters = {}) => {
    const query = rawQuery.trim();
    const isLiteral = isLiteralQuery(query);
    const outcome: SearchOutcome = {
      query,
      filters,
      literal: isLiteral,
      formulaLike: false,
      browsing: false,
      mechanisms: [],
      species: [],
      didYouMean: [],
    };
    const matched = new Map<number, Matched>();
    if (query === '') {
      if (!filters.role && !filters.status) return outcome;
      outcome.browsing = true;
      docs.forEach((_, i) => matched.set(i, { score: 0, hits: [], fields: ['all'] }));
    } else {
      if (!/\s/.test(query)) collect(matched, formulas.search(query), query, true);
      if (isLiteral) collect(matched, literal.search(query), query, true);
      else if (query.length >= 2) collect(matched, loose.search(query), query, false);
    }
    for (const [i, m] of matched) {
      const doc = docs[i]!;
      if (doc.kind === 'mechanism') {
        const result = mechanismResult(doc, m, filters);
        if (result) outcome.mechanisms.push(result);
      } else {
        const result = speciesResult(doc, m, filters);
        if (result) outcome.species.push(result);
      }
    }
    const order = (a: { score: number; doc: SearchDoc }, b: { score: number; doc: SearchDoc }) =>
      a.score - b.score || a.doc.title.localeCompare(b.doc.title);
    outcome.mechanisms.sort(order);
    outcome.species.sort(order);
    outcome.formulaLike = outcome.species.some((s) => s.how === 'symbol' || s.how === 'formula');
    if (outcome.mechanisms.length + outcome.species.length === 0 && query !== '')
      outcome.didYouMean = sameButCase(docs, query);
    return outcome;
  };
}

interface Matched {
  score: number;
  /** species hits (mechanisms: by species index; species docs: index 0) */
  hits: SpeciesHit[];
  fields: string[];
}

/** Folds one matcher's results into the per-document tally. */
function collect(into: Map<number, Matched>, results: FuseResult<SearchDoc>[], query: string, withCase: boolean): void {
  for (const result of results) {
    const doc = result.item;
    const entry = into.get(result.refIndex) ?? { score: Infinity, hits: [], fields: [] };
    for (const match of result.matches ?? []) {
      const key = keyName(match.key);
      const value = match.value ?? '';
      const score = rank(key, value, query, withCase, result.score ?? 1);
      if (score === undefined) continue;
      const index = match.refIndex ?? 0;
      if (key === 'symbols' || key === 'formulas')
        addHit(entry, { index, how: key === 'symbols' ? 'symbol' : 'formula', term: value, score });
      else if (key === 'names')
        addHit(entry, { index: doc.nameOwner[index] ?? 0, how: doc.nameKind[index] ?? 'name', term: value, score });
      else if (key === 'roles' && doc.kind === 'mechanism') addHit(entry, { index, how: 'role', term: value, score });
      else if (!entry.fields.includes(key)) entry.fields.push(key);
      entry.score = Math.min(entry.score, score);
    }
    if (entry.score < Infinity) into.set(result.refIndex, entry);
  }
}

/**
 * The score of one matched value. Symbols and formulas must contain the query exactly (Fuse
 * only proposes them); words rank by equal, then containing, then near (Fuse's own score).
 */
function rank(key: string, value: string, query: string, withCase: boolean, fuseScore: number): number | undefined {
  const shortfall = value.length > 0 ? 0.5 * (1 - Math.min(1, query.length / value.length)) : 0.5;
  if (key === 'symbols' || key === 'formulas') {
    if (value === query) return TIER.formulaEqual;
    return value.includes(query) ? TIER.formulaPart + shortfall : undefined;
  }
  const fold = (s: string) => (withCase ? s : s.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase());
  const v = fold(value);
  const q = fold(query);
  if (v === q) return TIER.wordEqual;
  if (v.includes(q)) return TIER.wordPart + shortfall;
  return withCase ? undefined : TIER.fuzzy + Math.min(0.99, fuseScore);
}

function addHit(entry: Matched, hit: SpeciesHit): void {
  const same = entry.hits.findIndex((h) => h.index === hit.index);
  if (same === -1) entry.hits.push(hit);
  else if (hit.score < entry.hits[same]!.score) entry.hits[same] = hit;
}

/** Fuse reports a match's key as it was declared (a name, or `{ name, weight }`). */
function keyName(key: unknown): string {
  if (typeof key === 'string') return key;
  if (key && typeof key === 'object' && 'name' in key) return String((key as { name: unknown }).name);
  return '';
}

function mechanismResult(doc: MechanismDoc, m: Matched, filters: SearchFilters): MechanismResult | undefined {
  if (filters.status && doc.status !== filters.status) return undefined;
  let hits = [...m.hits].sort((a, b) => a.score - b.score);
  if (filters.role) {
    hits = hits.filter((h) => doc.species[h.index]?.role === filters.role);
    // Matched by title, tags or system (or browsing): show the species that play the role.
    if (hits.length === 0 && m.fields.length > 0) {
      hits = doc.species.flatMap((s, index) =>
        s.role === filters.role ? [{ index, how: 'role' as const, term: s.symbol, score: m.score }] : [],
      );
    }
    if (hits.length === 0) return undefined;
  }
  const score = filters.role ? Math.min(...hits.map((h) => h.score)) : m.score;
  const fields = m.fields.filter((f) => f !== 'all');
  const through = hits.length > 0 || fields.length === 0 ? 'species' : 'words';
  return { kind: 'mechanism', doc, score, hits, fields, through };
}

function speciesResult(doc: SpeciesDoc, m: Matched, filters: SearchFilters): SpeciesResult | undefined {
  const occurrences = doc.occurrences.filter(
    (o) => (!filters.role || o.role === filters.role) && (!filters.status || o.status === filters.status),
  );
  if ((filters.role || filters.status) && occurrences.length === 0) return undefined;
  const best = [...m.hits].sort((a, b) => a.score - b.score)[0];
  const out: SpeciesResult = { kind: 'species', doc, score: m.score, occurrences };
  if (best) Object.assign(out, { how: best.how, term: best.term });
  else if (m.fields.includes('roles')) out.how = 'role';
  return out;
}

/** Symbols and formulas equal to the query but for case (CL2 → Cl2), for a hint when nothing matched. */
function sameButCase(docs: readonly SearchDoc[], query: string): string[] {
  const lower = query.toLowerCase();
  const out = new Set<string>();
  for (const doc of docs)
    for (const v of [...doc.symbols, ...doc.formulas]) if (v !== query && v.toLowerCase() === lower) out.add(v);
  return [...out].sort();
}
