import { postForm, showFieldErrors, clearFieldErrors } from '../common/api.js';
import { clearOverlay } from '../common/charts.js';
// Helpers of the measurement and listening panels: load a panel's HTML (its text comes from
// messages/measurements.properties through the server), read its texts, format numbers.

/** Adds css/measure.css once, for pages whose layout does not carry it. */
export function ensureStyles() {
  if (document.querySelector('link[data-measure-css]')) return;
  const link = document.createElement('link');
  link.rel = 'stylesheet';
  link.href = '/css/measure.css';
  link.dataset.measureCss = 'true';
  document.head.appendChild(link);
}

/** The panel element inside section: already rendered by the server, or fetched and inserted. */
export async function loadPanel(section, name) {
  ensureStyles();
  const present = section.querySelector(`[data-panel="${name}"]`);
  if (present) return present;
  const response = await fetch(`/measure/panels/${name}`, { headers: { Accept: 'text/html' } });
  if (!response.ok) throw new Error(`panel ${name}: HTTP ${response.status}`);
  const holder = document.createElement('div');
  holder.innerHTML = await response.text();
  const panel = holder.querySelector(`[data-panel="${name}"]`);
  section.appendChild(panel);
  return panel;
}

/**
 * Mounts a panel into the first of sectionIds the page has: loads it (loadPanel) and puts it and its texts into
 * state.panel and state.t. Resolves to the panel, or null when the page has none of the sections.
 */
export async function mountPanel(state, sectionIds, name) {
  const section = [].concat(sectionIds).map((id) => document.getElementById(id)).find(Boolean);
  if (!section) return null;
  const panel = await loadPanel(section, name);
  state.panel = panel;
  state.t = texts(panel);
  return panel;
}

/** The texts of a panel: data-k → text, with {0}, {1} … filled by t(key, ...args). */
export function texts(panel) {
  const map = Object.fromEntries([...panel.querySelectorAll('[data-role="text"] [data-k]')].map((el) => [el.dataset.k, el.textContent]));
  return (key, ...args) => (map[key] ?? key).replace(/\{(\d+)\}/g, (_, i) => (args[Number(i)] ?? ''));
}

export const role = (panel, name) => panel.querySelector(`[data-role="${name}"]`);

/** Significant-digit formatting without exponent noise for everyday magnitudes. */
export function sig(value, digits = 6) {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const a = Math.abs(value);
  if (a !== 0 && (a < 1e-3 || a >= 1e7)) return value.toExponential(digits - 1);
  return String(Number(value.toPrecision(digits)));
}

/** Cents between two frequencies: the one formula, in common/notes.js. */
export { cents as centsBetween } from '../common/notes.js';

/** Listens for a page event on window in the capture phase, whether dispatched on document or window. */
export function onPageEvent(name, handler) {
  window.addEventListener(name, handler, true);
}

/**
 * Posts an upload form's data and reports progress and refusals in the panel's status line and
 * on the form's fields. Resolves to the response data, or null when it was refused or unreachable.
 */
export async function sendUpload(state, form, url, data) {
  const status = role(state.panel, 'status');
  status.textContent = state.t('busy');
  let result;
  try {
    result = await postForm(url, data);
  } catch (err) {
    status.textContent = state.t('serverDown');
    return null;
  }
  if (!result.ok) {
    showFieldErrors(form, result.problem);
    const why = (result.problem?.errors ?? []).map((x) => x.message).join('; ') || result.problem?.detail || String(result.status);
    status.textContent = state.t('failed', why);
    state.panel.dataset.measured = 'failed';
    return null;
  }
  clearFieldErrors(form);
  status.textContent = '';
  return result.data;
}

/** The upload form's file as multipart data (part "file"), or null (and "noFile" said) when none is chosen. */
export function uploadData(state, form) {
  const file = form.elements.file.files[0];
  if (!file) {
    role(state.panel, 'status').textContent = state.t('noFile');
    return null;
  }
  const data = new FormData();
  data.append('file', file);
  return data;
}

/**
 * Sends a measurement upload (sendUpload): its answer becomes state.measured, and a refused one clears what an
 * earlier one left (clearMeasured). Resolves to true when there is a new measurement to show.
 */
export async function measure(state, form, url, data, canvasId) {
  const measured = await sendUpload(state, form, url, data);
  if (!measured) {
    clearMeasured(state, canvasId);
    return false;
  }
  state.measured = measured;
  return true;
}

/** A refused upload leaves no earlier result, table or chart under its error; the overlay on canvasId goes too. */
export function clearMeasured(state, canvasId) {
  state.measured = null;
  role(state.panel, 'result').hidden = true;
  role(state.panel, 'peaks').tBodies[0].replaceChildren();
  role(state.panel, 'own-chart').hidden = true;
  clearOverlay(canvasId, 'measured');
}

/** A table row of text cells. */
export function textRow(cells) {
  const tr = document.createElement('tr');
  tr.replaceChildren(...cells.map((c) => Object.assign(document.createElement('td'), { textContent: String(c) })));
  return tr;
}

/** A sign on a listening panel that something is sounding, for as long as it sounds. */
export function showPlaying(state, status, count, seconds) {
  clearTimeout(state.playingTimer);
  status.textContent = state.t('playing', count, seconds.toFixed(1));
  state.panel.classList.add('playing');
  state.playingTimer = setTimeout(() => { status.textContent = ''; state.panel.classList.remove('playing'); }, seconds * 1000);
}
