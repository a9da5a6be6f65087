// Form helpers shared by the string bench and the set planner: typed numbers that stay as typed,
// display units with exact round trips, note names, and the material catalogue.
import { getJson } from './api.js';
import { toMm, fromMm, toNewton, fromNewton } from './units.js';

const NOTE_NAMES = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B'];
const NOTE_STEPS = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A typed number, null when empty, or the raw text (the server answers it with a field error). */
export function readNumber(input) {
  const raw = input.value.trim();
  if (raw === '') return null;
  return NUMBER.test(raw) ? Number(raw) : raw;
}

/** Equal-tempered frequency of a note name such as E4, F#2 or Bb1; null when it is not one. */
export function noteToHz(name, a4) {
  const m = /^([A-Ga-g])([#b♯♭]?)(-?\d)$/.exec(name.trim());
  if (!m) return null;
  const accidental = { '#': 1, '♯': 1, b: -1, '♭': -1 }[m[2]] || 0;
  const midi = 12 * (Number(m[3]) + 1) + NOTE_STEPS[m[1].toUpperCase()] + accidental;
  return a4 * 2 ** ((midi - 69) / 12);   // 12-TET: f = A4 · 2^((m − 69)/12), MIDI note 69 = A4
}

/** Nearest 12-TET note name and its offset in cents for a frequency. */
export function nearestNote(hz, a4) {
  const semis = 12 * Math.log2(hz / a4) + 69;
  const midi = Math.round(semis);
  return { name: NOTE_NAMES[((midi % 12) + 12) % 12] + (Math.floor(midi / 12) - 1), cents: 100 * (semis - midi) };
}

/** A pitch field: Hz as a number, a note name turned into Hz, null, or the raw text. */
export function readPitch(input, a4Input) {
  const raw = input.value.trim();
  if (raw === '') return null;
  if (NUMBER.test(raw)) return Number(raw);
  const a4 = readNumber(a4Input);
  const hz = noteToHz(raw, typeof a4 === 'number' && a4 > 0 ? a4 : 440);
  return hz === null ? raw : hz;
}

/**
 * Length and force inputs in the user's units. An input written from an exact mm or N value
 * remembers it, so switching units back and forth never nudges what is sent to the server.
 */
export function unitInputs() {
  const units = { length: 'mm', force: 'N' };
  const digits = (kind) => (kind === 'length' ? (units.length === 'mm' ? 3 : 5) : (units.force === 'N' ? 2 : 3));
  const toDisplay = (kind, v) => (kind === 'length' ? fromMm(v, units.length) : fromNewton(v, units.force));
  const fromDisplay = (kind, v) => (kind === 'length' ? toMm(v, units.length) : toNewton(v, units.force));

  function write(kind, input, canonical) {
    input.value = String(Number(toDisplay(kind, canonical).toFixed(digits(kind))));
    input.dataset.canonical = String(canonical);
    input.dataset.shown = input.value;
  }
  function read(kind, input) {
    const v = readNumber(input);
    if (typeof v !== 'number') return v;
    if (input.dataset.shown === input.value && input.dataset.canonical !== undefined) return Number(input.dataset.canonical);
    return fromDisplay(kind, v);
  }
  /** Re-expresses every input of that kind inside root in the new unit and relabels the units. */
  function switchUnit(root, kind, unit) {
    const inputs = [...root.querySelectorAll(`input[data-unit="${kind}"]`)];
    const values = inputs.map((input) => read(kind, input));
    units[kind] = unit;
    inputs.forEach((input, i) => { if (typeof values[i] === 'number') write(kind, input, values[i]); });
    showLabels();
  }
  function showLabels() {
    document.querySelectorAll('[data-unit-label="length"]').forEach((el) => { el.textContent = units.length; });
    document.querySelectorAll('[data-unit-label="force"]').forEach((el) => { el.textContent = units.force; });
  }
  return {
    units,
    readLength: (input) => read('length', input),
    readForce: (input) => read('force', input),
    writeLength: (input, mm) => write('length', input, mm),
    writeForce: (input, n) => write('force', input, n),
    lengthOut: (mm) => fromMm(mm, units.length),
    lengthIn: (v) => toMm(v, units.length),
    forceOut: (n) => fromNewton(n, units.force),
    switchUnit,
    showLabels,
  };
}

/** Fills material selects from GET /api/v1/materials; resolves to the catalogue or null. */
export async function loadMaterials(selects) {
  const result = await getJson('/api/v1/materials').catch(() => ({ ok: false }));
  if (!result.ok || !Array.isArray(result.data)) return null;
  for (const select of selects) {
    const keep = select.value;
    select.replaceChildren(...result.data.map((m) => {
      const option = document.createElement('option');
      option.value = m.id;
      option.textContent = m.name || m.id;
      return option;
    }));
    if (result.data.some((m) => m.id === keep)) select.value = keep;
  }
  return result.data;
}

/** A catalogue id to use as the default wrap wire: a bronze when there is one. */
export function defaultWrap(materials) {
  const bronze = materials && materials.find((m) => /phosphor/.test(m.id)) || materials && materials.find((m) => /bronze/.test(m.id));
  return bronze ? bronze.id : (materials && materials[0] ? materials[0].id : '');
}
