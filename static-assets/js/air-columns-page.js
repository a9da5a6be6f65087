// The bore bench page: the bore editor, its drawing, the analysis from
// POST /api/v1/air-columns/analyze, the impedance and standing-wave charts, the resonance and
// fingering tables. Every figure comes from the server; the page only converts units and
// compares frequencies (notes, cents, series).
import { clearFieldErrors, postJson, showFieldErrors } from './common/api.js';
import { createRequestLoop } from './common/request-loop.js';
import { loadPanels, showPanelFailure } from './common/panels.js';
import { OPEN_AIR_COLUMN, BORE_FOR_TEMPLATES, handOver, handedOver } from './common/handover.js';
import { fmt, fromMm } from './common/units.js';
import { BoreEditor, parseNumber } from './air/editor.js';
import { drawBore } from './air/drawing.js';
import { drawImpedance, drawProfile } from './air/charts.js';
import { FingeringTable } from './air/fingerings.js';
import { alignment, suggestedSeries } from './air/tuning.js';
import { nearestNote } from './common/notes.js';
import { preset } from './air/presets.js';
import { MouthEditor } from './air/mouth.js';
import { t } from './air/text.js';

const ANALYZE_URL = '/api/v1/air-columns/analyze';
const $ = (id) => document.getElementById(id);
const root = document.querySelector('main.air-bench');

const state = { request: null, response: null, predictions: [], tolerance: 10 };

const editor = new BoreEditor({
  segmentBody: $('segment-rows'),
  holeBody: $('hole-rows'),
  onChange: () => changed(),
  onStructure: (holeOrder) => fingerings.holesChanged(editor.holes.length, holeOrder),
});
const mouthEditor = new MouthEditor({
  root: $('mouth-editor'),
  onChange: () => changed(),
  // A mouth decides which extremum is a playing resonance: follow it (the server refuses a contradiction).
  onKind: (end) => { $('input-end').value = end; },
});
const fingerings = new FingeringTable({
  body: $('fingering-rows'),
  cards: $('fingering-cards'),
  onChange: () => changed(),
  onApply: (closedHoles) => editor.setClosedHoles(closedHoles),
});

// ---- the request ------------------------------------------------------------------------

const NUMBER_FIELDS = [
  ['temperature', 'temperatureC'], ['humidity', 'relativeHumidityPct'], ['f-min', 'fMinHz'], ['f-max', 'fMaxHz'],
  ['points', 'points'], ['reference-a4', 'referenceA4Hz'],
];

const a4 = () => {
  const v = parseNumber($('reference-a4').value);
  return v > 0 ? v : 440;
};

/**
 * The analyze request the editor describes (fingerings included), and local problems: text that
 * is not a number is named on its own field here; everything else the server judges.
 */
function buildRequest() {
  const { segments, holes, problems } = editor.read();
  const request = { segments, inputEnd: $('input-end').value, outputEnd: $('output-end').value, holes };
  for (const [id, field] of NUMBER_FIELDS) {
    const v = parseNumber($(id).value);
    if (!Number.isFinite(v)) problems.push({ field, message: t('notNumber') });
    request[field] = Number.isFinite(v) ? v : null;
  }
  request.losses = $('losses').checked;
  const { mouth, problems: mouthProblems } = mouthEditor.read();
  problems.push(...mouthProblems);
  if (mouth) request.mouth = mouth;
  const breath = mouthEditor.readBreath();
  if (breath) request.breath = breath;
  if (!segments.length) problems.push({ field: 'segments', message: t('emptyBore') });
  request.fingerings = fingerings.read();
  return { request, problems };
}

// ---- analysis ---------------------------------------------------------------------------

function changed() {
  drawCurrentBore();
  if (!$('auto-analyze').checked) return;
  analyze();
}

/** The page kernel's request loop: one request in flight, the latest change next, none older shown. */
const loop = createRequestLoop({
  build: () => {
    const built = buildRequest();
    drawCurrentBore();
    return built;
  },
  send: (request) => postJson(ANALYZE_URL, request),
  event: 'nodewright:air-analyzed',
  view: {
    busy(on) {
      root.classList.toggle('busy', on);
      if (on) $('analysis-summary').textContent = t('analyzing');
    },
    answered(request, response, seq) {
      clearFieldErrors(root);
      $('form-errors').replaceChildren();
      root.classList.remove('stale');
      state.request = request;
      state.response = response;
      showResults();
      root.dataset.analyzed = String(seq);
      showFingerings(request, response);
    },
    refused(problem, request, seq, local) {
      markProblems(local ? { ...problem, detail: t('fixFields') } : problem);
      root.dataset.rejected = String(seq);
    },
    failed(error, seq) {
      markProblems({ detail: t('failed', error?.message ?? String(error)) });
      root.dataset.rejected = String(seq);
    },
  },
});
const analyze = () => loop.run();

