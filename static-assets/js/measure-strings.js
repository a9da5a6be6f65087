// Measurement panel of the string bench: upload a recording (WAV) or a table of partials (CSV), or
// listen through the microphone (common/microphone.js), then
// show the measured partials against the predicted ones in the partials chart and a table of
// residuals, and apply the fit back to the design as an effective linear density and modulus.
import { mountPanel, role, sig, onPageEvent, uploadData, measure, textRow } from './measure/panel.js';
import { cents as centsBetween } from './common/notes.js';
import { drawChart, setOverlay, clearOverlay, PALETTE } from './common/charts.js';
import { showPanelFailure } from './common/panels.js';
import { APPLY_STRING_PARAMETERS, handOver } from './common/handover.js';
import { mountMicrophone } from './common/microphone.js';

const MEASURED_COLOUR = PALETTE[4];   // Okabe–Ito orange: measured values over predicted ones
const state = { panel: null, t: null, analysis: null, measured: null };

/**
 * Effective string parameters reproducing a fitted f1 and B (Fletcher 1964, eq. 11 and the flexible
 * string f1 = (1/2L)·√(T/μ)): μ = T/(2·L·f1)², E = 64·T·L²·B/(π³·d⁴). SI in, SI out.
 */
export function effectiveParameters({ f1Hz, inharmonicityB }, tensionN, lengthMm, diameterMm) {
  const L = lengthMm / 1000;
  const d = diameterMm / 1000;
  const mu = tensionN / (2 * L * f1Hz) ** 2;
  const E = (64 * tensionN * L * L * inharmonicityB) / (Math.PI ** 3 * d ** 4);
  return { linearDensityKgPerM: mu, youngsModulusPa: E };
}

const isCsv = (file) => /\.(csv|txt)$/i.test(file.name) || /csv|text\/plain/.test(file.type);

async function onSubmit(e) {
  e.preventDefault();
  const form = role(state.panel, 'upload');
  const data = uploadData(state, form);
  if (!data) return;
  await analyseFile(data.get('file'));
}

/**
 * Sends a recording or table with the form's expected f1 and partial count, and shows the fit: the
 * one path of an uploaded file and of a recording heard through the microphone. True when fitted.
 */
async function analyseFile(file) {
  const form = role(state.panel, 'upload');
  const data = new FormData();
  data.append('file', file);
  if (form.elements.expectedF1Hz.value !== '') data.append('expectedF1Hz', form.elements.expectedF1Hz.value);
  if (form.elements.maxPartials.value !== '') data.append('maxPartials', form.elements.maxPartials.value);
  const url = isCsv(file) ? '/api/v1/measurements/partials-csv' : '/api/v1/measurements/partials';
  if (!(await measure(state, form, url, data, 'partials-chart'))) return false;
  showMeasured();
  return true;
}

function showMeasured() {
  const p = state.panel;
  const m = state.measured;
  if (!m) return;
  role(p, 'result').hidden = false;
  const fit = m.fit;
  role(p, 'fit').textContent = state.t('fit', sig(fit.f1Hz, 7), sig(fit.inharmonicityB, 4), sig(fit.fundamentalHz, 7),
    sig(fit.rmsCents, 3), fit.partialsUsed);
  const design = new Map((state.analysis?.response.modes ?? []).map((x) => [x.n, x.frequencyHz]));
  const rows = m.peaks.map((pk) => {
    const d = design.get(pk.n);
    const tr = textRow([pk.n, sig(pk.frequencyHz, 7), pk.levelDb == null ? '' : pk.levelDb.toFixed(1), sig(pk.fittedHz, 7),
      pk.residualCents.toFixed(3), d ? sig(d, 7) : '', d ? centsBetween(pk.frequencyHz, d).toFixed(2) : '']);
    if (!pk.usedInFit) tr.className = 'set-aside';
    return tr;
  });
  role(p, 'peaks').tBodies[0].replaceChildren(...rows);
  // Nothing to compare with until a design is analysed on this page (none on the Measure page).
  role(p, 'peaks').classList.toggle('without-design', !state.analysis);
  p.dataset.measured = String(m.peaks.length);
  p.dataset.fit = JSON.stringify({ f1Hz: fit.f1Hz, inharmonicityB: fit.inharmonicityB, partialsUsed: fit.partialsUsed });
  fillApplyInputs(false);
  drawMeasured();
}

/** Measured partials in cents from n × fitted f1, the same measure the chart shows for the design. */
const measuredCents = (m) => m.peaks.map((pk) => ({ n: pk.n, cents: centsBetween(pk.frequencyHz, pk.n * m.fit.f1Hz) }));

