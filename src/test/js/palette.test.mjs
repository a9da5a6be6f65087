// The page palette (js/common/charts.js PALETTE and STATE, the same values in nodewright.css)
// under simulated colour-vision deficiency. Simulation: Machado, Oliveira & Fernandes (2009), the
// severity-1.0 matrices of their table for protanopia, deuteranopia and tritanopia, applied to
// linear sRGB (IEC 61966-2-1). Difference: CIEDE2000 (CIE 142-2001), this file's own
// implementation, checked first against pairs of Sharma, Wu & Dalal (2005), Table 1.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { PALETTE, STATE, INK, PAPER } from '../../../static-assets/js/common/charts.js';

const MACHADO_2009 = {
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.011820, 0.042940, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.303900]],
};
const VISIONS = ['normal', ...Object.keys(MACHADO_2009)];

const channels = (hex) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
// sRGB transfer function, IEC 61966-2-1
const linear = (c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);

function simulated(hex, vision) {
  const c = channels(hex).map(linear);
  const m = MACHADO_2009[vision];
  if (!m) return c;
  return m.map((row) => Math.min(1, Math.max(0, row[0] * c[0] + row[1] * c[1] + row[2] * c[2])));
}

/** CIELAB (D65) of linear sRGB: the sRGB → XYZ matrix of IEC 61966-2-1, CIE 15 Lab. */
function lab([r, g, b]) {
  const x = 0.4124564 * r + 0.3575761 * g + 0.1804375 * b;
  const y = 0.2126729 * r + 0.7151522 * g + 0.0721750 * b;
  const z = 0.0193339 * r + 0.1191920 * g + 0.9503041 * b;
  const f = (t) => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116);
  const fx = f(x / 0.95047);
  const fy = f(y);
  const fz = f(z / 1.08883);
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}

/** CIEDE2000 colour difference (CIE 142-2001; the formulation of Sharma, Wu & Dalal 2005). */
function deltaE2000([l1, a1, b1], [l2, a2, b2]) {
  const rad = Math.PI / 180;
  const cBar = (Math.hypot(a1, b1) + Math.hypot(a2, b2)) / 2;
  const g = 0.5 * (1 - Math.sqrt(cBar ** 7 / (cBar ** 7 + 25 ** 7)));
  const a1p = (1 + g) * a1;
  const a2p = (1 + g) * a2;
  const c1p = Math.hypot(a1p, b1);
  const c2p = Math.hypot(a2p, b2);
  const hue = (b, a) => (a === 0 && b === 0 ? 0 : (Math.atan2(b, a) / rad + 360) % 360);
  const h1 = hue(b1, a1p);
  const h2 = hue(b2, a2p);
  let dh = 0;
  if (c1p * c2p !== 0) {
    dh = h2 - h1;
    if (dh > 180) dh -= 360;
    else if (dh < -180) dh += 360;
  }
  const dL = l2 - l1;
  const dC = c2p - c1p;
  const dH = 2 * Math.sqrt(c1p * c2p) * Math.sin((dh / 2) * rad);
  const lBar = (l1 + l2) / 2;
  const cBarP = (c1p + c2p) / 2;
  let hBar = h1 + h2;
  if (c1p * c2p !== 0) {
    if (Math.abs(h1 - h2) > 180) hBar = h1 + h2 < 360 ? (h1 + h2 + 360) / 2 : (h1 + h2 - 360) / 2;
    else hBar = (h1 + h2) / 2;
  }
  const t = 1 - 0.17 * Math.cos((hBar - 30) * rad) + 0.24 * Math.cos(2 * hBar * rad)
    + 0.32 * Math.cos((3 * hBar + 6) * rad) - 0.20 * Math.cos((4 * hBar - 63) * rad);
  const dTheta = 30 * Math.exp(-(((hBar - 275) / 25) ** 2));
  const rc = 2 * Math.sqrt(cBarP ** 7 / (cBarP ** 7 + 25 ** 7));
  const sl = 1 + (0.015 * (lBar - 50) ** 2) / Math.sqrt(20 + (lBar - 50) ** 2);
  const sc = 1 + 0.045 * cBarP;
  const sh = 1 + 0.015 * cBarP * t;
  const rt = -Math.sin(2 * dTheta * rad) * rc;
  return Math.sqrt((dL / sl) ** 2 + (dC / sc) ** 2 + (dH / sh) ** 2 + rt * (dC / sc) * (dH / sh));
}

const seen = (a, b, vision) => deltaE2000(lab(simulated(a, vision)), lab(simulated(b, vision)));

