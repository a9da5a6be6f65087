// Small Chart.js helpers shared by the pages. Chart.js and chartjs-plugin-annotation are globals
// loaded by the layout from their WebJars; nothing here fetches anything.

/**
 * The one palette of every chart and state mark: Okabe & Ito's "Color Universal Design" set (2008),
 * eight colours chosen to stay apart for protanopes, deuteranopes and tritanopes. Series take them
 * in this order (blue, vermillion, bluish green, reddish purple, orange, sky blue, yellow, black).
 * nodewright.css carries the same values as --series-1..8; src/test/js/palette.test.mjs checks both
 * against simulated colour-vision deficiency (Machado, Oliveira & Fernandes 2009) by CIEDE2000.
 */
export const PALETTE = Object.freeze(['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#F0E442', '#000000']);

/**
 * Colours of the states a page marks (in tune / out of tune, stress caution levels), always beside
 * a word and a shape: Okabe–Ito blue, and its orange and vermillion darkened (sRGB × 0.65 and × 0.63)
 * so that text in them reads at 4.5:1 on the paper. Same values as --ok, --warn, --danger in the CSS.
 */
export const STATE = Object.freeze({ ok: '#0072B2', warn: '#956700', danger: '#863B00' });

/** Page ink and paper (as --ink and --paper), for marks drawn in black and white. */
export const INK = '#1f2a36';
export const PAPER = '#fbf8f1';

export function colour(i) {
  return PALETTE[((i % PALETTE.length) + PALETTE.length) % PALETTE.length];
}

/** A palette or state colour with transparency alpha (0..1), for bands and shaded areas. */
export function translucent(hex, alpha) {
  const [r, g, b] = [1, 3, 5].map((k) => parseInt(hex.slice(k, k + 2), 16));
  return `rgba(${r},${g},${b},${alpha})`;
}

// Overlays: a panel adds its datasets to a chart another module draws (measured partials on the
// partials chart, a measured impedance curve) by name, never by reaching into the chart. The owner
// redraws with drawChart; the overlays registered for that canvas are put back after each drawing.
const overlays = new Map();   // canvas id → Map(overlay name → (chart) => datasets)

function applyOverlays(chart) {
  const mine = overlays.get(chart.canvas?.id);
  chart.data.datasets = chart.data.datasets.filter((ds) => !ds.overlay);
  if (!mine) return;
  for (const [name, datasetsFor] of mine) {
    for (const ds of datasetsFor(chart) || []) chart.data.datasets.push({ ...ds, overlay: name });
  }
}

/**
 * Draws a chart on a canvas, or updates the one already there in place (no flicker, no
 * animation); replace: true draws it anew. The canvas's overlays are put back on top.
 */
export function drawChart(canvas, config, { replace = false } = {}) {
  const existing = Chart.getChart(canvas);
  let chart;
  if (existing && !replace && existing.config.type === config.type) {
    existing.data = config.data;
    existing.options = config.options;
    chart = existing;
  } else {
    if (existing) existing.destroy();
    chart = new Chart(canvas, config);
  }
  applyOverlays(chart);
  chart.update('none');
  return chart;
}

/** The chart drawn on the canvas with that id, or null. */
export function chartOn(canvasId) {
  const canvas = typeof document === 'undefined' ? null : document.getElementById(canvasId);
  return canvas && typeof Chart !== 'undefined' ? Chart.getChart(canvas) ?? null : null;
}

/**
 * Puts named overlay datasets on the chart of canvasId, now and after each redraw by its owner.
 * datasetsFor(chart) returns the datasets (it may extend the chart's labels). Returns true when
 * the chart is drawn on this page now.
 */
export function setOverlay(canvasId, name, datasetsFor) {
  if (!overlays.has(canvasId)) overlays.set(canvasId, new Map());
  overlays.get(canvasId).set(name, datasetsFor);
  const chart = chartOn(canvasId);
  if (chart) { applyOverlays(chart); chart.update('none'); }
  return chart !== null;
}

export function clearOverlay(canvasId, name) {
  overlays.get(canvasId)?.delete(name);
  const chart = chartOn(canvasId);
  if (chart) { applyOverlays(chart); chart.update('none'); }
}