function drawMeasured() {
  const m = state.measured;
  if (!m) return;
  const points = measuredCents(m);
  if (document.getElementById('partials-chart')) {
    // The bench owns its partials chart; the measured points ride on it as an overlay, put back
    // after each of its redraws.
    setOverlay('partials-chart', 'measured', (chart) => {
      const data = chart.data;
      const maxN = Math.max(...points.map((x) => x.n), ...(data.labels ?? []).map(Number));
      if (!data.labels || data.labels.length < maxN) data.labels = Array.from({ length: maxN }, (_, i) => String(i + 1));
      const byN = new Map(points.map((x) => [x.n, x.cents]));
      return [{
        type: 'line', kind: 'measured', label: state.t('chartLabel'), showLine: false, pointRadius: 5,
        pointStyle: 'rectRot', borderColor: MEASURED_COLOUR, backgroundColor: MEASURED_COLOUR,
        data: data.labels.map((l) => (byN.has(Number(l)) ? byN.get(Number(l)) : null)),
      }];
    });
    return;
  }
  // No design chart on this page (the Measure page): draw our own.
  const box = role(state.panel, 'own-chart');
  box.hidden = false;
  drawChart(box.querySelector('canvas'), {
    type: 'scatter',
    data: { datasets: [{ kind: 'measured', label: state.t('chartLabel'), data: points.map((x) => ({ x: x.n, y: x.cents })),
      pointRadius: 5, pointStyle: 'rectRot', borderColor: MEASURED_COLOUR, backgroundColor: MEASURED_COLOUR }] },
    options: { animation: false, maintainAspectRatio: false,
      scales: { x: { title: { display: true, text: 'n' }, ticks: { stepSize: 1 } }, y: { title: { display: true, text: state.t('chartAxis') } } } },
  }, { replace: true });
}

/** Tension, length and core diameter from the last analysis of the design, unless typed in. */
function fillApplyInputs(force) {
  const p = state.panel;
  const a = state.analysis;
  if (!a) return;
  const put = (name, value) => {
    const input = role(p, name);
    if (value != null && (force || input.value === '' || input.dataset.auto === 'true')) {
      input.value = String(Number(Number(value).toPrecision(8)));
      input.dataset.auto = 'true';
    }
  };
  put('tension', a.response.tensionN);
  put('length', a.request.lengthMm);
  put('diameter', a.request.diameterMm);
  preview();
}

function applyInputs() {
  const p = state.panel;
  const v = (name) => Number(role(p, name).value);
  const T = v('tension'); const L = v('length'); const d = v('diameter');
  return [T, L, d].every((x) => Number.isFinite(x) && x > 0) ? { T, L, d } : null;
}

function preview() {
  const p = state.panel;
  const inputs = applyInputs();
  if (!state.measured || !inputs) { role(p, 'preview').textContent = ''; return null; }
  const e = effectiveParameters(state.measured.fit, inputs.T, inputs.L, inputs.d);
  role(p, 'preview').textContent = state.t('preview', sig(e.linearDensityKgPerM * 1000, 6), sig(e.youngsModulusPa / 1e9, 5));
  return e;
}

const onBench = () => document.getElementById('string-form') !== null;

function onApply() {
  const p = state.panel;
  const e = preview();
  if (!e) { role(p, 'status').textContent = state.t('missing'); return; }
  if (!onBench()) {
    // No design on this page: open the string bench with the fit and the values it was made with.
    const { T, L, d } = applyInputs();
    const handed = { lengthMm: L, diameterMm: d, tensionN: T, ...e };
    handOver(APPLY_STRING_PARAMETERS, handed);
    role(p, 'status').textContent = state.t('opening', sig(e.linearDensityKgPerM * 1000, 6), sig(e.youngsModulusPa / 1e9, 5));
    p.dataset.applied = JSON.stringify(handed);
    window.location.assign('/strings#from-measure');
    return;
  }
  document.dispatchEvent(new CustomEvent('nodewright:apply-string-parameters', { detail: { ...e } }));
  role(p, 'status').textContent = state.t('done', sig(e.linearDensityKgPerM * 1000, 6), sig(e.youngsModulusPa / 1e9, 5));
  p.dataset.applied = JSON.stringify(e);
}

async function init() {
  const panel = await mountPanel(state, 'measure-panel', 'measure-strings');
  if (!panel) return;
  role(panel, 'upload').addEventListener('submit', onSubmit);
  mountMicrophone(panel.querySelector('[data-mic]'), { onRecording: analyseFile });
  role(panel, 'apply').addEventListener('click', onApply);
  for (const name of ['tension', 'length', 'diameter']) {
    role(panel, name).addEventListener('input', (e) => { e.target.dataset.auto = 'false'; preview(); });
  }
  if (!onBench()) {
    role(panel, 'apply-legend').textContent = state.t('openLegend');
    role(panel, 'apply').textContent = state.t('openButton');
  }
  fillApplyInputs(false);
  panel.dataset.ready = 'true';
}

onPageEvent('nodewright:string-analyzed', (e) => {
  if (!e.detail?.response) return;
  state.analysis = e.detail;
  if (!state.panel) return;
  fillApplyInputs(false);
  if (state.measured) showMeasured(); // the design changed: compare the measured partials with it again
});

init().catch((e) => showPanelFailure('measure-panel', 'measure-strings', e));
