// The bench templates page: fret slotting and tone-hole drilling templates (SVG preview, SVG
// and PDF downloads), the gauge picker and the tone-hole solver (a job polled for progress,
// cancellable, whose result can be applied to the bore and opened in the bore bench).
import { clearFieldErrors, getJson, postJson, sendJson, showFieldErrors } from './common/api.js';
import { fmt } from './common/units.js';

const $ = (id) => document.getElementById(id);

/** Hand-over keys (sessionStorage): the bore bench reads OPEN_KEY, and may leave a bore in FROM_KEY. */
export const OPEN_KEY = 'nodewright.openAirColumn';
export const FROM_KEY = 'nodewright.boreForTemplates';

const POLL_MS = 200;
const state = { job: null, result: null, timer: null, urls: {}, limits: {} };

// ---- texts -------------------------------------------------------------------------------
const texts = new Map();
document.querySelectorAll('#tpl-text [data-key]').forEach((el) => texts.set(el.dataset.key, el.textContent));
function t(key, ...args) {
  const text = texts.get(`tpl.js.${key}`) ?? key;
  return text.replace(/\{(\d+)\}/g, (m, i) => (args[i] === undefined ? m : String(args[i])));
}

// ---- small helpers -----------------------------------------------------------------------
function csrfHeaders() {
  const token = document.querySelector('meta[name="_csrf"]');
  const header = document.querySelector('meta[name="_csrf_header"]');
  return token && header ? { [header.content]: token.content } : {};
}

/** POSTs JSON and resolves to {ok, blob, problem}: for SVG and PDF answers. */
async function postForBlob(url, body) {
  const response = await fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Accept: '*/*', ...csrfHeaders() },
    body: JSON.stringify(body),
  });
  if (response.ok) return { ok: true, blob: await response.blob(), problem: null };
  const type = response.headers.get('Content-Type') || '';
  return { ok: false, blob: null, problem: type.includes('json') ? await response.json() : { detail: response.statusText } };
}

const num = (text) => {
  const s = String(text).trim().replace(',', '.');
  return s === '' ? NaN : Number(s);
};

function showProblem(container, messageEl, problem) {
  const unclaimed = showFieldErrors(container, problem);
  const detail = problem && problem.detail ? problem.detail : '';
  messageEl.textContent = [detail, ...unclaimed].filter(Boolean).join(' ');
  messageEl.classList.add('bad');
}

function say(messageEl, text) {
  messageEl.textContent = text;
  messageEl.classList.remove('bad');
}

function showImage(img, blob, slot) {
  if (state.urls[slot]) URL.revokeObjectURL(state.urls[slot]);
  state.urls[slot] = URL.createObjectURL(blob);
  img.src = state.urls[slot];
}

function download(blob, name) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
}

// ---- fret template -----------------------------------------------------------------------
const fretForm = $('fret-form');

function fretRequest() {
  const problems = [];
  const field = (id, name, integer) => {
    const v = num($(id).value);
    if (!Number.isFinite(v) || (integer && !Number.isInteger(v))) problems.push({ field: name, message: t('notNumber') });
    return Number.isFinite(v) ? v : null;
  };
  const request = {
    scaleLengthMm: field('fret-scale', 'scaleLengthMm'),
    count: field('fret-count', 'count', true),
    divisionsPerOctave: field('fret-divisions', 'divisionsPerOctave', true),
    lineLengthMm: field('fret-line', 'lineLengthMm'),
    positions: [],
  };
  $('fret-positions').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const eq = line.lastIndexOf('=');
    const mm = eq > 0 ? num(line.slice(eq + 1)) : NaN;
    if (eq <= 0 || !Number.isFinite(mm)) {
      problems.push({ field: 'positions', message: t('badLine', i + 1) });
      return;
    }
    request.positions.push({ label: line.slice(0, eq).trim(), positionMm: mm });
  });
  return { request, problems };
}

