// The plate bench: outline, thickness, material, edges and braces to a request; the modes back as a
// table, a gallery of shape maps with node lines, and a tap preview. Lengths are typed in mm or inches
// (js/common/units.js); requests speak mm.
import { getJson, postJson, showFieldErrors, clearFieldErrors } from '../common/api.js';
import { parseNumber, toMm, textFromMm, textToMm, problemInUserUnits } from '../common/units.js';
import { mountDesignBar } from '../common/design-bar.js';
import { drawMode } from './plate-map.js';
import { mountSolver } from './solver-panel.js';
import { mountMeasure } from './measure-panel.js';

const form = document.getElementById('plate-form');
const braceRows = document.getElementById('brace-rows');
const problemLine = document.getElementById('form-problem');
let lastResponse = null;
/** Constants fitted on the measure panel (the material choice "measured"), or null. */
let measuredMaterial = null;
const MEASURED = 'measured';
const CONSTANTS = ['densityKgPerM3', 'elasticAlongPa', 'elasticAcrossPa', 'shearPa', 'poissonAlongAcross'];

/** A typed number as a number; text that is not one is sent as typed so the server names the field. */
function numberOrText(value) {
  const t = String(value).trim();
  if (t === '') return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : t;
}

// --- lengths in the unit shown --------------------------------------------------------------
// Every length input carries data-length: "one" (a single number) or "list" (numbers in a text, such as
// "x, y" a line). An input written from mm keeps that exact mm text (data-mm) while it shows the same text
// (data-shown), so switching units back and forth never changes a value the maker did not touch.
let unit = 'mm';

/** Writes a length (a number or a text of numbers, in mm) into an input in the unit shown. */
function writeLength(input, mm) {
  const text = mm === null || mm === undefined ? '' : String(mm);
  input.value = textFromMm(text, unit);
  input.dataset.mm = text;
  input.dataset.shown = input.value;
}

/** An input's length as mm text: exact when untouched since written, else what is typed, converted. */
function lengthText(input) {
  if (input.dataset.mm !== undefined && input.dataset.shown === input.value) return input.dataset.mm;
  if (input.dataset.length !== 'one') return textToMm(input.value, unit);
  const v = parseNumber(input.value);
  return Number.isFinite(v) ? String(toMm(v, unit)) : input.value; // not a number: sent as typed, the server names it
}

/** A single length input as mm (a number), null when empty, or its text as typed when it is no number. */
function lengthMm(input) {
  return numberOrText(lengthText(input));
}

function setUnit(next) {
  const inputs = [...document.querySelectorAll('[data-length]')];
  const mm = inputs.map(lengthText);
  unit = next;
  inputs.forEach((input, i) => writeLength(input, mm[i]));
  document.querySelectorAll('[data-unit-label="length"]').forEach((el) => { el.textContent = unit === 'inch' ? 'in' : 'mm'; });
}

/** A problem document with its lengths in the unit shown. */
const shownProblem = (problem) => problemInUserUnits(problem, { length: unit });

function outlineKind() {
  return document.getElementById('outline-points-kind').checked ? 'points' : 'rectangle';
}

function showOutlineKind() {
  const points = outlineKind() === 'points';
  document.getElementById('points-fields').hidden = !points;
  document.getElementById('rectangle-fields').hidden = points;
}

function parsePoints(text) {
  const lines = text.split(/\n|;/).map((l) => l.trim()).filter((l) => l.length > 0);
  return lines.map((l) => l.split(/[\s,]+/).filter((s) => s.length > 0).map(numberOrText));
}

function addBraceRow(b = { fromMm: [50, 150], toMm: [350, 150], widthMm: 8, heightMm: 12 }) {
  const tr = document.createElement('tr');
  const index = braceRows.children.length;
  const cell = (field, value, kind) => {
    const td = document.createElement('td');
    const input = document.createElement('input');
    input.type = 'text';
    input.inputMode = 'decimal';
    input.dataset.role = field;
    input.dataset.length = kind;
    writeLength(input, value);
    td.appendChild(input);
    return td;
  };
  const head = document.createElement('td');
  head.textContent = String(index + 1);
  tr.appendChild(head);
  const from = cell('from', `${b.fromMm[0]}, ${b.fromMm[1]}`, 'list');
  const to = cell('to', `${b.toMm[0]}, ${b.toMm[1]}`, 'list');
  tr.append(from, to, cell('width', b.widthMm, 'one'), cell('height', b.heightMm, 'one'));
  const rm = document.createElement('td');
  const button = document.createElement('button');
  button.type = 'button';
  button.className = 'secondary remove-brace';
  button.textContent = '\u00d7';
  button.addEventListener('click', () => { tr.remove(); renumberBraces(); });
  rm.appendChild(button);
  tr.appendChild(rm);
  braceRows.appendChild(tr);
  renumberBraces();
}

