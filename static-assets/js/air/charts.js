// Chart.js drawings of the bore bench: the input impedance (log magnitude, phase on demand, the
// resonances marked) and the standing wave along the bore (pressure, flow, node markers, holes).
// Chart.js and its annotation plugin are globals loaded by the layout from their WebJars.
import { t } from './text.js';
import { drawChart, PALETTE, translucent } from '../common/charts.js';

const ACCENT = PALETTE[0];
const FLOW = PALETTE[4];
const PHASE = PALETTE[3];
const NODE = PALETTE[1];

const hasAnnotations = () => typeof Chart !== 'undefined' && Chart.registry?.plugins?.get?.('annotation');

/**
 * Draws through the shared helper: the chart already on the canvas is updated in place without
 * animation, and other panels' overlays (a measured curve) are put back.
 */
const replaceChart = (canvas, config) => drawChart(canvas, config);

/** Long curves are thinned to what the chart's width shows; min-max keeps every peak and dip. */
const DECIMATION = { enabled: true, algorithm: 'min-max' };

/** Log-axis ticks at whole decades only, written plainly (1000, 10, 0.01). */
function decade(value) {
  const l = Math.log10(value);
  if (Math.abs(l - Math.round(l)) > 1e-9) return '';
  return value >= 1 ? String(Math.round(value)) : value.toPrecision(1);
}

/** Impedance chart: |Z| on a log axis, the phase on a right axis when showPhase, resonances marked. */
export function drawImpedance(canvas, impedance, resonances, { showPhase, inputClosed }) {
  const f = impedance?.frequencyHz ?? [];
  const mag = f.map((x, i) => ({ x, y: impedance.magnitude[i] }));
  const phase = f.map((x, i) => ({ x, y: impedance.phaseRad[i] }));
  const annotations = {};
  if (hasAnnotations()) {
    resonances.forEach((r, i) => {
      annotations[`r${i}`] = {
        type: 'line', xMin: r.frequencyHz, xMax: r.frequencyHz, borderColor: translucent(NODE, 0.45), borderWidth: 1,
        borderDash: [4, 3],
        label: { display: i < 24, content: String(r.n), position: inputClosed ? 'start' : 'end', font: { size: 10 },
          backgroundColor: 'rgba(255,255,255,0.85)', color: NODE, padding: 2 },
      };
    });
  }
  return replaceChart(canvas, {
    type: 'line',
    data: {
      datasets: [
        { label: t('magnitude'), data: mag, yAxisID: 'y', borderColor: ACCENT, borderWidth: 1.4, pointRadius: 0, tension: 0 },
        { label: t('phase'), data: phase, yAxisID: 'phase', borderColor: PHASE, borderWidth: 1, pointRadius: 0,
          tension: 0, hidden: !showPhase },
      ],
    },
    options: {
      animation: false, parsing: false, normalized: true, maintainAspectRatio: false,
      interaction: { mode: 'nearest', axis: 'x', intersect: false },
      scales: {
        x: { type: 'linear', title: { display: true, text: t('frequencyAxis') }, min: f[0], max: f[f.length - 1] },
        y: { type: 'logarithmic', title: { display: true, text: t('magnitude') }, ticks: { callback: decade } },
        phase: { position: 'right', display: showPhase, min: -Math.PI / 2 - 0.1, max: Math.PI / 2 + 0.1,
          title: { display: true, text: t('phase') }, grid: { drawOnChartArea: false } },
      },
      // The phase has a legend entry only while it is shown; overlays (a measured curve) always have one.
      plugins: { legend: { labels: { filter: (item) => showPhase || item.datasetIndex !== 1 } }, annotation: { annotations },
        decimation: DECIMATION },
    },
  });
}

/**
 * Standing-wave chart: profile = {positionMm[], pressure[], flow[]} (any scale; each is scaled to
 * its largest magnitude) or null; nodesMm always marked; holes as grey bands. Positions are shown
 * in the display unit through toUnit(mm).
 */
export function drawProfile(canvas, profile, nodesMm, holes, { toUnit, unitLabel, lengthMm }) {
  const scaled = (values) => {
    const m = Math.max(...values.map((v) => Math.abs(v)), 1e-300);
    return values.map((v) => v / m);
  };
  const datasets = [];
  if (profile && profile.positionMm?.length) {
    const xs = profile.positionMm.map(toUnit);
    const p = scaled(profile.pressure);
    datasets.push({ label: t('pressure'), data: xs.map((x, i) => ({ x, y: p[i] })), borderColor: ACCENT, borderWidth: 2, pointRadius: 0 });
    if (profile.flow?.length) {
      const u = scaled(profile.flow);
      datasets.push({ label: t('flow'), data: xs.map((x, i) => ({ x, y: u[i] })), borderColor: FLOW, borderWidth: 1.6,
        borderDash: [6, 3], pointRadius: 0 });
    }
  }
  // Node markers as points on the axis (so they show even without the annotation plugin).
  datasets.push({ label: t('pressureNode'), data: nodesMm.map((n) => ({ x: toUnit(n), y: 0 })), showLine: false,
    pointStyle: 'crossRot', pointRadius: 7, borderColor: NODE, borderWidth: 2, backgroundColor: NODE });
  const annotations = {};
  if (hasAnnotations()) {
    nodesMm.forEach((n, i) => {
      annotations[`n${i}`] = { type: 'line', xMin: toUnit(n), xMax: toUnit(n), borderColor: translucent(NODE, 0.5), borderDash: [3, 3], borderWidth: 1 };
    });
    holes.forEach((h, i) => {
      if (!Number.isFinite(h.positionMm) || !Number.isFinite(h.diameterMm)) return;
      annotations[`h${i}`] = { type: 'box', xMin: toUnit(h.positionMm - h.diameterMm / 2), xMax: toUnit(h.positionMm + h.diameterMm / 2),
        backgroundColor: h.open ? 'rgba(120,120,120,0.18)' : 'rgba(60,60,60,0.35)', borderWidth: 0 };
    });
  }
  return replaceChart(canvas, {
    type: 'line',
    data: { datasets },
    options: {
      animation: false, parsing: false, maintainAspectRatio: false,
      scales: {
        x: { type: 'linear', min: 0, max: Number.isFinite(lengthMm) ? toUnit(lengthMm) : undefined,
          title: { display: true, text: `${t('positionAxis')} (${unitLabel})` } },
        y: { min: -1.1, max: 1.1, title: { display: true, text: `${t('pressure')} / ${t('flow')}` } },
      },
      plugins: { annotation: { annotations } },
    },
  });
}
