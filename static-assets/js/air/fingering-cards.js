// The fingering cards: each fingering drawn as the bore's own hole pattern, upright from the
// input end, its holes where they are on the bore and in proportion to it (filled = closed,
// hollow = open; a click, Enter or Space on a hole closes or opens it), beside a cents gauge of
// the predicted pitch against the tolerance band, the note and cents as text, the register marked.
// The rows and the readings belong to FingeringTable (fingerings.js); this only draws them.
import { fmt } from '../common/units.js';
import { centsGauge, fingeringHeightPx, fingeringLayout, totalLengthMm } from './geometry.js';
import { targetField } from './fingerings.js';
import { t } from './text.js';

const NS = 'http://www.w3.org/2000/svg';
const DRAWING_WIDTH = 64;
const GAUGE_WIDTH = 132;

function svgEl(name, attrs = {}, text) {
  const e = document.createElementNS(NS, name);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, String(v));
  if (text !== undefined) e.textContent = text;
  return e;
}

function htmlEl(name, attrs = {}, text) {
  const e = document.createElement(name);
  for (const [k, v] of Object.entries(attrs)) {
    if (k === 'className') e.className = v; else e.setAttribute(k, String(v));
  }
  if (text !== undefined) e.textContent = text;
  return e;
}

const signed = (c) => `${c >= 0 ? '+' : '−'}${Math.abs(c).toFixed(1)}`;

/** The register in words: "1st register" ... "4th register" (the page's texts). */
export const registerWords = (k) => t(`register${Math.min(Math.max(k, 1), 4)}`);

/**
 * Draws one card per fingering into the list element. model: {rows, holeCount, bore: {segments,
 * holes}, tolerance, judge(i)} where judge gives the reading (see FingeringTable.judge).
 */
export function drawCards(list, model) {
  const { segments, holes } = model.bore;
  const height = fingeringHeightPx(totalLengthMm(segments));
  const layout = fingeringLayout(segments, holes, { heightPx: height, halfWidthPx: 9, padPx: 16 });
  list.replaceChildren(...model.rows.map((r, i) => card(r, i, model, layout, height)));
}

function card(r, i, model, layout, height) {
  const reading = model.judge(i);
  const li = htmlEl('li', { className: `fingering-card ${reading?.cls ?? 'unknown'}${reading?.pending ? ' pending' : ''}`, 'data-row': i });
  const head = htmlEl('div', { className: 'card-head' });
  head.append(htmlEl('span', { className: 'card-number', 'aria-hidden': 'true' }, String(i + 1)));
  const name = htmlEl('input', { type: 'text', size: 9, 'data-key': 'name', 'data-row': i, 'data-field': `fingerings[${i}].name`,
    'aria-label': t('cardName', i + 1) });
  name.value = r.name;
  head.append(name);
  li.append(head);

  const body = htmlEl('div', { className: 'card-body' });
  body.append(boreOfFingering(r, i, model, layout, height));
  body.append(readingOf(r, i, reading, model.tolerance));
  li.append(body);

  const foot = htmlEl('div', { className: 'card-foot' });
  const target = htmlEl('label', { className: 'card-target' });
  target.append(htmlEl('span', {}, t('cardTarget')));
  const input = htmlEl('input', { type: 'text', size: 6, 'data-key': 'target', 'data-row': i, 'data-field': targetField(r.target, i),
    'aria-label': t('cardTargetLabel', i + 1) });
  input.value = r.target;
  target.append(input);
  const reg = htmlEl('select', { 'data-key': 'register', 'data-row': i, 'data-field': `fingerings[${i}].register`,
    'aria-label': t('cardRegisterLabel', i + 1) });
  for (let k = 1; k <= 4; k++) reg.append(new Option(registerWords(k), String(k), false, k === r.register));
  const apply = htmlEl('button', { type: 'button', className: 'secondary tiny apply', 'data-action': 'apply', 'data-row': i,
    title: t('applyFingering'), 'aria-label': t('applyFingeringOf', i + 1) }, '⇧');
  const rm = htmlEl('button', { type: 'button', className: 'secondary tiny remove', 'data-action': 'remove', 'data-row': i,
    title: t('remove'), 'aria-label': t('removeFingering', i + 1) }, '✕');
  foot.append(target, reg, apply, rm);
  li.append(foot);
  return li;
}

