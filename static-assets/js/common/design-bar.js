// The design bar: name, tags, notes, Save and Save as new for any bench page, plus loading
// ?design=ID, edit conflicts (409) that lose nothing, validation errors (400) and a notice as soon
// as a colleague saves the open design (server-sent events, with polling as a fallback).
//
//   mountDesignBar(element, { kind, getParameters, setParameters, formRoot })
//     kind           'string' | 'string-set' | 'air-column'
//     getParameters  () => the analysis request object of the page
//     setParameters  (parameters) => fills the page from a saved design
//     formRoot       optional element whose [data-field] inputs get the field errors (default <main>)
//     getView/setView optional: the page's display settings; their units are saved with the design
//     (design.units, seen by whoever opens it) and the whole view is also kept in this browser
//                    with each design it saves and put back when that design is opened
// Returns { current(), load(id) }.
import { getJson, sendJson, showFieldErrors, clearFieldErrors } from './api.js';
import { mountBenchSheet } from './bench-sheet.js';

const POLL_MS = 20000;
const WHO_KEY = 'nodewright.who';
let textPromise = null;

/** The library's texts from messages/designs.properties, fetched once per page. */
export function loadDesignText() {
  if (!textPromise) {
    textPromise = getJson('/api/v1/designs/ui-text').then((r) => (r.ok ? r.data : {}));
  }
  return textPromise;
}

/** Fills {0}, {1}... in a message. */
export function format(message, ...args) {
  return String(message ?? '').replace(/\{(\d+)\}/g, (m, i) => (args[i] === undefined ? m : String(args[i])));
}

/** A saved time in the user's locale and time zone (the browser's Intl.DateTimeFormat). */
const LOCAL_TIME = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

export function localTime(iso) {
  if (!iso) return '';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? String(iso) : LOCAL_TIME.format(d);
}

function el(tag, attrs = {}, text) {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (k === 'dataset') Object.assign(e.dataset, v); else e.setAttribute(k, v);
  }
  if (text !== undefined) e.textContent = text;
  return e;
}

const VIEW_KEY = (id) => `nodewright.view.design.${id}`;

