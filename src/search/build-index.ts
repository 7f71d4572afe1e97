/**
 * The search bundle, built once per site build from the catalogue collections: one document per
 * mechanism and one per species, and the two Fuse indexes over them (text and formulas). Pure:
 * the same collections give the same JSON, so the browser never indexes anything.
 */
import Fuse from 'fuse.js';
import {
  FORMULA_KEYS,
  TEXT_KEYS,
  roleWords,
  type MechanismDoc,
  type SearchBundle,
  type SearchOccurrence,
  type SearchSpecies,
  type SpeciesDoc,
} from './search-doc.ts';

/** What the search needs of a mechanism entry (a RecordView fits). */
export interface MechanismInput {
  id: string;
  title: string;
  system?: string | undefined;
  status?: string | undefined;
  tags: readonly string[];
  /** symbol → species page slug for this record (labels belong to its system); else looked up by symbol */
  speciesSlugs?: Readonly<Record<string, string>>;
  species: readonly {
    symbol: string;
    role?: string | undefined;
    name?: string | undefined;
    formula?: string | undefined;
    aliases: readonly string[];
  }[];
}

/** What the search needs of a species entry (a SpeciesPage fits). */
export interface SpeciesInput {
  symbol: string;
  slug: string;
  /** the reaction system a label belongs to; absent for a formula shared by the catalogue */
  system?: string | undefined;
  names: readonly string[];
  formula?: string | undefined;
  aliases: readonly string[];
  occurrences: readonly { mechanism: string; title: string; role?: string | undefined }[];
}

/** Builds the documents and their prebuilt indexes; docs keep the input order, mechanisms first. */
export function buildSearchIndex(
  mechanisms: readonly MechanismInput[],
  species: readonly SpeciesInput[],
): SearchBundle {
  const slugs = new Map(species.map((s) => [s.symbol, s.slug]));
  const statuses = new Map(mechanisms.map((m) => [m.id, m.status]));
  const docs = [...mechanisms.map((m) => mechanismDoc(m, slugs)), ...species.map((s) => speciesDoc(s, statuses))];
  return {
    version: 1,
    docs,
    textIndex: Fuse.createIndex([...TEXT_KEYS], docs).toJSON(),
    formulaIndex: Fuse.createIndex([...FORMULA_KEYS], docs).toJSON(),
  };
}

function mechanismDoc(m: MechanismInput, slugs: ReadonlyMap<string, string>): MechanismDoc {
  const species = m.species.map((s): SearchSpecies => {
    const slug =
      (m.speciesSlugs && Object.hasOwn(m.speciesSlugs, s.symbol) ? m.speciesSlugs[s.symbol] : undefined) ??
      slugs.get(s.symbol);
    const out: SearchSpecies = { symbol: s.symbol, slug: slug ?? '', aliases: [...s.aliases] };
    if (s.role) out.role = s.role;
    if (s.name) out.name = s.name;
    if (s.formula) out.formula = s.formula;
    return out;
  });
  const terms = nameTerms(species.map((s) => ({ names: s.name ? [s.name] : [], aliases: s.aliases })));
  const doc: MechanismDoc = {
    kind: 'mechanism',
    id: m.id,
    path: `m/${m.id}/`,
    title: m.title,
    system: m.system ?? '',
    status: m.status ?? '',
    tags: [...m.tags],
    ...terms,
    roles: species.map((s) => roleWords(s.role)),
    symbols: species.map((s) => s.symbol),
    formulas: species.map((s) => s.formula ?? ''),
    species,
  };
  return doc;
}

function speciesDoc(s: SpeciesInput, statuses: ReadonlyMap<string, string | undefined>): SpeciesDoc {
  const occurrences = s.occurrences.map((o): SearchOccurrence => {
    const out: SearchOccurrence = { mechanism: o.mechanism, title: o.title, path: `m/${o.mechanism}/` };
    if (o.role) out.role = o.role;
    const status = statuses.get(o.mechanism);
    if (status) out.status = status;
    return out;
  });
  const identity: SpeciesDoc['identity'] = { names: [...s.names], aliases: [...s.aliases] };
  if (s.formula) identity.formula = s.formula;
  return {
    kind: 'species',
    id: s.slug,
    path: `s/${s.slug}/`,
    symbol: s.symbol,
    title: s.names[0] ?? s.symbol,
    system: s.system ?? '',
    status: '',
    tags: [],
    ...nameTerms([{ names: s.names, aliases: s.aliases }]),
    roles: [...new Set(occurrences.map((o) => roleWords(o.role)).filter(Boolean))],
    symbols: [s.symbol],
    formulas: [s.formula ?? ''],
    identity,
    occurrences,
  };
}

/** Names and aliases flattened into one indexed list, remembering whose each one is. */
function nameTerms(
  owners: readonly { names: readonly string[]; aliases: readonly string[] }[],
): Pick<MechanismDoc, 'names' | 'nameOwner' | 'nameKind'> {
  const out: Pick<MechanismDoc, 'names' | 'nameOwner' | 'nameKind'> = { names: [], nameOwner: [], nameKind: [] };
  owners.forEach((o, index) => {
    for (const [kind, list] of [
      ['name', o.names],
      ['alias', o.aliases],
    ] as const) {
      for (const term of list) {
        out.names.push(term);
        out.nameOwner.push(index);
        out.nameKind.push(kind);
      }
    }
  });
  return out;
}
