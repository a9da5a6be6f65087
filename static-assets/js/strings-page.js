// String bench: one string's modes, nodes, partials and pluck × pickup spectra.
// The form speaks the user's units; every request to the API is in mm and N (units.js converts).
import { postJson, showFieldErrors, clearFieldErrors } from './common/api.js';
import { toMm, fromMm, fromNewton } from './common/units.js';
import { readNumber, readPitch, nearestNote, unitInputs, loadMaterials, defaultWrap } from './common/string-form.js';
import { drawChart, colour, baseOptions, verticalLine, band, levelsDb, enableLineDrag } from './common/charts.js';

const form = document.getElementById('string-form');
const $ = (id) => document.getElementById(id);
const TEXT = Object.fromEntries([...document.querySelectorAll('#page-text [data-k]')].map((el) => [el.dataset.k, el.textContent]));

const SPECTRUM_FLOOR_DB = -80;      // lowest level drawn on the spectrum chart
const SHAPE_HALF_HEIGHT = 0.42;     // each mode shape is drawn ±0.42 around its row of the ladder
const DEFAULT_WRAP_MM = 0.25;       // a starting wrap wire when a plain string is switched to wound
const io = unitInputs();
const state = { seq: 0, last: null, timer: null };
const { readLength, readForce, writeLength, writeForce } = io;

// ---------- reading and writing the form ----------

const drive = () => form.querySelector('input[name="drive"]:checked').value;
const wound = () => $('construction').value === 'wound';

function pickupRows() {
  return [...$('pickup-list').querySelectorAll('.pickup-row')];
}

/** A measured-value override in SI: the exact value handed over by another panel, or typed × factor. */
function readOverride(input, factor) {
  const v = readNumber(input);
  if (typeof v !== 'number') return v;
  if (input.dataset.shown === input.value && input.dataset.canonical !== undefined) return Number(input.dataset.canonical);
  return v * factor;
}

/** The analyze request for what the form shows now (mm, N, Hz, SI). */
function buildRequest() {
  const request = { lengthMm: readLength($('lengthMm')) };
  if (drive() === 'pitch') request.targetHz = readPitch($('targetHz'), $('referenceA4Hz'));
  else request.tensionN = readForce($('tensionN'));
  request.material = $('material').value;
  request.diameterMm = readLength($('diameterMm'));
  if (wound()) {
    request.wrapMaterial = $('wrapMaterial').value;
    request.wrapDiameterMm = readLength($('wrapDiameterMm'));
  }
  const mu = readOverride($('linearDensity'), 1e-3);           // g/m → kg/m
  if (mu !== null) request.linearDensityKgPerM = mu;
  const modulus = readOverride($('youngsModulus'), 1e9);       // GPa → Pa
  if (modulus !== null) request.youngsModulusPa = modulus;
  request.endCondition = $('endCondition').value;
  request.stiffness = $('stiffness').checked;
  request.modeCount = readNumber($('modeCount'));
  request.referenceA4Hz = readNumber($('referenceA4Hz'));
  request.pluck = { positionMm: readLength($('pluckPosition')), kind: $('pluckKind').value };
  request.pickups = pickupRows().map((row) => ({
    positionMm: readLength(row.querySelector('.pickup-position')),
    apertureMm: readLength(row.querySelector('.pickup-aperture')),
  }));
  return request;
}

/** A target frequency as the user would write it: its note name when it is one exactly, else Hz. */
function pitchText(hz) {
  if (typeof hz !== 'number') return String(hz);
  const a4 = readNumber($('referenceA4Hz'));
  const note = nearestNote(hz, typeof a4 === 'number' && a4 > 0 ? a4 : 440);
  return Math.abs(note.cents) < 1e-6 ? note.name : String(hz);
}

function setIfPresent(p, key, apply) {
  if (Object.prototype.hasOwnProperty.call(p, key) && p[key] !== undefined) apply(p[key]);
}

