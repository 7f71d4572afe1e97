/**
 * The species pages of a catalogue. A symbol in formula notation names one substance wherever it
 * occurs (CHF3 is CHF3 in every record), so it has one page across the catalogue. A symbol in
 * label notation (A, B, Cat, E, S) means whatever its own reaction system says it means, so it
 * has one page per system: /s/<system>/<label>/. Two systems that both write A never share a page.
 */
import type { RecordView } from './record-view.ts';
import { speciesSlugs } from './species-slug.ts';

export interface SpeciesOccurrence {
  mechanism: string;
  title: string;
  role?: string;
  buffered: boolean;
}

export interface SpeciesPage {
  symbol: string;
  /** the page's path under /s/: `chf3`, or `<system>/<label>` for a label */
  slug: string;
  /** the reaction system a label belongs to; absent for a formula shared across the catalogue */
  system?: string;
  names: string[];
  formula?: string;
  charge?: number;
  inchi: string[];
  smiles: string[];
  aliases: string[];
  occurrences: SpeciesOccurrence[];
}

/** Whether a record's symbols are its system's own labels (true) or formulas shared by the catalogue. */
export function labelsOf(record: Pick<RecordView, 'notation' | 'system'>): boolean {
  return record.notation === 'labels' && record.system !== undefined;
}

/** The key one species page is found by: the symbol, or the system and the symbol for a label. */
export function speciesKey(record: Pick<RecordView, 'notation' | 'system'>, symbol: string): string {
  return labelsOf(record) ? `${record.system}\u0000${symbol}` : symbol;
}

/** Slugs for every species key of the catalogue: formulas by their own slug, labels under their system. */
export function speciesPageSlugs(records: readonly RecordView[]): Map<string, string> {
  const out = new Map<string, string>();
  const shared = records.filter((r) => !labelsOf(r)).flatMap((r) => r.species.map((s) => s.symbol));
  for (const [symbol, slug] of speciesSlugs(shared)) out.set(symbol, slug);
  const bySystem = new Map<string, string[]>();
  for (const r of records.filter(labelsOf))
    bySystem.set(r.system!, [...(bySystem.get(r.system!) ?? []), ...r.species.map((s) => s.symbol)]);
  for (const [system, symbols] of bySystem)
    for (const [symbol, slug] of speciesSlugs(symbols)) out.set(`${system}\u0000${symbol}`, `${system}/${slug}`);
  return out;
}

/** Symbol → page slug for the species of one record, for its links. */
export function recordSpeciesSlugs(record: RecordView, slugs: ReadonlyMap<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const s of record.species) {
    const slug = slugs.get(speciesKey(record, s.symbol));
    if (slug) out[s.symbol] = slug;
  }
  return out;
}

/** Every species page, formulas first by symbol and then each system's labels. */
export function speciesPages(records: readonly RecordView[], slugs: ReadonlyMap<string, string>): SpeciesPage[] {
  const pages = new Map<string, SpeciesPage>();
  for (const record of records) {
    for (const s of record.species) {
      const key = speciesKey(record, s.symbol);
      const page = pages.get(key) ?? {
        symbol: s.symbol,
        slug: slugs.get(key)!,
        ...(labelsOf(record) && { system: record.system! }),
        names: [],
        inchi: [],
        smiles: [],
        aliases: [],
        occurrences: [],
      };
      addUnique(page.names, s.name);
      addUnique(page.inchi, s.inchi);
      addUnique(page.smiles, s.smiles);
      for (const a of s.aliases) addUnique(page.aliases, a);
      if (s.formula && !page.formula) page.formula = s.formula;
      if (s.charge !== undefined && page.charge === undefined) page.charge = s.charge;
      page.occurrences.push({
        mechanism: record.id,
        title: record.title,
        ...(s.role && { role: s.role }),
        buffered: s.buffered,
      });
      pages.set(key, page);
    }
  }
  return [...pages.values()].sort(
    (a, b) =>
      Number(a.system !== undefined) - Number(b.system !== undefined) ||
      (a.system ?? '').localeCompare(b.system ?? '') ||
      a.symbol.localeCompare(b.symbol),
  );
}

function addUnique(list: string[], value: string | undefined): void {
  if (value && !list.includes(value)) list.push(value);
}
