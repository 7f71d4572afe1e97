/// <reference lib="dom" />
/**
 * The search page in the browser: loads the prebuilt bundle, reads `?q=&role=&status=` from the
 * address (so the home form and shared links work), searches as the reader types or presses
 * Enter, keeps the address in step, and renders the results as lists of links. Text is only
 * ever set with textContent: names and titles come from records and are never parsed as HTML.
 */
import { outcomeSummary } from './outcome-summary.ts';
import {
  createCatalogueSearch,
  type MechanismResult,
  type SearchFilters,
  type SearchOutcome,
  type SpeciesHit,
  type SpeciesResult,
} from './search-catalogue.ts';
import { formulaParts } from './formula-parts.ts';
import { roleWords, type SearchBundle } from './search-doc.ts';

const root = document.getElementById('catalogue-search');
if (root) void start(root);

async function start(root: HTMLElement): Promise<void> {
  const base = root.dataset['base'] ?? '/';
  const form = root.querySelector<HTMLFormElement>('form')!;
  const input = form.querySelector<HTMLInputElement>('input[name="q"]')!;
  const role = form.querySelector<HTMLSelectElement>('select[name="role"]')!;
  const status = form.querySelector<HTMLSelectElement>('select[name="status"]')!;
  const count = root.querySelector<HTMLElement>('#search-count')!;
  const results = root.querySelector<HTMLElement>('#search-results')!;
  root.hidden = false;

  const params = new URLSearchParams(location.search);
  input.value = params.get('q') ?? '';
  setSelect(role, params.get('role'));
  setSelect(status, params.get('status'));

  count.textContent = 'Loading the search index…';
  let search: ReturnType<typeof createCatalogueSearch>;
  try {
    const response = await fetch(root.dataset['index'] ?? `${base}search/index.json`);
    if (!response.ok) throw new Error(`HTTP ${response.status}`);
    search = createCatalogueSearch((await response.json()) as SearchBundle);
  } catch (error) {
    count.textContent = `The search index could not be loaded (${error instanceof Error ? error.message : String(error)}). Browse the species and systems pages instead.`;
    return;
  }

  let timer: ReturnType<typeof setTimeout> | undefined;
  const run = () => {
    clearTimeout(timer);
    const filters: SearchFilters = {};
    if (role.value) filters.role = role.value;
    if (status.value) filters.status = status.value;
    const outcome = search(input.value, filters);
    render(outcome, results, base);
    count.textContent = outcomeSummary(outcome);
    syncAddress(outcome);
  };
  form.addEventListener('submit', (event) => {
    event.preventDefault();
    run();
  });
  input.addEventListener('input', () => {
    clearTimeout(timer);
    timer = setTimeout(run, 250);
  });
  role.addEventListener('change', run);
  status.addEventListener('change', run);
  input.addEventListener('keydown', (event) => {
    if (event.key === 'ArrowDown') {
      const first = results.querySelector<HTMLAnchorElement>('a.result-link');
      if (first) {
        event.preventDefault();
        first.focus();
      }
    }
  });
  run();
  if (!input.value) input.focus();
}

function setSelect(select: HTMLSelectElement, value: string | null): void {
  if (value && Array.from(select.options).some((o) => o.value === value)) select.value = value;
}

/** Keeps the address shareable without adding a history entry per keystroke. */
function syncAddress(outcome: SearchOutcome): void {
  const params = new URLSearchParams();
  if (outcome.query) params.set('q', outcome.query);
  if (outcome.filters.role) params.set('role', outcome.filters.role);
  if (outcome.filters.status) params.set('status', outcome.filters.status);
  const query = params.toString();
  history.replaceState(null, '', `${location.pathname}${query ? `?${query}` : ''}`);
  document.title = outcome.query ? `“${outcome.query}” · Search · mechatlas` : 'Search · mechatlas';
}

/**
 * Species matched by formula or symbol come first when the query reads as one; mechanisms matched
 * only through their title, tags or system are listed apart, after everything matched by a species.
 */
function render(outcome: SearchOutcome, into: HTMLElement, base: string): void {
  into.replaceChildren();
  const bySpecies = outcome.mechanisms.filter((r) => r.through === 'species');
  const byWords = outcome.mechanisms.filter((r) => r.through === 'words');
  const species =
    outcome.species.length > 0
      ? section(
          'Species',
          'results-species',
          outcome.species.map((r) => speciesItem(r, base)),
        )
      : undefined;
  const mechanisms =
    bySpecies.length > 0
      ? section(
          outcome.formulaLike ? 'Mechanisms with a matching species' : 'Mechanisms',
          'results-mechanisms',
          bySpecies.map((r) => mechanismItem(r, base)),
        )
      : undefined;
  const loose =
    byWords.length > 0
      ? section(
          'Also matched in titles, tags or systems',
          'results-loose',
          byWords.map((r) => mechanismItem(r, base)),
        )
      : undefined;
  const order = outcome.formulaLike ? [species, mechanisms, loose] : [mechanisms, species, loose];
  into.append(...order.filter((s): s is HTMLElement => s !== undefined));
}

