// The set planner's drawing: the strings across the nut and along the neck, one row per string
// in the set's order, each drawn at its outside diameter (all at one magnification; wound strings
// with a wrap texture), its tension as a bar along it from the nut, its stress share as a band on
// a 0..100 % scale with the server's limits marked and its level in a word and a shape, and above
// the neck the total load with each string's share of it. Every figure comes from the answer.
import { bandAt, loadShares, neckRows } from './set-geometry.js';

const NS = 'http://www.w3.org/2000/svg';

function el(name, attrs = {}, text) {
  const e = document.createElementNS(NS, name);
  for (const [k, v] of Object.entries(attrs)) if (v !== undefined) e.setAttribute(k, String(v));
  if (text !== undefined) e.textContent = text;
  return e;
}

/** The shape beside each level's word (a state is never told by colour alone). */
const LEVEL_SHAPE = { ok: '○', warning: '▲', danger: '✖' };

/**
 * Draws the set into the container. set: {strings: [{label, outerMm, wound, tensionN, tensionText,
 * stressFraction, stressLevel}], totalText, limits: {warningFraction, dangerFraction} | null,
 * gaugeUnitText(mm)}, t: the page's texts.
 */
export function drawNeck(container, set, t) {
  const width = Math.max(520, container.clientWidth || 640);
  const n = set.strings.length;
  const labelW = 78;
  const nutX = labelW;
  const nutW = 9;
  const bandW = 96;
  const levelW = 136;
  const neckFrom = nutX + nutW;
  const neckTo = width - bandW - levelW - 24;
  const top = 58;
  const pitch = 30;
  const layout = neckRows(set.strings, { top, pitch, barPx: neckTo - neckFrom - 58, bandPx: bandW, maxWidthPx: 11 });
  const neckBottom = top + n * pitch;
  const height = neckBottom + 40;
  const svg = el('svg', { width, height, viewBox: `0 0 ${width} ${height}`, class: 'neck-svg', role: 'img',
    'aria-label': t('drawingLabel', n, set.totalText) });
  const defs = el('defs');
  // The wrap: fine slanted turns over the core, our own texture.
  const pattern = el('pattern', { id: 'wrap-turns', width: 3, height: 6, patternUnits: 'userSpaceOnUse', patternTransform: 'skewX(-35)' });
  pattern.append(el('rect', { width: 3, height: 6, class: 'wrap-base' }), el('line', { x1: 0.5, y1: 0, x2: 0.5, y2: 6, class: 'wrap-turn' }));
  defs.append(pattern);
  svg.append(defs);

  // Above the neck: the total load, and each string's share of it as one stacked bar.
  svg.append(el('text', { x: neckFrom, y: 16, class: 'neck-total', id: 'neck-total' }, `${t('total')}: ${set.totalText}`));
  const shares = loadShares(set.strings.map((s) => s.tensionN));
  let sx = neckFrom;
  const stackW = neckTo - neckFrom;
  shares.forEach((share, i) => {
    const w = share * stackW;
    const seg = el('rect', { x: sx, y: 24, width: Math.max(0, w), height: 12, class: `load-share ${i % 2 ? 'odd' : 'even'}`, 'data-string': i });
    seg.append(el('title', {}, `${i + 1} ${set.strings[i].label}: ${(100 * share).toFixed(0)} % · ${set.strings[i].tensionText}`));
    svg.append(seg);
    if (w > 16) svg.append(el('text', { x: sx + w / 2, y: 33.5, class: 'load-share-label' }, String(i + 1)));
    sx += w;
  });

  // The neck and the nut, a few frets for bearings (x_k = L (1 - 2^(-k/12)), twelve equal
  // divisions of the octave, drawn over the neck's first octave).
  svg.append(el('rect', { x: neckFrom, y: top - 6, width: neckTo - neckFrom, height: n * pitch + 12, class: 'neck-board' }));
  for (let k = 1; k <= 12; k++) {
    const fx = neckFrom + (1 - 2 ** (-k / 12)) * 2 * (neckTo - neckFrom);
    svg.append(el('line', { x1: fx, y1: top - 6, x2: fx, y2: neckBottom + 6, class: 'neck-fret' }));
  }
  svg.append(el('rect', { x: nutX, y: top - 8, width: nutW, height: n * pitch + 16, class: 'neck-nut' }));
  svg.append(el('text', { x: nutX + nutW / 2, y: neckBottom + 22, class: 'neck-caption middle' }, t('nut')));

  // The stress band's scale, with the limits where the server puts them.
  const bandX = neckTo + 16;
  svg.append(el('text', { x: bandX, y: top - 26, class: 'neck-caption' }, t('stressScale')));
  const limits = set.limits ?? {};
  for (const [kind, f] of [['warning', limits.warningFraction], ['danger', limits.dangerFraction]]) {
    const at = bandAt(f, bandW);
    if (at === null) continue;
    svg.append(el('line', { x1: bandX + at, y1: top - 6, x2: bandX + at, y2: neckBottom + 6, class: `limit-line ${kind}`, 'data-limit': kind }));
    // The caution mark's figure below the band, the breaking mark's above it, so that close limits both read.
    svg.append(el('text', { x: bandX + at, y: kind === 'warning' ? neckBottom + 20 : top - 12, class: `neck-caption middle limit-${kind}` },
      `${kind === 'warning' ? '▲' : '✖'} ${(100 * f).toFixed(0)} %`));
  }

  set.strings.forEach((s, i) => {
    const row = layout.rows[i];
    const g = el('g', { class: `neck-string ${s.wound ? 'wound' : 'plain'} level-${s.stressLevel ?? 'unknown'}`, 'data-string': i });
    g.append(el('title', {}, t('stringTitle', i + 1, s.label, s.gaugeText, s.tensionText,
      Number.isFinite(s.stressFraction) ? `${(100 * s.stressFraction).toFixed(0)} %` : '—')));
    g.append(el('text', { x: 4, y: row.y + 4, class: 'neck-label' }, `${i + 1} ${s.label}`));
    // The tension bar along the string, from the nut, and its figure at its end.
    g.append(el('rect', { x: neckFrom, y: row.y - 7, width: Math.max(0, row.barPx), height: 14, class: 'tension-bar', 'data-tension-px': row.barPx.toFixed(2) }));
    g.append(el('text', { x: neckFrom + row.barPx + 4, y: row.y - 8 + 4, class: 'tension-figure' }, s.tensionText));
    // The string itself at its gauge, across the nut to the end of the neck.
    const w = Math.max(0.6, row.widthPx);
    g.append(el('rect', { x: nutX - 10, y: row.y - w / 2, width: neckTo - nutX + 10, height: w, class: 'string-body',
      'data-width-px': row.widthPx.toFixed(3), fill: s.wound ? 'url(#wrap-turns)' : undefined }));
    // The stress share as a band on the 0..100 % scale, with the level's word and shape.
    g.append(el('rect', { x: bandX, y: row.y - 6, width: bandW, height: 12, class: 'stress-track' }));
    if (row.bandPx !== null) {
      g.append(el('rect', { x: bandX, y: row.y - 6, width: row.bandPx, height: 12, class: 'stress-band', 'data-share': s.stressFraction.toFixed(4) }));
    }
    const level = s.stressLevel ?? 'unknown';
    g.append(el('text', { x: bandX + bandW + 8, y: row.y + 4, class: `stress-word ${level}` },
      `${LEVEL_SHAPE[level] ?? '·'} ${t(`level.${level}`)}${Number.isFinite(s.stressFraction) ? ` ${(100 * s.stressFraction).toFixed(0)} %` : ''}`));
    svg.append(g);
  });
  svg.append(el('text', { x: neckFrom, y: height - 4, class: 'neck-caption' }, t('gaugeScale', Number(layout.pxPerMm.toFixed(1)), set.tensionScaleText(layout.tensionScaleN))));
  container.replaceChildren(svg);
  container.dataset.pxPerMm = String(layout.pxPerMm);
}
