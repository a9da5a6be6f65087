// Set planner: the tension each string of a set needs for its pitch, its stress, and the total
// load on the neck. Requests go to POST /api/v1/string-sets/analyze in mm and N.
import { postJson } from './common/api.js';
import { problemInUserUnits } from './common/units.js';
import { readNumber, readPitch, unitInputs, loadMaterials, defaultWrap, localChecks } from './common/string-form.js';
import { drawChart, baseOptions, STATE, PALETTE } from './common/charts.js';
import { createRequestLoop, formView } from './common/request-loop.js';
import { pageText, labelByColumn } from './common/text.js';
import { showPanelFailure } from './common/panels.js';
import { pitchHz } from './common/notes.js';
import { drawNeck } from './strings/set-drawing.js';
import { outerDiameterMm } from './strings/set-geometry.js';

const form = document.getElementById('set-form');
const $ = (id) => document.getElementById(id);
const t = pageText('#page-text');
const io = unitInputs();
const state = { materials: null };

/** Bar colour and table marking by the server's stressLevel word. */
const LEVEL_COLOUR = { danger: STATE.danger, warning: STATE.warn };
const LEVEL_CLASS = { danger: 'strong', warning: 'warn' };

// Harrowgate Lane Workshop's steel-string parlour guitar, a light set of our own devising.
const HOUSE_SET = [
  { target: 'E4', material: 'plain-steel', diameterMm: 0.254 },
  { target: 'B3', material: 'plain-steel', diameterMm: 0.330 },
  { target: 'G3', material: 'plain-steel', diameterMm: 0.432 },
  { target: 'D3', material: 'plain-steel', diameterMm: 0.300, wrapDiameterMm: 0.160 },
  { target: 'A2', material: 'plain-steel', diameterMm: 0.360, wrapDiameterMm: 0.235 },
  { target: 'E2', material: 'plain-steel', diameterMm: 0.430, wrapDiameterMm: 0.325 },
];

function rows() {
  return [...$('set-rows').querySelectorAll('tr')];
}

function materialSelect(cls) {
  const select = document.createElement('select');
  select.className = cls;
  for (const m of state.materials || [{ id: 'plain-steel' }]) {
    const option = document.createElement('option');
    option.value = m.id;
    option.textContent = m.name || m.id;
    select.append(option);
  }
  return select;
}

function textInput(cls, unit) {
  const input = document.createElement('input');
  input.type = 'text';
  input.className = cls;
  if (unit) { input.dataset.unit = unit; input.inputMode = 'decimal'; }
  return input;
}

/** Adds a row; spec holds a target (note or Hz), material, gauge and optional wrap and length in mm. */
function addRow(spec) {
  const tr = document.createElement('tr');
  const cell = (child, cls) => { const td = document.createElement('td'); if (cls) td.className = cls; if (child) td.append(child); tr.append(td); return td; };
  cell(null).className = 'row-number';
  const target = textInput('target');
  target.value = spec.target != null ? String(spec.target) : '';
  // A saved label that is not a pitch ("1 E4") rides with the row until the pitch is retyped.
  if (spec.label != null) tr.dataset.label = spec.label;
  target.addEventListener('input', () => { delete tr.dataset.label; });
  cell(target, 'narrow');
  const material = materialSelect('material');
  if (spec.material) material.value = spec.material;
  cell(material);
  const lengthCell = (cls, mm) => {
    const input = textInput(cls, 'length');
    if (typeof mm === 'number') io.writeLength(input, mm);
    else if (mm != null) input.value = String(mm);   // shown as it came, for the server to judge
    cell(input, 'narrow');
  };
  lengthCell('gauge', spec.diameterMm);
  const wound = document.createElement('input');
  wound.type = 'checkbox';
  wound.className = 'wound';
  wound.checked = spec.wrapDiameterMm != null || spec.wrapMaterial != null;
  cell(wound);
  const wrap = materialSelect('wrap-material');
  wrap.value = spec.wrapMaterial || defaultWrap(state.materials);
  cell(wrap);
  lengthCell('wrap-gauge', spec.wrapDiameterMm);
  lengthCell('own-length', spec.lengthMm);
  const remove = document.createElement('button');
  remove.type = 'button';
  remove.className = 'secondary remove-string';
  remove.textContent = t('remove');
  remove.addEventListener('click', () => { tr.remove(); renumber(); analyze(); });
  cell(remove);
  $('set-rows').append(tr);
  renumber();
}

