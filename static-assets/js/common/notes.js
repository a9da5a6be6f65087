// Note names and cents, one grammar for every page (the server follows the same grammar; both are
// tested against src/test/resources/tuning/note-names.csv).
//   letter A–G (either case); none, one or two sharps (# or ♯) or flats (b or ♭), never mixed;
//   octave −1..10 in scientific pitch notation (C4 = middle C = MIDI 60); blanks around ignored.
// 12-tone equal temperament, MIDI 69 = A4 = 440 Hz by default (ISO 16:1975).
import { parseNumber } from './units.js';

/** ISO 16:1975 standard tuning frequency; the only default A4 of the pages. */
export const A4_HZ = 440;

const STEPS = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };
const SHARP_NAMES = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B'];
const FLAT_NAMES = ['C', 'Db', 'D', 'Eb', 'E', 'F', 'Gb', 'G', 'Ab', 'A', 'Bb', 'B'];
const GRAMMAR = /^\s*([A-Ga-g])([#♯]{1,2}|[b♭]{1,2})?(-1|10|[0-9])\s*$/u;

/** The A4 to use: the given one when it is a positive finite number, else 440 Hz. */
export const a4Or440 = (a4) => (typeof a4 === 'number' && Number.isFinite(a4) && a4 > 0 ? a4 : A4_HZ);

/** Cents from fRef to f: 1200·log2(f/fRef) (definition of the cent, Ellis 1885). */
export const cents = (f, fRef) => 1200 * Math.log2(f / fRef);

/** A note name parsed: {letter, accidental (−2..2), octave, midi}, or null when it is not one. */
export function parseNote(text) {
  const m = GRAMMAR.exec(String(text ?? ''));
  if (!m) return null;
  const marks = [...(m[2] ?? '')];
  const accidental = marks.length === 0 ? 0 : (marks[0] === '#' || marks[0] === '♯' ? marks.length : -marks.length);
  const octave = Number(m[3]);
  const letter = m[1].toUpperCase();
  return { letter, accidental, octave, midi: 12 * (octave + 1) + STEPS[letter] + accidental };
}

/** 12-TET frequency of a MIDI note: f = A4 · 2^((m − 69)/12). */
export const frequencyOfMidi = (midi, a4 = A4_HZ) => a4Or440(a4) * 2 ** ((midi - 69) / 12);

/** Frequency of a note name ("E4", "F#2", "B♭3", "Cb4"), or null when it is not one. */
export function noteHz(text, a4 = A4_HZ) {
  const note = parseNote(text);
  return note ? frequencyOfMidi(note.midi, a4) : null;
}

/** The name of a MIDI note, with sharps or (flats = true) flats. */
export function midiName(midi, flats = false) {
  const names = flats ? FLAT_NAMES : SHARP_NAMES;
  return names[((midi % 12) + 12) % 12] + (Math.floor(midi / 12) - 1);
}

/**
 * Nearest 12-TET note of a frequency, in the server's field names:
 * {name, midi, frequencyHz (of the note), centsOff (of hz from it)}.
 */
export function nearestNote(hz, a4 = A4_HZ, { flats = false } = {}) {
  const ref = a4Or440(a4);
  const midi = Math.round(69 + 12 * Math.log2(hz / ref));
  const frequencyHz = frequencyOfMidi(midi, ref);
  return { name: midiName(midi, flats), midi, frequencyHz, centsOff: cents(hz, frequencyHz) };
}

/** True when a note name is written with flats (so that answers can be spelt the same way). */
export const spelledWithFlats = (text) => (parseNote(text)?.accidental ?? 0) < 0;

/** A frequency as typed: "329.63", "329,63" or "329.63 Hz"; NaN when the text is no number of hertz. */
export function hzNumber(text) {
  return parseNumber(String(text ?? '').trim().replace(/\s*hz$/i, ''));
}

/**
 * A pitch as a user types it: a frequency ("329.63", "329,63", "329.63 Hz") or a note name.
 * Resolves to Hz, or null when the text is neither (empty text is null too).
 */
export function pitchHz(text, a4 = A4_HZ) {
  const s = String(text ?? '').trim();
  if (s === '') return null;
  const hz = hzNumber(s);
  if (Number.isFinite(hz)) return hz;
  return noteHz(s, a4);
}