/** Fills the form from a request body (all of it, or only the keys a partial one carries). */
function fillForm(p, partial) {
  // Numbers go in through the unit converters; anything else is shown as it came, for the server to judge.
  const put = (input, v, write) => {
    if (typeof v === 'number') { write(input, v); return; }
    input.value = v == null ? '' : String(v);
    delete input.dataset.canonical;
  };
  setIfPresent(p, 'referenceA4Hz', (v) => { $('referenceA4Hz').value = v === null ? '440' : String(v); });
  setIfPresent(p, 'lengthMm', (v) => put($('lengthMm'), v, writeLength));
  setIfPresent(p, 'targetHz', (v) => {
    if (v === null) return;
    $('targetHz').value = pitchText(v);
    form.querySelector('input[name="drive"][value="pitch"]').checked = true;
  });
  setIfPresent(p, 'tensionN', (v) => {
    if (v === null) return;
    put($('tensionN'), v, writeForce);
    if (!partial || p.targetHz == null) form.querySelector('input[name="drive"][value="tension"]').checked = true;
  });
  setIfPresent(p, 'material', (v) => { if (v !== null) $('material').value = v; });
  setIfPresent(p, 'diameterMm', (v) => put($('diameterMm'), v, writeLength));
  if (!partial || 'wrapMaterial' in p || 'wrapDiameterMm' in p) {
    const isWound = p.wrapMaterial != null || p.wrapDiameterMm != null;
    $('construction').value = isWound ? 'wound' : 'plain';
    if (p.wrapMaterial != null) $('wrapMaterial').value = p.wrapMaterial;
    if (p.wrapDiameterMm != null) put($('wrapDiameterMm'), p.wrapDiameterMm, writeLength);
  }
  const overrides = (key, input, factor) => {
    if (partial && !(key in p)) return;
    const v = p[key];
    input.value = v == null ? '' : String(Number((v * factor).toPrecision(6)));
    input.dataset.canonical = v == null ? '' : String(v);
    input.dataset.shown = input.value;
    if (v == null) delete input.dataset.canonical;
    if (v != null) input.closest('details').open = true;
  };
  overrides('linearDensityKgPerM', $('linearDensity'), 1000);   // kg/m → g/m
  overrides('youngsModulusPa', $('youngsModulus'), 1e-9);       // Pa → GPa
  setIfPresent(p, 'endCondition', (v) => { if (v !== null) $('endCondition').value = v; });
  setIfPresent(p, 'stiffness', (v) => { $('stiffness').checked = v === true; });   // the server's default is off
  setIfPresent(p, 'modeCount', (v) => { if (v !== null) $('modeCount').value = String(v); });
  setIfPresent(p, 'pluck', (v) => {
    if (!v) return;
    if (v.kind) $('pluckKind').value = v.kind;
    if (v.positionMm != null) put($('pluckPosition'), v.positionMm, writeLength);
  });
  setIfPresent(p, 'pickups', (list) => {
    $('pickup-list').replaceChildren();
    (list || []).filter((pu) => pu && typeof pu.positionMm === 'number')
      .forEach((pu) => addPickupRow(pu.positionMm, typeof pu.apertureMm === 'number' ? pu.apertureMm : 0));
  });
  showConstruction();
}

// ---------- pickups and sliders ----------

function addPickupRow(positionMm, apertureMm) {
  const row = document.createElement('div');
  row.className = 'pickup-row';
  row.innerHTML = `<span class="pickup-name"></span>
    <label class="inline"><span class="pos-label"></span> <span class="unit" data-unit-label="length"></span>
      <input class="pickup-position" type="text" inputmode="decimal" data-unit="length"></label>
    <label class="inline"><span class="ap-label"></span> <span class="unit" data-unit-label="length"></span>
      <input class="pickup-aperture" type="text" inputmode="decimal" data-unit="length"></label>
    <button type="button" class="secondary remove-pickup"></button>`;
  row.querySelector('.pos-label').textContent = TEXT.position;
  row.querySelector('.ap-label').textContent = TEXT.aperture;
  row.querySelector('.remove-pickup').textContent = TEXT.remove;
  writeLength(row.querySelector('.pickup-position'), positionMm);
  writeLength(row.querySelector('.pickup-aperture'), apertureMm);
  row.querySelector('.remove-pickup').addEventListener('click', () => {
    row.remove();
    renumberPickups();
    analyzeSoon(0);
  });
  $('pickup-list').append(row);
  renumberPickups();
}

