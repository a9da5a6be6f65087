// The bore drawn to scale as SVG: the walls of every segment, tone holes as chimneys on the top
// wall with a marker above (filled = closed, hollow ring = open), pressure nodes of the chosen
// resonance as ticks on the axis, and a scale bar. Diameters may be widened for legibility.
// The drawing is also an editor: a joint's knob below the bore drags (or arrow-keys) the length
// of the segment that ends there, a knob on the top wall a bore diameter, a hole along the bore
// its position; options.onEdit hears each change, the page puts it in the rows.
import { t } from './text.js';
import { mouthExtentMm } from './mouth.js';
import { keepFocus } from '../common/keep-focus.js';
import { boundedMm, diameterHandles, keyStepMm, usableSegments } from './geometry.js';

const NS = 'http://www.w3.org/2000/svg';

function el(name, attrs = {}, text) {
  const e = document.createElementNS(NS, name);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, String(v));
  if (text !== undefined) e.textContent = text;
  return e;
}

/** A round scale-bar length (mm) near a fifth of the bore. */
function barLength(totalMm) {
  const target = totalMm / 5;
  const steps = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000];
  return steps.reduce((best, s) => (Math.abs(s - target) < Math.abs(best - target) ? s : best), steps[0]);
}

/**
 * Draws the bore into the container. segments/holes are request lists (mm; unreadable values
 * null, skipped). Options: widen (radial factor), unit, inputEnd, outputEnd, nodesMm, mouth,
 * onHoleClick(i), and for editing on the drawing onEdit({kind, targets: [{list, index, field}],
 * valueMm}) on every step of a drag or arrow key, onEditEnd() when a drag or key press ends.
 */
export function drawBore(container, segments, holes, options = {}) {
  wire(container);
  OPTIONS.set(container, options);
  keepFocus(container, () => draw(container, segments, holes, options));
}

/** The options of each container's last drawing (its handlers), and a drag in progress. */
const OPTIONS = new WeakMap();
const DRAG = new WeakMap();

