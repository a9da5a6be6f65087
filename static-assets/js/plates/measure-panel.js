// Measure the plate: a rectangular sample's size, mass and tap frequencies (typed, or the peaks of a WAV, uploaded or
// heard through the microphone, through
// POST /api/v1/measurements/peaks) to its fitted constants (POST /api/v1/plates/measure), which the maker can then
// use for the plate on the bench.
import { clearFieldErrors, postForm, postJson, showFieldErrors } from '../common/api.js';
import { parseNumber } from '../common/units.js';
import { pageText } from '../common/text.js';
import { mountMicrophone } from '../common/microphone.js';

const $ = (id) => document.getElementById(id);
const t = pageText('#plate-text', 'plates.js.');
const state = { peaks: null, result: null, api: null };
/** Tap tones of a plate sample lie above the room's rumble: peaks under 40 Hz are left out (common practice). */
const MIN_PEAK_HZ = 40;

function value(id) {
  const text = $(id).value.trim();
  if (text === '') return null;
  const v = parseNumber(text);
  return Number.isFinite(v) ? v : text;
}

function say(problem) {
  const unclaimed = showFieldErrors($('measure-form'), state.api.shownProblem(problem));
  $('measure-problem').textContent = unclaimed.length ? unclaimed.join('; ') : (problem?.errors?.length ? '' : problem?.detail || '');
}

/** The peaks of a tap recording (the file chosen, or one heard through the microphone); false when refused. */
async function readRecording(file = $('measure-wav').files[0]) {
  if (!file) return true;
  const data = new FormData();
  data.append('file', file);
  data.append('maxPeaks', '12');
  data.append('minHz', String(MIN_PEAK_HZ));
  const answer = await postForm('/api/v1/measurements/peaks', data);
  if (!answer.ok) { say(answer.problem); return false; }
  state.peaks = answer.data.peaks.map((p) => p.frequencyHz);
  $('measure-peaks').textContent = t('peaks', state.peaks.map((f) => f.toFixed(1)).join(', '));
  return true;
}

function request() {
  const mm = (id) => state.api.lengthMm($(id)); // in the bench's length unit, as mm
  const r = { lengthMm: mm('measure-length'), widthMm: mm('measure-width'), thicknessMm: mm('measure-thickness'),
    massG: value('measure-mass') };
  const material = document.getElementById('material').value;
  if (material && material !== 'measured') r.material = material;
  const named = { twistingHz: value('measure-twisting'), alongHz: value('measure-along'), acrossHz: value('measure-across') };
  const anyNamed = Object.values(named).some((v) => v !== null);
  if (anyNamed || !state.peaks) Object.entries(named).forEach(([k, v]) => { if (v !== null) r[k] = v; });
  else r.peaksHz = state.peaks;
  return r;
}

function row(tbody, cells, data = {}) {
  const tr = document.createElement('tr');
  Object.assign(tr.dataset, data);
  cells.forEach((c) => { const td = document.createElement('td'); td.textContent = c; tr.appendChild(td); });
  tbody.appendChild(tr);
}

function show(r) {
  state.result = r;
  const constants = $('measure-constants').querySelector('tbody');
  constants.replaceChildren();
  const gpa = (v) => (v / 1e9).toFixed(3);
  row(constants, [t('const.densityKgPerM3'), r.densityKgPerM3.toFixed(1)], { key: 'densityKgPerM3', value: String(r.densityKgPerM3) });
  row(constants, [t('const.elasticAlongPa'), gpa(r.elasticAlongPa)], { key: 'elasticAlongPa', value: String(r.elasticAlongPa) });
  row(constants, [t('const.elasticAcrossPa'), gpa(r.elasticAcrossPa)], { key: 'elasticAcrossPa', value: String(r.elasticAcrossPa) });
  row(constants, [t('const.shearPa'), gpa(r.shearPa)], { key: 'shearPa', value: String(r.shearPa) });
  row(constants, [t('const.soundSpeedAlongMPerS'), r.soundSpeedAlongMPerS.toFixed(0)], { key: 'soundSpeedAlongMPerS' });
  row(constants, [t('const.soundSpeedAcrossMPerS'), r.soundSpeedAcrossMPerS.toFixed(0)], { key: 'soundSpeedAcrossMPerS' });
  const modes = $('measure-modes').querySelector('tbody');
  modes.replaceChildren();
  r.modes.forEach((m) => row(modes, [t(`kind.${m.kind}`), m.measuredHz.toFixed(2), m.computedHz.toFixed(2),
    `${m.cents >= 0 ? '+' : ''}${m.cents.toFixed(2)}`], { kind: m.kind }));
  $('measure-cautions').replaceChildren(...r.cautions.map((c) => Object.assign(document.createElement('li'), { textContent: c })));
  $('measure-result').hidden = false;
  document.dispatchEvent(new CustomEvent('nodewright:plate-measured', { detail: r }));
}

async function fit(event, file) {
  event?.preventDefault();
  clearFieldErrors($('measure-form'));
  $('measure-problem').textContent = '';
  if (!(await readRecording(file))) return false;
  const answer = await postJson('/api/v1/plates/measure', request());
  if (!answer.ok) { say(answer.problem); return false; }
  show(answer.data);
  return true;
}

export function mountMeasure(api) {
  state.api = api;
  $('measure-form').addEventListener('submit', (e) => fit(e));
  // A tap heard through the microphone is fitted at once, as a chosen file is on "Fit".
  mountMicrophone($('measure-form').querySelector('[data-mic]'), { onRecording: (file) => fit(null, file) });
  $('measure-wav').addEventListener('change', () => { state.peaks = null; $('measure-peaks').textContent = ''; });
  $('measure-apply').addEventListener('click', () => {
    const r = state.result;
    if (!r) return;
    api.useMaterialConstants({ densityKgPerM3: r.densityKgPerM3, elasticAlongPa: r.elasticAlongPa,
      elasticAcrossPa: r.elasticAcrossPa, shearPa: r.shearPa, poissonAlongAcross: r.poissonAlongAcross });
    api.analyze();
  });
}