function renumberPickups() {
  pickupRows().forEach((row, i) => {
    row.querySelector('.pickup-name').textContent = `${TEXT.pickup} ${i + 1}`;
    row.querySelector('.pickup-position').dataset.field = `pickups[${i}].positionMm`;
    row.querySelector('.pickup-aperture').dataset.field = `pickups[${i}].apertureMm`;
    row.querySelector('.pickup-position').id = `pickup-${i}-position`;
    row.querySelector('.pickup-aperture').id = `pickup-${i}-aperture`;
  });
  showUnitLabels();
  buildSliders();
}

/** The text input a draggable marker moves: 'pluck' or 'pickup0', 'pickup1', ... */
function markerInput(id) {
  if (id === 'pluck') return $('pluckPosition');
  const row = pickupRows()[Number(id.replace('pickup', ''))];
  return row ? row.querySelector('.pickup-position') : null;
}

function buildSliders() {
  const box = $('position-sliders');
  box.replaceChildren();
  const ids = ['pluck', ...pickupRows().map((_, i) => `pickup${i}`)];
  for (const id of ids) {
    const label = document.createElement('label');
    label.className = 'slider';
    const name = document.createElement('span');
    name.textContent = id === 'pluck' ? (($('pluckKind').value === 'strike') ? TEXT.strike : TEXT.pluck)
      : `${TEXT.pickup} ${Number(id.replace('pickup', '')) + 1}`;
    const range = document.createElement('input');
    range.type = 'range';
    range.id = `slider-${id}`;
    range.dataset.marker = id;
    range.addEventListener('input', () => moveMarker(id, toMm(Number(range.value), io.units.length), false));
    label.append(name, range);
    box.append(label);
  }
  syncSliders();
}

function syncSliders() {
  const length = readLength($('lengthMm'));
  if (typeof length !== 'number' || length <= 0) return;
  for (const range of $('position-sliders').querySelectorAll('input[type="range"]')) {
    const input = markerInput(range.dataset.marker);
    const mm = input ? readLength(input) : null;
    const max = fromMm(length, io.units.length);
    range.min = '0';
    range.max = String(max);
    range.step = String(max / 1000);
    if (typeof mm === 'number') range.value = String(fromMm(mm, io.units.length));
  }
}

/** Moves the pluck or a pickup to mm: input, slider and chart markers at once, then re-analyzes. */
function moveMarker(id, mm, fromDrag) {
  const input = markerInput(id);
  if (!input) return;
  writeLength(input, mm);
  if (fromDrag) syncSliders();
  const x = fromMm(mm, io.units.length);
  for (const canvasId of ['node-map-chart', 'mode-shapes-chart']) {
    const chart = Chart.getChart($(canvasId));
    const a = chart?.options.plugins.annotation.annotations[id];
    if (a) { a.xMin = x; a.xMax = x; chart.update('none'); }
  }
  analyzeSoon(40);
}

// ---------- analysis ----------

function analyzeSoon(delayMs = 250) {
  clearTimeout(state.timer);
  state.timer = setTimeout(analyze, delayMs);
}

async function analyze() {
  clearTimeout(state.timer);
  const request = buildRequest();
  const mine = ++state.seq;
  $('busy').hidden = false;
  let result;
  try {
    result = await postJson('/api/v1/strings/analyze', request);
  } catch (e) {
    if (mine === state.seq) { $('form-problem').textContent = TEXT.serverDown; $('busy').hidden = true; }
    return;
  }
  if (mine !== state.seq) return;   // a newer request is on its way; drop this answer
  $('busy').hidden = true;
  if (!result.ok) {
    document.querySelectorAll('.bench-results, #modes-panel').forEach((el) => el.classList.add('stale'));
    const unclaimed = showFieldErrors(form, result.problem);
    const detail = result.problem && result.problem.detail ? ` ${result.problem.detail}` : '';
    $('form-problem').textContent = `${TEXT.fixFields}${detail}${unclaimed.length ? ` ${unclaimed.join('; ')}` : ''}`;
    return;
  }
  clearFieldErrors(form);
  $('form-problem').textContent = '';
  document.querySelectorAll('.bench-results, #modes-panel').forEach((el) => el.classList.remove('stale'));
  state.last = { request, response: result.data };
  render(request, result.data);
  document.dispatchEvent(new CustomEvent('nodewright:string-analyzed', { detail: { request, response: result.data } }));
}