function renumberBraces() {
  [...braceRows.children].forEach((tr, i) => {
    tr.children[0].textContent = String(i + 1);
    tr.querySelector('[data-role="from"]').dataset.field = `braces[${i}].fromMm`;
    tr.querySelector('[data-role="to"]').dataset.field = `braces[${i}].toMm`;
    tr.querySelector('[data-role="width"]').dataset.field = `braces[${i}].widthMm`;
    tr.querySelector('[data-role="height"]').dataset.field = `braces[${i}].heightMm`;
    tr.querySelector('[data-role="from"]').closest('tr').dataset.field = `braces[${i}]`;
  });
}

function getParameters() {
  const request = {};
  if (outlineKind() === 'rectangle') {
    request.outline = 'rectangle';
    request.lengthMm = lengthMm(document.getElementById('lengthMm'));
    request.widthMm = lengthMm(document.getElementById('widthMm'));
  } else {
    request.outline = parsePoints(lengthText(document.getElementById('outline-points')));
    if (document.getElementById('mirrorHalf').checked) request.mirrorHalf = true;
  }
  const points = parsePoints(lengthText(document.getElementById('thickness-points')));
  if (points.length > 0) {
    request.thicknessPoints = points.map(([xMm, yMm, thicknessMm]) => ({ xMm, yMm, thicknessMm }));
  } else {
    request.thicknessMm = lengthMm(document.getElementById('thicknessMm'));
  }
  const material = document.getElementById('material').value;
  if (material === MEASURED && measuredMaterial) {
    CONSTANTS.forEach((k) => { request[k] = measuredMaterial[k]; });
  } else {
    request.material = material;
  }
  request.edges = document.getElementById('edges').value;
  request.modeCount = numberOrText(document.getElementById('modeCount').value);
  request.braces = [...braceRows.children].map((tr) => ({
    fromMm: lengthText(tr.querySelector('[data-role="from"]')).split(/[\s,]+/).filter((s) => s).map(numberOrText),
    toMm: lengthText(tr.querySelector('[data-role="to"]')).split(/[\s,]+/).filter((s) => s).map(numberOrText),
    widthMm: lengthMm(tr.querySelector('[data-role="width"]')),
    heightMm: lengthMm(tr.querySelector('[data-role="height"]')),
  }));
  return request;
}

function setParameters(p) {
  const rect = !Array.isArray(p.outline);
  document.getElementById('outline-rectangle').checked = rect;
  document.getElementById('outline-points-kind').checked = !rect;
  if (rect) {
    writeLength(document.getElementById('lengthMm'), p.lengthMm);
    writeLength(document.getElementById('widthMm'), p.widthMm);
  } else {
    writeLength(document.getElementById('outline-points'), p.outline.map((pt) => pt.join(', ')).join('\n'));
    document.getElementById('mirrorHalf').checked = !!p.mirrorHalf;
  }
  showOutlineKind();
  writeLength(document.getElementById('thicknessMm'), p.thicknessMm);
  writeLength(document.getElementById('thickness-points'), (p.thicknessPoints || [])
    .map((q) => `${q.xMm}, ${q.yMm}, ${q.thicknessMm}`).join('\n'));
  if (p.material) {
    document.getElementById('material').value = p.material;
  } else if (p.elasticAlongPa != null) {
    useMaterialConstants(Object.fromEntries(CONSTANTS.map((k) => [k, p[k]])));
  }
  document.getElementById('edges').value = p.edges || 'free';
  document.getElementById('modeCount').value = p.modeCount ?? 10;
  braceRows.replaceChildren();
  (p.braces || []).forEach((b) => addBraceRow(b));
}

/** Puts fitted constants in the material choice as "measured" and selects it. */
function useMaterialConstants(constants) {
  measuredMaterial = constants;
  const select = document.getElementById('material');
  let option = select.querySelector(`option[value="${MEASURED}"]`);
  if (!option) {
    option = document.createElement('option');
    option.value = MEASURED;
    select.appendChild(option);
  }
  const gpa = (pa) => (pa / 1e9).toFixed(2);
  option.textContent = `${document.querySelector('#plate-text [data-k="plates.js.measured"]').textContent}: `
    + `${gpa(constants.elasticAlongPa)} / ${gpa(constants.elasticAcrossPa)} / ${gpa(constants.shearPa)} GPa`;
  select.value = MEASURED;
}

