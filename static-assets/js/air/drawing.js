// The bore drawn to scale as SVG: the walls of every segment, tone holes as chimneys on the top
// wall with a marker above (filled = closed, hollow ring = open), pressure nodes of the chosen
// resonance as ticks on the axis, and a scale bar. Diameters may be widened for legibility.
import { t } from './text.js';
import { mouthExtentMm } from './mouth.js';

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
 * null, skipped). Options: widen (radial factor), inputEnd, outputEnd, nodesMm, onHoleClick(i).
 */
export function drawBore(container, segments, holes, options = {}) {
  const widen = options.widen ?? 1;
  const good = segments.filter((s) => [s.lengthMm, s.inputDiameterMm, s.outputDiameterMm].every((v) => Number.isFinite(v) && v > 0));
  const width = Math.max(320, container.clientWidth || 600);
  container.replaceChildren();
  if (!good.length) {
    container.append(el('svg', { width, height: 40 }));
    return;
  }
  const total = good.reduce((s, g) => s + g.lengthMm, 0);
  const mouth = options.mouth ?? null;
  const lead = Math.max(0, mouthExtentMm(mouth) || 0); // the mouth's extent upstream of x = 0, mm
  const margin = 44;
  const scale = (width - 2 * margin) / (total + lead); // px per mm, the same along and across the bore
  const maxD = Math.max(...good.flatMap((g) => [g.inputDiameterMm, g.outputDiameterMm]));
  const goodHoles = holes.map((h, i) => ({ ...h, index: i }))
    .filter((h) => [h.positionMm, h.diameterMm, h.chimneyMm].every((v) => Number.isFinite(v) && v >= 0));
  const maxHole = Math.max(0, ...goodHoles.map((h) => h.diameterMm));
  const maxChimney = Math.max(0, ...goodHoles.map((h) => h.chimneyMm));
  const top = 26 + (goodHoles.length ? maxHole * scale + Math.max(3, maxChimney * scale * widen) + 14 : 0);
  const halfMax = (maxD / 2) * scale * widen;
  const axisY = top + halfMax;
  const height = axisY + halfMax + 48;
  const svg = el('svg', { width, height, viewBox: `0 0 ${width} ${height}`, role: 'img', class: 'bore-svg',
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
  svg.append(el('text', { x: x(0), y: axisY + halfMax + 16, class: 'bore-label' }, t('inputEnd')));
  svg.append(el('text', { x: x(total), y: axisY + halfMax + 16, class: 'bore-label end' }, t('outputEnd')));

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
    const g = el('g', { class: h.open ? 'bore-hole open' : 'bore-hole closed', 'data-hole': h.index, tabindex: 0 });
    g.append(el('title', {}, `${t('hole')} ${h.index + 1}: ${h.open ? t('open') : t('closed')}`));
    g.append(el('rect', { x: cx - w / 2, y: wallY - chimney, width: w, height: chimney + 1, class: 'hole-chimney' }));
    const markerR = Math.max(3, (h.diameterMm * scale) / 2);
    g.append(el('circle', { cx, cy: wallY - chimney - markerR - 2, r: markerR, class: 'hole-marker' }));
    g.append(el('text', { x: cx, y: wallY - chimney - 2 * markerR - 6, class: 'hole-number' }, String(h.index + 1)));
    if (options.onHoleClick) {
      g.addEventListener('click', () => options.onHoleClick(h.index));
      g.addEventListener('keydown', (e) => { if (e.key === 'Enter' || e.key === ' ') { e.preventDefault(); options.onHoleClick(h.index); } });
    }
    svg.append(g);
  }

  // Scale bar and the overall length, in the display unit.
  const inch = options.unit === 'inch';
  const perUnit = inch ? 25.4 : 1;
  const bar = inch ? [0.5, 1, 2, 5, 10, 20, 50].reduce((b, s) => (Math.abs(s - total / 127) < Math.abs(b - total / 127) ? s : b), 1)
    : barLength(total);
  const unitText = inch ? t('unitInch') : t('unitMm');
  const barY = height - 18;
  svg.append(el('line', { x1: x(0), y1: barY, x2: x(bar * perUnit), y2: barY, class: 'scale-bar' }));
  svg.append(el('text', { x: x(bar * perUnit) + 6, y: barY + 4, class: 'bore-label' }, `${bar} ${unitText}`));
  svg.append(el('text', { x: x(total), y: barY + 4, class: 'bore-label end' },
    `${Number((total / perUnit).toFixed(inch ? 3 : 2))} ${unitText}${widen > 1 ? ` · ⌀ × ${widen}` : ''}`));
  container.append(svg);
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
