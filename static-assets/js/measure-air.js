// Measurement panel of the bore bench: import a measured input-impedance curve (CSV of frequency,
// magnitude, phase), draw it over the predicted curve in the impedance chart and list its peaks
// beside the nearest predicted resonance; or listen to the instrument through the microphone
// (common/microphone.js) and list the peaks heard (POST /api/v1/measurements/peaks) the same way.
import { mountPanel, role, sig, onPageEvent, sendUpload, uploadData, measure, textRow } from './measure/panel.js';
import { cents as centsBetween } from './common/notes.js';
import { drawChart, setOverlay, clearOverlay, PALETTE } from './common/charts.js';
import { showPanelFailure } from './common/panels.js';
import { mountMicrophone } from './common/microphone.js';

const MEASURED_COLOUR = PALETTE[4];   // Okabe–Ito orange: measured values over predicted ones
const state = { panel: null, t: null, analysis: null, measured: null, heard: null };
/** Peaks kept from a listen, and the lowest: below 40 Hz is the room's rumble (common practice). */
const HEARD_PEAKS = 12;
const HEARD_MIN_HZ = 40;

/** Factor bringing the measured curve's highest value onto the prediction's (for unlike units). */
export function scaleToPrediction(measuredMagnitudes, predictedMagnitudes) {
  const top = (xs) => xs.reduce((m, x) => (x > m ? x : m), 0);
  const a = top(measuredMagnitudes);
  const b = top(predictedMagnitudes ?? []);
  return a > 0 && b > 0 ? b / a : 1;
}

async function onSubmit(e) {
  e.preventDefault();
  const form = role(state.panel, 'upload');
  const data = uploadData(state, form);
  if (!data) return;
  if (form.elements.phaseUnit.value) data.append('phaseUnit', form.elements.phaseUnit.value);
  data.append('inputEnd', state.analysis?.request?.inputEnd === 'open' ? 'open' : 'closed');
  if (await measure(state, form, '/api/v1/measurements/impedance', data, 'impedance-chart')) showMeasured();
}

function showMeasured() {
  const p = state.panel;
  const m = state.measured;
  if (!m) return;
  role(p, 'result').hidden = false;
  const f = m.impedance.frequencyHz;
  role(p, 'summary').textContent = state.t('summary', f.length, sig(f[0], 6), sig(f[f.length - 1], 6), m.resonances.length);
  const rows = m.resonances.map((r) => {
    const nearest = nearestPredicted(r.frequencyHz);
    const cells = [r.n, sig(r.frequencyHz, 6), sig(r.magnitude, 4), r.q == null ? '' : sig(r.q, 3),
      nearest ? sig(nearest.frequencyHz, 6) : '', nearest ? centsBetween(r.frequencyHz, nearest.frequencyHz).toFixed(1) : ''];
    return textRow(cells);
  });
  role(p, 'peaks').tBodies[0].replaceChildren(...rows);
  // Nothing to compare with until a design is analysed on this page (none on the Measure page).
  role(p, 'peaks').classList.toggle('without-design', !state.analysis);
  p.dataset.measured = String(m.resonances.length);
  drawMeasured();
}

function drawMeasured() {
  const m = state.measured;
  if (!m) return;
  const scaleOn = role(state.panel, 'scale').checked;
  const onBench = document.getElementById('impedance-chart') !== null;
  const k = scaleOn && onBench ? scaleToPrediction(m.impedance.magnitude, state.analysis?.response?.impedance?.magnitude) : 1;
  const points = m.impedance.frequencyHz.map((x, i) => ({ x, y: m.impedance.magnitude[i] * k }));
  const dataset = { kind: 'measured', label: state.t('chartLabel'), data: points, yAxisID: 'y', borderColor: MEASURED_COLOUR,
    borderWidth: 1.2, borderDash: [5, 3], pointRadius: 0, tension: 0 };
  if (onBench) {
    // The bench owns the impedance chart; the measured curve is an overlay it puts back after each redraw.
    setOverlay('impedance-chart', 'measured', () => [dataset]);
    return;
  }
  const box = role(state.panel, 'own-chart');
  box.hidden = false;
  drawChart(box.querySelector('canvas'), {
    type: 'line',
    data: { datasets: [dataset] },
    options: { animation: false, parsing: false, maintainAspectRatio: false,
      scales: { x: { type: 'linear', title: { display: true, text: 'Hz' } }, y: { type: 'logarithmic' } } },
  }, { replace: true });
}