function showResults(response) {
  lastResponse = response;
  document.getElementById('plate-method').textContent = response.method;
  const cautions = document.getElementById('plate-cautions');
  cautions.replaceChildren(...(response.cautions || []).map((c) => Object.assign(document.createElement('li'), { textContent: c })));
  const body = document.querySelector('#plate-results tbody');
  body.replaceChildren();
  const gallery = document.getElementById('mode-gallery');
  gallery.replaceChildren();
  for (const m of response.modes) {
    const tr = document.createElement('tr');
    tr.dataset.frequencyHz = String(m.frequencyHz);
    const cents = m.note ? `${m.note.centsOff >= 0 ? '+' : ''}${m.note.centsOff.toFixed(1)}` : '';
    for (const text of [m.n, m.frequencyHz.toFixed(1), m.note ? m.note.name : '', cents, m.name || `(${m.nodalLinesX}, ${m.nodalLinesY})`]) {
      const td = document.createElement('td');
      td.textContent = String(text);
      tr.appendChild(td);
    }
    const play = document.createElement('td');
    const button = document.createElement('button');
    button.type = 'button';
    button.className = 'secondary';
    button.textContent = '\u25b6';
    button.title = document.getElementById('tap-label').textContent;
    button.addEventListener('click', () => tap([m]));
    play.appendChild(button);
    tr.appendChild(play);
    body.appendChild(tr);
    const figure = document.createElement('figure');
    figure.className = 'mode-card';
    const canvas = document.createElement('canvas');
    canvas.id = `plate-mode-${m.n}`;
    canvas.width = 220;
    canvas.height = 180;
    figure.appendChild(canvas);
    const caption = document.createElement('figcaption');
    caption.textContent = `${m.n}: ${m.frequencyHz.toFixed(1)} Hz ${m.name || ''}`;
    caption.id = `${canvas.id}-caption`;
    canvas.setAttribute('role', 'img');
    canvas.setAttribute('aria-labelledby', caption.id);
    figure.appendChild(caption);
    gallery.appendChild(figure);
    drawMode(canvas, m);
  }
  document.dispatchEvent(new CustomEvent('nodewright:plate-analyzed', { detail: { request: getParameters(), response } }));
}

/** The tap tone: the modes as decaying sines (amplitude falling with mode number), through Web Audio. */
function tap(modes) {
  const AudioCtx = window.AudioContext || window.webkitAudioContext;
  if (!AudioCtx) return;
  const ctx = new AudioCtx();
  const now = ctx.currentTime;
  modes.forEach((m, k) => {
    const osc = ctx.createOscillator();
    const gain = ctx.createGain();
    osc.frequency.value = m.frequencyHz;
    const decay = Math.min(1.5, 40 / m.frequencyHz + 0.2);
    gain.gain.setValueAtTime(0.25 / (k + 1), now);
    gain.gain.exponentialRampToValueAtTime(0.0001, now + decay);
    osc.connect(gain).connect(ctx.destination);
    osc.start(now);
    osc.stop(now + decay);
  });
}

async function analyze() {
  clearFieldErrors(form);
  problemLine.textContent = '';
  const result = await postJson('/api/v1/plates/analyze', getParameters());
  if (!result.ok) {
    const problem = shownProblem(result.problem);
    const unclaimed = showFieldErrors(form, problem);
    problemLine.textContent = unclaimed.length ? unclaimed.join('; ') : (problem && problem.detail) || '';
    return false;
  }
  showResults(result.data);
  return true;
}

async function start() {
  const [materials, presets] = await Promise.all([getJson('/api/v1/plate-materials'), getJson('/api/v1/plate-presets')]);
  const select = document.getElementById('material');
  for (const m of materials.data || []) {
    select.appendChild(Object.assign(document.createElement('option'), { value: m.id, textContent: m.name }));
  }
  select.value = 'spruce';
  const presetSelect = document.getElementById('plate-preset');
  for (const p of presets.data || []) {
    presetSelect.appendChild(Object.assign(document.createElement('option'), { value: p.id, textContent: p.name }));
  }
  presetSelect.addEventListener('change', () => {
    const p = (presets.data || []).find((x) => x.id === presetSelect.value);
    if (p) { setParameters(p.request); analyze(); }
  });
  document.querySelectorAll('input[name="outline-kind"]').forEach((r) => r.addEventListener('change', showOutlineKind));
  document.getElementById('add-brace').addEventListener('click', () => addBraceRow());
  document.getElementById('plate-units').addEventListener('change', (e) => { setUnit(e.target.value); analyze(); });
  form.addEventListener('submit', (e) => { e.preventDefault(); analyze(); });
  const bar = document.getElementById('design-bar');
  if (bar) mountDesignBar(bar, { kind: 'plate', getParameters, setParameters, formRoot: form });
  const api = { getParameters, setParameters, analyze, last: () => lastResponse, useMaterialConstants, lengthMm,
    shownProblem };
  mountSolver(api);
  mountMeasure(api);
  const url = new URL(window.location.href);
  if (!url.searchParams.has('design')) analyze();
}

start();
window.nodewrightPlates = { last: () => lastResponse, parameters: () => getParameters(), unit: () => unit,
  tap: () => lastResponse && tap(lastResponse.modes.slice(0, 6)) };