/** WCAG 2.x contrast ratio from relative luminance. */
function contrast(a, b) {
  const lum = (hex) => { const [r, g, bl] = channels(hex).map(linear); return 0.2126 * r + 0.7152 * g + 0.0722 * bl; };
  const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

// Thresholds. A CIEDE2000 difference of 1 is about one just-noticeable difference for large patches
// side by side (the scale the formula was fitted to); chart lines, bar fills and small markers are
// thin and seen apart, so we ask ten of those between any two colours of one set, in every vision,
// and twice that between a colour and the paper it is drawn on (from memory: a categorical palette
// is commonly held to ΔE00 ≥ 10 for reliable naming of small marks).
const BETWEEN = 10;
const AGAINST_PAPER = 20;
const WHITE = '#ffffff';

test('CIEDE2000 of this file reproduces Sharma, Wu & Dalal (2005) Table 1', () => {
  const pairs = [
    [[50, 2.6772, -79.7751], [50, 0, -82.7485], 2.0425],      // pair 1
    [[50, 3.1571, -77.2803], [50, 0, -82.7485], 2.8615],      // pair 2
    [[50, 0, 0], [50, -1, 2], 2.3669],                        // pair 7
    [[50, 2.49, -0.001], [50, -2.49, 0.0009], 7.1792],        // pair 9 (hue wrap)
    [[50, 2.5, 0], [73, 25, -18], 27.1492],                   // pair 17
    [[60.2574, -34.0099, 36.2677], [60.4626, -34.1751, 39.4387], 1.2644],  // pair 25
    [[22.7233, 20.0904, -46.694], [23.0331, 14.973, -42.5619], 2.0373],    // pair 27
    [[2.0776, 0.0795, -1.135], [0.9033, -0.0636, -0.5514], 0.9082],        // pair 34
  ];
  for (const [a, b, expected] of pairs) assert.ok(Math.abs(deltaE2000(a, b) - expected) < 5e-4, `${a} / ${b}: ${deltaE2000(a, b)}`);
});

test('the simulations keep greys grey and turn the red–green pair of normal vision into near twins', () => {
  // Each Machado matrix's rows sum to 1, so a neutral stays neutral.
  for (const vision of Object.keys(MACHADO_2009)) {
    const [r, g, b] = simulated('#808080', vision);
    assert.ok(Math.abs(r - g) < 1e-3 && Math.abs(g - b) < 1e-3, vision);
  }
  // A pure red and a pure green of equal-looking weight stay far apart for normal vision and come close
  // for a deuteranope: the reason for this test file. (sRGB #cc0000 and #008800, our own pick.)
  assert.ok(seen('#cc0000', '#008800', 'normal') > 40);
  assert.ok(seen('#cc0000', '#008800', 'deuteranopia') < seen('#cc0000', '#008800', 'normal') / 3);
});

test('the chart palette is Okabe–Ito: every two series stay apart in every vision', () => {
  assert.deepEqual([...PALETTE].sort(), ['#000000', '#0072B2', '#009E73', '#56B4E9', '#CC79A7', '#D55E00', '#E69F00', '#F0E442']);
  for (const vision of VISIONS) {
    for (let i = 0; i < PALETTE.length; i++) {
      for (let j = i + 1; j < PALETTE.length; j++) {
        const d = seen(PALETTE[i], PALETTE[j], vision);
        assert.ok(d >= BETWEEN, `${vision}: ${PALETTE[i]} / ${PALETTE[j]} ΔE00 ${d.toFixed(1)}`);
      }
    }
  }
});

test('every series stands out from the paper and the white panels in every vision', () => {
  for (const vision of VISIONS) {
    for (const c of PALETTE) {
      for (const ground of [PAPER, WHITE]) {
        const d = seen(c, ground, vision);
        assert.ok(d >= BETWEEN, `${vision}: ${c} on ${ground} ΔE00 ${d.toFixed(1)}`);
      }
    }
  }
});

test('the three state colours stay apart in every vision and read as text at 4.5:1', () => {
  const states = Object.entries(STATE);
  assert.deepEqual(states.map(([k]) => k), ['ok', 'warn', 'danger']);
  for (const vision of VISIONS) {
    for (let i = 0; i < states.length; i++) {
      for (let j = i + 1; j < states.length; j++) {
        const d = seen(states[i][1], states[j][1], vision);
        assert.ok(d >= BETWEEN, `${vision}: ${states[i][0]} / ${states[j][0]} ΔE00 ${d.toFixed(1)}`);
      }
      for (const ground of [PAPER, WHITE]) {
        assert.ok(seen(states[i][1], ground, vision) >= AGAINST_PAPER, `${vision}: ${states[i][0]} on ${ground}`);
      }
    }
  }
  // WCAG 2.x 1.4.3: normal text at least 4.5:1 against its background.
  for (const [name, c] of [...states, ['ink', INK]]) {
    for (const ground of [PAPER, WHITE]) assert.ok(contrast(c, ground) >= 4.5, `${name} on ${ground}: ${contrast(c, ground).toFixed(2)}`);
  }
});

test('nodewright.css carries the same palette as charts.js (one palette, two notations)', () => {
  const css = readFileSync(new URL('../../../static-assets/css/nodewright.css', import.meta.url), 'utf8');
  const variable = (name) => {
    const m = css.match(new RegExp(`--${name}:\\s*(#[0-9a-fA-F]{6})\\s*;`));
    assert.ok(m, `--${name} in nodewright.css`);
    return m[1].toUpperCase();
  };
  PALETTE.forEach((c, i) => assert.equal(variable(`series-${i + 1}`), c.toUpperCase()));
  assert.equal(variable('ok'), STATE.ok.toUpperCase());
  assert.equal(variable('warn'), STATE.warn.toUpperCase());
  assert.equal(variable('danger'), STATE.danger.toUpperCase());
  assert.equal(variable('ink'), INK.toUpperCase());
  assert.equal(variable('paper'), PAPER.toUpperCase());
});