async function fretTemplate(kind) {
  clearFieldErrors(fretForm);
  const { request, problems } = fretRequest();
  if (problems.length) {
    showProblem(fretForm, $('fret-message'), { errors: problems });
    return;
  }
  const paper = $('fret-paper').value;
  const url = kind === 'pdf' ? `/api/v1/templates/frets.pdf?paper=${encodeURIComponent(paper)}` : '/api/v1/templates/frets.svg';
  const answer = await postForBlob(url, request);
  if (!answer.ok) {
    showProblem(fretForm, $('fret-message'), answer.problem);
    return;
  }
  const stem = `frets-${request.scaleLengthMm}mm-${request.count}`;
  if (kind === 'preview') {
    showImage($('fret-image'), answer.blob, 'fret');
    say($('fret-message'), '');
  } else {
    const name = kind === 'pdf' ? `${stem}-${paper}.pdf` : `${stem}.svg`;
    download(answer.blob, name);
    say($('fret-message'), t('downloaded', name));
  }
}

fretForm.addEventListener('submit', (e) => { e.preventDefault(); fretTemplate('preview'); });
$('fret-svg').addEventListener('click', () => fretTemplate('svg'));
$('fret-pdf').addEventListener('click', () => fretTemplate('pdf'));

// ---- saddle compensation -----------------------------------------------------------------
const compForm = $('comp-form');
$('comp-strings').value = ['E4, nylon, 0.71', 'B3, nylon, 0.82', 'G3, nylon, 1.03', 'D3, nylon, 0.38, copper, 0.16',
  'A2, nylon, 0.38, copper, 0.22', 'E2, nylon, 0.40, copper, 0.29'].join('\n');

compForm.addEventListener('submit', async (e) => {
  e.preventDefault();
  clearFieldErrors(compForm);
  const problems = [];
  const field = (id, name) => {
    const v = num($(id).value);
    if (!Number.isFinite(v)) problems.push({ field: name, message: t('notNumber') });
    return Number.isFinite(v) ? v : null;
  };
  const request = {
    lengthMm: field('comp-scale', 'lengthMm'), actionAt12thMm: field('comp-action', 'actionAt12thMm'),
    nutHeightMm: field('comp-nut', 'nutHeightMm'), frets: field('comp-frets', 'frets'),
    compensateNut: $('comp-both').checked, strings: [],
  };
  $('comp-strings').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const p = line.split(',').map((x) => x.trim());
    const d = num(p[2] ?? '');
    const wd = num(p[4] ?? '');
    if ((p.length !== 3 && p.length !== 5) || !Number.isFinite(d) || (p.length === 5 && !Number.isFinite(wd))) {
      problems.push({ field: 'strings', message: t('badLine', i + 1) });
      return;
    }
    const hz = num(p[0]);
    request.strings.push({
      ...(Number.isFinite(hz) ? { targetHz: hz } : { note: p[0] }), material: p[1], diameterMm: d,
      ...(p.length === 5 ? { wrapMaterial: p[3], wrapDiameterMm: wd } : {}),
    });
  });
  if (problems.length) {
    showProblem(compForm, $('comp-message'), { errors: problems });
    return;
  }
  const answer = await postJson('/api/v1/templates/compensation', request);
  if (!answer.ok) {
    showProblem(compForm, $('comp-message'), answer.problem);
    return;
  }
  say($('comp-message'), '');
  const rows = $('comp-rows');
  rows.replaceChildren();
  answer.data.strings.forEach((s, i) => {
    const tr = document.createElement('tr');
    tr.dataset.setback = s.saddleSetbackMm;
    [String(i + 1), fmt(s.tensionN, 1), fmt(s.saddleSetbackMm, 2), fmt(s.nutSetbackMm, 2),
      s.uncompensatedCentsAt12th === null ? '' : fmt(s.uncompensatedCentsAt12th, 1), fmt(s.worstCompensatedCents, 2)]
      .forEach((text) => { const td = document.createElement('td'); td.textContent = text; tr.appendChild(td); });
    rows.appendChild(tr);
  });
  $('comp-table').hidden = false;
  $('comp-model').textContent = answer.data.model;
  const list = $('comp-assumptions');
  list.replaceChildren();
  answer.data.assumptions.forEach((a) => { const li = document.createElement('li'); li.textContent = a; list.appendChild(li); });
});

// ---- gauge picker ------------------------------------------------------------------------
const gaugeForm = $('gauge-form');
$('gauge-strings').value = ['E4, 72, plain-steel', 'B3, 68, plain-steel', 'G3, 70, plain-steel',
  'D3, 76, nickel-plated-steel/nickel-plated-steel', 'A2, 78, nickel-plated-steel/nickel-plated-steel',
  'E2, 75, nickel-plated-steel/nickel-plated-steel'].join('\n');

