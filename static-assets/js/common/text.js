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
