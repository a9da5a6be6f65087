// Set planner: the tension each string of a set needs for its pitch, its stress, and the total
// load on the neck. Requests go to POST /api/v1/string-sets/analyze in mm and N.
import { postJson, showFieldErrors, clearFieldErrors } from './common/api.js';
import { readNumber, readPitch, unitInputs, loadMaterials, defaultWrap } from './common/string-form.js';
import { drawChart, baseOptions } from './common/charts.js';

const form = document.getElementById('set-form');
const $ = (id) => document.getElementById(id);
const TEXT = Object.fromEntries([...document.querySelectorAll('#page-text [data-k]')].map((el) => [el.dataset.k, el.textContent]));
const io = unitInputs();
const state = { seq: 0, materials: null, last: null };

const WARN_RATIO = 0.75;     // the core warns above 75 % of the tensile strength...
const STRONG_RATIO = 0.9;    // ...and strongly above 90 %

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
  remove.textContent = TEXT.remove;
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
  io.showLabels();
}

function buildRequest() {
  return {
    lengthMm: io.readLength($('setLengthMm')),
    referenceA4Hz: readNumber($('setA4')),
    strings: rows().map((tr) => {
      const wound = tr.querySelector('.wound').checked;
      const target = tr.querySelector('.target').value.trim();
      return {
        label: target === '' ? null : target,
        targetHz: readPitch(tr.querySelector('.target'), $('setA4')),
        material: tr.querySelector('.material').value,
        diameterMm: io.readLength(tr.querySelector('.gauge')),
        wrapMaterial: wound ? tr.querySelector('.wrap-material').value : null,
        wrapDiameterMm: wound ? io.readLength(tr.querySelector('.wrap-gauge')) : null,
        lengthMm: io.readLength(tr.querySelector('.own-length')),
      };
    }),
  };
}

function fillForm(p) {
  if (p.lengthMm != null) io.writeLength($('setLengthMm'), p.lengthMm);
  $('setA4').value = p.referenceA4Hz != null ? String(p.referenceA4Hz) : '440';
  $('set-rows').replaceChildren();
  for (const s of p.strings || []) {
    addRow({ target: s.label || s.targetHz, material: s.material, diameterMm: s.diameterMm, wrapMaterial: s.wrapMaterial,
      wrapDiameterMm: s.wrapDiameterMm, lengthMm: s.lengthMm });
  }
}

function strengthOf(request, index, result) {
  if (result.tensileStrengthPa) return result.tensileStrengthPa;
  const m = (state.materials || []).find((x) => x.id === request.strings[index].material);
  return m ? m.tensileStrengthPa : null;
}

function render(request, response) {
  const ratios = response.strings.map((s, i) => {
    if (typeof s.stressFraction === 'number') return s.stressFraction;
    const ts = strengthOf(request, i, s);
    return ts ? s.stressPa / ts : null;
  });
  const tensions = response.strings.map((s) => io.forceOut(s.tensionN));
  const colours = ratios.map((r) => (r !== null && r > STRONG_RATIO ? '#a3262a' : r !== null && r > WARN_RATIO ? '#a86400' : '#2b5d8a'));
  const digits = io.units.force === 'N' ? 1 : 2;
  $('set-total').textContent = `${io.forceOut(response.totalTensionN).toFixed(digits)} ${io.units.force}`;
  const options = baseOptions({ legend: false });
  options.scales.x = { type: 'category', title: { display: true, text: TEXT.string } };
  options.scales.y = { beginAtZero: true, title: { display: true, text: `${TEXT.tension} (${io.units.force})` } };
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${ctx.parsed.y.toFixed(digits)} ${io.units.force}` } };
  const labels = request.strings.map((s, i) => `${i + 1}: ${rows()[i]?.querySelector('.target').value || ''}`);
  drawChart($('set-tension-chart'), {
    type: 'bar',
    data: { labels, datasets: [{ kind: 'tension', label: TEXT.tension, data: tensions, totalN: response.totalTensionN, backgroundColor: colours }] },
    options,
  });
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
    const ratio = ratios[i];
    const cells = [
      String(i + 1),
      `${rows()[i]?.querySelector('.target').value || ''} (${typeof request.strings[i].targetHz === 'number' ? request.strings[i].targetHz.toFixed(2) : ''} Hz)`,
      tensions[i].toFixed(digits),
      (s.linearDensityKgPerM * 1000).toFixed(4),
      (s.stressPa / 1e6).toFixed(0),
      ratio === null ? '' : `${(100 * ratio).toFixed(0)} %`,
      (s.warnings || []).length ? s.warnings.join(' ') : TEXT.none,
    ];
    cells.forEach((v, k) => {
      const td = document.createElement('td');
      td.textContent = v;
      if (k >= 5 && ratio !== null && ratio > WARN_RATIO) td.className = ratio > STRONG_RATIO ? 'strong' : 'warn';
      tr.append(td);
    });
    tbody.append(tr);
  });
}

async function analyze() {
  const request = buildRequest();
  const mine = ++state.seq;
  let result;
  try {
    result = await postJson('/api/v1/string-sets/analyze', request);
  } catch (e) {
    if (mine === state.seq) $('form-problem').textContent = TEXT.serverDown;
    return;
  }
  if (mine !== state.seq) return;
  if (!result.ok) {
    const unclaimed = showFieldErrors(form, result.problem);
    $('form-problem').textContent = `${TEXT.fixFields}${unclaimed.length ? ` ${unclaimed.join('; ')}` : ''}`;
    return;
  }
  clearFieldErrors(form);
  $('form-problem').textContent = '';
  state.last = { request, response: result.data };
  render(request, result.data);
  form.dataset.analyses = String(Number(form.dataset.analyses || 0) + 1);   // lets tests and neighbours see a fresh answer
}

async function start() {
  state.materials = await loadMaterials([]);
  if (!state.materials) $('form-problem').textContent = TEXT.materialsFailed;
  const wrap = defaultWrap(state.materials);
  HOUSE_SET.forEach((s) => addRow(s.wrapDiameterMm ? { ...s, wrapMaterial: wrap } : s));
  io.showLabels();
  form.addEventListener('submit', (e) => { e.preventDefault(); analyze(); });
  form.addEventListener('change', (e) => {
    const t = e.target;
    if (t.id === 'length-unit' || t.id === 'force-unit') {
      io.switchUnit(form, t.id === 'length-unit' ? 'length' : 'force', t.value);
      if (state.last) render(state.last.request, state.last.response);
      return;
    }
    if (t.classList.contains('wound')) renumber();
    analyze();
  });
  $('add-string').addEventListener('click', () => {
    addRow({ target: 'E4', material: (state.materials || [])[0]?.id || 'plain-steel', diameterMm: 0.25 });
    analyze();
  });
  const getParameters = () => buildRequest();
  const setParameters = (p) => { fillForm(p || {}); return analyze(); };
  import('/js/common/design-bar.js')
    .then((m) => m.mountDesignBar(document.getElementById('design-bar'), { kind: 'string-set', getParameters, setParameters }))
    .catch(() => {});
  await analyze();
}

start();
