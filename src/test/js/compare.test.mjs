// The compare page's labels, units and side-by-side results, without a browser.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { labelOf, parameterRows, sections, rememberedUnits, formatDifference } from '../../../static-assets/js/library/compare.js';

const words = { 'library.param.pickups': 'Pickup', 'library.param.positionMm': 'position', 'library.param.diameterMm': 'Diameter' };

test('a path is labelled by its words, list members numbered from 1, unit suffixes dropped', () => {
  assert.equal(labelOf('pickups[0].positionMm', words), 'Pickup 1 · position');
  assert.equal(labelOf('diameterMm', words), 'Diameter');
  assert.equal(labelOf('relativeHumidityPct'), 'relative humidity');
  assert.equal(labelOf('segments[2].points[0].diameterMm', words), 'segments 3 · points 1 · Diameter');
});

test('lengths and forces in the user units; the server marks what differs, lists of numbers stay one row', () => {
  const a = { lengthMm: 647.7, tensionN: 70, pickups: [{ positionMm: 610 }], closedHoles: [1, 2] };
  const b = { lengthMm: 647.7, tensionN: 72.5, pickups: [{ positionMm: 600 }], closedHoles: [1, 2, 3] };
  const diffs = [{ path: 'tensionN' }, { path: 'pickups[0].positionMm' }, { path: 'closedHoles[2]' }];
  // 647.7 mm = 25.5 in exactly (1 in = 25.4 mm); 70 N / 9.80665 N per kgf (ISO 80000-4) = 7.13801 kgf.
  const rows = Object.fromEntries(parameterRows(a, b, diffs, { length: 'inch', force: 'kgf' }, words).map((r) => [r.path, r]));
  assert.equal(rows.lengthMm.a, '25.5');
  assert.equal(rows.lengthMm.unit, 'in');
  assert.equal(rows.lengthMm.differs, false);
  assert.equal(rows.tensionN.a, '7.13801');
  assert.equal(rows.tensionN.unit, 'kgf');
  assert.equal(rows.tensionN.differs, true);
  assert.equal(rows['pickups[0].positionMm'].label, 'Pickup 1 · position');
  assert.equal(rows.closedHoles.b, '1, 2, 3');
  assert.equal(rows.closedHoles.differs, true);
});

test('string results: the server figures side by side, B − A of each partial, f1 apart in cents', () => {
  const mode = (n, c, out) => ({ n, centsFromHarmonic: c, excitation: 1 / n, pickupOutput: [out], combinedOutput: null });
  const ra = { fundamentalHz: 440, tensionN: 70, stressFraction: 0.4, inharmonicityB: 1e-4, linearDensityKgPerM: 4e-4,
    modes: [mode(1, 0.1, 1), mode(2, 0.3, 0.1)] };
  const rb = { fundamentalHz: 880, tensionN: 100, stressFraction: 0.5, inharmonicityB: 2e-4, linearDensityKgPerM: 6e-4,
    modes: [mode(1, 0.2, 1), mode(2, 0.7, 0.01)] };
  const [summary, partials, levels] = sections('string', ra, rb, { length: 'mm', force: 'N' });
  const row = (s, id) => s.rows.find((r) => r.id === id);
  assert.equal(row(summary, 'f1').difference, 1200); // an octave
  assert.equal(row(summary, 'tension').difference, 30);
  assert.ok(Math.abs(row(summary, 'stress').difference - 10) < 1e-12);
  assert.ok(Math.abs(row(summary, 'mu').a - 0.4) < 1e-12);
  assert.ok(Math.abs(row(partials, 'partial-2').difference - 0.4) < 1e-12);
  // 20·log10(0.1) = −20 dB, 20·log10(0.01) = −40 dB.
  assert.ok(Math.abs(row(levels, 'level-2').a + 20) < 1e-9);
  assert.ok(Math.abs(row(levels, 'level-2').difference + 20) < 1e-9);
  assert.equal(formatDifference(row(summary, 'b')), '+0.0001 (×2)');
});

test('bore results: resonances apart in cents, fingerings matched by name', () => {
  const ra = { resonances: [{ n: 1, frequencyHz: 293.66, centsFromSeries: 0 }], fingerings: [{ index: 0, name: 'D5', centsFromTarget: -3 }] };
  const rb = { resonances: [{ n: 1, frequencyHz: 293.66 * 2 ** (5 / 1200), centsFromSeries: 1 }], fingerings: [{ index: 0, name: 'D5', centsFromTarget: 2 }] };
  const s = Object.fromEntries(sections('air-column', ra, rb, { length: 'mm', force: 'N' }).map((x) => [x.id, x]));
  assert.ok(Math.abs(s.resonances.rows[0].difference - 5) < 1e-9);
  assert.equal(s.fingerings.rows[0].label, 'D5');
  assert.equal(s.fingerings.rows[0].difference, 5);
});

test('the units come back from this browser: the compare page first, else the bench of the kind', () => {
  const store = (m) => ({ getItem: (k) => m[k] ?? null });
  assert.deepEqual(rememberedUnits('string', store({ 'nodewright.units.strings': '{"length":"inch","force":"lbf"}' })), { length: 'inch', force: 'lbf' });
  assert.deepEqual(rememberedUnits('string', store({ 'nodewright.units.strings': '{"length":"inch"}', 'nodewright.units.library': '{"force":"kgf"}' })), { length: 'inch', force: 'kgf' });
  assert.deepEqual(rememberedUnits('bar', store({ 'nodewright.units.library': 'not json' })), { length: 'mm', force: 'N' });
});
