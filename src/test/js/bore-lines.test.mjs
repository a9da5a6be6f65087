// The bore panel's lines and request bodies for holes from a blank tube and calibration
// (static-assets/js/templates/bore-lines.js). Pitches against 12-TET on A4 = 440 Hz (ISO 16:1975):
// f = 440 * 2^((midi - 69) / 12), D5 = MIDI 74 (common practice).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import {
  fingeringLines, parseFingeringLines, parseMeasuredLines, movableMouth, blankTubeBody, calibrationBody, mouthMoves,
} from '../../../static-assets/js/templates/bore-lines.js';

const iso16 = (midi) => 440 * 2 ** ((midi - 69) / 12);

test('fingering lines count holes from 1 and carry the register; they read back as the API counts them', () => {
  const chart = [
    { name: 'D5', closedHoles: [0, 1, 2, 3, 4, 5], targetNote: 'D5', register: 1 },
    { name: 'D6', closedHoles: [0, 1, 2, 3, 4, 5], targetNote: 'D6', register: 2 },
    { name: 'x', closedHoles: [], targetHz: 329.63 },
  ];
  const text = fingeringLines(chart);
  assert.equal(text.split('\n')[0], 'D5, D5, 1 2 3 4 5 6');
  assert.equal(text.split('\n')[1], 'D6, D6, 1 2 3 4 5 6, 2');
  const { rows, bad } = parseFingeringLines(text);
  assert.deepEqual(bad, []);
  assert.deepEqual(rows[0], { name: 'D5', closedHoles: [0, 1, 2, 3, 4, 5], targetNote: 'D5', register: 1 });
  assert.equal(rows[1].register, 2);
  assert.deepEqual(rows[2], { name: 'x', closedHoles: [], targetHz: 329.63, register: 1 });
});

test('bad fingering lines are named by their line number, blank lines skipped', () => {
  const { rows, bad } = parseFingeringLines('D5, D5, 1 2\n\nE5\nF5, F5, 0\nG5, G5, 1, two\nA5, 880 Hz, 1');
  assert.deepEqual(bad, [3, 4, 5]);
  assert.equal(rows.length, 2);
  assert.equal(rows[1].targetHz, 880);
});

test('measured pitches are read in hertz (point or comma, with or without the unit) or as note names', () => {
  const { rows, bad } = parseMeasuredLines('D5, 580.5\nE5, 655,25 Hz\nF#5, F#5\nG5, Bb4', 440);
  assert.deepEqual(bad, []);
  assert.deepEqual(rows.slice(0, 2), [{ fingering: 'D5', measuredHz: 580.5 }, { fingering: 'E5', measuredHz: 655.25 }]);
  assert.ok(Math.abs(rows[2].measuredHz - iso16(78)) < 1e-9, `${rows[2].measuredHz}`);
  assert.ok(Math.abs(rows[3].measuredHz - iso16(70)) < 1e-9);
  // on another A4 the note moves with it
  const low = parseMeasuredLines('A, A4', 415).rows[0].measuredHz;
  assert.ok(Math.abs(low - 415) < 1e-9);
});

test('bad measured lines: no name, no pitch, zero or a word', () => {
  const { rows, bad } = parseMeasuredLines(', 440\nD5\nE5, 0\nF5, loud\nG5, 784', 440);
  assert.deepEqual(bad, [1, 2, 3, 4]);
  assert.deepEqual(rows, [{ fingering: 'G5', measuredHz: 784 }]);
});

test('only a window or an embouchure has a headspace; only a window a window length', () => {
  assert.deepEqual(movableMouth({ mouth: { kind: 'window' } }), { headspace: true, windowLength: true });
  assert.deepEqual(movableMouth({ mouth: { kind: 'embouchure' } }), { headspace: true, windowLength: false });
  assert.deepEqual(movableMouth({ mouth: { kind: 'reed' } }), { headspace: false, windowLength: false });
  assert.deepEqual(movableMouth({}), { headspace: false, windowLength: false });
});

test('the blank-tube body drops the holes and asks only for what the mouth can move', () => {
  const bore = { segments: [{ lengthMm: 280, inputDiameterMm: 13, outputDiameterMm: 13 }], holes: [{ positionMm: 1 }],
    mouth: { kind: 'embouchure', headspaceMm: 17 } };
  const body = blankTubeBody(bore, { holeCount: 6, chimneyMm: 2.5, fingerings: [], limits: { minWallMm: 3 },
    varyHeadspace: true, varyWindowLength: true });
  assert.equal(body.bore.holes, undefined);
  assert.ok(bore.holes, 'the page\'s bore is not changed');
  assert.deepEqual(body.mouthLimits, { varyHeadspace: true });
  assert.equal(body.holeCount, 6);
  assert.deepEqual(body.limits, { minWallMm: 3 });
  const window = blankTubeBody({ ...bore, mouth: { kind: 'window' } }, { holeCount: 6, chimneyMm: 2.5, fingerings: [],
    limits: {}, varyHeadspace: true, varyWindowLength: true });
  assert.deepEqual(window.mouthLimits, { varyHeadspace: true, varyWindowLength: true });
  const fixed = blankTubeBody(bore, { holeCount: 6, chimneyMm: 2.5, fingerings: [], limits: {} });
  assert.equal(fixed.mouthLimits, undefined);
});

test('the calibration body carries pitches, a measured curve, or both', () => {
  const bore = { segments: [], mouth: { kind: 'window' } };
  const chart = [{ name: 'D5', closedHoles: [0], targetNote: 'D5', register: 1 }];
  const pitches = calibrationBody(bore, chart, [{ fingering: 'D5', measuredHz: 580 }], 'mouth', null);
  assert.deepEqual(pitches, { bore: { segments: [], mouth: { kind: 'window' }, fingerings: chart }, fit: ['mouth'],
    measured: [{ fingering: 'D5', measuredHz: 580 }] });
  const curve = calibrationBody(bore, chart, [], 'mouth', { csv: '100,1,0\n', fingering: ' D5 ' });
  assert.equal(curve.measured, undefined);
  assert.deepEqual(curve.impedance, { csv: '100,1,0\n', fingering: 'D5' });
  const holesAsTheyAre = calibrationBody(bore, chart, [], 'air-temperature', { csv: '1,1,0', fingering: '' });
  assert.deepEqual(holesAsTheyAre.impedance, { csv: '1,1,0' });
  assert.deepEqual(holesAsTheyAre.fit, ['air-temperature']);
  assert.equal(calibrationBody(bore, chart, [], 'mouth', { csv: '' }).impedance, undefined);
});

test('what the solve moved at the player\'s end', () => {
  assert.deepEqual(mouthMoves({ mouth: [{ field: 'mouth.headspaceMm', startMm: 0, solvedMm: 5.5, movedMm: 5.5 }] }),
    [{ field: 'mouth.headspaceMm', startMm: 0, solvedMm: 5.5, movedMm: 5.5 }]);
  assert.deepEqual(mouthMoves({}), []);
  assert.deepEqual(mouthMoves(null), []);
});
