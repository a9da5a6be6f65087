// One text lookup for every page and panel. Pages render their user-facing texts from
// messages/*.properties into hidden elements: <span data-k="key"> or <span data-key="prefix.key">.

/** Fills {0}, {1}... in a message; a placeholder without an argument stays as it is. */
export function format(message, ...args) {
  return String(message ?? '').replace(/\{(\d+)\}/g, (m, i) => (args[i] === undefined ? m : String(args[i])));
}

/** A lookup over a map of texts: t(key, ...args), the key itself when the text is missing. */
export function lookup(map, prefix = '') {
  return (key, ...args) => format(map.get(prefix + key) ?? key, ...args);
}

/**
 * The texts inside container (an element or a selector), read once: t(key, ...args). With a
 * prefix, t('x') reads the element keyed prefix + 'x' (e.g. 'air.js.').
 */
export function pageText(container, prefix = '') {
  let map = null;
  const read = () => {
    map = new Map();
    const root = typeof container === 'string' ? document.querySelector(container) : container;
    root?.querySelectorAll('[data-k], [data-key]').forEach((el) => map.set(el.dataset.k ?? el.dataset.key, el.textContent));
  };
  return (key, ...args) => {
    if (!map) read();
    return lookup(map, prefix)(key, ...args);
  };
}

/**
 * Names the inputs and selects of a table's body for screen readers by their column's heading and
 * their row's number ("Gauge 3"), where they have no name of their own: a table's cells carry no
 * <label>, and a heading alone does not name a control. Call after the rows are (re)drawn.
 */
export function labelByColumn(tbody) {
  const table = tbody?.closest('table');
  if (!table) return;
  const heads = [...table.querySelectorAll('thead tr:last-child th')].map((th) => th.textContent.replace(/\s+/g, ' ').trim());
  [...tbody.rows].forEach((tr, i) => {
    [...tr.cells].forEach((td, k) => {
      for (const control of td.querySelectorAll('input, select, textarea')) {
        if (control.hasAttribute('aria-label') && control.dataset.columnLabel === undefined) continue;
        if (control.labels?.length || !heads[k]) continue;
        control.dataset.columnLabel = '';
        control.setAttribute('aria-label', `${heads[k]} ${i + 1}`);
      }
    });
  });
}
