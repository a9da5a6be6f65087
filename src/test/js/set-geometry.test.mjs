// The set planner drawing's geometry, worked by hand: a round-wound string's outside diameter is
// its core plus twice the wrap wire (one layer each side, common practice); a drawing to scale
// multiplies every gauge by the same factor; bars on one scale are in the ratio of their values.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { bandAt, gaugeScale, loadShares, neckRows, niceCeil, outerDiameterMm } from '../../../static-assets/js/strings/set-geometry.js';

const close = (a, b, tol = 1e-9) => assert.ok(Math.abs(a - b) <= tol, `${a} is not ${b}`);

test('outside diameters: the core, or the core and two wraps', () => {
  close(outerDiameterMm({ diameterMm: 0.254 }), 0.254);
  close(outerDiameterMm({ diameterMm: 0.43, wrapDiameterMm: 0.325 }), 1.08);
  close(outerDiameterMm({ diameterMm: 0.3, wrapDiameterMm: null }), 0.3);
  assert.ok(Number.isNaN(outerDiameterMm({ diameterMm: null })));
  assert.ok(Number.isNaN(outerDiameterMm({ diameterMm: 0 })));
});

test('round scale ends', () => {
  assert.deepEqual([71.3, 100, 0.3, 230, 4.2, 1.2e3].map(niceCeil), [100, 100, 0.5, 250, 5, 2000]);
  assert.equal(niceCeil(0), 1);
  assert.equal(niceCeil(NaN), 1);
});

test('one magnification for every gauge: the thickest at the wanted width, thin sets capped', () => {
  close(gaugeScale([0.254, 1.08], { maxWidthPx: 10.8 }), 10);
  close(gaugeScale([0.2, 0.3], { maxWidthPx: 11, cap: 16 }), 16);
  close(gaugeScale([], { cap: 16 }), 16);
});

test('rows: widths in proportion to the gauges, bars to the tensions, bands to the shares', () => {
  const members = [
    { outerMm: 0.254, tensionN: 70.76, stressFraction: 0.58 },
    { outerMm: 1.08, tensionN: 80, stressFraction: 0.31 },
    { outerMm: 0.54, tensionN: 40, stressFraction: 1.4 },
  ];
  const L = neckRows(members, { top: 10, pitch: 30, barPx: 200, bandPx: 100, maxWidthPx: 10.8 });
  close(L.pxPerMm, 10);
  assert.equal(L.tensionScaleN, 100);
  assert.deepEqual(L.rows.map((r) => r.y), [25, 55, 85]);
  close(L.rows[0].widthPx, 2.54);
  close(L.rows[1].widthPx, 10.8);
  close(L.rows[2].widthPx / L.rows[0].widthPx, 0.54 / 0.254);
  close(L.rows[1].barPx, 160);             // 80 N of a 100 N scale over 200 px
  close(L.rows[2].barPx / L.rows[1].barPx, 0.5);
  close(L.rows[0].bandPx, 58);
  close(L.rows[2].bandPx, 100);            // beyond the strength: the full band, the figure says how far
  assert.equal(neckRows([{ outerMm: 0.3, tensionN: 50, stressFraction: NaN }]).rows[0].bandPx, null);
});

test('limits on the band, and the shares of the total load', () => {
  close(bandAt(0.75, 120), 90);
  assert.equal(bandAt(undefined, 120), null);
  const shares = loadShares([70, 30, NaN, -1]);
  assert.deepEqual(shares, [0.7, 0.3, 0, 0]);
  assert.deepEqual(loadShares([0, 0]), [0, 0]);
});