// ---------- drawing ----------

const L = (mm) => fromMm(mm, io.units.length);
const fmtLen = (mm) => {
  const digits = io.units.length === 'mm' ? 2 : 4;
  const v = L(mm);
  return (Math.abs(v) < 0.5 * 10 ** -digits ? 0 : v).toFixed(digits);   // no "-0.00" from rounding noise
};
const cents = (mode) => mode.centsFromHarmonic ?? mode.cents ?? 1200 * Math.log2(mode.frequencyHz / mode.harmonicHz);

/**
 * Shape samples of a mode as {xMm, y} with max |y| = 1: the server's own samples (shapeX in mm,
 * shape; the computed beam shape for clamped ends), else sin(nπx/L), the pinned string's shape.
 */
function shapeSamples(mode, lengthMm) {
  let xs = mode.shapeX;
  let ys = mode.shape;
  if (!Array.isArray(xs) || !Array.isArray(ys) || xs.length !== ys.length || xs.length < 2) {
    const count = Math.max(200, 16 * mode.n);
    xs = Array.from({ length: count + 1 }, (_, i) => (lengthMm * i) / count);
    ys = xs.map((x) => Math.sin((mode.n * Math.PI * x) / lengthMm));
  }
  const peak = Math.max(...ys.map(Math.abs)) || 1;
  return xs.map((x, i) => ({ xMm: x, y: ys[i] / peak }));
}

function interpolate(samples, xMm) {
  for (let i = 1; i < samples.length; i++) {
    if (samples[i].xMm >= xMm) {
      const a = samples[i - 1];
      const b = samples[i];
      const t = b.xMm === a.xMm ? 0 : (xMm - a.xMm) / (b.xMm - a.xMm);
      return a.y + t * (b.y - a.y);
    }
  }
  return samples.length ? samples[samples.length - 1].y : 0;
}

/**
 * Pluck and pickups where the form has them now: while a marker is dragged, an answer to an
 * earlier request must not pull the line back to where it was.
 */
function liveMarkers(request) {
  const live = buildRequest();
  const ok = (v) => typeof v === 'number' && Number.isFinite(v);
  const pluck = ok(live.pluck.positionMm) ? live.pluck : request.pluck;
  const pickups = live.pickups.length === request.pickups.length && live.pickups.every((p) => ok(p.positionMm) && ok(p.apertureMm))
    ? live.pickups : request.pickups;
  return { pluck, pickups };
}

/** Gives a chart with one row per mode room for every row (Chart.js follows its box's size). */
function fitHeight(canvasId, minPx, perModePx, count) {
  $(canvasId).parentElement.style.height = `${Math.max(minPx, perModePx * count + 90)}px`;
}

/** One tick per mode row (1..count), whatever the axis padding. */
function modeTicks(count) {
  return Array.from({ length: count }, (_, i) => ({ value: i + 1 }));
}

function markerAnnotations(request) {
  const annotations = {};
  const pluckLabel = request.pluck.kind === 'strike' ? TEXT.strike : TEXT.pluck;
  if (typeof request.pluck.positionMm === 'number') {
    annotations.pluck = verticalLine(L(request.pluck.positionMm), pluckLabel, '#a3262a', { draggable: true, labelAt: 'end' });
  }
  request.pickups.forEach((pu, i) => {
    if (typeof pu.positionMm !== 'number') return;
    if (pu.apertureMm > 0) {
      annotations[`aperture${i}`] = band(L(pu.positionMm - pu.apertureMm / 2), L(pu.positionMm + pu.apertureMm / 2), 'rgba(43,93,138,0.15)');
    }
    annotations[`pickup${i}`] = verticalLine(L(pu.positionMm), `${TEXT.pickup} ${i + 1}`, '#2b5d8a', { dash: [6, 3], draggable: true });
  });
  return annotations;
}