function gaugeRequest() {
  const problems = [];
  const lengthMm = num($('gauge-scale').value);
  if (!Number.isFinite(lengthMm)) problems.push({ field: 'lengthMm', message: t('notNumber') });
  const strings = [];
  $('gauge-strings').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const parts = line.split(',').map((s) => s.trim());
    const tension = num(parts[1] ?? '');
    if (parts.length !== 3 || !Number.isFinite(tension) || !parts[2]) {
      problems.push({ field: 'strings', message: t('badLine', i + 1) });
      return;
    }
    const [material, wrapMaterial] = parts[2].split('/');
    const hz = num(parts[0]);
    strings.push({
      ...(Number.isFinite(hz) ? { targetHz: hz } : { note: parts[0] }),
      targetTensionN: tension, material, ...(wrapMaterial ? { wrapMaterial } : {}),
    });
  });
  const request = { lengthMm: Number.isFinite(lengthMm) ? lengthMm : null, strings };
  const available = $('gauge-available').value.trim();
  if (available) {
    request.availableGaugesMm = available.split(/[,\s]+/).filter(Boolean).map(num);
    if (request.availableGaugesMm.some((v) => !Number.isFinite(v))) problems.push({ field: 'availableGaugesMm', message: t('notNumber') });
  }
  return { request, problems };
}

gaugeForm.addEventListener('submit', async (e) => {
  e.preventDefault();
  clearFieldErrors(gaugeForm);
  const { request, problems } = gaugeRequest();
  if (problems.length) {
    showProblem(gaugeForm, $('gauge-message'), { errors: problems });
    return;
  }
  const answer = await postJson('/api/v1/inverse/gauges', request);
  if (!answer.ok) {
    showProblem(gaugeForm, $('gauge-message'), answer.problem);
    return;
  }
  say($('gauge-message'), '');
  const rows = $('gauge-rows');
  rows.replaceChildren();
  const warnings = $('gauge-warnings');
  warnings.replaceChildren();
  answer.data.strings.forEach((s, i) => {
    const tr = document.createElement('tr');
    const gauge = s.wound ? `${fmt(s.outerDiameterMm, 3)} mm (${fmt(s.outerDiameterIn, 3)} in) wound`
      : `${fmt(s.diameterMm, 3)} mm (${fmt(s.diameterIn, 4)} in)`;
    [String(i + 1), fmt(s.targetTensionN, 1), gauge, fmt(s.tensionN, 1), fmt(s.offPct, 1), fmt(s.stressPct, 0)]
      .forEach((text) => { const td = document.createElement('td'); td.textContent = text; tr.appendChild(td); });
    rows.appendChild(tr);
    (s.warnings || []).forEach((w) => {
      const li = document.createElement('li');
      li.textContent = `${i + 1}: ${w}`;
      warnings.appendChild(li);
    });
  });
  const total = document.createElement('tr');
  total.innerHTML = '<td></td><td></td><td></td><td></td><td></td><td></td>';
  total.children[3].textContent = fmt(answer.data.totalTensionN, 1);
  rows.appendChild(total);
  $('gauge-table').hidden = false;
});

// ---- bore, drilling template, solver -----------------------------------------------------
const borePanel = $('bore-panel');

function readBore() {
  try {
    return { bore: JSON.parse($('bore-json').value), problem: null };
  } catch (err) {
    return { bore: null, problem: { errors: [{ field: 'bore', message: t('badJson', err.message) }] } };
  }
}

/** Fingerings as text lines; holes shown from 1 (the API counts closedHoles from 0). */
function fingeringLines(fingerings) {
  return fingerings.map((f) => `${f.name}, ${f.targetNote ?? f.targetHz}, ${(f.closedHoles || []).map((h) => h + 1).join(' ')}`).join('\n');
}

