// Small Chart.js helpers shared by the pages. Chart.js and chartjs-plugin-annotation are globals
// loaded by the layout from their WebJars; nothing here fetches anything.

/** Twelve distinguishable colours (our own palette), reused in order. */
const PALETTE = ['#2b5d8a', '#c0572b', '#2f7f4f', '#8a3b8f', '#b08a18', '#1f8a8a',
  '#a3262a', '#5a6b2a', '#6a4fb3', '#d07a9a', '#44546a', '#8c5a2b'];

export function colour(i) {
  return PALETTE[((i % PALETTE.length) + PALETTE.length) % PALETTE.length];
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
