// Pickup rows and the position sliders of the string bench: the pluck and each pickup can be
// moved by typing, by a slider or by dragging its line on the charts (charts.js).
import { $, t, io } from './context.js';
import { toMm, fromMm } from '../common/units.js';
import { moveLine } from '../common/charts.js';
import { nextPickupMm } from './placement.js';

/** Closest two pickups may sit when the page places one: about a single-coil's width (common practice). */
const PICKUP_SPACING_MM = 20;
/** Slider steps: a millimetre, or two hundredths of an inch (a typed value stays as typed until moved). */
const SLIDER_STEP = { mm: 1, inch: 0.02 };
/** Where a dragged line lands: a tenth of a millimetre, or five thousandths of an inch. */
const DRAG_STEP = { mm: 0.1, inch: 0.005 };

let changed = () => {};
/** Called after a pickup or marker moved, was added or removed (the page re-analyses). */
export function onPickupsChanged(callback) { changed = callback; }

export function pickupRows() {
  return [...$('pickup-list').querySelectorAll('.pickup-row')];
}

export function clearPickups() {
  $('pickup-list').replaceChildren();
}

export function addPickupRow(positionMm, apertureMm) {
  const row = document.createElement('div');
  row.className = 'pickup-row';
  row.innerHTML = `<span class="pickup-name"></span>
    <label class="inline"><span class="pos-label"></span> <span class="unit" data-unit-label="length"></span>
      <input class="pickup-position" type="text" inputmode="decimal" data-unit="length"></label>
    <label class="inline"><span class="ap-label"></span> <span class="unit" data-unit-label="length"></span>
      <input class="pickup-aperture" type="text" inputmode="decimal" data-unit="length"></label>
    <button type="button" class="secondary remove-pickup"></button>`;
  row.querySelector('.pos-label').textContent = t('position');
  row.querySelector('.ap-label').textContent = t('aperture');
  row.querySelector('.remove-pickup').textContent = t('remove');
  io.writeLength(row.querySelector('.pickup-position'), positionMm);
  io.writeLength(row.querySelector('.pickup-aperture'), apertureMm);
  row.querySelector('.remove-pickup').addEventListener('click', () => {
    row.remove();
    renumberPickups();
    $('pickup-note').textContent = '';
    changed();
  });
  $('pickup-list').append(row);
  renumberPickups();
}

/** Adds a pickup where the pickup zone has room; says so when it has none. */
export function addPickupWhereRoom() {
  const length = io.readLength($('lengthMm'));
  const span = Number.isFinite(length) && length > 0 ? length : 650;
  const taken = pickupRows().map((row) => io.readLength(row.querySelector('.pickup-position')));
  const x = nextPickupMm(span, taken, PICKUP_SPACING_MM);
  if (x === null) {
    $('pickup-note').textContent = t('noRoom', `${io.units.length === 'mm' ? PICKUP_SPACING_MM : (PICKUP_SPACING_MM / 25.4).toFixed(2)} ${io.units.length}`);
    return false;
  }
  $('pickup-note').textContent = '';
  addPickupRow(x, 0);
  changed();
  return true;
}

function renumberPickups() {
  pickupRows().forEach((row, i) => {
    row.querySelector('.pickup-name').textContent = `${t('pickup')} ${i + 1}`;
    row.querySelector('.pickup-position').dataset.field = `pickups[${i}].positionMm`;
    row.querySelector('.pickup-aperture').dataset.field = `pickups[${i}].apertureMm`;
    row.querySelector('.pickup-position').id = `pickup-${i}-position`;
    row.querySelector('.pickup-aperture').id = `pickup-${i}-aperture`;
  });
  io.showLabels();
  buildSliders();
}

/** The text input a draggable marker moves: 'pluck' or 'pickup0', 'pickup1', ... */
function markerInput(id) {
  if (id === 'pluck') return $('pluckPosition');
  const row = pickupRows()[Number(id.replace('pickup', ''))];
  return row ? row.querySelector('.pickup-position') : null;
}

/** The name of a marker as the page shows it: Pluck (or Strike), Pickup 1, Pickup 2, ... */
export function markerName(id) {
  return id === 'pluck' ? (($('pluckKind').value === 'strike') ? t('strike') : t('pluck'))
    : `${t('pickup')} ${Number(id.replace('pickup', '')) + 1}`;
}

/** Where a marker may go, in the user's length unit: one step inside each end of the string. */
export function markerRange() {
  const length = io.readLength($('lengthMm'));
  const step = SLIDER_STEP[io.units.length];
  const span = Number.isFinite(length) && length > 0 ? fromMm(length, io.units.length) : 2 * step;
  return { min: step, max: Math.max(step, Math.floor(span / step - 1e-9) * step), step };
}

/** Decimals a marker position is spoken with in the current unit. */
export const markerDigits = () => (io.units.length === 'mm' ? 0 : 2);

/** A marker moved from the keyboard (its chart handle): to x in the user's unit, sliders follow. */
export function nudgeMarker(id, x) {
  moveMarker(id, toMm(x, io.units.length), false);
  syncSliders();
}

function speak(range) {
  range.setAttribute('aria-valuetext', `${Number(range.value).toFixed(markerDigits())} ${io.units.length}`);
}

export function buildSliders() {
  const box = $('position-sliders');
  box.replaceChildren();
  const ids = ['pluck', ...pickupRows().map((_, i) => `pickup${i}`)];
  for (const id of ids) {
    const label = document.createElement('label');
    label.className = 'slider';
    const name = document.createElement('span');
    name.textContent = markerName(id);
    const range = document.createElement('input');
    range.type = 'range';
    range.id = `slider-${id}`;
    range.dataset.marker = id;
    range.addEventListener('input', () => { speak(range); moveMarker(id, toMm(Number(range.value), io.units.length), false); });
    label.append(name, range);
    box.append(label);
  }
  syncSliders();
}

/**
 * Slider ranges from one step past the nut to one step short of the bridge (both ends are not
 * places a pluck or a pickup can be), in steps a maker can mark, so a typed 610 stays 610.
 */
export function syncSliders() {
  const length = io.readLength($('lengthMm'));
  if (!Number.isFinite(length) || length <= 0) return;
  const step = SLIDER_STEP[io.units.length];
  const max = fromMm(length, io.units.length);
  for (const range of $('position-sliders').querySelectorAll('input[type="range"]')) {
    const input = markerInput(range.dataset.marker);
    const mm = input ? io.readLength(input) : null;
    range.min = String(step);
    range.max = String(Math.floor(max / step - 1e-9) * step);
    range.step = String(step);
    if (Number.isFinite(mm)) range.value = String(fromMm(mm, io.units.length));
    speak(range);
  }
}

/** Moves the pluck or a pickup to mm: input, slider and chart markers at once, then re-analyses. */
export function moveMarker(id, mm, fromDrag) {
  const input = markerInput(id);
  if (!input) return;
  const step = DRAG_STEP[io.units.length];
  const shown = Math.round(fromMm(mm, io.units.length) / step) * step;   // a dragged line lands on a step too
  io.writeLength(input, fromDrag ? toMm(shown, io.units.length) : mm);
  if (fromDrag) syncSliders();
  const x = fromMm(io.readLength(input), io.units.length);
  for (const canvasId of ['node-map-chart', 'mode-shapes-chart']) moveLine(canvasId, id, x);
  changed();
}
