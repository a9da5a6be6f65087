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
  placeLineHandles(canvas);
  describeChart(canvas, chart);
  return chart;
}

// Text alternative of every chart drawn here: the canvas is an image (role="img") named by its
// panel's heading and described by a table of the chart's own numbers, in a <details> right after
// the chart (and by any page table named in the canvas's data-described-by). Curves of more points
// than a table can carry are given as their extent; their numbers are in the page's own tables.
const TABLE_POINTS = 60;

function commonText(key, fallback) {
  const el = typeof document === 'undefined' ? null : document.querySelector(`#common-text [data-key="${key}"]`);
  return el?.textContent || fallback;
}

const shown = (v) => {
  if (typeof v !== 'number' || !Number.isFinite(v)) return v == null ? '' : String(v);
  const a = Math.abs(v);
  return a !== 0 && (a < 1e-3 || a >= 1e6) ? v.toExponential(3) : String(Number(v.toFixed(a < 10 ? 3 : 2)));
};

const axisTitle = (chart, axis) => {
  const title = chart.options.scales?.[axis]?.title;
  return title?.display !== false && title?.text ? String(title.text) : axis;
};

/** Rows of the chart's table: a category chart by its labels, an x/y chart by its series. */
function chartRows(chart) {
  const datasets = chart.data.datasets.filter((ds) => !ds.hidden);
  const labels = chart.data.labels;
  if (Array.isArray(labels) && labels.length && datasets.every((ds) => (ds.data || []).every((v) => typeof v !== 'object' || v === null))) {
    return {
      head: [axisTitle(chart, 'x'), ...datasets.map((ds) => ds.label ?? '')],
      rows: labels.map((label, i) => [String(label), ...datasets.map((ds) => shown(ds.data?.[i]))]),
    };
  }
  const x = axisTitle(chart, 'x');
  const y = axisTitle(chart, 'y');
  return {
    head: ['', `${x} · ${y}`],
    rows: datasets.map((ds) => {
      const points = (ds.data || []).map((p, i) => (typeof p === 'number' ? { x: labels?.[i] ?? i + 1, y: p } : p))
        .filter((p) => p && typeof p === 'object');
      if (points.length > TABLE_POINTS) {
        const xs = points.map((p) => Number(p.x)).filter(Number.isFinite);
        return [ds.label ?? '', commonText('common.js.chartCurve', 'curve of {0} points, {1} from {2} to {3}')
          .replace('{0}', points.length).replace('{1}', x).replace('{2}', shown(Math.min(...xs))).replace('{3}', shown(Math.max(...xs)))];
      }
      return [ds.label ?? '', points.map((p) => `${shown(p.x)} · ${shown(p.y)}`).join('; ')];
    }),
  };
}

