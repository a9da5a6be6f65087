// Form helpers shared by the string bench and the set planner: typed numbers that stay as typed,
// display units with exact round trips, local checks, and the material catalogue.
import { getJson } from './api.js';
import { toMm, fromMm, toNewton, fromNewton, parseNumber } from './units.js';
import { pitchHz, a4Or440 } from './notes.js';

/** A typed number (units.js parseNumber: a decimal comma is a point), null when empty, NaN when it is no number. */
export function readNumber(input) {
  const raw = input.value.trim();
  return raw === '' ? null : parseNumber(raw);
}

/** A pitch field: Hz ("329.63", "329.63 Hz") or a note name turned into Hz; null when empty, NaN when neither. */
export function readPitch(input, a4Input) {
  const raw = input.value.trim();
  if (raw === '') return null;
  const hz = pitchHz(raw, a4Or440(a4Input ? readNumber(a4Input) : null));
  return hz === null ? NaN : hz;
}

/**
 * Collects what the page can already refuse before asking the server: a value that is no number
 * (NaN from the readers above) is named on its own field ([data-field] of the input) with the
 * page's own words. check(input, value, message) returns the value, or null when it was refused.
 */
export function localChecks() {
  const problems = [];
  return {
    problems,
    check(input, value, message) {
      if (typeof value === 'number' && Number.isNaN(value)) {
        problems.push({ field: input.dataset.field, message });
        return null;
      }
      return value;
    },
    add(field, message) { problems.push({ field, message }); },
  };
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
    if (typeof v !== 'number' || Number.isNaN(v)) return v;
    if (input.dataset.shown === input.value && input.dataset.canonical !== undefined) return Number(input.dataset.canonical);
    return fromDisplay(kind, v);
  }
  /** Re-expresses every input of that kind inside root in the new unit and relabels the units. */
  function switchUnit(root, kind, unit) {
    const inputs = [...root.querySelectorAll(`input[data-unit="${kind}"]`)];
    const values = inputs.map((input) => read(kind, input));
    units[kind] = unit;
    inputs.forEach((input, i) => { if (Number.isFinite(values[i])) write(kind, input, values[i]); });
    showLabels();
  }
  function showLabels() {
    document.querySelectorAll('[data-unit-label="length"]').forEach((el) => { el.textContent = units.length; });
    document.querySelectorAll('[data-unit-label="force"]').forEach((el) => { el.textContent = units.force; });
  }
  /** Shows units {length, force} (either may be missing) in the selects and every input of root. */
  function showUnits(root, wanted) {
    for (const kind of ['length', 'force']) {
      const unit = wanted?.[kind];
      const select = document.getElementById(`${kind}-unit`);
      if (!unit || !select || ![...select.options].some((o) => o.value === unit) || unit === units[kind]) continue;
      select.value = unit;
      switchUnit(root, kind, unit);
    }
  }
  /** The units last chosen on this page in this browser come back on the next visit. */
  function remember(root, page) {
    const key = `nodewright.units.${page}`;
    try { showUnits(root, JSON.parse(localStorage.getItem(key) || 'null')); } catch (error) { localStorage.removeItem(key); }
    root.addEventListener('change', (e) => {
      if (e.target.id === 'length-unit' || e.target.id === 'force-unit') localStorage.setItem(key, JSON.stringify(units));
    });
  }
  return {
    units,
    showUnits,
    remember,
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
  const result = await getJson('/api/v1/materials').catch((error) => ({ ok: false, error }));
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