export async function mountDesignBar(element, { kind, getParameters, setParameters, formRoot, getView, setView } = {}) {
  const t = await loadDesignText();
  const root = formRoot || document.querySelector('main') || document.body;
  const state = { id: null, version: null, name: '', lastOwnVersion: null, notice: null };

  element.classList.add('design-bar');
  element.replaceChildren();
  const nameInput = el('input', { 'data-role': 'name', 'data-field': 'name', maxlength: '200', 'aria-label': t['designbar.name'] });
  const tagsInput = el('input', { 'data-role': 'tags', maxlength: '400', 'aria-label': t['designbar.tags'] });
  const whoInput = el('input', { 'data-role': 'who', maxlength: '80', placeholder: t['designbar.whoPlaceholder'] || 'local', 'aria-label': t['designbar.who'] });
  const notesInput = el('textarea', { 'data-role': 'notes', rows: '2', maxlength: '20000', 'aria-label': t['designbar.notes'] });
  const saveButton = el('button', { type: 'button', 'data-role': 'save' }, t['designbar.save']);
  const saveAsButton = el('button', { type: 'button', 'data-role': 'save-as', class: 'secondary' }, t['designbar.saveAs']);
  const versionLabel = el('span', { 'data-role': 'version', class: 'design-version' }, t['designbar.unsaved']);
  const historyLink = el('a', { 'data-role': 'history', hidden: '' }, t['designbar.history']);
  const status = el('div', { 'data-role': 'status', role: 'status', class: 'design-status' });
  const errors = el('ul', { 'data-role': 'errors', class: 'design-errors' });
  const conflict = el('div', { 'data-role': 'conflict', class: 'design-conflict', role: 'alert', hidden: '' });
  const notice = el('div', { 'data-role': 'notice', class: 'design-notice', role: 'status', hidden: '' });

  const label = (text, input) => { const l = el('label'); l.append(el('span', {}, text), input); return l; };
  const fields = el('div', { class: 'design-fields' });
  fields.append(label(t['designbar.name'], nameInput), label(t['designbar.tags'], tagsInput),
    label(t['designbar.who'], whoInput), label(t['designbar.notes'], notesInput));
  const actions = el('div', { class: 'design-actions' });
  actions.append(saveButton, saveAsButton, versionLabel, historyLink);
  element.append(fields, actions, status, errors, conflict, notice);
  mountBenchSheet(actions, t, {
    kind,
    heading: document.querySelector('main h1')?.textContent?.trim(),
    state: () => ({ id: state.id, version: state.version, name: nameInput.value.trim() || state.name, savedAt: state.savedAt }),
    getParameters,
    status: (message, tone) => setStatus(message, tone),
  });

  whoInput.value = localStorage.getItem(WHO_KEY) || '';
  // The name is kept in this browser as it is typed (not only on a change event that a click may beat).
  const keepWho = () => localStorage.setItem(WHO_KEY, whoInput.value.trim());
  whoInput.addEventListener('input', keepWho);
  whoInput.addEventListener('change', keepWho);

  const who = () => whoInput.value.trim() || undefined;
  const tags = () => tagsInput.value.split(',').map((s) => s.trim()).filter(Boolean);

  function setStatus(message, tone = 'ok') {
    status.textContent = message || '';
    status.dataset.tone = tone;
  }

  function showErrors(problem) {
    errors.replaceChildren();
    // Parameter errors are shown on the page's own inputs (data-field="lengthMm").
    const onPage = { ...problem, errors: (problem?.errors || []).map((e) => ({ ...e, field: e.field.replace(/^parameters\.?/, '') })) };
    const unclaimed = showFieldErrors(root, onPage);
    for (const line of unclaimed) errors.append(el('li', {}, line));
  }

  function clearErrors() {
    errors.replaceChildren();
    clearFieldErrors(root);
  }

  function keepView(design) {
    if (getView) localStorage.setItem(VIEW_KEY(design.id), JSON.stringify(getView()));
  }

  function showDesign(design) {
    state.id = design.id;
    state.version = design.version;
    state.savedAt = design.updatedAt;
    state.name = design.name;
    nameInput.value = design.name;
    tagsInput.value = (design.tags || []).join(', ');
    notesInput.value = design.notes || '';
    versionLabel.textContent = format(t['designbar.version'], design.version);
    historyLink.href = `/library/${design.id}`;
    historyLink.hidden = false;
    element.dataset.designId = design.id;
    element.dataset.version = design.version;
    const url = new URL(window.location.href);
    url.searchParams.set('design', design.id);
    window.history.replaceState(null, '', url);
  }

  function hide(panel) { panel.hidden = true; panel.replaceChildren(); }

  async function load(id) {
    const r = await getJson(`/api/v1/designs/${encodeURIComponent(id)}`);
    if (!r.ok) {
      setStatus(format(t['designbar.loadFailed'], id, r.problem?.detail || r.status), 'error');
      return false;
    }
    if (r.data.kind !== kind) {
      setStatus(format(t['designbar.wrongKind'], id, r.data.kind), 'error');
      return false;
    }
    await setParameters(r.data.parameters);
    // The units saved with the design (what anyone who opens it sees), else this browser's last view of it.
    let view = r.data.units ? { units: r.data.units } : null;
    if (!view) {
      try { view = JSON.parse(localStorage.getItem(VIEW_KEY(r.data.id)) || 'null'); } catch (error) { view = null; }
    }
    if (view && setView) {
      try { await setView(view); } catch (error) { setStatus(String(error), 'error'); }
    }
    showDesign(r.data);
    hide(conflict); hide(notice); clearErrors();
    setStatus(format(t['designbar.loaded'], r.data.name, r.data.version));
    return true;
  }

  function body(extra) {
    const units = getView ? getView().units : undefined;
    return { name: nameInput.value.trim(), kind, parameters: getParameters(), notes: notesInput.value, tags: tags(), author: who(), units, ...extra };
  }

  async function saveNew(name) {
    const b = body({ name });
    if (!b.name) { setStatus(t['designbar.nameRequired'], 'error'); nameInput.focus(); return; }
    const r = await sendJson('POST', '/api/v1/designs', b);
    if (r.ok) {
      state.lastOwnVersion = `${r.data.id}:${r.data.version}`;
      keepView(r.data);
      showDesign(r.data); hide(conflict); hide(notice); clearErrors();
      setStatus(t['designbar.created']);
    } else {
      failed(r);
    }
  }

  async function save() {
    if (state.id === null) { await saveNew(nameInput.value.trim()); return; }
    const b = body({ version: state.version });
    delete b.kind;
    if (!b.name) { setStatus(t['designbar.nameRequired'], 'error'); nameInput.focus(); return; }
    const r = await sendJson('PUT', `/api/v1/designs/${state.id}`, b);
    if (r.ok) {
      state.lastOwnVersion = `${r.data.id}:${r.data.version}`;
      keepView(r.data);
      showDesign(r.data); hide(conflict); hide(notice); clearErrors();
      setStatus(format(t['designbar.saved'], r.data.version));
    } else if (r.status === 409) {
      showConflict(r.problem || {});
    } else {
      failed(r);
    }
  }

  function failed(r) {
    if (r.status === 400) {
      showErrors(r.problem);
      setStatus(t['designbar.invalid'], 'error');
    } else {
      setStatus(format(t['designbar.failed'], r.problem?.detail || r.problem?.title || r.status), 'error');
    }
  }

  function showConflict(problem) {
    conflict.replaceChildren();
    conflict.append(el('p', {}, format(t['designbar.conflict'], problem.changedBy, localTime(problem.changedAt),
      problem.currentVersion, problem.yourVersion ?? state.version)));
    const reload = el('button', { type: 'button', 'data-role': 'reload', class: 'secondary' }, t['designbar.reload']);
    const copy = el('button', { type: 'button', 'data-role': 'save-copy' }, t['designbar.saveCopy']);
    reload.addEventListener('click', () => load(state.id));
    copy.addEventListener('click', () => saveNew(format(t['designbar.copyName'], nameInput.value.trim() || state.name, who() || 'local')));
    conflict.append(copy, reload);
    conflict.hidden = false;
    setStatus('', 'error');
  }

  function showNotice(change) {
    notice.replaceChildren();
    const text = change.change === 'deleted'
      ? format(t['designbar.colleagueDeleted'], change.by)
      : format(t['designbar.colleagueSaved'], change.by, change.version, localTime(change.at));
    notice.append(el('p', {}, text));
    if (change.change !== 'deleted') {
      const reload = el('button', { type: 'button', 'data-role': 'notice-reload', class: 'secondary' }, t['designbar.reload']);
      reload.addEventListener('click', () => load(state.id));
      notice.append(reload);
    }
    const dismiss = el('button', { type: 'button', 'data-role': 'notice-dismiss', class: 'secondary' }, t['designbar.dismiss']);
    dismiss.addEventListener('click', () => hide(notice));
    notice.append(dismiss);
    notice.hidden = false;
    notice.dataset.version = change.version;
  }

  function changed(change) {
    if (state.id === null || change.id !== state.id) return;
    if (`${change.id}:${change.version}` === state.lastOwnVersion) return;
    if (change.change === 'saved' && change.version <= state.version) return;
    if (notice.dataset.version === String(change.version) && !notice.hidden) return;
    showNotice(change);
  }

  saveButton.addEventListener('click', save);
  saveAsButton.addEventListener('click', () => {
    let name = nameInput.value.trim();
    if (state.id !== null && name === state.name) name = `${name} ${t['library.copySuffix'] || '(copy)'}`;
    saveNew(name);
  });

  if (typeof EventSource !== 'undefined') {
    const source = new EventSource('/api/v1/designs/events');
    source.addEventListener('design-saved', (e) => changed(JSON.parse(e.data)));
    source.addEventListener('design-deleted', (e) => changed(JSON.parse(e.data)));
  }
  // Fallback for a colleague on another app instance (or a dropped event stream).
  setInterval(async () => {
    if (state.id === null || document.hidden) return;
    const r = await getJson(`/api/v1/designs/${state.id}`);
    if (r.ok && r.data.version > state.version) {
      changed({ change: 'saved', id: r.data.id, version: r.data.version, by: r.data.updatedBy, at: r.data.updatedAt });
    } else if (r.status === 404) {
      changed({ change: 'deleted', id: state.id, version: state.version, by: '?' });
    }
  }, POLL_MS);

  const wanted = new URLSearchParams(window.location.search).get('design');
  if (wanted) await load(wanted);
  element.dataset.ready = 'true';

  return { current: () => ({ id: state.id, version: state.version }), load };
}