/** The predicted resonance nearest to f (of the current fingering), or null before an analysis. */
function nearestPredicted(f) {
  let nearest = null;
  for (const q of state.analysis?.response?.resonances ?? []) {
    if (!nearest || Math.abs(q.frequencyHz - f) < Math.abs(nearest.frequencyHz - f)) nearest = q;
  }
  return nearest;
}

/** A recording heard through the microphone: its strongest peaks, through the same endpoint as an uploaded tap. */
async function analyseHeard(file) {
  const form = role(state.panel, 'upload');
  const data = new FormData();
  data.append('file', file);
  data.append('maxPeaks', String(HEARD_PEAKS));
  data.append('minHz', String(HEARD_MIN_HZ));
  const heard = await sendUpload(state, form, '/api/v1/measurements/peaks', data);
  state.heard = heard;
  if (!heard) {
    role(state.panel, 'heard-result').hidden = true;
    clearOverlay('impedance-chart', 'heard');
    return false;
  }
  showHeard();
  return true;
}

/** Magnitude of the predicted curve at f (straight line between samples), to put a heard peak on it. */
function predictedAt(f) {
  const z = state.analysis?.response?.impedance;
  if (!z?.frequencyHz?.length) return null;
  const xs = z.frequencyHz;
  let i = xs.findIndex((x) => x >= f);
  if (i <= 0) return z.magnitude[i < 0 ? xs.length - 1 : 0];
  const w = (f - xs[i - 1]) / (xs[i] - xs[i - 1]);
  return z.magnitude[i - 1] * (1 - w) + z.magnitude[i] * w;
}

function showHeard() {
  const p = state.panel;
  const h = state.heard;
  if (!h) return;
  role(p, 'heard-result').hidden = false;
  const f = h.peaks.map((x) => x.frequencyHz);
  role(p, 'heard-summary').textContent = state.t('heardSummary', f.length, sig(f[0], 5), sig(f[f.length - 1], 5));
  const rows = h.peaks.map((pk, i) => {
    const q = nearestPredicted(pk.frequencyHz);
    const cells = [i + 1, sig(pk.frequencyHz, 6), pk.levelDb.toFixed(1), q ? sig(q.frequencyHz, 6) : '',
      q ? centsBetween(pk.frequencyHz, q.frequencyHz).toFixed(1) : ''];
    return textRow(cells);
  });
  role(p, 'heard').tBodies[0].replaceChildren(...rows);
  role(p, 'heard').classList.toggle('without-design', !state.analysis);
  p.dataset.heard = String(h.peaks.length);
  if (document.getElementById('impedance-chart')) {
    setOverlay('impedance-chart', 'heard', () => [{
      kind: 'heard', label: state.t('heardLabel'), type: 'scatter', yAxisID: 'y', pointStyle: 'triangle', pointRadius: 6,
      borderColor: MEASURED_COLOUR, backgroundColor: MEASURED_COLOUR,
      data: h.peaks.map((pk) => ({ x: pk.frequencyHz, y: predictedAt(pk.frequencyHz) })).filter((pt) => pt.y != null),
    }]);
  }
}

async function init() {
  const panel = await mountPanel(state, ['measure-air-panel', 'measure-panel'], 'measure-air');
  if (!panel) return;
  role(panel, 'upload').addEventListener('submit', onSubmit);
  role(panel, 'scale').addEventListener('change', drawMeasured);
  mountMicrophone(panel.querySelector('[data-mic]'), { onRecording: analyseHeard });
  panel.dataset.ready = 'true';
}

onPageEvent('nodewright:air-analyzed', (e) => {
  if (!e.detail?.response) return;
  state.analysis = e.detail;
  // The table compares with the new prediction; the chart overlay follows the bench's redraws by itself.
  if (state.measured) showMeasured();
  if (state.heard) showHeard();
});

init().catch((e) => showPanelFailure(document.getElementById('measure-air-panel') ? 'measure-air-panel' : 'measure-panel', 'measure-air', e));
