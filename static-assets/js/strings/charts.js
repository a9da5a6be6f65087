// The string bench's charts: mode shapes with nodes and antinodes, the node map, partial
// deviations and the pluck × pickup spectrum. Canvas ids are read by tests and panels.
import { $, t, io, L, fmtLen } from './context.js';
import { drawChart, colour, baseOptions, verticalLine, band, levelsDb, chartOn, PALETTE, INK, PAPER, translucent } from '../common/charts.js';
import { buildRequest } from './form.js';

const SPECTRUM_FLOOR_DB = -80;      // lowest level drawn on the spectrum chart
const SHAPE_HALF_HEIGHT = 0.42;     // each mode shape is drawn ±0.42 around its row of the ladder

/** The server's cents of a mode from its harmonic. */
export const cents = (mode) => mode.centsFromHarmonic;

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
      const f = b.xMm === a.xMm ? 0 : (xMm - a.xMm) / (b.xMm - a.xMm);
      return a.y + f * (b.y - a.y);
    }
  }
  return samples.length ? samples[samples.length - 1].y : 0;
}

/**
 * Pluck and pickups where the form has them now: while a marker is dragged, an answer to an
 * earlier request must not pull the line back to where it was.
 */
function liveMarkers(request) {
  const live = buildRequest().request;
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
  const pluckLabel = request.pluck.kind === 'strike' ? t('strike') : t('pluck');
  if (typeof request.pluck.positionMm === 'number') {
    annotations.pluck = verticalLine(L(request.pluck.positionMm), pluckLabel, PALETTE[1], { draggable: true, labelAt: 'end' });
  }
  request.pickups.forEach((pu, i) => {
    if (typeof pu.positionMm !== 'number') return;
    if (pu.apertureMm > 0) {
      annotations[`aperture${i}`] = band(L(pu.positionMm - pu.apertureMm / 2), L(pu.positionMm + pu.apertureMm / 2), translucent(PALETTE[0], 0.15));
    }
    annotations[`pickup${i}`] = verticalLine(L(pu.positionMm), `${t('pickup')} ${i + 1}`, PALETTE[0], { dash: [6, 3], draggable: true });
  });
  return annotations;
}

function lengthAxis(lengthMm) {
  return { type: 'linear', min: 0, max: L(lengthMm), title: { display: true, text: `${t('position')} (${io.units.length})` } };
}

/**
 * What a chart was last drawn from, when only the pluck and pickup lines can differ: the same
 * shape arrays (the page reuses them for a marker move), length and unit. A marker move then
 * moves the lines on the chart already drawn instead of rebuilding thousands of points.
 */
const drawnFrom = new Map();

function markersOnly(canvasId, signature, request) {
  const chart = chartOn(canvasId);
  const before = drawnFrom.get(canvasId);
  drawnFrom.set(canvasId, signature);
  if (!chart || !before || !sameSignature(before, signature)) return false;
  chart.options.plugins.annotation.annotations = markerAnnotations(liveMarkers(request));
  chart.update('none');
  return true;
}

function sameSignature(a, b) {
  return a.key === b.key && a.refs.length === b.refs.length && a.refs.every((r, i) => r === b.refs[i]);
}

export function drawModeShapes(request, response) {
  const lengthMm = request.lengthMm;
  const shapeRefs = response.modes.map((m) => (Array.isArray(m.shape) ? m.shape : null));
  const signature = { key: `${lengthMm}|${io.units.length}`, refs: shapeRefs.every((r) => r) ? shapeRefs : [{}] };
  if (markersOnly('mode-shapes-chart', signature, request)) return;
  const count = response.modes.length;
  const row = (n) => count - n + 1;   // mode 1 on the top row
  const datasets = [];
  const nodes = [];
  const antinodes = [];
  for (const mode of response.modes) {
    const samples = shapeSamples(mode, lengthMm);
    datasets.push({
      kind: 'mode', n: mode.n, label: `${t('mode')} ${mode.n}`, borderColor: colour(mode.n - 1),
      borderWidth: 1.5, pointRadius: 0, showLine: true, fill: false,
      data: samples.map((s) => ({ x: L(s.xMm), y: row(mode.n) + SHAPE_HALF_HEIGHT * s.y })),
    });
    for (const x of mode.nodesMm) nodes.push({ x: L(x), y: row(mode.n), n: mode.n });
    for (const x of mode.antinodesMm) {
      antinodes.push({ x: L(x), y: row(mode.n) + SHAPE_HALF_HEIGHT * Math.sign(interpolate(samples, x) || 1), n: mode.n });
    }
  }
  datasets.push({ kind: 'nodes', label: t('nodes'), data: nodes, showLine: false, pointStyle: 'circle', pointRadius: 3.5, backgroundColor: INK, borderColor: INK });
  datasets.push({ kind: 'antinodes', label: t('antinodes'), data: antinodes, showLine: false, pointStyle: 'triangle', pointRadius: 4, backgroundColor: PAPER, borderColor: PALETTE[4], borderWidth: 1.5 });
  const options = baseOptions({});
  options.plugins.legend.labels.filter = (item, data) => data.datasets[item.datasetIndex].kind !== 'mode';
  options.plugins.annotation.annotations = markerAnnotations(liveMarkers(request));
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${ctx.dataset.label} · ${ctx.parsed.x.toFixed(2)} ${io.units.length}` } };
  options.scales.x = lengthAxis(lengthMm);
  options.scales.y = {
    min: 0.4, max: count + 0.6, ticks: { callback: (v) => `${t('mode')} ${count - v + 1}` },
    afterBuildTicks: (axis) => { axis.ticks = modeTicks(count); },
    grid: { color: 'rgba(0,0,0,0.06)' },
  };
  fitHeight('mode-shapes-chart', 360, 40, count);
  drawChart($('mode-shapes-chart'), { type: 'scatter', data: { datasets }, options });
}

export function drawNodeMap(request, response) {
  const count = response.modes.length;
  const nodeKey = `${request.lengthMm}|${io.units.length}|${JSON.stringify(response.modes.map((m) => m.nodesMm))}`;
  if (markersOnly('node-map-chart', { key: nodeKey, refs: [] }, request)) return;
  const datasets = response.modes.map((mode) => ({
    kind: 'node-row', n: mode.n, label: `${t('mode')} ${mode.n}`,
    data: mode.nodesMm.map((x) => ({ x: L(x), y: mode.n })),
    pointRadius: 4, pointStyle: 'circle', backgroundColor: colour(mode.n - 1), borderColor: colour(mode.n - 1), showLine: false,
  }));
  const options = baseOptions({ legend: false });
  options.plugins.annotation.annotations = markerAnnotations(liveMarkers(request));
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${t('mode')} ${ctx.parsed.y} · ${t('nodes')} ${ctx.parsed.x.toFixed(2)} ${io.units.length}` } };
  options.scales.x = lengthAxis(request.lengthMm);
  options.scales.y = {
    reverse: true, min: 0.5, max: count + 0.5, title: { display: true, text: t('modeNumber') },
    afterBuildTicks: (axis) => { axis.ticks = modeTicks(count); },
  };
  fitHeight('node-map-chart', 300, 18, count);
  drawChart($('node-map-chart'), { type: 'scatter', data: { datasets }, options });
}

