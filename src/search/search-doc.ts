/**
 * The documents the catalogue search works on, shared by the build (which writes them and their
 * prebuilt Fuse indexes to /search/index.json) and the browser (which reads them). The keys and
 * the order of the documents must be the same on both sides, so both import them from here.
 */

/** One species as it appears in one mechanism. */
export interface SearchSpecies {
  symbol: string;
  slug: string;
  role?: string;
  name?: string;
  formula?: string;
  aliases: string[];
}

/** Where a species occurs, with its role there and the status of that mechanism. */
export interface SearchOccurrence {
  mechanism: string;
  title: string;
  path: string;
  role?: string;
  status?: string;
}

/**
 * The indexed fields, common to both kinds of document. Arrays marked "aligned" have one entry
 * per species (blank where there is nothing), so Fuse's `refIndex` of a match names the species.
 */
export interface IndexedFields {
  /** a mechanism's title; a species' first name, else its symbol */
  title: string;
  /** blank where none */
  system: string;
  /** a mechanism's status; blank for a species */
  status: string;
  tags: string[];
  /** names and aliases; `nameOwner[i]` is the species index of `names[i]` */
  names: string[];
  /** roles as words ("third body"); aligned */
  roles: string[];
  /** species symbols; aligned */
  symbols: string[];
  /** formulas where known; aligned */
  formulas: string[];
}

export interface MechanismDoc extends IndexedFields {
  kind: 'mechanism';
  id: string;
  /** site path relative to the base, e.g. `m/<id>/` */
  path: string;
  species: SearchSpecies[];
  nameOwner: number[];
  /** whether `names[i]` is a name or an alias */
  nameKind: ('name' | 'alias')[];
}

export interface SpeciesDoc extends IndexedFields {
  kind: 'species';
  /** the slug */
  id: string;
  path: string;
  symbol: string;
  identity: { names: string[]; aliases: string[]; formula?: string };
  occurrences: SearchOccurrence[];
  nameOwner: number[];
  nameKind: ('name' | 'alias')[];
}

export type SearchDoc = MechanismDoc | SpeciesDoc;

/** What /search/index.json holds: the documents and one prebuilt Fuse index per matcher. */
export interface SearchBundle {
  version: 1;
  docs: SearchDoc[];
  /** `Fuse.createIndex(TEXT_KEYS, docs).toJSON()` */
  textIndex: unknown;
  /** `Fuse.createIndex(FORMULA_KEYS, docs).toJSON()` */
  formulaIndex: unknown;
}

/** Loose, typo-tolerant matching of words: titles, names, aliases, tags, system, roles, status. */
export const TEXT_KEYS = [
  { name: 'names', weight: 1 },
  { name: 'title', weight: 0.9 },
  { name: 'tags', weight: 0.5 },
  { name: 'system', weight: 0.5 },
  { name: 'roles', weight: 0.4 },
  { name: 'status', weight: 0.3 },
] as const;

/** Case-sensitive matching of what chemists write with capitals: symbols and formulas. */
export const FORMULA_KEYS = [
  { name: 'symbols', weight: 1 },
  { name: 'formulas', weight: 1 },
] as const;

/** The role as words: `third_body` → `third body`. */
export function roleWords(role: string | undefined): string {
  return role ? role.replace(/_/g, ' ') : '';
}