/** Inline errors on the offending rows and fields; the rows stay as the user entered them. */
function markProblems(problem) {
  const unclaimed = showFieldErrors(root, problem);
  const items = new Set([problem?.detail ?? t('failed', problem?.title ?? '?'), t('fixFields'), ...unclaimed]);
  $('form-errors').replaceChildren(...[...items].filter(Boolean).map((text) => Object.assign(document.createElement('li'), { textContent: text })));
  $('analysis-summary').textContent = '';
  root.classList.remove('busy');
  root.classList.add('stale');
}

// ---- results ----------------------------------------------------------------------------

function showResults() {
  const { request, response } = state;
  const res = response.resonances ?? [];
  const inputClosed = request.inputEnd === 'closed';
  $('analysis-summary').textContent = [
    t('speedOfSound', fmt(response.speedOfSoundMps, 2)),
    ...(response.air ? [t('airDensity', fmt(response.air.densityKgPerM3, 4))] : []),
    t('resonanceCount', res.length, fmt(request.fMinHz, 0), fmt(request.fMaxHz, 0)),
    inputClosed ? t('maxima') : t('minima'),
  ].join(' · ');
  $('air-warnings').replaceChildren(...(response.warnings ?? []).map((w) => Object.assign(document.createElement('li'), { textContent: w })));
  drawImpedance($('impedance-chart'), response.impedance, res, { showPhase: $('show-phase').checked, inputClosed });
  fillResonanceTable();
  fillMouthSummary();
  fillProfileChoices();
  showProfile();
}

/** The mouth's end correction and what it does, next to the resonance table. */
function fillMouthSummary() {
  const { response } = state;
  const m = response?.mouth;
  const unit = $('units').value;
  const parts = [];
  if (m) {
    const dl = m.endCorrectionMm;
    const first = m.resonances?.[0]?.cents;
    parts.push(t('mouthSummary', m.kind, dl == null ? '—' : fmt(fromMm(dl, unit), unit === 'inch' ? 3 : 2),
      unit === 'inch' ? t('unitInch') : t('unitMm'), first == null ? '—' : signedCents(first)));
    if (m.helmholtzHz != null) parts.push(t('mouthHelmholtz', fmt(m.helmholtzHz, 0)));
    if (m.missingApexVolumeMm3 != null) parts.push(t('mouthApex', fmt(m.missingApexVolumeMm3, 0)));
  } else {
    parts.push(t('mouthNone'));
  }
  const along = response?.air?.alongBore;
  if (along?.length) {
    const c = along.map((p) => p.speedOfSoundMps);
    parts.push(` · ${t('breathSummary', fmt(Math.min(...c), 1), fmt(Math.max(...c), 1))}`);
  }
  const el = $('mouth-summary');
  el.textContent = parts.join('');
  el.dataset.endCorrectionMm = m?.endCorrectionMm == null ? '' : String(m.endCorrectionMm);
}

function seriesChoice() {
  const s = $('series').value;
  return s === 'auto' ? state.response?.series ?? suggestedSeries(state.request) : s;
}

function fillResonanceTable() {
  const body = $('resonance-table').querySelector('tbody');
  const res = state.response?.resonances ?? [];
  const series = seriesChoice();
  $('series-note').textContent = series === 'odd' ? t('seriesOdd') : t('seriesHarmonic');
  if (!res.length) {
    const tr = document.createElement('tr');
    const td = Object.assign(document.createElement('td'), { textContent: t('noResonances'), colSpan: 10 });
    tr.append(td);
    body.replaceChildren(tr);
    return;
  }
  const fromServer = $('series').value === 'auto' && res.every((r) => Number.isFinite(r.centsFromSeries));
  const align = fromServer
    ? res.map((r) => ({ ratio: r.ratioToFirst, member: r.seriesMember, centsFromSeries: r.centsFromSeries }))
    : alignment(res.map((r) => r.frequencyHz), series);
  const unit = $('units').value;
  body.replaceChildren(...res.map((r, i) => {
    const note = r.note;
    const cells = [
      r.n, fmt(r.frequencyHz, 2), r.q === null || r.q === undefined ? '—' : fmt(r.q, 1), note.name, signedCents(note.centsOff),
      fmt(align[i].ratio, 3), `${align[i].member}·f1`, signedCents(align[i].centsFromSeries),
      r.mouthCents === null || r.mouthCents === undefined ? '—' : signedCents(r.mouthCents),
      (r.pressureNodesMm ?? []).map((x) => fmt(fromMm(x, unit), unit === 'inch' ? 2 : 1)).join(', '),
    ];
    const tr = document.createElement('tr');
    tr.dataset.n = String(r.n);
    cells.forEach((c, k) => {
      const td = document.createElement('td');
      td.textContent = String(c);
      if (k === 7) td.className = Math.abs(align[i].centsFromSeries) <= tolerance() ? 'aligned' : 'misaligned';
      if (k === 8) td.className = 'mouth-cents';
      if (k === 9) td.className = 'nodes';
      tr.append(td);
    });
    return tr;
  }));
}