function renumber() {
  rows().forEach((tr, i) => {
    tr.querySelector('.row-number').textContent = String(i + 1);
    const field = (cls, name) => { tr.querySelector(cls).dataset.field = `strings[${i}].${name}`; };
    field('.target', 'targetHz');
    field('.material', 'material');
    field('.gauge', 'diameterMm');
    field('.wrap-material', 'wrapMaterial');
    field('.wrap-gauge', 'wrapDiameterMm');
    field('.own-length', 'lengthMm');
    const wound = tr.querySelector('.wound').checked;
    tr.querySelector('.wrap-material').disabled = !wound;
    tr.querySelector('.wrap-gauge').disabled = !wound;
  });
  labelByColumn($('set-rows'));
  io.showLabels();
}

/** The set request for the rows as they are now, and what the page can already refuse. */
function buildRequest() {
  const c = localChecks();
  const length = (input) => c.check(input, io.readLength(input), t('notNumber'));
  const request = {
    lengthMm: length($('setLengthMm')),
    referenceA4Hz: c.check($('setA4'), readNumber($('setA4')), t('notNumber')),
    strings: rows().map((tr) => {
      const wound = tr.querySelector('.wound').checked;
      const target = tr.querySelector('.target');
      const text = target.value.trim();
      const hz = c.check(target, readPitch(target, $('setA4')), t('notANote'));
      if (text === '') c.add(target.dataset.field, t('pitchNeeded'));
      return {
        label: tr.dataset.label ?? (text === '' ? null : text),
        targetHz: hz,
        material: tr.querySelector('.material').value,
        diameterMm: length(tr.querySelector('.gauge')),
        wrapMaterial: wound ? tr.querySelector('.wrap-material').value : null,
        wrapDiameterMm: wound ? length(tr.querySelector('.wrap-gauge')) : null,
        lengthMm: length(tr.querySelector('.own-length')),
      };
    }),
  };
  return { request, problems: c.problems };
}

function fillForm(p) {
  if (p.lengthMm != null) io.writeLength($('setLengthMm'), p.lengthMm);
  $('setA4').value = p.referenceA4Hz != null ? String(p.referenceA4Hz) : '440';
  $('set-rows').replaceChildren();
  for (const s of p.strings || []) {
    // The one input holds the pitch: the label when it reads as one (as this page saves it), else
    // the saved frequency, the label kept beside it.
    const labelIsPitch = s.label != null && pitchHz(String(s.label)) !== null;
    addRow({ target: labelIsPitch || s.targetHz == null ? s.label : s.targetHz,
      label: labelIsPitch ? undefined : s.label ?? undefined, material: s.material, diameterMm: s.diameterMm, wrapMaterial: s.wrapMaterial,
      wrapDiameterMm: s.wrapDiameterMm, lengthMm: s.lengthMm });
  }
}

