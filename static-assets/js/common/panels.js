// Panels that load after the page (design bar, listening, measuring): a panel that fails to load
// says so on the page, in its own place, never silently.
import { pageText } from './text.js';

const t = pageText('#common-text', 'common.js.');

/** Writes "this panel could not be loaded" (and why) into the panel's place on the page. */
export function showPanelFailure(place, name, error) {
  const where = typeof place === 'string' ? document.getElementById(place) : place;
  const line = document.createElement('p');
  line.className = 'panel-failure';
  line.setAttribute('role', 'alert');
  line.dataset.panel = name;
  line.textContent = t('panelFailed', name, error?.message ?? String(error ?? ''));
  (where ?? document.querySelector('main') ?? document.body).append(line);
  if (typeof console !== 'undefined') console.error(`panel ${name} not loaded`, error);
}

/**
 * Loads each panel module ({url, place, name}); once loaded, the loop's last answer is replayed to
 * it (loop may be null). Resolves when every panel has loaded or said that it failed.
 */
export function loadPanels(panels, loop) {
  return Promise.all(panels.map(({ url, place, name }) => import(url)
    .then((module) => { loop?.replay(); return module; })
    .catch((error) => { showPanelFailure(place, name, error); return null; })));
}