function draw(container, segments, holes, options) {
  const widen = options.widen ?? 1;
  const good = segments.filter((s) => [s.lengthMm, s.inputDiameterMm, s.outputDiameterMm].every((v) => Number.isFinite(v) && v > 0));
  const frozen = DRAG.get(container)?.layout ?? null;   // while a drag lasts the scale stays put
  const width = frozen?.width ?? Math.max(320, container.clientWidth || 600);
  container.replaceChildren();
  if (!good.length) {
    container.append(el('svg', { width, height: 40 }));
    return;
  }
  const total = good.reduce((s, g) => s + g.lengthMm, 0);
  const mouth = options.mouth ?? null;
  const lead = frozen?.lead ?? Math.max(0, mouthExtentMm(mouth) || 0); // the mouth's extent upstream of x = 0, mm
  const margin = 44;
  const scale = frozen?.scale ?? (width - 2 * margin) / (total + lead); // px per mm, the same along and across the bore
  const maxD = Math.max(...good.flatMap((g) => [g.inputDiameterMm, g.outputDiameterMm]));
  const goodHoles = holes.map((h, i) => ({ ...h, index: i }))
    .filter((h) => [h.positionMm, h.diameterMm, h.chimneyMm].every((v) => Number.isFinite(v) && v >= 0));
  const maxHole = Math.max(0, ...goodHoles.map((h) => h.diameterMm));
  const maxChimney = Math.max(0, ...goodHoles.map((h) => h.chimneyMm));
  const top = frozen?.top ?? 26 + (goodHoles.length ? maxHole * scale + Math.max(3, maxChimney * scale * widen) + 14 : 0);
  const halfMax = frozen?.halfMax ?? (maxD / 2) * scale * widen;
  const axisY = top + halfMax;
  const height = axisY + halfMax + 62;
  container.dataset.pxPerMm = String(scale);
  LAYOUT.set(container, { width, lead, scale, top, halfMax, widen, total });
  const svg = el('svg', { width, height, viewBox: `0 0 ${width} ${height}`, role: 'group', class: 'bore-svg',
    'aria-label': t('drawingLabel', good.length, goodHoles.length, Number(total.toFixed(2))) });
  const x = (mm) => margin + (mm + lead) * scale;
  const r = (d) => (d / 2) * scale * widen;

  // Walls: one polygon over all segments (steps in diameter show as vertical edges).
  const upper = [];
  const lower = [];
  let at = 0;
  for (const g of good) {
    upper.push([x(at), axisY - r(g.inputDiameterMm)], [x(at + g.lengthMm), axisY - r(g.outputDiameterMm)]);
    lower.push([x(at), axisY + r(g.inputDiameterMm)], [x(at + g.lengthMm), axisY + r(g.outputDiameterMm)]);
    at += g.lengthMm;
  }
  const points = [...upper, ...lower.reverse()].map(([px, py]) => `${px.toFixed(1)},${py.toFixed(1)}`).join(' ');
  svg.append(el('polygon', { points, class: 'bore-air' }));
  svg.append(el('line', { x1: x(0), y1: axisY, x2: x(total), y2: axisY, class: 'bore-axis' }));
  // Segment joints.
  at = 0;
  for (const g of good.slice(0, -1)) {
    at += g.lengthMm;
    svg.append(el('line', { x1: x(at), y1: axisY - halfMax - 3, x2: x(at), y2: axisY + halfMax + 3, class: 'bore-joint' }));
  }
  // Ends: a closed end is a thick bar, an open end a thin dashed one.
  const endMark = (mm, d, closed) => svg.append(el('line', {
    x1: x(mm), y1: axisY - r(d) - 2, x2: x(mm), y2: axisY + r(d) + 2, class: closed ? 'bore-end closed' : 'bore-end open',
  }));
  endMark(0, good[0].inputDiameterMm, options.inputEnd === 'closed');
  endMark(total, good[good.length - 1].outputDiameterMm, options.outputEnd === 'closed');
  svg.append(el('text', { x: x(0), y: axisY + halfMax + 32, class: 'bore-label' }, t('inputEnd')));
  svg.append(el('text', { x: x(total), y: axisY + halfMax + 32, class: 'bore-label end' }, t('outputEnd')));

  if (mouth) drawMouth(svg, mouth, good[0].inputDiameterMm, { x, r, axisY, scale, widen });

  // Pressure nodes of the chosen resonance.
  for (const n of options.nodesMm ?? []) {
    if (n < 0 || n > total) continue;
    svg.append(el('line', { x1: x(n), y1: axisY - 5, x2: x(n), y2: axisY + 5, class: 'bore-node' }));
  }

  // Tone holes: the chimney rises from the top wall; the marker above shows open or closed.
  const wallAt = (mm) => {
    let from = 0;
    for (const g of good) {
      if (mm <= from + g.lengthMm) return g.inputDiameterMm + ((mm - from) / g.lengthMm) * (g.outputDiameterMm - g.inputDiameterMm);
      from += g.lengthMm;
    }
    return good[good.length - 1].outputDiameterMm;
  };
  for (const h of goodHoles) {
    const cx = x(Math.min(Math.max(h.positionMm, 0), total));
    const wallY = axisY - r(wallAt(h.positionMm));
    const chimney = Math.max(3, h.chimneyMm * scale * widen);
    const w = Math.max(2, h.diameterMm * scale);
    const state = h.open ? t('open') : t('closed');
    const where = showMm(h.positionMm, options.unit);
    const g = el('g', { class: h.open ? 'bore-hole open' : 'bore-hole closed', 'data-hole': h.index, tabindex: 0,
      role: 'checkbox', 'aria-checked': String(!h.open), 'aria-keyshortcuts': 'Enter Space ArrowLeft ArrowRight',
      'aria-label': t('holeHandle', h.index + 1, state, where),
      'data-handle': `hole:${h.index}`, 'data-kind': 'position', 'data-value-mm': h.positionMm, 'data-targets': `holes.${h.index}.positionMm` });
    g.append(el('title', {}, `${t('hole')} ${h.index + 1}: ${state} · ${where}`));
    g.append(el('rect', { x: cx - w / 2, y: wallY - chimney, width: w, height: chimney + 1, class: 'hole-chimney' }));
    const markerR = Math.max(3, (h.diameterMm * scale) / 2);
    g.append(el('circle', { cx, cy: wallY - chimney - markerR - 2, r: markerR, class: 'hole-marker' }));
    g.append(el('text', { x: cx, y: wallY - chimney - 2 * markerR - 6, class: 'hole-number' }, String(h.index + 1)));
    svg.append(g);
  }
  if (options.onEdit) drawHandles(svg, segments, { x, axisY, halfMax, r, unit: options.unit, total });

  // Scale bar and the overall length, in the display unit.
  const inch = options.unit === 'inch';
  const perUnit = inch ? 25.4 : 1;
  const bar = inch ? [0.5, 1, 2, 5, 10, 20, 50].reduce((b, s) => (Math.abs(s - total / 127) < Math.abs(b - total / 127) ? s : b), 1)
    : barLength(total);
  const unitText = inch ? t('unitInch') : t('unitMm');
  const barY = height - 12;
  svg.append(el('line', { x1: x(0), y1: barY, x2: x(bar * perUnit), y2: barY, class: 'scale-bar' }));
  svg.append(el('text', { x: x(bar * perUnit) + 6, y: barY + 4, class: 'bore-label' }, `${bar} ${unitText}`));
  svg.append(el('text', { x: x(total), y: barY + 4, class: 'bore-label end' },
    `${Number((total / perUnit).toFixed(inch ? 3 : 2))} ${unitText}${widen > 1 ? ` · ⌀ × ${widen}` : ''}`));
  container.append(svg);
}