const signedCents = (c) => `${c >= 0 ? '+' : '−'}${Math.abs(c).toFixed(1)}`;

function fillProfileChoices() {
  const select = $('profile-resonance');
  const before = select.value;
  const res = state.response?.resonances ?? [];
  select.replaceChildren(...res.map((r, i) => new Option(`${r.n}: ${fmt(r.frequencyHz, 1)} Hz (${nearestNote(r.frequencyHz, a4()).name})`, String(i))));
  if (before && Number(before) < res.length) select.value = before;
}

/** The standing wave of a resonance: the server's profile with the same n ({n, xMm, pressure, flow}). */
function profileOf(i) {
  const r = state.response?.resonances?.[i];
  const p = r && (state.response.profiles ?? []).find((q) => q.n === r.n);
  return p ? { positionMm: p.xMm, pressure: p.pressure, flow: p.flow } : null;
}

function showProfile() {
  const i = Number($('profile-resonance').value || 0);
  const r = state.response?.resonances?.[i];
  const unit = $('units').value;
  const profile = profileOf(i);
  const holes = state.request?.holes ?? [];
  drawProfile($('profile-chart'), profile, r?.pressureNodesMm ?? [], holes, {
    toUnit: (mm) => fromMm(mm, unit), unitLabel: unit === 'inch' ? t('unitInch') : t('unitMm'),
    lengthMm: state.request?.segments?.reduce((s, g) => s + g.lengthMm, 0),
  });
  const note = $('profile-note');
  note.dataset.hint ??= note.textContent;
  note.classList.toggle('warning', !profile);
  note.textContent = profile ? note.dataset.hint : t('noProfile');
  drawCurrentBore();
}

// ---- fingerings -------------------------------------------------------------------------

/**
 * Each fingering's sounding pitch: the server's prediction (the resonance of the wanted register
 * with only that fingering's holes closed), shown against the tolerance.
 */
function showFingerings(request, response) {
  const items = Array.isArray(response.fingerings) ? response.fingerings : [];
  state.predictions = request.fingerings.map((_, i) => {
    const f = items.find((x) => x.index === i) ?? items[i];
    return f ? { frequencyHz: f.predictedHz ?? null, centsFromTarget: f.centsFromTarget, targetHz: f.targetHz, note: f.note } : null;
  });
  fingerings.show(state.predictions, tolerance(), a4());
  root.dataset.fingeringsReady = root.dataset.analyzed;
}

/**
 * The cents tolerance fingerings are judged by. A negative or unreadable one is refused on its
 * field (never silently replaced): the last good tolerance stays in use until it is fixed.
 */
const tolerance = () => {
  const input = $('cents-tolerance');
  const v = parseNumber(input.value);
  const ok = Number.isFinite(v) && v >= 0;
  input.classList.toggle('invalid', !ok);
  input.setAttribute('aria-invalid', String(!ok));
  let slot = document.querySelector('[data-error-for="cents-tolerance"]');
  if (!ok && !slot) {
    slot = Object.assign(document.createElement('span'), { className: 'field-error' });
    slot.dataset.errorFor = 'cents-tolerance';
    input.insertAdjacentElement('afterend', slot);
  }
  if (slot) slot.textContent = ok ? '' : t('badTolerance', fmt(state.tolerance, 1));
  if (ok) state.tolerance = v;
  return state.tolerance;
};

// ---- drawing, presets, parameters -------------------------------------------------------

function drawCurrentBore() {
  const { segments, holes } = editor.read();
  const { mouth } = mouthEditor.read();
  const i = Number($('profile-resonance').value || 0);
  const current = state.response && !root.classList.contains('stale');
  drawBore($('bore-drawing'), segments, holes, {
    widen: Number($('drawing-widen').value),
    unit: $('units').value,
    inputEnd: $('input-end').value,
    outputEnd: $('output-end').value,
    nodesMm: current ? state.response.resonances?.[i]?.pressureNodesMm ?? [] : [],
    onHoleClick: (k) => editor.toggleHole(k),
    // Edited on the drawing: the rows take the value, and the change is analysed as if typed.
    onEdit: ({ targets, valueMm }) => editor.setValues(targets, valueMm),
    onEditEnd: () => drawCurrentBore(),
    mouth,
  });
  fingerings.setBore(segments, holes);
}