/** The bore upright with this fingering's holes: closed filled, open hollow, the register above. */
function boreOfFingering(r, i, model, layout, height) {
  const cx = DRAWING_WIDTH / 2 - 6;
  const closedCount = r.closedHoles.filter((h) => h < model.holeCount).length;
  const svg = svgEl('svg', { width: DRAWING_WIDTH, height, viewBox: `0 0 ${DRAWING_WIDTH} ${height}`, class: 'fingering-bore',
    role: 'group', 'data-field': `fingerings[${i}].closedHoles`, 'aria-label': t('cardHoles', r.name || i + 1, closedCount, model.holeCount) });
  if (layout.wall.length) {
    const left = layout.wall.map((p) => `${(cx - p.half).toFixed(1)},${p.y.toFixed(1)}`);
    const right = layout.wall.map((p) => `${(cx + p.half).toFixed(1)},${p.y.toFixed(1)}`).reverse();
    svg.append(svgEl('polygon', { points: [...left, ...right].join(' '), class: 'card-tube' }));
  }
  // The register: one chevron per register above the input end, the number beside for reading.
  for (let k = 0; k < r.register; k++) {
    const y = 3 + k * 3.2;
    svg.append(svgEl('polyline', { points: `${cx - 5},${y + 3} ${cx},${y} ${cx + 5},${y + 3}`, class: 'register-chevron' }));
  }
  for (const h of layout.holes) {
    const closed = r.closedHoles.includes(h.index);
    const state = closed ? t('closed') : t('open');
    const g = svgEl('g', { class: `fingering-hole ${closed ? 'closed' : 'open'}`, 'data-action': 'toggle', 'data-row': i, 'data-hole': h.index,
      tabindex: 0, role: 'checkbox', 'aria-checked': String(closed), 'aria-label': t('cardHole', h.index + 1, state) });
    g.append(svgEl('title', {}, t('cardHole', h.index + 1, state)));
    g.append(svgEl('circle', { cx, cy: h.y.toFixed(1), r: 9, class: 'hole-hit' }));
    g.append(svgEl('circle', { cx, cy: h.y.toFixed(1), r: Math.max(1.5, h.r).toFixed(2), class: 'hole-ring' }));
    g.append(svgEl('text', { x: cx + 15, y: (h.y + 3).toFixed(1), class: 'card-hole-number' }, String(h.index + 1)));
    svg.append(g);
  }
  return svg;
}

/** The cents gauge, the note and cents as text, the verdict in a word with its shape, the register. */
function readingOf(r, i, reading, tolerance) {
  const box = htmlEl('div', { className: 'card-reading' });
  const g = centsGauge(reading ? reading.cents : NaN, tolerance, GAUGE_WIDTH - 8);
  const label = reading ? t('cardGauge', signed(reading.cents), fmt(tolerance, 1)) : t('cardGaugeEmpty');
  const svg = svgEl('svg', { width: GAUGE_WIDTH, height: 44, viewBox: `0 0 ${GAUGE_WIDTH} 44`, class: 'cents-gauge', role: 'img',
    'aria-label': label, 'data-cents': reading ? reading.cents.toFixed(2) : '' });
  const x0 = 4;
  svg.append(svgEl('rect', { x: x0, y: 14, width: GAUGE_WIDTH - 8, height: 10, class: 'gauge-track' }));
  svg.append(svgEl('rect', { x: x0 + g.bandFrom, y: 12, width: Math.max(1, g.bandTo - g.bandFrom), height: 14, class: 'gauge-band' }));
  svg.append(svgEl('line', { x1: x0 + g.centre, y1: 9, x2: x0 + g.centre, y2: 29, class: 'gauge-zero' }));
  svg.append(svgEl('text', { x: x0, y: 40, class: 'gauge-scale' }, `−${g.range}`));
  svg.append(svgEl('text', { x: x0 + g.centre, y: 40, class: 'gauge-scale middle' }, '0'));
  svg.append(svgEl('text', { x: GAUGE_WIDTH - x0, y: 40, class: 'gauge-scale end' }, `+${g.range}`));
  if (g.needle !== null) {
    const x = x0 + g.needle;
    svg.append(svgEl('line', { x1: x, y1: 8, x2: x, y2: 30, class: 'gauge-needle' }));
    // Off the scale: an arrow pointing on; within it: a pointer on the needle.
    const tip = g.beyond ? `${x + 6 * g.beyond},5 ${x},1 ${x},9` : `${x - 4},1 ${x + 4},1 ${x},7`;
    svg.append(svgEl('polygon', { points: tip, class: 'gauge-pointer' }));
  }
  box.append(svg);
  const text = htmlEl('p', { className: 'card-note' });
  if (reading) {
    text.append(htmlEl('span', { className: 'card-sounds' }, reading.note.name), ' ',
      htmlEl('span', { className: 'card-cents' }, `${signed(reading.cents)} ¢`));
  } else {
    text.append(htmlEl('span', { className: 'card-sounds' }, '—'));
  }
  box.append(text);
  box.append(htmlEl('p', { className: 'card-hz' }, reading ? `${fmt(reading.hz, 1)} Hz` : reading === null ? t('noPrediction') : ''));
  box.append(htmlEl('p', { className: `card-verdict ${reading?.cls ?? ''}` },
    reading ? (reading.pending ? t('cardPending') : reading.word) : ''));
  box.append(htmlEl('p', { className: 'card-register' }, registerWords(r.register)));
  return box;
}