/** The layout of each container's last drawing: a drag starts from it and keeps it. */
const LAYOUT = new WeakMap();

const showMm = (mm, unit) => (unit === 'inch'
  ? `${Number((mm / 25.4).toFixed(3))} ${t('unitInch')}` : `${Number(mm.toFixed(2))} ${t('unitMm')}`);

/**
 * The editing knobs: below the bore at each joint (and at its far end) a diamond that sets the
 * length of the segment ending there; on the top wall a round knob per diameter (one where the
 * bore is continuous, one each side of a step). Each is a slider for the keyboard.
 */
function drawHandles(svg, segments, { x, axisY, halfMax, r, unit, total }) {
  const good = usableSegments(segments);
  let at = 0;
  good.forEach((g, k) => {
    at += g.lengthMm;
    const cx = x(at);
    const y = axisY + halfMax + 12;
    const label = t('jointHandle', g.index + 1, showMm(g.lengthMm, unit));
    const knob = el('g', { class: 'bore-handle joint', tabindex: 0, role: 'slider', 'aria-orientation': 'horizontal',
      'aria-label': label, 'aria-valuenow': Number(g.lengthMm.toFixed(2)), 'aria-valuemin': 0.1, 'aria-valuemax': 100000,
      'aria-valuetext': showMm(g.lengthMm, unit),
      'data-handle': `joint:${g.index}`, 'data-kind': 'length', 'data-value-mm': g.lengthMm, 'data-targets': `segments.${g.index}.lengthMm` });
    knob.append(el('title', {}, label));
    knob.append(el('line', { x1: cx, y1: axisY - halfMax - 3, x2: cx, y2: y, class: 'handle-stem' }));
    knob.append(el('rect', { x: cx - 12, y: y - 10, width: 24, height: 20, class: 'handle-hit' }));
    knob.append(el('polygon', { points: `${cx},${y - 6} ${cx + 6},${y} ${cx},${y + 6} ${cx - 6},${y}`, class: 'handle-knob' }));
    if (k === good.length - 1) knob.classList.add('end');
    svg.append(knob);
  });
  for (const h of diameterHandles(segments)) {
    const dx = h.side === 'before' ? -7 : h.side === 'after' ? 7 : 0;
    const cx = Math.min(Math.max(x(h.atMm) + dx, x(0) + 4), x(total) - 4);
    const cy = axisY - r(h.diameterMm);
    const which = h.targets.map((tg) => `${tg.segment + 1}`).join('/');
    const label = t('diameterHandle', which, showMm(h.diameterMm, unit));
    const knob = el('g', { class: 'bore-handle diameter', tabindex: 0, role: 'slider', 'aria-orientation': 'vertical',
      'aria-label': label, 'aria-valuenow': Number(h.diameterMm.toFixed(2)), 'aria-valuemin': 0.1, 'aria-valuemax': 100000,
      'aria-valuetext': showMm(h.diameterMm, unit),
      'data-handle': `diameter:${h.targets.map((tg) => `${tg.segment}.${tg.field}`).join(',')}`, 'data-kind': 'diameter',
      'data-value-mm': h.diameterMm, 'data-targets': h.targets.map((tg) => `segments.${tg.segment}.${tg.field}`).join(' ') });
    knob.append(el('title', {}, label));
    knob.append(el('circle', { cx, cy, r: 9, class: 'handle-hit' }));
    knob.append(el('circle', { cx, cy, r: 4, class: 'handle-knob' }));
    svg.append(knob);
  }
}

