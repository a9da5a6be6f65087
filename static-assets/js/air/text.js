// User-facing texts of the bore bench script: rendered by the page from
// messages/aircolumns.properties (keys air.js.*) into <div id="air-text">.
let cache = null;

function load() {
  cache = new Map();
  document.querySelectorAll('#air-text [data-key]').forEach((el) => cache.set(el.dataset.key, el.textContent));
}

/** The text for air.js.<key>, with {0}, {1} ... replaced by the arguments. */
export function t(key, ...args) {
  if (!cache) load();
  const text = cache.get(`air.js.${key}`) ?? key;
  return text.replace(/\{(\d+)\}/g, (m, i) => (args[i] === undefined ? m : String(args[i])));
}