function describeChart(canvas, chart) {
  if (typeof document === 'undefined' || !canvas.id) return;
  const box = canvas.parentElement;
  const tableId = `${canvas.id}-numbers`;
  let details = document.getElementById(`${tableId}-box`);
  if (!details) {
    details = document.createElement('details');
    details.className = 'chart-numbers no-print';
    details.id = `${tableId}-box`;
    const summary = document.createElement('summary');
    summary.textContent = commonText('common.js.chartNumbers', 'The numbers of this chart');
    const scroll = document.createElement('div');
    scroll.className = 'table-scroll';
    const table = document.createElement('table');
    table.className = 'numbers';
    table.id = tableId;
    scroll.append(table);
    details.append(summary, scroll);
    box.after(details);
  }
  const { head, rows } = chartRows(chart);
  const table = document.getElementById(tableId);
  const tr = (cells, tag) => {
    const row = document.createElement('tr');
    for (const c of cells) { const cell = document.createElement(tag); cell.textContent = c; if (tag === 'th') cell.scope = 'col'; row.append(cell); }
    return row;
  };
  const thead = document.createElement('thead');
  thead.append(tr(head, 'th'));
  const tbody = document.createElement('tbody');
  tbody.append(...rows.map((r) => tr(r, 'td')));
  table.replaceChildren(thead, tbody);
  const heading = canvas.closest('section, .panel, figure')?.querySelector('h2, h3, figcaption');
  canvas.setAttribute('role', 'img');
  canvas.setAttribute('aria-label', heading?.textContent.trim() || axisTitle(chart, 'y'));
  canvas.setAttribute('aria-describedby', [tableId, ...(canvas.dataset.describedBy || '').split(/\s+/).filter(Boolean)].join(' '));
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
  placeLineHandles(chart.canvas);
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

// Keyboard handles: each draggable line of a chart also gets a focusable element over it
// (role="slider", WAI-ARIA Authoring Practices' slider pattern) that the arrow keys move, so a
// marker can be placed without a pointer. Arrow keys move by one step, Page Up/Down by ten,
// Home/End to the ends of the range; the chart's owner is told through onMove as for a drag.
const handleSpecs = new Map();   // canvas id → {label(id), range(id) → {min, max, step}, unit(), digits(), onMove(id, x)}

/**
 * Gives the draggable lines of the chart on canvas keyboard handles, now and after each drawing.
 * spec: label(id) the line's name, range(id) {min, max, step} in axis units, unit() the axis unit
 * for the spoken value, digits() its decimals, onMove(id, x) called with the new x.
 */
export function enableLineKeys(canvas, spec) {
  handleSpecs.set(canvas.id, spec);
  placeLineHandles(canvas);
}

function keyStep(event, x, { min, max, step }) {
  const big = step * 10;
  const moves = {
    ArrowRight: x + step, ArrowUp: x + step, ArrowLeft: x - step, ArrowDown: x - step,
    PageUp: x + big, PageDown: x - big, Home: min, End: max,
  };
  if (!(event.key in moves)) return null;
  const snapped = event.key === 'Home' || event.key === 'End' ? moves[event.key] : Math.round(moves[event.key] / step) * step;
  return Math.min(max, Math.max(min, snapped));
}

function placeLineHandles(canvas) {
  const spec = canvas && handleSpecs.get(canvas.id);
  const chart = spec && typeof Chart !== 'undefined' ? Chart.getChart(canvas) : null;
  if (!chart || !chart.scales?.x) return;
  const box = canvas.parentElement;
  const annotations = chart.options.plugins?.annotation?.annotations || {};
  const ids = Object.keys(annotations).filter((id) => annotations[id].draggable);
  for (const h of box.querySelectorAll('.line-handle')) if (!ids.includes(h.dataset.marker)) h.remove();
  for (const id of ids) {
    let handle = box.querySelector(`.line-handle[data-marker="${id}"]`);
    if (!handle) {
      handle = document.createElement('div');
      handle.className = 'line-handle';
      handle.tabIndex = 0;
      handle.setAttribute('role', 'slider');
      handle.setAttribute('aria-orientation', 'horizontal');
      handle.dataset.marker = id;
      handle.addEventListener('keydown', (event) => {
        const line = Chart.getChart(canvas)?.options.plugins?.annotation?.annotations?.[id];
        if (!line) return;
        const x = keyStep(event, line.xMin, spec.range(id));
        if (x === null) return;
        event.preventDefault();
        spec.onMove(id, x);
      });
      box.append(handle);
    }
    const { min, max } = spec.range(id);
    const x = annotations[id].xMin;
    const digits = spec.digits();
    handle.setAttribute('aria-label', spec.label(id));
    handle.setAttribute('aria-valuemin', min.toFixed(digits));
    handle.setAttribute('aria-valuemax', max.toFixed(digits));
    handle.setAttribute('aria-valuenow', x.toFixed(digits));
    handle.setAttribute('aria-valuetext', `${x.toFixed(digits)} ${spec.unit()}`);
    handle.style.left = `${chart.scales.x.getPixelForValue(x)}px`;
    handle.style.top = `${chart.chartArea.top}px`;
    handle.style.height = `${chart.chartArea.bottom - chart.chartArea.top}px`;
  }
}
