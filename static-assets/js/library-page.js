// Shop library pages: the list (search, compare, import/export), one design (history, restore,
// duplicate, delete, any two revisions compared) and two designs compared (library/compare.js).
// Every name, tag and note goes into the page with textContent, never as HTML.
import { getJson, sendJson, postJson } from './common/api.js';
import { loadDesignText, format, localTime } from './common/design-bar.js';
import { showCompare, parameterRows, rememberedUnits } from './library/compare.js';

const DESIGNERS = { string: '/strings', 'string-set': '/string-sets', 'air-column': '/air-columns', bar: '/bars', plate: '/plates' };

const main = document.querySelector('main.library');
let t = {};

function el(tag, attrs = {}, text) {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, v);
  if (text !== undefined && text !== null) e.textContent = text;
  return e;
}

function status(message, tone = 'ok') {
  const s = document.getElementById('library-status');
  s.textContent = message || '';
  s.dataset.tone = tone;
}

function problemText(r) {
  const p = r.problem || {};
  const fields = (p.errors || []).map((e) => `${e.field}: ${e.message}`).join('; ');
  return [p.detail || p.title || `HTTP ${r.status}`, fields].filter(Boolean).join(' ');
}

/** A POST of a copy of design d, named "<name> (copy)". */
async function duplicate(d) {
  const name = `${d.name} ${t['library.copySuffix']}`.slice(0, 200);
  const r = await postJson('/api/v1/designs', { name, kind: d.kind, parameters: d.parameters, notes: d.notes, tags: d.tags });
  if (r.ok) status(format(t['library.duplicated'], r.data.name)); else status(problemText(r), 'error');
  return r;
}

