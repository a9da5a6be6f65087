// The bar bench's listen preview and its partials-against-target chart, without a browser.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { shapeAt, tapPartials, renderTap, LOSS_FACTOR } from '../../../static-assets/js/bars/listen.js';
import { parseRatios, ratioOffsets } from '../../../static-assets/js/bars/targets.js';

// A mode sampled from sin(πx/L) on 0..100 mm (pinned-pinned mode 1) and sin(2πx/L) (mode 2, node at 50 mm).
const xs = Array.from({ length: 101 }, (_, i) => i);
const mode = (n, f) => ({ n, kind: 'bending', frequencyHz: f, shapeX: xs, shape: xs.map((x) => Math.sin(n * Math.PI * x / 100)) });

test('shape between samples is the straight line between them', () => {
  const m = { shapeX: [0, 10], shape: [0, 1] };
  assert.equal(shapeAt(m, 2.5), 0.25);
  assert.equal(shapeAt(m, -1), 0);
  assert.equal(shapeAt(m, 11), 1);
});

test('a mode with a node under the mallet is silent, the rest share amplitude 1', () => {
  const p = tapPartials([mode(1, 200), mode(2, 800)], 50, { lossFactor: 0.01, malletHz: 1e9 });
  assert.ok(Math.abs(p[1].amplitude) < 1e-12);
  assert.ok(Math.abs(p[0].amplitude - 1) < 1e-12);
});

test('decay time is the loss factor definition τ = 1/(π f η)', () => {
  const [p] = tapPartials([mode(1, 440)], 30, { lossFactor: LOSS_FACTOR.metal });
  assert.ok(Math.abs(p.decaySeconds - 1 / (Math.PI * 440 * 0.0005)) < 1e-12);
});

test('twisting and lateral modes are not struck by a mallet on the top face', () => {
  const twist = { ...mode(1, 300), kind: 'twisting' };
  assert.equal(tapPartials([mode(1, 200), twist], 30).length, 1);
});

test('rendered tap: envelope e^-1 after one decay time, and the right number of zero crossings', () => {
  const rate = 48000;
  const s = renderTap([{ frequencyHz: 1000, amplitude: 1, decaySeconds: 0.2 }], rate, 1.0);
  assert.equal(s.length, 48000);
  const at = Math.round(0.2 * rate);
  let peak = 0;
  for (let i = at - 24; i <= at + 24; i++) peak = Math.max(peak, Math.abs(s[i]));   // one period of 1 kHz
  assert.ok(Math.abs(peak - Math.exp(-1)) < 0.01 * Math.exp(-1), `peak ${peak}`);
  let crossings = 0;
  for (let i = 1; i < rate / 2; i++) if ((s[i - 1] < 0) !== (s[i] < 0)) crossings++;
  assert.ok(Math.abs(crossings - 1000) <= 2, `crossings ${crossings}`);   // 2 per cycle × 1000 Hz × 0.5 s
});

test('target ratios read as the makers write them', () => {
  assert.deepEqual(parseRatios('1:4:10'), [4, 10]);
  assert.deepEqual(parseRatios('3, 6'), [3, 6]);
  assert.equal(parseRatios('4, 3'), null);
  assert.equal(parseRatios('x'), null);
});

// Blevins 1979, Table 8-1: a uniform free-free bar's modes 2 and 3 sit at 2.7565 and 5.4039 × f1;
// against the marimba's 1:4:10 that is 1200·log2(2.7565/4) = −644.6 cents and 1200·log2(5.4039/10) = −1065.6.
test('a uniform bar sits far below the marimba ratios', () => {
  const modes = [{ n: 1, kind: 'bending', frequencyHz: 100 }, { n: 2, kind: 'bending', frequencyHz: 275.65 },
    { n: 3, kind: 'bending', frequencyHz: 540.39 }, { n: 1, kind: 'twisting', frequencyHz: 300 }];
  const o = ratioOffsets(modes, [4, 10]);
  assert.equal(o.length, 2);
  assert.ok(Math.abs(o[0].cents - -644.6) < 0.1);
  assert.ok(Math.abs(o[1].cents - -1065.6) < 0.1);
});
