/// <reference lib="dom" />
/// <reference lib="dom.iterable" />
/**
 * The checks page's filters, in the browser: severity, rule and reaction system, applied by hiding
 * the rows that do not match (and any rule or severity section left empty), without reloading.
 * The choice is kept in the address (?severity=&rule=&system=), so a filtered view can be shared.
 * Without script the form stays hidden and every check is listed, with the index of anchors.
 */

const form = document.querySelector<HTMLFormElement>('#checks-filter');
if (form) start(form);

function start(form: HTMLFormElement): void {
  const selects = ['severity', 'rule', 'system'].map((name) =>
    form.querySelector<HTMLSelectElement>(`select[name="${name}"]`)!,
  );
  const status = document.querySelector<HTMLElement>('#checks-filter-status')!;
  const params = new URLSearchParams(location.search);
  for (const select of selects) {
    const value = params.get(select.name);
    if (value && Array.from(select.options).some((o) => o.value === value)) select.value = value;
  }
  form.hidden = false;
  const apply = () => {
    const [severity, rule, system] = selects.map((s) => s.value);
    let shown = 0;
    for (const row of Array.from(document.querySelectorAll<HTMLElement>('tr[data-severity][data-rule]'))) {
      const match =
        (!severity || row.dataset['severity'] === severity) &&
        (!rule || row.dataset['rule'] === rule) &&
        (!system || row.dataset['system'] === system);
      row.hidden = !match;
      if (match) shown++;
    }
    for (const section of Array.from(document.querySelectorAll<HTMLElement>('section.rule, section.severity')))
      section.hidden = section.querySelector('tr[data-severity]:not([hidden])') === null && isFiltering();
    const total = document.querySelectorAll('tr[data-severity][data-rule]').length;
    status.textContent = isFiltering() ? `${shown} of ${total} checks shown.` : `All ${total} checks shown.`;
    const next = new URLSearchParams();
    for (const s of selects) if (s.value) next.set(s.name, s.value);
    const query = next.toString();
    history.replaceState(null, '', `${location.pathname}${query ? `?${query}` : ''}${location.hash}`);
  };
  const isFiltering = () => selects.some((s) => s.value !== '');
  for (const select of selects) select.addEventListener('change', apply);
  form.addEventListener('submit', (event) => event.preventDefault());
  form.addEventListener('reset', () => setTimeout(apply));
  apply();
}