// ---------- the list ----------
async function listView() {
  const form = document.getElementById('library-search');
  const tbody = document.querySelector('#design-list tbody');
  const params = new URLSearchParams(window.location.search);
  for (const key of ['name', 'tag', 'kind']) if (params.get(key)) form.elements[key].value = params.get(key);

  async function refresh() {
    const q = new URLSearchParams();
    for (const key of ['name', 'tag', 'kind']) {
      const v = form.elements[key].value.trim();
      if (v) q.set(key, v);
    }
    const r = await getJson(`/api/v1/designs?${q}`);
    tbody.replaceChildren();
    if (!r.ok) { status(problemText(r), 'error'); return; }
    document.getElementById('library-empty').hidden = r.data.length > 0;
    for (const d of r.data) tbody.append(row(d));
    main.dataset.loaded = String(r.data.length);
    showDemoRemoval();
  }

  // The first start's demo designs (tag "demo") go in one click.
  const removeDemo = document.getElementById('remove-demo');
  async function showDemoRemoval() {
    const demo = await getJson('/api/v1/designs?tag=demo&limit=1');
    removeDemo.hidden = !(demo.ok && demo.data.length > 0);
  }
  removeDemo.addEventListener('click', async () => {
    const r = await sendJson('DELETE', '/api/v1/designs/demo');
    if (r.ok) { status(format(t['library.demoRemoved'], r.data.deleted)); refresh(); } else status(problemText(r), 'error');
  });

  function row(d) {
    const tr = el('tr', { 'data-design-id': String(d.id), 'data-kind': d.kind });
    const tick = el('input', { type: 'checkbox', class: 'compare-tick', 'aria-label': t['library.col.compare'] });
    tick.value = String(d.id);
    const open = el('a', { href: `/library/${d.id}`, class: 'design-name' }, d.name);
    const tagCell = el('td', { class: 'tags' });
    for (const tag of d.tags) {
      const a = el('a', { href: `/library?tag=${encodeURIComponent(tag)}`, class: 'tag' }, tag);
      tagCell.append(a);
    }
    const actions = el('td', { class: 'row-actions' });
    actions.append(el('a', { href: `${DESIGNERS[d.kind]}?design=${d.id}`, class: 'open-design' }, t['library.open']));
    const dup = el('button', { type: 'button', class: 'secondary duplicate' }, t['library.duplicate']);
    dup.addEventListener('click', async () => { if ((await duplicate(d)).ok) refresh(); });
    const del = el('button', { type: 'button', class: 'danger delete' }, t['library.delete']);
    del.addEventListener('click', async () => {
      if (!window.confirm(format(t['library.confirmDelete'], d.name))) return;
      const r = await sendJson('DELETE', `/api/v1/designs/${d.id}`);
      if (r.ok) { status(format(t['library.deleted'], d.name)); refresh(); } else status(problemText(r), 'error');
    });
    actions.append(dup, del);
    const cells = [el('td'), el('td'), el('td', {}, t[`library.kind.${d.kind}`] || d.kind), tagCell,
      el('td', { class: 'num' }, String(d.version)), el('td', { class: 'when' }), el('td', {}, d.updatedBy), actions];
    cells[0].append(tick);
    cells[1].append(open);
    cells[5].append(el('time', { datetime: d.updatedAt ?? '' }, localTime(d.updatedAt)));
    tr.append(...cells);
    return tr;
  }

  form.addEventListener('submit', (e) => {
    e.preventDefault();
    const q = new URLSearchParams(new FormData(form));
    for (const [k, v] of [...q]) if (!v) q.delete(k);
    window.history.replaceState(null, '', `/library${q.size ? `?${q}` : ''}`);
    refresh();
  });

  document.getElementById('compare-selected').addEventListener('click', () => {
    const ticked = [...tbody.querySelectorAll('.compare-tick:checked')].map((c) => c.closest('tr'));
    if (ticked.length !== 2 || ticked[0].dataset.kind !== ticked[1].dataset.kind) {
      status(t['library.compareNeedTwo'], 'error');
      return;
    }
    window.location.href = `/library/compare?a=${ticked[0].dataset.designId}&b=${ticked[1].dataset.designId}`;
  });

  document.getElementById('import-file').addEventListener('change', async (e) => {
    const file = e.target.files[0];
    if (!file) return;
    let doc;
    try {
      doc = JSON.parse(await file.text());
    } catch (err) {
      status(`${file.name}: ${err.message}`, 'error');
      return;
    }
    const r = await postJson('/api/v1/designs/import', doc);
    e.target.value = '';
    if (r.ok) { status(format(t['library.importDone'], r.data.imported.length)); refresh(); } else status(problemText(r), 'error');
  });

  const source = new EventSource('/api/v1/designs/events');
  source.addEventListener('design-saved', () => refresh());
  source.addEventListener('design-deleted', () => refresh());
  await refresh();
}

// ---------- one design ----------
/** A revision's parameters, labelled in the user's units, those differing from the current one marked. */
function paramRows(tbody, parameters, kind, highlight = new Set()) {
  tbody.replaceChildren();
  const units = rememberedUnits(kind, window.localStorage);
  const words = new Proxy({}, { get: (_, key) => t[key] || undefined });
  for (const row of parameterRows(parameters, parameters, [...highlight].map((path) => ({ path })), units, words)) {
    const tr = el('tr', { 'data-path': row.path });
    if (row.differs) tr.classList.add('differs');
    tr.append(el('th', {}, row.label), el('td', {}, row.a), el('td', { class: 'unit' }, row.unit));
    tbody.append(tr);
  }
}