/** Fills the editor from an analyze request (mm), fingerings included, and analyses it. */
function setParameters(p) {
  if (!p) return;
  editor.load(p.segments ?? [], p.holes ?? []);
  $('input-end').value = p.inputEnd ?? 'closed';
  $('output-end').value = p.outputEnd ?? 'open-unflanged';
  const val = (v, fallback) => (v === undefined || v === null ? fallback : String(v));
  $('temperature').value = val(p.temperatureC, '20');
  $('humidity').value = val(p.relativeHumidityPct, '0');
  $('f-min').value = val(p.fMinHz, '20');
  $('f-max').value = val(p.fMaxHz, '3000');
  $('points').value = val(p.points, '2000');
  $('reference-a4').value = val(p.referenceA4Hz, '440');
  $('losses').checked = p.losses !== false;
  mouthEditor.load(p.mouth ?? null, p.breath ?? null);
  fingerings.load(p.fingerings ?? []);
  fingerings.holesChanged(editor.holes.length, null);
  clearFieldErrors(root);
  $('form-errors').replaceChildren();
  $('profile-resonance').replaceChildren();
  analyze();
}

const getParameters = () => buildRequest().request;

function loadPreset() {
  const p = preset($('preset-select').value);
  if (p) setParameters(p);
}

// ---- wiring -----------------------------------------------------------------------------

$('bore-form').addEventListener('submit', (e) => { e.preventDefault(); analyze(); });
$('add-segment').addEventListener('click', () => editor.addSegment());
$('add-hole').addEventListener('click', () => editor.addHole());
$('add-fingering').addEventListener('click', () => fingerings.add());
$('preset-load').addEventListener('click', loadPreset);
$('preset-select').addEventListener('change', loadPreset);
$('units').addEventListener('change', () => {
  const unit = $('units').value;
  editor.setUnit(unit);
  mouthEditor.setUnit(unit);
  drawCurrentBore();
  document.querySelectorAll('.unit-label').forEach((el) => { el.textContent = unit === 'inch' ? t('unitInch') : t('unitMm'); });
  if (state.response) { fillResonanceTable(); fillMouthSummary(); showProfile(); }
});
for (const id of ['input-end', 'output-end', 'temperature', 'humidity', 'f-min', 'f-max', 'points', 'losses']) {
  $(id).addEventListener(id === 'losses' || id.endsWith('-end') ? 'change' : 'input', changed);
}
$('drawing-widen').addEventListener('change', drawCurrentBore);
$('show-phase').addEventListener('change', () => { if (state.response) showResults(); });
$('series').addEventListener('change', () => { if (state.response) fillResonanceTable(); });
$('profile-resonance').addEventListener('change', showProfile);
$('cents-tolerance').addEventListener('input', () => {
  fingerings.show(state.predictions, tolerance(), a4());
  if (state.response) fillResonanceTable();
});
$('reference-a4').addEventListener('input', changed);
window.addEventListener('resize', () => drawCurrentBore());
// On paper the folded fingering table is printed open, and folded again afterwards as it was.
let tableWasOpen = null;
window.addEventListener('beforeprint', () => { tableWasOpen = $('fingering-table-view').open; $('fingering-table-view').open = true; });
window.addEventListener('afterprint', () => { if (tableWasOpen !== null) $('fingering-table-view').open = tableWasOpen; tableWasOpen = null; });

/** A bore handed over by the bench templates' solver (unsaved), else the workshop whistle. */
function openFirstBore() {
  try {
    const handed = handedOver(OPEN_AIR_COLUMN, { take: true });
    if (handed?.request) {
      setParameters(handed.request);
      $('handover-note').textContent = t('fromTemplates');
      return;
    }
  } catch (error) {
    $('handover-note').textContent = t('handOverFailed', error.message);
  }
  setParameters(preset('six-hole-whistle'));
}

/** This bore to the bench templates (drilling template, hole solver), unsaved. */
$('send-to-templates').addEventListener('click', () => {
  handOver(BORE_FOR_TEMPLATES, { source: 'air-columns', request: getParameters() });
  window.location.assign('/templates#from-bore-bench');
});

openFirstBore();

// Integration hooks: the design bar (save/load), and the listening and measuring panels, each
// handed the last analysis when it loads; a panel that fails to load says so in its place.
import('/js/common/design-bar.js')
  .then((m) => m.mountDesignBar(document.getElementById('design-bar'), {
    kind: 'air-column', getParameters, setParameters,
    getView: () => ({ units: { length: $('units').value } }),
    setView: (view) => {
      const length = view?.units?.length;
      if ((length === 'mm' || length === 'inch') && $('units').value !== length) {
        $('units').value = length;
        $('units').dispatchEvent(new Event('change'));
      }
    },
  }))
  .catch((error) => showPanelFailure('design-bar', 'design bar', error));
loadPanels([
  { url: '/js/listen-air.js', place: 'listen-panel', name: 'listen-air' },
  { url: '/js/measure-air.js', place: 'measure-panel', name: 'measure-air' },
], loop);