/** A symbol with its counts as subscripts and its charge as a superscript; the symbol as typed in data-symbol. */
function formulaEl(symbol: string): HTMLElement {
  const code = el('span', { class: 'symbol formula', 'data-symbol': symbol, title: symbol });
  for (const part of formulaParts(symbol)) code.append(part.kind === 'text' ? part.text : el(part.kind, {}, part.text));
  return code;
}

function section(title: string, id: string, items: HTMLLIElement[]): HTMLElement {
  const out = el('section', { 'aria-labelledby': `${id}-heading` });
  const heading = el('h2', { id: `${id}-heading` }, title);
  heading.append(el('span', { class: 'count' }, ` ${items.length}`));
  const list = el('ol', { class: 'results', id });
  list.append(...items);
  out.append(heading, list);
  return out;
}

function mechanismItem(r: MechanismResult, base: string): HTMLLIElement {
  const doc = r.doc;
  const li = el('li', { class: 'result', 'data-kind': 'mechanism', 'data-id': doc.id });
  const head = el('p', { class: 'result-head' });
  head.append(el('a', { class: 'result-link', href: `${base}${doc.path}` }, doc.title));
  if (doc.status) head.append(' ', el('span', { class: `status status-${doc.status}` }, doc.status));
  li.append(head);
  if (doc.system) {
    const meta = el('p', { class: 'result-meta' }, 'system ');
    meta.append(el('a', { href: `${base}systems/${doc.system}/` }, doc.system));
    li.append(meta);
  }
  if (r.hits.length > 0) {
    const hits = el('ul', { class: 'hits' });
    const shown = r.hits.slice(0, 4);
    hits.append(...shown.map((h) => hitItem(doc, h, base)));
    if (r.hits.length > shown.length)
      hits.append(el('li', { class: 'muted' }, `and ${r.hits.length - shown.length} more matching species`));
    li.append(hits);
  }
  if (r.fields.length > 0) li.append(el('p', { class: 'result-meta' }, `matched in the ${r.fields.join(', ')}`));
  return li;
}

/** "Cat KX-7 pincer catalyst — catalyst in this mechanism (matched alias KX-7)" */
function hitItem(doc: MechanismResult['doc'], hit: SpeciesHit, base: string): HTMLLIElement {
  const s = doc.species[hit.index]!;
  const li = el('li', { class: 'hit', 'data-symbol': s.symbol, 'data-role': s.role ?? '', 'data-how': hit.how });
  const link = s.slug ? el('a', { href: `${base}s/${s.slug}/` }) : el('span');
  link.append(formulaEl(s.symbol));
  li.append(link);
  if (s.name) li.append(` ${s.name}`);
  li.append(
    ' — ',
    el('strong', { class: 'role' }, s.role ? roleWords(s.role) : 'role not derived'),
    ' in this mechanism',
  );
  if (hit.how === 'alias' || hit.how === 'formula')
    li.append(' ', el('span', { class: 'muted' }, `(matched ${hit.how} ${hit.term})`));
  return li;
}

function speciesItem(r: SpeciesResult, base: string): HTMLLIElement {
  const doc = r.doc;
  const li = el('li', { class: 'result', 'data-kind': 'species', 'data-symbol': doc.symbol });
  const head = el('p', { class: 'result-head' });
  const link = el('a', { class: 'result-link', href: `${base}${doc.path}` });
  link.append(formulaEl(doc.symbol));
  if (doc.identity.names[0]) link.append(` ${doc.identity.names[0]}`);
  head.append(link);
  // A label belongs to its system: say which, so two systems' A never read as one species.
  if (doc.system) head.append(' ', el('span', { class: 'result-system' }, `label in ${doc.system}`));
  li.append(head);
  const about = [
    doc.identity.formula && doc.identity.formula !== doc.symbol ? `formula ${doc.identity.formula}` : undefined,
    doc.identity.aliases.length > 0 ? `also ${doc.identity.aliases.join(', ')}` : undefined,
  ].filter(Boolean);
  if (about.length > 0) li.append(el('p', { class: 'result-meta' }, about.join('; ')));
  if (r.how) li.setAttribute('data-how', r.how);
  const list = el('ul', { class: 'occurrences' });
  for (const o of r.occurrences) {
    const item = el('li', { 'data-mechanism': o.mechanism, 'data-role': o.role ?? '' });
    item.append(
      el('strong', { class: 'role' }, o.role ? roleWords(o.role) : 'occurs'),
      ' in ',
      el('a', { href: `${base}${o.path}` }, o.title),
    );
    if (o.status) item.append(' ', el('span', { class: `status status-${o.status}` }, o.status));
    list.append(item);
  }
  li.append(list);
  return li;
}

function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  attributes: Record<string, string> = {},
  text?: string,
): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [name, value] of Object.entries(attributes)) node.setAttribute(name, value);
  if (text !== undefined) node.textContent = text;
  return node;
}