function lengthAxis(lengthMm) {
  return { type: 'linear', min: 0, max: L(lengthMm), title: { display: true, text: `${TEXT.position} (${io.units.length})` } };
}

function drawModeShapes(request, response) {
  const lengthMm = request.lengthMm;
  const count = response.modes.length;
  const row = (n) => count - n + 1;   // mode 1 on the top row
  const datasets = [];
  const nodes = [];
  const antinodes = [];
  for (const mode of response.modes) {
    const samples = shapeSamples(mode, lengthMm);
    datasets.push({
      kind: 'mode', n: mode.n, label: `${TEXT.mode} ${mode.n}`, borderColor: colour(mode.n - 1),
      borderWidth: 1.5, pointRadius: 0, showLine: true, fill: false,
      data: samples.map((s) => ({ x: L(s.xMm), y: row(mode.n) + SHAPE_HALF_HEIGHT * s.y })),
    });
    for (const x of mode.nodesMm) nodes.push({ x: L(x), y: row(mode.n), n: mode.n });
    for (const x of mode.antinodesMm) {
      antinodes.push({ x: L(x), y: row(mode.n) + SHAPE_HALF_HEIGHT * Math.sign(interpolate(samples, x) || 1), n: mode.n });
    }
  }
  datasets.push({ kind: 'nodes', label: TEXT.nodes, data: nodes, showLine: false, pointStyle: 'circle', pointRadius: 3.5, backgroundColor: '#1f2a36', borderColor: '#1f2a36' });
  datasets.push({ kind: 'antinodes', label: TEXT.antinodes, data: antinodes, showLine: false, pointStyle: 'triangle', pointRadius: 4, backgroundColor: '#fbf8f1', borderColor: '#a86400', borderWidth: 1.5 });
  const options = baseOptions({});
  options.plugins.legend.labels.filter = (item, data) => data.datasets[item.datasetIndex].kind !== 'mode';
  options.plugins.annotation.annotations = markerAnnotations(liveMarkers(request));
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${ctx.dataset.label} · ${ctx.parsed.x.toFixed(2)} ${io.units.length}` } };
  options.scales.x = lengthAxis(lengthMm);
  options.scales.y = {
    min: 0.4, max: count + 0.6, ticks: { callback: (v) => `${TEXT.mode} ${count - v + 1}` },
    afterBuildTicks: (axis) => { axis.ticks = modeTicks(count); },
    grid: { color: 'rgba(0,0,0,0.06)' },
  };
  fitHeight('mode-shapes-chart', 360, 40, count);
  drawChart($('mode-shapes-chart'), { type: 'scatter', data: { datasets }, options });
}

function drawNodeMap(request, response) {
  const count = response.modes.length;
  const datasets = response.modes.map((mode) => ({
    kind: 'node-row', n: mode.n, label: `${TEXT.mode} ${mode.n}`,
    data: mode.nodesMm.map((x) => ({ x: L(x), y: mode.n })),
    pointRadius: 4, pointStyle: 'circle', backgroundColor: colour(mode.n - 1), borderColor: colour(mode.n - 1), showLine: false,
  }));
  const options = baseOptions({ legend: false });
  options.plugins.annotation.annotations = markerAnnotations(liveMarkers(request));
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${TEXT.mode} ${ctx.parsed.y} · ${TEXT.nodes} ${ctx.parsed.x.toFixed(2)} ${io.units.length}` } };
  options.scales.x = lengthAxis(request.lengthMm);
  options.scales.y = {
    reverse: true, min: 0.5, max: count + 0.5, title: { display: true, text: TEXT.modeNumber },
    afterBuildTicks: (axis) => { axis.ticks = modeTicks(count); },
  };
  fitHeight('node-map-chart', 300, 18, count);
  drawChart($('node-map-chart'), { type: 'scatter', data: { datasets }, options });
}