/** The fingering lines as the API's fingerings (closedHoles from 0). */
function readFingerings() {
  const rows = [];
  const problems = [];
  $('fingering-lines').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const parts = line.split(',').map((s) => s.trim());
    const closed = (parts[2] ?? '').split(/\s+/).filter(Boolean).map(Number);
    if (parts.length < 2 || !parts[0] || !parts[1] || closed.some((n) => !Number.isInteger(n) || n < 1)) {
      problems.push({ field: 'fingerings', message: t('badLine', i + 1) });
      return;
    }
    const hz = num(parts[1]);
    rows.push({
      name: parts[0], closedHoles: closed.map((n) => n - 1),
      ...(Number.isFinite(hz) ? { targetHz: hz } : { targetNote: parts[1] }), register: 1,
    });
  });
  return { rows, problems };
}

function limits() {
  const get = (id) => num($(id).value);
  return {
    ...state.limits,
    varyDiameters: $('vary-diameters').checked, varyFoot: $('vary-foot').checked,
    minDiameterMm: get('min-diameter'), maxDiameterMm: get('max-diameter'), minWallMm: get('min-wall'),
  };
}

/** Puts a bore (an air-column request, fingerings included or not) into the panel. */
function showBore(request) {
  const bore = { ...request };
  const fingerings = bore.fingerings || [];
  delete bore.fingerings;
  $('bore-json').value = JSON.stringify(bore, null, 1);
  if (fingerings.length) $('fingering-lines').value = fingeringLines(fingerings);
}

async function loadDemo() {
  const answer = await getJson('/api/v1/inverse/tone-holes/demo');
  if (!answer.ok) return;
  showBore(answer.data.bore);
  const l = answer.data.limits || {};
  state.limits = { minPositionMm: l.minPositionMm, endMarginMm: l.endMarginMm, minFootMm: l.minFootMm, maxFootMm: l.maxFootMm };
  if (l.minDiameterMm) $('min-diameter').value = l.minDiameterMm;
  if (l.maxDiameterMm) $('max-diameter').value = l.maxDiameterMm;
  if (l.minWallMm !== undefined && l.minWallMm !== null) $('min-wall').value = l.minWallMm;
  $('vary-foot').checked = l.varyFoot !== false;
  $('vary-diameters').checked = !!l.varyDiameters;
}

function fromBench() {
  const stored = sessionStorage.getItem(FROM_KEY);
  if (!stored) {
    say($('bore-message'), t('noBench'));
    return;
  }
  const handed = JSON.parse(stored);
  state.limits = {};
  showBore(handed.request || handed);
  say($('bore-message'), t('fromBench'));
}

async function boreTemplate(kind) {
  clearFieldErrors(borePanel);
  const { bore, problem } = readBore();
  if (problem) {
    showProblem(borePanel, $('bore-message'), problem);
    return;
  }
  const paper = $('bore-paper').value;
  const url = kind === 'pdf' ? `/api/v1/templates/tone-holes.pdf?paper=${encodeURIComponent(paper)}` : '/api/v1/templates/tone-holes.svg';
  const answer = await postForBlob(url, bore);
  if (!answer.ok) {
    showProblem(borePanel, $('bore-message'), answer.problem);
    return;
  }
  if (kind === 'pdf') {
    download(answer.blob, `tone-holes-${paper}.pdf`);
    say($('bore-message'), t('downloaded', `tone-holes-${paper}.pdf`));
  } else {
    showImage($('bore-image'), answer.blob, 'bore');
    say($('bore-message'), '');
  }
}

function setRunning(running) {
  $('solve-start').disabled = running;
  $('solve-cancel').disabled = !running;
}

async function startSolve() {
  clearFieldErrors(borePanel);
  const { bore, problem } = readBore();
  const f = readFingerings();
  if (problem || f.problems.length) {
    showProblem(borePanel, $('bore-message'), { errors: [...(problem ? problem.errors : []), ...f.problems] });
    return;
  }
  const answer = await postJson('/api/v1/inverse/tone-holes', { bore: { ...bore, fingerings: f.rows }, limits: limits() });
  if (!answer.ok) {
    showProblem(borePanel, $('bore-message'), answer.problem);
    return;
  }
  say($('bore-message'), '');
  $('solve-result').hidden = true;
  state.job = answer.data.id;
  setRunning(true);
  $('solve-progress').value = 0;
  poll();
}