/** The edit a handle element names: {kind, targets: [{list, index, field}], valueMm}. */
function editOf(handle, valueMm) {
  const targets = handle.dataset.targets.split(' ').map((s) => {
    const [list, index, field] = s.split('.');
    return { list, index: Number(index), field };
  });
  return { kind: handle.dataset.kind, targets, valueMm };
}

/**
 * Pointer and keys on a container's drawing, wired once: a press on a handle that then moves
 * more than 3 px is a drag (the container captures the pointer, so the drag outlives each
 * redraw); a press that does not move is a click, which on a hole opens or closes it. Arrow keys
 * on a focused handle move it by a step, Enter or Space on a hole toggles it.
 */
function wire(container) {
  if (container.dataset.wired) return;
  container.dataset.wired = 'true';
  container.addEventListener('pointerdown', (e) => {
    const handle = e.target.closest('[data-handle]');
    if (!handle || e.button !== 0) return;
    const layout = LAYOUT.get(container);
    DRAG.set(container, { pointerId: e.pointerId, handle: handle.dataset.handle, kind: handle.dataset.kind, startX: e.clientX,
      startY: e.clientY, startMm: Number(handle.dataset.valueMm), targets: handle.dataset.targets, layout: null, base: layout, moved: false });
    if (handle.dataset.kind !== 'position') e.preventDefault();
  });
  container.addEventListener('pointermove', (e) => {
    const d = DRAG.get(container);
    if (!d || d.pointerId !== e.pointerId) return;
    const dx = e.clientX - d.startX;
    const dy = e.clientY - d.startY;
    if (!d.moved) {
      if (Math.hypot(dx, dy) <= 3) return;
      d.moved = true;
      d.layout = d.base;
      container.setPointerCapture?.(e.pointerId);
      container.classList.add('dragging');
    }
    const { scale, widen } = d.layout;
    const raw = d.kind === 'diameter' ? d.startMm - (2 * dy) / (scale * widen) : d.startMm + dx / scale;
    const options = OPTIONS.get(container);
    const valueMm = boundedMm(d.kind, raw, { totalMm: d.layout.total });
    const fake = { dataset: { kind: d.kind, targets: d.targets } };
    options.onEdit?.(editOf(fake, valueMm));
  });
  const end = (e) => {
    const d = DRAG.get(container);
    if (!d || d.pointerId !== e.pointerId) return;
    DRAG.delete(container);
    container.classList.remove('dragging');
    if (d.moved) {
      container.dataset.dragEnded = String(Date.now());
      OPTIONS.get(container).onEditEnd?.();
    }
  };
  container.addEventListener('pointerup', end);
  container.addEventListener('pointercancel', end);
  container.addEventListener('click', (e) => {
    const hole = e.target.closest('g.bore-hole[data-hole]');
    if (hole) OPTIONS.get(container).onHoleClick?.(Number(hole.dataset.hole));
  });
  container.addEventListener('keydown', (e) => {
    const handle = e.target.closest('[data-handle]');
    if (!handle) return;
    const options = OPTIONS.get(container);
    if (handle.dataset.hole !== undefined && (e.key === 'Enter' || e.key === ' ')) {
      e.preventDefault();
      options.onHoleClick?.(Number(handle.dataset.hole));
      return;
    }
    const kind = handle.dataset.kind;
    const along = kind !== 'diameter';
    const sign = { ArrowRight: along ? 1 : 0, ArrowLeft: along ? -1 : 0, ArrowUp: along ? 0 : 1, ArrowDown: along ? 0 : -1 }[e.key];
    if (!sign || !options.onEdit) return;
    e.preventDefault();
    const valueMm = boundedMm(kind, Number(handle.dataset.valueMm) + sign * keyStepMm(kind, options.unit, e.shiftKey),
      { totalMm: LAYOUT.get(container)?.total ?? Infinity });
    options.onEdit(editOf(handle, valueMm));
    options.onEditEnd?.();
  });
}