export function drawPartials(response) {
  const modes = response.modes;
  const values = modes.map(cents);
  const options = baseOptions({ xTitle: t('modeNumber'), yTitle: t('cents'), legend: false });
  options.scales.x = { type: 'category', title: { display: true, text: t('modeNumber') } };
  options.plugins.tooltip = { callbacks: { label: (ctx) => {
    const m = modes[ctx.dataIndex];
    if (!m) return `${ctx.dataset.label}: ${Number(ctx.parsed.y).toFixed(2)} ¢`;
    return `${m.frequencyHz.toFixed(3)} Hz · ${m.harmonicHz.toFixed(3)} Hz · ${values[ctx.dataIndex].toFixed(2)} ¢`;
  } } };
  drawChart($('partials-chart'), {
    type: 'bar',
    data: { labels: modes.map((m) => String(m.n)), datasets: [{ kind: 'cents', label: t('cents'), data: values, backgroundColor: PALETTE[0] }] },
    options,
  });
}

/** Per-mode output of the pickups: the server's excitation × gain, plus the sum and difference of pickups 1 and 2. */
function spectrumSeries(response) {
  const modes = response.modes;
  const excitation = modes.map((m) => (m.excitation == null ? 1 : m.excitation));
  const pickupCount = modes.length ? (modes[0].pickupResponse || []).length : 0;
  const series = [];
  for (let k = 0; k < pickupCount; k++) {
    // pickupOutput is null when nothing sets the string going (no pluck): the gains alone then.
    series.push({ label: `${t('pickup')} ${k + 1}`, values: modes.map((m, i) => (m.pickupOutput ? m.pickupOutput[k] : excitation[i] * m.pickupResponse[k])) });
  }
  if (pickupCount >= 2) {
    series.push({ label: t('sum'), values: modes.map((m, i) => excitation[i] * (m.pickupResponse[0] + m.pickupResponse[1])), combined: true });
    series.push({ label: t('difference'), values: modes.map((m, i) => excitation[i] * (m.pickupResponse[0] - m.pickupResponse[1])), combined: true });
  }
  if (pickupCount === 0) series.push({ label: t('excitationOnly'), values: excitation });
  return series;
}

export function drawSpectrum(response) {
  const series = spectrumSeries(response);
  const levels = levelsDb(series.map((s) => s.values), SPECTRUM_FLOOR_DB);
  const datasets = series.map((s, i) => ({
    kind: s.combined ? 'combined' : 'pickup', label: s.label, amplitudes: s.values, data: levels[i],
    base: SPECTRUM_FLOOR_DB, backgroundColor: colour(i === 0 ? 0 : i + 1), borderWidth: 0,
  }));
  const options = baseOptions({});
  options.scales.x = { type: 'category', title: { display: true, text: t('modeNumber') } };
  options.scales.y = { min: SPECTRUM_FLOOR_DB, max: 0, title: { display: true, text: t('level') } };
  options.plugins.tooltip = { callbacks: { label: (ctx) => `${ctx.dataset.label}: ${ctx.parsed.y.toFixed(1)} dB (${ctx.dataset.amplitudes[ctx.dataIndex].toExponential(3)})` } };
  drawChart($('spectrum-chart'), { type: 'bar', data: { labels: response.modes.map((m) => String(m.n)), datasets }, options });
}

/** Under the pointer on the node map: which modes have a node within a few mm of that point. */
export function probeNodes(event, last) {
  const chart = chartOn('node-map-chart');
  if (!chart || !last) return;
  const area = chart.chartArea;
  if (event.offsetX < area.left || event.offsetX > area.right) { $('node-probe').textContent = ''; return; }
  const { request, response } = last;
  const xMm = io.lengthIn(chart.scales.x.getValueForPixel(event.offsetX));
  const tol = Math.max(2, request.lengthMm / 250);   // mm: about a fingertip, or 0.4 % of a long string
  const hits = response.modes.filter((m) => m.nodesMm.some((x) => Math.abs(x - xMm) <= tol)).map((m) => m.n);
  const where = `${fmtLen(xMm)} ${io.units.length}`;
  $('node-probe').textContent = hits.length ? t('probe', where, hits.join(', ')) : t('probeNone', where);
}
