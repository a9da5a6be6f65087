// The bore drawings' geometry. The values are worked by hand from elementary geometry (a frustum's
// wall is a straight line between its end diameters; a drawing to scale multiplies every length
// by one factor), not computed with the module under test.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import {
  boundedMm, centsGauge, diameterHandles, fingeringHeightPx, fingeringLayout, joints, keyStepMm,
  totalLengthMm, usableSegments, wallDiameterAt,
} from '../../../static-assets/js/air/geometry.js';

const close = (a, b, tol = 1e-9) => assert.ok(Math.abs(a - b) <= tol, `${a} is not ${b}`);

// A cylinder 100 mm x 10 mm, then a cone opening from 10 to 20 mm over 200 mm.
const CYL_CONE = [
  { lengthMm: 100, inputDiameterMm: 10, outputDiameterMm: 10 },
  { lengthMm: 200, inputDiameterMm: 10, outputDiameterMm: 20 },
];

test('the wall of a frustum is straight between its end diameters', () => {
  close(wallDiameterAt(CYL_CONE, 50), 10);
  close(wallDiameterAt(CYL_CONE, 150), 12.5);   // a quarter of the way along the cone: 10 + 10/4
  close(wallDiameterAt(CYL_CONE, 300), 20);
  close(wallDiameterAt(CYL_CONE, 400), 20);     // beyond the end: the end's diameter
  close(wallDiameterAt(CYL_CONE, -5), 10);
  assert.ok(Number.isNaN(wallDiameterAt([], 10)));
});

test('rows that are not usable numbers are skipped, the rest keep their request index', () => {
  const rows = [{ lengthMm: null, inputDiameterMm: 10, outputDiameterMm: 10 }, ...CYL_CONE, { lengthMm: -3, inputDiameterMm: 1, outputDiameterMm: 1 }];
  assert.deepEqual(usableSegments(rows).map((s) => s.index), [1, 2]);
  close(totalLengthMm(rows), 300);
  assert.deepEqual(joints(rows), [{ segment: 1, atMm: 100 }, { segment: 2, atMm: 300 }]);
});

test('a continuous joint has one diameter handle moving both sides; a step has two', () => {
  const h = diameterHandles(CYL_CONE);
  assert.equal(h.length, 3);
  assert.deepEqual(h[0].targets, [{ segment: 0, field: 'inputDiameterMm' }]);
  assert.deepEqual(h[1].targets, [{ segment: 0, field: 'outputDiameterMm' }, { segment: 1, field: 'inputDiameterMm' }]);
  close(h[1].atMm, 100);
  assert.deepEqual(h[2].targets, [{ segment: 1, field: 'outputDiameterMm' }]);
  const step = diameterHandles([{ lengthMm: 50, inputDiameterMm: 8, outputDiameterMm: 8 }, { lengthMm: 50, inputDiameterMm: 12, outputDiameterMm: 12 }]);
  assert.deepEqual(step.map((x) => [x.atMm, x.side, x.diameterMm]), [[0, 'after', 8], [50, 'before', 8], [50, 'after', 12], [100, 'before', 12]]);
});

test('arrow-key steps: 1 mm or 1/32 inch along, 0.1 mm or 1/256 inch across, ten of them with Shift', () => {
  close(keyStepMm('length', 'mm'), 1);
  close(keyStepMm('position', 'inch'), 0.79375);       // 25.4 / 32
  close(keyStepMm('diameter', 'mm', true), 1);
  close(keyStepMm('diameter', 'inch'), 0.09921875);    // 25.4 / 256
});

test('dragged values stay in bounds and read back at 0.01 mm', () => {
  close(boundedMm('length', -20), 0.1);
  close(boundedMm('diameter', 12.3456), 12.35);
  close(boundedMm('position', 320, { totalMm: 300 }), 300);
  close(boundedMm('position', -1, { totalMm: 300 }), 0);
});

test('a fingering drawing is to scale along the bore and in proportion across it', () => {
  const holes = [{ positionMm: 150, diameterMm: 6, chimneyMm: 3 }, { positionMm: 250, diameterMm: 4, chimneyMm: 3 },
    { positionMm: 350, diameterMm: 4, chimneyMm: 3 }, { positionMm: 'x', diameterMm: 4, chimneyMm: 3 }];
  const L = fingeringLayout(CYL_CONE, holes, { heightPx: 320, halfWidthPx: 10, padPx: 10 });
  close(L.pxPerMm, 1);                    // 300 px for 300 mm
  close(L.acrossPxPerMm, 1);              // the widest bore (20 mm) spans 2 x 10 px
  assert.deepEqual(L.holes.map((h) => h.index), [0, 1]);   // beyond the bore and unreadable: left out
  close(L.holes[0].y, 160);
  close(L.holes[1].y, 260);
  close(L.holes[0].r, 3);                 // 6 mm hole: radius 3 px, as the 20 mm bore is 10 px
  close(L.holes[1].r / L.holes[0].r, 4 / 6);
  assert.deepEqual(L.wall.map((p) => p.half), [5, 5, 5, 10]);
  // A short drawing: across is held to the scale along (0.5 px per mm), not widened to 10 px.
  const S = fingeringLayout(CYL_CONE, holes, { heightPx: 150, halfWidthPx: 10 });
  close(S.pxPerMm, 0.5);
  close(S.acrossPxPerMm, 0.5);
  close(S.holes[0].r, 1.5);
  close(S.holes[1].y - S.holes[0].y, 50);
  assert.equal(fingeringHeightPx(100), 180);
  assert.equal(fingeringHeightPx(300), 300);
  assert.equal(fingeringHeightPx(2000), 360);
});

test('the cents gauge spans at least a quarter tone and three tolerances each side', () => {
  const g = centsGauge(10, 10, 200);
  assert.equal(g.range, 50);
  close(g.centre, 100);
  close(g.bandFrom, 80);
  close(g.bandTo, 120);
  close(g.needle, 120);
  assert.equal(g.beyond, 0);
  const wide = centsGauge(-100, 25, 300);
  assert.equal(wide.range, 75);
  close(wide.needle, 0);
  assert.equal(wide.beyond, -1);
  assert.equal(centsGauge(NaN, 10, 100).needle, null);
  close(centsGauge(0, -5, 100).bandTo, 50);   // an unusable tolerance draws no band
});
