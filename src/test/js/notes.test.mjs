// The page's note grammar against the table the server's tests read too
// (src/test/resources/tuning/note-names.csv: MIDI numbering, 12-TET at A4 = 440 Hz, ISO 16:1975).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { noteHz, parseNote, nearestNote, pitchHz, cents, midiName, spelledWithFlats } from '../../../static-assets/js/common/notes.js';

const csv = fileURLToPath(new URL('../resources/tuning/note-names.csv', import.meta.url));
const rows = readFileSync(csv, 'utf8').split('\n')
  .filter((line) => line !== '' && !line.startsWith('#') && !line.startsWith('text|'))
  .map((line) => { const [text, midi, hz] = line.split('|'); return { text, midi, hz }; });

test('the shared table has rows', () => {
  assert.ok(rows.length >= 30, `only ${rows.length} rows read from ${csv}`);
});

for (const { text, midi, hz } of rows) {
  if (midi === '') {
    test(`"${text}" is not a note name`, () => {
      assert.equal(parseNote(text), null);
      assert.equal(noteHz(text), null);
    });
  } else {
    test(`"${text}" is MIDI ${midi}, ${hz} Hz`, () => {
      assert.equal(parseNote(text).midi, Number(midi));
      // 17 significant digits in the table; the page computes 440·2^((m−69)/12) in doubles.
      assert.ok(Math.abs(noteHz(text) - Number(hz)) <= 1e-12 * Number(hz), `${noteHz(text)} vs ${hz}`);
    });
  }
}

test('nearest note uses the server\'s field names and a cent is 1/1200 octave', () => {
  // E4 = 329.6275569128699 Hz (table above); 329.63 Hz sits 1200·log2(329.63/329.62755691286992)
  // = +0.01283 cents above it (computed with Python 3 math.log2).
  const n = nearestNote(329.63);
  assert.deepEqual(Object.keys(n).sort(), ['centsOff', 'frequencyHz', 'midi', 'name']);
  assert.equal(n.name, 'E4');
  assert.equal(n.midi, 64);
  assert.ok(Math.abs(n.centsOff - 0.012831) < 1e-5, String(n.centsOff));
  assert.ok(Math.abs(cents(880, 440) - 1200) < 1e-12);
  // A quarter tone below A4 at A4 = 442 Hz: 442·2^(−0.5/12) = 429.35 Hz is 50 ¢ from A4 and G#4 alike.
  const low = nearestNote(442 * 2 ** (-0.49 / 12), 442);
  assert.equal(low.name, 'A4');
  assert.ok(Math.abs(low.centsOff + 49) < 1e-9);
});

test('flat spelling on request', () => {
  assert.equal(midiName(63), 'D#4');
  assert.equal(midiName(63, true), 'Eb4');
  assert.equal(nearestNote(311.127, 440, { flats: true }).name, 'Eb4');
  assert.equal(spelledWithFlats('Eb4'), true);
  assert.equal(spelledWithFlats('D#4'), false);
});

test('a typed pitch: Hz with or without the unit, a decimal comma, or a note', () => {
  assert.equal(pitchHz('329.63'), 329.63);
  assert.equal(pitchHz('329.63 Hz'), 329.63);
  assert.equal(pitchHz('329,63 hz'), 329.63);
  assert.equal(pitchHz('A4', 442), 442);
  assert.equal(pitchHz(''), null);
  assert.equal(pitchHz('E4 Hz'), null);
  assert.equal(pitchHz('loud'), null);
});

test('a number of hertz as typed', async () => {
  const { hzNumber } = await import('../../../static-assets/js/common/notes.js');
  assert.equal(hzNumber('329.63 Hz'), 329.63);
  assert.equal(hzNumber('82,41'), 82.41);
  assert.ok(Number.isNaN(hzNumber('E2')));
});