function render(request, response) {
  const tensions = response.strings.map((s) => io.forceOut(s.tensionN));
  const colours = response.strings.map((s) => LEVEL_COLOUR[s.stressLevel] ?? PALETTE[0]);
  const digits = io.units.force === 'N' ? 1 : 2;
  $('set-total').textContent = `${io.forceOut(response.totalTensionN).toFixed(digits)} ${io.units.force}`;
  const options = baseOptions({ legend: false });
  options.scales.x = { type: 'category', title: { display: true, text: t('string') } };
  options.scales.y = { beginAtZero: true, title: { display: true, text: `${t('tension')} (${io.units.force})` } };
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${ctx.parsed.y.toFixed(digits)} ${io.units.force}` } };
  const labels = request.strings.map((s, i) => `${i + 1}: ${rows()[i]?.querySelector('.target').value || ''}`);
  drawChart($('set-tension-chart'), {
    type: 'bar',
    data: { labels, datasets: [{ kind: 'tension', label: t('tension'), data: tensions, totalN: response.totalTensionN, backgroundColor: colours }] },
    options,
  });
  drawSet(request, response, tensions, digits);
  const setWarnings = $('set-warnings');
  setWarnings.replaceChildren(...(response.warnings || []).map((w) => {
    const li = document.createElement('li');
    li.textContent = w;
    return li;
  }));
  const tbody = $('set-results').querySelector('tbody');
  tbody.replaceChildren();
  response.strings.forEach((s, i) => {
    const tr = document.createElement('tr');
    const ratio = s.stressFraction;
    const cells = [
      String(i + 1),
      `${rows()[i]?.querySelector('.target').value || ''} (${typeof request.strings[i].targetHz === 'number' ? request.strings[i].targetHz.toFixed(2) : ''} Hz)`,
      tensions[i].toFixed(digits),
      (s.linearDensityKgPerM * 1000).toFixed(4),
      (s.stressPa / 1e6).toFixed(0),
      Number.isFinite(ratio) ? `${(100 * ratio).toFixed(0)} %` : '',
      (s.warnings || []).length ? s.warnings.join(' ') : t('none'),
    ];
    cells.forEach((v, k) => {
      const td = document.createElement('td');
      td.textContent = v;
      if (k >= 5 && LEVEL_CLASS[s.stressLevel]) td.className = LEVEL_CLASS[s.stressLevel];
      tr.append(td);
    });
    tbody.append(tr);
  });
}

/**
 * The set drawn across the nut and the neck (strings/set-drawing.js): gauges from the request as
 * sent (mm), tensions, stress shares, levels and limits from the answer, figures in the user's units.
 */
function drawSet(request, response, tensions, digits) {
  const force = io.units.force;
  const lengthUnit = io.units.length;
  const gaugeText = (mm) => (Number.isFinite(mm)
    ? `${io.lengthOut(mm).toFixed(lengthUnit === 'mm' ? 3 : 4)} ${lengthUnit === 'mm' ? 'mm' : 'in'}` : '—');
  drawNeck($('set-drawing'), {
    strings: response.strings.map((s, i) => {
      const member = request.strings[i] ?? {};
      const outer = outerDiameterMm(member);
      return {
        label: rows()[i]?.querySelector('.target').value || '',
        outerMm: outer,
        wound: member.wrapDiameterMm != null,
        gaugeText: gaugeText(outer),
        tensionN: s.tensionN,
        tensionText: `${tensions[i].toFixed(digits)} ${force}`,
        stressFraction: s.stressFraction,
        stressLevel: s.stressLevel,
      };
    }),
    totalText: `${io.forceOut(response.totalTensionN).toFixed(digits)} ${force}`,
    limits: response.stressLimits ?? null,
    tensionScaleText: (n) => `${io.forceOut(n).toFixed(force === 'N' ? 0 : 1)} ${force}`,
  }, t);
}

const loop = createRequestLoop({
  build: buildRequest,
  send: (request) => postJson('/api/v1/string-sets/analyze', request),
  event: 'nodewright:string-set-analyzed',
  view: formView({
    form, message: $('form-problem'),
    render: (request, response) => {
      render(request, response);
      form.dataset.analyses = String(Number(form.dataset.analyses || 0) + 1);   // lets tests and neighbours see a fresh answer
    },
    text: { fix: t('fixFields'), down: t('serverDown') },
    prepare: (problem) => problemInUserUnits(problem, io.units),
  }),
});
const analyze = () => loop.run();

async function start() {
  state.materials = await loadMaterials([]);
  if (!state.materials) $('form-problem').textContent = t('materialsFailed');
  const wrap = defaultWrap(state.materials);
  HOUSE_SET.forEach((s) => addRow(s.wrapDiameterMm ? { ...s, wrapMaterial: wrap } : s));
  io.showLabels();
  io.remember(form, 'string-sets');
  form.addEventListener('submit', (e) => { e.preventDefault(); analyze(); });
  form.addEventListener('change', (e) => {
    const t = e.target;
    if (t.id === 'length-unit' || t.id === 'force-unit') {
      io.switchUnit(form, t.id === 'length-unit' ? 'length' : 'force', t.value);
      if (loop.last) render(loop.last.request, loop.last.response);
      return;
    }
    if (t.classList.contains('wound')) renumber();
    analyze();
  });
  $('add-string').addEventListener('click', () => {
    addRow({ target: 'E4', material: (state.materials || [])[0]?.id || 'plain-steel', diameterMm: 0.25 });
    analyze();
  });
  const getParameters = () => buildRequest().request;
  const setParameters = (p) => { fillForm(p || {}); return analyze(); };
  import('/js/common/design-bar.js')
    .then((m) => m.mountDesignBar(document.getElementById('design-bar'), {
      kind: 'string-set', getParameters, setParameters,
      getView: () => ({ units: { ...io.units } }),
      setView: (view) => { io.showUnits(form, view.units); if (loop.last) render(loop.last.request, loop.last.response); },
    }))
    .catch((error) => showPanelFailure('design-bar', t('designBarName'), error));
  await analyze();
}

window.addEventListener('resize', () => { if (loop.last) render(loop.last.request, loop.last.response); });
start();