function drawPartials(response) {
  const modes = response.modes;
  const values = modes.map(cents);
  const options = baseOptions({ xTitle: TEXT.modeNumber, yTitle: TEXT.cents, legend: false });
  options.scales.x = { type: 'category', title: { display: true, text: TEXT.modeNumber } };
  options.plugins.tooltip = { callbacks: { label: (ctx) => {
    const m = modes[ctx.dataIndex];
    return `${m.frequencyHz.toFixed(3)} Hz · ${m.harmonicHz.toFixed(3)} Hz · ${values[ctx.dataIndex].toFixed(2)} ¢`;
  } } };
  drawChart($('partials-chart'), {
    type: 'bar',
    data: { labels: modes.map((m) => String(m.n)), datasets: [{ kind: 'cents', label: TEXT.cents, data: values, backgroundColor: '#2b5d8a' }] },
    options,
  });
}

/** Per-mode output of the pickups: excitation × gain, plus the sum and difference of pickups 1 and 2. */
function spectrumSeries(response) {
  const modes = response.modes;
  const excitation = modes.map((m) => (m.excitation == null ? 1 : m.excitation));
  const pickupCount = modes.length ? (modes[0].pickupResponse || []).length : 0;
  const series = [];
  for (let k = 0; k < pickupCount; k++) {
    series.push({ label: `${TEXT.pickup} ${k + 1}`, values: modes.map((m, i) => (m.pickupOutput ? m.pickupOutput[k] : excitation[i] * m.pickupResponse[k])) });
  }
  if (pickupCount >= 2) {
    series.push({ label: TEXT.sum, values: modes.map((m, i) => excitation[i] * (m.pickupResponse[0] + m.pickupResponse[1])), combined: true });
    series.push({ label: TEXT.difference, values: modes.map((m, i) => excitation[i] * (m.pickupResponse[0] - m.pickupResponse[1])), combined: true });
  }
  if (pickupCount === 0) series.push({ label: TEXT.excitationOnly, values: excitation });
  return series;
}