async function poll() {
  if (!state.job) return;
  const answer = await getJson(`/api/v1/inverse/jobs/${encodeURIComponent(state.job)}`);
  if (!answer.ok) {
    setRunning(false);
    $('solve-state').textContent = t('error', answer.status);
    return;
  }
  const job = answer.data;
  const progress = $('solve-progress');
  progress.value = job.status === 'succeeded' ? 1 : job.progress.fraction;
  $('solve-state').dataset.status = job.status;
  if (job.status === 'queued') {
    $('solve-state').textContent = t('queued');
  } else if (job.status === 'running') {
    $('solve-state').textContent = t('running', job.progress.evaluations,
      job.progress.worstCents == null ? '...' : fmt(job.progress.worstCents, 2));
  } else {
    finish(job);
    return;
  }
  state.timer = setTimeout(poll, POLL_MS);
}

function finish(job) {
  setRunning(false);
  state.job = null;
  if (job.status === 'cancelled') {
    $('solve-state').textContent = t('cancelled');
    return;
  }
  if (job.status === 'failed') {
    $('solve-state').textContent = t('failed', job.error);
    return;
  }
  const r = job.result;
  state.result = r;
  $('solve-state').textContent = r.withinTolerance ? t('succeeded', fmt(job.elapsedSeconds, 2), fmt(r.toleranceCents, 2))
    : t('notConverged', fmt(job.elapsedSeconds, 2), fmt(r.worstCents, 2));
  const cell = (tr, text) => { const td = document.createElement('td'); td.textContent = text; tr.appendChild(td); };
  const notes = $('note-rows');
  notes.replaceChildren();
  r.notes.forEach((n) => {
    const tr = document.createElement('tr');
    tr.dataset.cents = n.achievedCents;
    cell(tr, n.fingering); cell(tr, fmt(n.targetHz, 2)); cell(tr, fmt(n.startCents, 1));
    cell(tr, fmt(n.achievedHz, 2)); cell(tr, fmt(n.achievedCents, 2));
    notes.appendChild(tr);
  });
  const holes = $('hole-rows');
  holes.replaceChildren();
  r.holes.forEach((h) => {
    const tr = document.createElement('tr');
    cell(tr, String(h.hole)); cell(tr, fmt(h.positionMm, 2)); cell(tr, fmt(h.movedMm, 2));
    cell(tr, fmt(h.diameterMm, 2)); cell(tr, fmt(h.diameterChangeMm, 2));
    holes.appendChild(tr);
  });
  $('foot-line').textContent = t('foot', fmt(r.footMovedMm, 2));
  $('solve-result').hidden = false;
}

async function cancelSolve() {
  if (!state.job) return;
  clearTimeout(state.timer);
  const answer = await sendJson('DELETE', `/api/v1/inverse/jobs/${encodeURIComponent(state.job)}`);
  // A running job stops at its next evaluation: keep polling until it says so.
  if (answer.ok) poll();
}

function applyResult() {
  if (!state.result) return;
  showBore(state.result.bore);
  say($('bore-message'), t('applied'));
}

/**
 * Hands the adjusted bore to the bore bench: saved as an air-column design in the shop library and
 * opened with /air-columns?design=ID (the design bar's own hook). When the library refuses it, the
 * bore goes through sessionStorage under OPEN_KEY and the page opens at /air-columns#from-templates.
 */
async function openInBench() {
  if (!state.result) return;
  const stamp = new Date().toISOString().slice(0, 16).replace('T', ' ');
  const answer = await postJson('/api/v1/designs', { name: `${t('solvedName')} ${stamp}`, kind: 'air-column', parameters: state.result.bore });
  if (answer.ok && answer.data && answer.data.id !== undefined) {
    window.location.assign(`/air-columns?design=${encodeURIComponent(answer.data.id)}`);
    return;
  }
  sessionStorage.setItem(OPEN_KEY, JSON.stringify({ source: 'templates', request: state.result.bore }));
  window.location.assign('/air-columns#from-templates');
}

$('bore-demo').addEventListener('click', loadDemo);
$('bore-from-bench').addEventListener('click', fromBench);
$('bore-preview').addEventListener('click', () => boreTemplate('preview'));
$('bore-pdf').addEventListener('click', () => boreTemplate('pdf'));
$('solve-start').addEventListener('click', startSolve);
$('solve-cancel').addEventListener('click', cancelSolve);
$('solve-apply').addEventListener('click', applyResult);
$('solve-open').addEventListener('click', openInBench);

if (sessionStorage.getItem(FROM_KEY)) fromBench(); else loadDemo();