async function designView() {
  const id = main.dataset.designId;
  const tbody = document.querySelector('#revision-list tbody');
  let design = null;

  async function refresh() {
    const [d, revs] = await Promise.all([getJson(`/api/v1/designs/${id}`), getJson(`/api/v1/designs/${id}/revisions`)]);
    if (!d.ok) { status(problemText(d), 'error'); return; }
    design = d.data;
    document.getElementById('design-name').textContent = design.name;
    document.getElementById('design-saved').textContent = format(t['library.lastSaved'], design.version, design.updatedBy, localTime(design.updatedAt));
    tbody.replaceChildren();
    for (const r of revs.data.slice().reverse()) tbody.append(revisionRow(r));
    fillRevisionPicker(revs.data);
    main.dataset.version = String(design.version);
  }

  function revisionRow(r) {
    const tr = el('tr', { 'data-version': String(r.version) });
    if (r.version === design.version) tr.classList.add('current');
    const actions = el('td', { class: 'row-actions' });
    const view = el('button', { type: 'button', class: 'secondary view-revision' }, t['library.rev.view']);
    view.addEventListener('click', async () => {
      const cmp = await getJson(`/api/v1/designs/${id}/revisions/compare?from=${r.version}&to=${design.version}`);
      const differs = new Set(cmp.ok ? cmp.data.differences.map((x) => x.path) : []);
      document.getElementById('revision-view').hidden = false;
      document.getElementById('revision-view-title').textContent = format(t['library.rev.parameters'], r.version);
      paramRows(document.querySelector('#revision-params tbody'), r.parameters, design.kind, differs);
    });
    actions.append(view);
    if (r.version !== design.version) {
      const restore = el('button', { type: 'button', class: 'restore-revision' }, t['library.rev.restore']);
      restore.addEventListener('click', async () => {
        const res = await postJson(`/api/v1/designs/${id}/revisions/${r.version}/restore`, { version: design.version, author: localStorage.getItem('nodewright.who') || undefined });
        if (res.ok) { status(format(t['library.rev.restored'], r.version, res.data.version)); refresh(); } else status(problemText(res), 'error');
      });
      actions.append(restore);
    }
    tr.append(el('td', {}, String(r.version)), el('td', {}, localTime(r.savedAt)), el('td', {}, r.savedBy),
      el('td', {}, r.name), el('td', {}, r.comment), actions);
    return tr;
  }

  /** Any two revisions of the history, compared on the compare page. */
  function fillRevisionPicker(revisions) {
    const from = document.getElementById('compare-from');
    const to = document.getElementById('compare-to');
    const keep = [from.value, to.value];
    for (const select of [from, to]) {
      select.replaceChildren(...revisions.map((r) => el('option', { value: String(r.version) },
        format(t['library.rev.option'], r.version, localTime(r.savedAt), r.comment || ''))));
    }
    from.value = keep[0] && revisions.some((r) => String(r.version) === keep[0]) ? keep[0] : String(revisions[0]?.version ?? '');
    to.value = keep[1] && revisions.some((r) => String(r.version) === keep[1]) ? keep[1] : String(revisions[revisions.length - 1]?.version ?? '');
    document.getElementById('compare-revisions').hidden = revisions.length < 2;
  }
  document.getElementById('compare-revisions').addEventListener('submit', (e) => {
    e.preventDefault();
    const from = document.getElementById('compare-from').value;
    const to = document.getElementById('compare-to').value;
    if (from === to) { status(t['library.rev.pickTwo'], 'error'); return; }
    window.location.href = `/library/compare?design=${encodeURIComponent(id)}&from=${from}&to=${to}`;
  });

  document.getElementById('duplicate-design').addEventListener('click', async () => {
    const r = await duplicate(design);
    if (r.ok) window.location.href = `/library/${r.data.id}`;
  });
  const dialog = document.getElementById('confirm-delete');
  document.getElementById('delete-design').addEventListener('click', () => {
    document.getElementById('confirm-delete-text').textContent = format(t['library.confirmDelete'], design.name);
    dialog.showModal();
  });
  document.getElementById('confirm-delete-no').addEventListener('click', () => dialog.close());
  document.getElementById('confirm-delete-yes').addEventListener('click', async () => {
    dialog.close();
    const r = await sendJson('DELETE', `/api/v1/designs/${id}`);
    if (r.ok) window.location.href = '/library'; else status(problemText(r), 'error');
  });

  const source = new EventSource('/api/v1/designs/events');
  source.addEventListener('design-saved', (e) => { if (String(JSON.parse(e.data).id) === id) refresh(); });
  await refresh();
}

(async () => {
  t = await loadDesignText();
  const view = main.dataset.view;
  if (view === 'list') await listView();
  else if (view === 'design') await designView();
  else if (view === 'compare') await showCompare({ getJson, postJson, t: (k) => t[k], status, problemText });
  main.dataset.ready = 'true';
})();