function drawSpectrum(response) {
  const series = spectrumSeries(response);
  const levels = levelsDb(series.map((s) => s.values), SPECTRUM_FLOOR_DB);
  const datasets = series.map((s, i) => ({
    kind: s.combined ? 'combined' : 'pickup', label: s.label, amplitudes: s.values, data: levels[i],
    base: SPECTRUM_FLOOR_DB, backgroundColor: colour(i === 0 ? 0 : i + 1), borderWidth: 0,
  }));
  const options = baseOptions({});
  options.scales.x = { type: 'category', title: { display: true, text: TEXT.modeNumber } };
  options.scales.y = { min: SPECTRUM_FLOOR_DB, max: 0, title: { display: true, text: TEXT.level } };
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${ctx.dataset.label}: ${ctx.parsed.y.toFixed(1)} dB (${ctx.dataset.amplitudes[ctx.dataIndex].toExponential(3)})` } };
  drawChart($('spectrum-chart'), { type: 'bar', data: { labels: response.modes.map((m) => String(m.n)), datasets }, options });
}

/** A signed figure without a "-0.0" for values that round to zero. */
function signed(value, digits) {
  const text = Math.abs(value).toFixed(digits);
  if (Number(text) === 0) return `±${text}`;
  return `${value > 0 ? '+' : '−'}${text}`;
}

function drawSummary(request, response) {
  const a4 = typeof request.referenceA4Hz === 'number' ? request.referenceA4Hz : 440;
  const note = response.note || nearestNote(response.fundamentalHz, a4);
  const ratio = response.stressFraction ?? (response.tensileStrengthPa ? response.stressPa / response.tensileStrengthPa : null);
  const rows = [
    [TEXT.tension, `${fromNewton(response.tensionN, io.units.force).toFixed(io.units.force === "N" ? 2 : 3)} ${io.units.force}`],
    [TEXT.fundamental, `${response.fundamentalHz.toFixed(3)} Hz`],
    [TEXT.note, `${note.name} ${signed(note.centsOff ?? note.cents, 1)} ¢`],
    [TEXT.linearDensity, `${(response.linearDensityKgPerM * 1000).toFixed(4)} g/m`],
    [TEXT.waveSpeed, `${response.waveSpeedMps.toFixed(1)} m/s`],
    [TEXT.inharmonicity, response.inharmonicityB.toExponential(3)],
    [TEXT.stress, `${(response.stressPa / 1e6).toFixed(0)} MPa${ratio === null ? '' : ` · ${(100 * ratio).toFixed(0)} % ${TEXT.ofStrength}`}`],
  ];
  const dl = $('summary');
  dl.replaceChildren();
  for (const [k, v] of rows) {
    const dt = document.createElement('dt');
    dt.textContent = k;
    const dd = document.createElement('dd');
    dd.textContent = v;
    dl.append(dt, dd);
  }
  const ul = $('warnings');
  ul.replaceChildren();
  for (const w of response.warnings || []) {
    const li = document.createElement('li');
    li.textContent = w;
    if (ratio !== null && ratio > 0.9) li.classList.add('strong');
    ul.append(li);
  }
  $('summary-panel').classList.toggle('danger', ratio !== null && ratio > 0.9);
}

function drawTable(request, response) {
  const a4 = typeof request.referenceA4Hz === 'number' ? request.referenceA4Hz : 440;
  const length = request.lengthMm;
  const tbody = $('modes-table').querySelector('tbody');
  tbody.replaceChildren();
  for (const m of response.modes) {
    const note = nearestNote(m.frequencyHz, a4);
    const c = cents(m);
    const cells = [
      String(m.n), m.frequencyHz.toFixed(3), m.harmonicHz.toFixed(3), signed(c, 2),
      `${note.name} ${signed(note.cents, 1)}`,
      m.nodesMm.map(fmtLen).join(', '),
      (m.nodesFromBridgeMm || [...m.nodesMm].reverse().map((x) => length - x)).map(fmtLen).join(', '),
      m.antinodesMm.map(fmtLen).join(', '),
      (m.antinodesFromBridgeMm || [...m.antinodesMm].reverse().map((x) => length - x)).map(fmtLen).join(', '),
    ];
    const tr = document.createElement('tr');
    cells.forEach((v, i) => {
      const td = document.createElement('td');
      td.textContent = v;
      if (i >= 5) td.className = 'positions';
      tr.append(td);
    });
    tbody.append(tr);
  }
}

/** Which modes have a node close to the pluck and to each pickup (they barely sound there). */
function drawNearNodes(request, response) {
  const ul = $('near-nodes');
  ul.replaceChildren();
  const places = [{ name: request.pluck.kind === 'strike' ? TEXT.strike : TEXT.pluck, x: request.pluck.positionMm, tol: 2 }];
  request.pickups.forEach((pu, i) => places.push({ name: `${TEXT.pickup} ${i + 1}`, x: pu.positionMm, tol: Math.max(2, pu.apertureMm / 2) }));
  for (const place of places) {
    const hits = response.modes.filter((m) => m.nodesMm.some((x) => x > 0 && x < request.lengthMm && Math.abs(x - place.x) <= place.tol)).map((m) => m.n);
    const li = document.createElement('li');
    const tol = `${fmtLen(place.tol)} ${io.units.length}`;
    li.textContent = hits.length ? `${place.name} ${TEXT.nearNodes.replace('{0}', tol)} ${hits.join(', ')}` : `${place.name} ${TEXT.nearNone}`;
    ul.append(li);
  }
}

/** Under the pointer on the node map: which modes have a node within a few mm of that point. */
function probeNodes(event) {
  const chart = Chart.getChart($('node-map-chart'));
  if (!chart || !state.last) return;
  const area = chart.chartArea;
  if (event.offsetX < area.left || event.offsetX > area.right) { $('node-probe').textContent = ''; return; }
  const { request, response } = state.last;
  const xMm = io.lengthIn(chart.scales.x.getValueForPixel(event.offsetX));
  const tol = Math.max(2, request.lengthMm / 250);   // mm: about a fingertip, or 0.4 % of a long string
  const hits = response.modes.filter((m) => m.nodesMm.some((x) => Math.abs(x - xMm) <= tol)).map((m) => m.n);
  const where = `${fmtLen(xMm)} ${io.units.length}`;
  $('node-probe').textContent = hits.length
    ? TEXT.probe.replace('{0}', where).replace('{1}', hits.join(', '))
    : TEXT.probeNone.replace('{0}', where);
}

function render(request, response) {
  drawSummary(request, response);
  drawNodeMap(request, response);
  drawModeShapes(request, response);
  drawPartials(response);
  drawSpectrum(response);
  drawTable(request, response);
  drawNearNodes(request, response);
  syncSliders();
}

// ---------- units and small form behaviour ----------

function showUnitLabels() {
  io.showLabels();
}

function switchUnit(kind, unit) {
  io.switchUnit(form, kind, unit);
  syncSliders();
  if (state.last) render(state.last.request, state.last.response);
}

function showConstruction() {
  form.classList.toggle('is-wound', wound());
  form.classList.toggle('drive-tension', drive() === 'tension');
}

async function loadCatalogue() {
  const materials = await loadMaterials([$('material'), $('wrapMaterial')]);
  if (!materials) {
    $('form-problem').textContent = TEXT.materialsFailed;
    return;
  }
  $('wrapMaterial').value = defaultWrap(materials);
  if (materials.some((m) => m.id === 'plain-steel')) $('material').value = 'plain-steel';
}

function wire() {
  form.addEventListener('submit', (e) => { e.preventDefault(); analyze(); });
  form.addEventListener('change', (e) => {
    const t = e.target;
    if (t.id === 'length-unit') { switchUnit('length', t.value); return; }
    if (t.id === 'force-unit') { switchUnit('force', t.value); return; }
    if (t.type === 'range') return;
    showConstruction();
    if (t.id === 'pluckKind') buildSliders();
    if (t.id === 'construction' && wound() && $('wrapDiameterMm').value.trim() === '') writeLength($('wrapDiameterMm'), DEFAULT_WRAP_MM);
    if (t.id === 'lengthMm') syncSliders();
    analyzeSoon(0);
  });
  $('add-pickup').addEventListener('click', () => {
    const length = readLength($('lengthMm'));
    const span = typeof length === 'number' && length > 0 ? length : 650;
    const taken = pickupRows().length;
    addPickupRow(span * (0.94 - 0.14 * taken), 0);   // a new pickup goes a little nearer the nut than the last
    analyzeSoon(0);
  });
  for (const canvasId of ['node-map-chart', 'mode-shapes-chart']) {
    enableLineDrag($(canvasId), (id, x) => moveMarker(id, toMm(x, io.units.length), true));
  }
  $('node-map-chart').addEventListener('pointermove', probeNodes);
  document.addEventListener('nodewright:apply-string-parameters', (e) => {
    if (!e.detail || typeof e.detail !== 'object') return;
    fillForm(e.detail, true);
    analyze();
  });
}

function mountNeighbours() {
  const getParameters = () => buildRequest();
  const setParameters = (p) => { fillForm(p || {}, false); return analyze(); };
  import('/js/common/design-bar.js')
    .then((m) => m.mountDesignBar(document.getElementById('design-bar'), { kind: 'string', getParameters, setParameters }))
    .catch(() => {});
  // A panel that loads after the first analysis is handed that analysis again.
  const replayLast = () => {
    if (state.last) {
      document.dispatchEvent(new CustomEvent('nodewright:string-analyzed', { detail: state.last }));
    }
  };
  import('/js/listen-strings.js').then(replayLast).catch(() => {});
  import('/js/measure-strings.js').then(replayLast).catch(() => {});
}

async function start() {
  // Harrowgate Lane Workshop's parlour guitar, first string: a bridge pickup and a neck pickup.
  addPickupRow(610, 10);
  addPickupRow(490, 10);
  showUnitLabels();
  showConstruction();
  wire();
  await loadCatalogue();
  mountNeighbours();
  await analyze();
}

start();
