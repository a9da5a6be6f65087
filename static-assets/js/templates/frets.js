// Fret slotting template: SVG preview, SVG and tiled PDF downloads. Lengths are typed in mm or
// inches (the panel's unit switch, remembered in this browser); the API always gets mm.
import { clearFieldErrors, postForBlob, download } from '../common/api.js';
import { toMm, fromMm, figure } from '../common/units.js';
import { $, t, num, showProblem, say, showImage } from './shared.js';

const fretForm = $('fret-form');
const UNIT_KEY = 'nodewright.units.templates.frets';
const unit = () => $('fret-units').value;
const inMm = (v) => toMm(v, unit());

function fretRequest() {
  const problems = [];
  const field = (id, name, integer) => {
    const v = num($(id).value);
    if (!Number.isFinite(v)) problems.push({ field: name, message: t('notNumber') });
    else if (integer && !Number.isInteger(v)) problems.push({ field: name, message: t('notWhole', v) });
    return Number.isFinite(v) ? v : null;
  };
  const length = (id, name) => { const v = field(id, name); return v === null ? null : exactOr(id, $(id).value, v); };
  const request = {
    scaleLengthMm: length('fret-scale', 'scaleLengthMm'),
    count: field('fret-count', 'count', true),
    divisionsPerOctave: field('fret-divisions', 'divisionsPerOctave', true),
    lineLengthMm: length('fret-line', 'lineLengthMm'),
    positions: [],
  };
  $('fret-positions').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const eq = line.lastIndexOf('=');
    const mm = eq > 0 ? num(line.slice(eq + 1)) : NaN;
    if (eq <= 0 || !Number.isFinite(mm)) {
      problems.push({ field: 'positions', message: t('badLine', i + 1) });
      return;
    }
    request.positions.push({ label: line.slice(0, eq).trim(), positionMm: exactOr(`line${i}`, line.slice(eq + 1), mm) });
  });
  return { request, problems };
}

async function fretTemplate(kind) {
  clearFieldErrors(fretForm);
  const { request, problems } = fretRequest();
  if (problems.length) {
    showProblem(fretForm, $('fret-message'), { errors: problems });
    return;
  }
  const paper = $('fret-paper').value;
  const url = kind === 'pdf' ? `/api/v1/templates/frets.pdf?paper=${encodeURIComponent(paper)}` : '/api/v1/templates/frets.svg';
  const answer = await postForBlob(url, request);
  if (!answer.ok) {
    showProblem(fretForm, $('fret-message'), answer.problem);
    return;
  }
  const stem = `frets-${request.scaleLengthMm}mm-${request.count}`;
  const shown = (mm) => `${figure(fromMm(mm, unit()))} ${unit()}`;
  const past = request.positions.filter((p) => p.positionMm > request.scaleLengthMm)
    .map((p) => t('pastSaddle', p.label, shown(p.positionMm), shown(request.scaleLengthMm)));
  if (kind === 'preview') {
    showImage($('fret-image'), answer.blob, 'fret');
    say($('fret-message'), past.join(' '));
  } else {
    const name = kind === 'pdf' ? `${stem}-${paper}.pdf` : `${stem}.svg`;
    download(answer.blob, name);
    say($('fret-message'), [t('downloaded', name), ...past].join(' '));
  }
}

/** Shows the typed lengths in the new unit (the same lengths, converted), and the unit beside each field. */
// The mm behind each converted text, so that switching back and forth never drifts (650 mm shown
// as 25.5906 inch comes back as 650, not 650.001): used while the text is still as shown.
const exactMm = new Map();   // key → {text, mm}

/** The mm of a field: the exact one kept at the last switch while its text is unchanged, else the typed value. */
function exactOr(key, text, typed) {
  const kept = exactMm.get(key);
  return kept && kept.text === String(text).trim() ? kept.mm : inMm(typed);
}

function switchUnit(from, to) {
  const convert = (key, text) => {
    const v = num(text);
    if (!Number.isFinite(v)) return text;
    const kept = exactMm.get(key);
    const mm = kept && kept.text === text.trim() ? kept.mm : toMm(v, from);
    const shown = figure(fromMm(mm, to));
    exactMm.set(key, { text: shown, mm });
    return shown;
  };
  for (const id of ['fret-scale', 'fret-line']) $(id).value = convert(id, $(id).value);
  $('fret-positions').value = $('fret-positions').value.split('\n').map((line, i) => {
    const eq = line.lastIndexOf('=');
    return eq > 0 ? `${line.slice(0, eq).trimEnd()} = ${convert(`line${i}`, line.slice(eq + 1).trim())}` : line;
  }).join('\n');
  document.querySelectorAll('[data-fret-unit]').forEach((el) => { el.textContent = to; });
  localStorage.setItem(UNIT_KEY, to);
}

let shownUnit = 'mm';
$('fret-units').addEventListener('change', () => { switchUnit(shownUnit, unit()); shownUnit = unit(); });
if (localStorage.getItem(UNIT_KEY) === 'inch') {
  $('fret-units').value = 'inch';
  switchUnit('mm', 'inch');
  shownUnit = 'inch';
}

fretForm.addEventListener('submit', (e) => { e.preventDefault(); fretTemplate('preview'); });
$('fret-svg').addEventListener('click', () => fretTemplate('svg'));
$('fret-pdf').addEventListener('click', () => fretTemplate('pdf'));