/** Moves a vertical line annotation (a draggable marker) of the chart on canvasId to x. */
export function moveLine(canvasId, annotationId, x) {
  const chart = chartOn(canvasId);
  const a = chart?.options.plugins?.annotation?.annotations?.[annotationId];
  if (!a) return;
  a.xMin = x;
  a.xMax = x;
  chart.update('none');
}

/** Options every chart shares: responsive, no animation, titled axes. */
export function baseOptions({ xTitle, yTitle, legend = true } = {}) {
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    parsing: true,
    plugins: {
      legend: { display: legend, labels: { boxWidth: 12, font: { size: 11 } } },
      annotation: { annotations: {} },
    },
    scales: {
      x: { type: 'linear', title: { display: !!xTitle, text: xTitle } },
      y: { title: { display: !!yTitle, text: yTitle } },
    },
  };
}

/** A vertical marker line (annotation plugin) at x with a small label. */
export function verticalLine(x, label, lineColour, { dash = [], draggable = false, labelAt = 'start' } = {}) {
  return {
    type: 'line',
    xMin: x,
    xMax: x,
    borderColor: lineColour,
    borderWidth: draggable ? 3 : 2,
    borderDash: dash,
    draggable,
    label: {
      display: true,
      content: label,
      position: labelAt,
      backgroundColor: lineColour,
      color: '#fff',
      font: { size: 10 },
      padding: 3,
    },
  };
}

/** A shaded band from x0 to x1 (a pickup's aperture). */
export function band(x0, x1, fill) {
  return { type: 'box', xMin: x0, xMax: x1, backgroundColor: fill, borderWidth: 0, drawTime: 'beforeDatasetsDraw' };
}

/**
 * Levels in dB relative to the largest magnitude among all the given series; exact zeros and
 * anything below the floor sit on the floor (the raw magnitudes stay available to the caller).
 */
export function levelsDb(seriesList, floorDb) {
  let max = 0;
  for (const s of seriesList) for (const v of s) max = Math.max(max, Math.abs(v));
  return seriesList.map((s) => s.map((v) => {
    if (max === 0 || v === 0) return floorDb;
    return Math.max(floorDb, 20 * Math.log10(Math.abs(v) / max));
  }));
}

/**
 * Lets the user drag the chart's draggable vertical line annotations along the x axis.
 * onMove(id, x) is called while dragging (x in axis units, kept inside the axis range).
 */
export function enableLineDrag(canvas, onMove) {
  if (canvas.dataset.dragReady) return;
  canvas.dataset.dragReady = 'true';
  let dragging = null;
  const near = (chart, px) => {
    const annotations = chart.options.plugins?.annotation?.annotations || {};
    let best = null;
    let bestDist = 9; // pixels: how close the pointer must be to grab a line
    for (const [id, a] of Object.entries(annotations)) {
      if (!a.draggable) continue;
      const d = Math.abs(chart.scales.x.getPixelForValue(a.xMin) - px);
      if (d < bestDist) { best = id; bestDist = d; }
    }
    return best;
  };
  canvas.addEventListener('pointerdown', (e) => {
    const chart = Chart.getChart(canvas);
    if (!chart) return;
    const id = near(chart, e.offsetX);
    if (!id) return;
    dragging = id;
    canvas.setPointerCapture(e.pointerId);
    e.preventDefault();
  });
  canvas.addEventListener('pointermove', (e) => {
    const chart = Chart.getChart(canvas);
    if (!chart) return;
    if (!dragging) {
      canvas.style.cursor = near(chart, e.offsetX) ? 'ew-resize' : '';
      return;
    }
    const scale = chart.scales.x;
    const x = Math.min(scale.max, Math.max(scale.min, scale.getValueForPixel(e.offsetX)));
    onMove(dragging, x);
  });
  const stop = (e) => {
    if (dragging && canvas.hasPointerCapture(e.pointerId)) canvas.releasePointerCapture(e.pointerId);
    dragging = null;
  };
  canvas.addEventListener('pointerup', stop);
  canvas.addEventListener('pointercancel', stop);
}