/**
 * The player's end at x = 0, to the same scale: the headspace up to its stopper and the opening
 * in the top wall (embouchure, window), a reed's wedge, or a cup and throat ahead of the bore.
 */
function drawMouth(svg, m, boreD, { x, r, axisY, scale, widen }) {
  const ok = (v) => Number.isFinite(v) && v >= 0;
  const g = el('g', { class: `bore-mouth ${m.kind}`, 'data-mouth': m.kind });
  g.append(el('title', {}, m.kind));
  if (m.kind === 'embouchure' || m.kind === 'window') {
    const h = ok(m.headspaceMm) ? m.headspaceMm : 0;
    if (h > 0) {
      g.append(el('rect', { x: x(-h), y: axisY - r(boreD), width: h * scale, height: 2 * r(boreD), class: 'bore-air headspace' }));
      g.append(el('line', { x1: x(-h), y1: axisY - r(boreD) - 2, x2: x(-h), y2: axisY + r(boreD) + 2, class: 'bore-end closed stopper' }));
    }
    const along = m.kind === 'window' ? m.windowLengthMm : m.holeLengthMm;
    const wall = ok(m.wallMm) ? m.wallMm : 0;
    if (ok(along)) {
      const w = Math.max(2, along * scale);
      const top = axisY - r(boreD);
      g.append(el('rect', { x: x(-along / 2), y: top - Math.max(2, wall * scale * widen), width: w,
        height: Math.max(2, wall * scale * widen) + 1, class: 'mouth-opening' }));
    }
  } else if (m.kind === 'reed') {
    const half = r(boreD);
    g.append(el('polygon', { points: `${x(-6)},${axisY - 1} ${x(0)},${axisY - half} ${x(0)},${axisY + half} ${x(-6)},${axisY + 1}`, class: 'mouth-reed' }));
  } else if (m.kind === 'cup') {
    const lt = ok(m.throatLengthMm) ? m.throatLengthMm : 0;
    const rt = ok(m.throatDiameterMm) ? r(m.throatDiameterMm) : 1;
    g.append(el('rect', { x: x(-lt), y: axisY - rt, width: lt * scale, height: 2 * rt, class: 'bore-air throat' }));
    const rc = Math.cbrt((3 * (m.cupVolumeMm3 ?? 0)) / (2 * Math.PI));
    if (Number.isFinite(rc) && rc > 0) {
      const cx = x(-lt);
      const ry = Math.min(rc * scale * widen, axisY - 4);
      const rx = rc * scale;
      g.append(el('path', { d: `M ${cx} ${axisY - ry} A ${rx} ${ry} 0 0 0 ${cx} ${axisY + ry} Z`, class: 'bore-air cup' }));
    }
  }
  svg.append(g);
}
