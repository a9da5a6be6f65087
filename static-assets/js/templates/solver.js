// The bore panel: a bore (from the demo or the bore bench), its drilling template, and the
// tone-hole solver (a job polled for progress, cancellable, whose result can be applied to the
// bore and opened in the bore bench).
import { clearFieldErrors, getJson, postJson, postForBlob, download } from '../common/api.js';
import { createJobFollower } from '../common/jobs.js';
import { fmt } from '../common/units.js';
import { OPEN_AIR_COLUMN, BORE_FOR_TEMPLATES, handOver, handedOver } from '../common/handover.js';
import { $, t, num, showProblem, say, showImage } from './shared.js';
import {
  fingeringLines, parseFingeringLines, parseMeasuredLines, blankTubeBody, calibrationBody, mouthMoves,
} from './bore-lines.js';


const POLL_MS = 200;
const state = { result: null, limits: {} };

const borePanel = $('bore-panel');

function readBore() {
  try {
    return { bore: JSON.parse($('bore-json').value), problem: null };
  } catch (err) {
    return { bore: null, problem: { errors: [{ field: 'bore', message: t('badJson', err.message) }] } };
  }
}

/** The fingering lines as the API's fingerings (closedHoles from 0). */
function readFingerings() {
  const { rows, bad } = parseFingeringLines($('fingering-lines').value);
  return { rows, problems: bad.map((line) => ({ field: 'fingerings', message: t('badLine', line) })) };
}

function limits() {
  const get = (id) => num($(id).value);
  return {
    ...state.limits,
    varyDiameters: $('vary-diameters').checked, varyFoot: $('vary-foot').checked,
    minDiameterMm: get('min-diameter'), maxDiameterMm: get('max-diameter'), minWallMm: get('min-wall'),
  };
}

/** Puts a bore (an air-column request, fingerings included or not) into the panel. */
function showBore(request) {
  const bore = { ...request };
  const fingerings = bore.fingerings || [];
  delete bore.fingerings;
  $('bore-json').value = JSON.stringify(bore, null, 1);
  if (fingerings.length) $('fingering-lines').value = fingeringLines(fingerings);
}

async function loadDemo() {
  const answer = await getJson('/api/v1/inverse/tone-holes/demo').catch((error) => ({ ok: false, problem: { detail: String(error) } }));
  if (!answer.ok) {
    showProblem(borePanel, $('bore-message'), { detail: t('demoFailed', answer.problem?.detail ?? answer.status) });
    return;
  }
  showBore(answer.data.bore);
  const l = answer.data.limits || {};
  state.limits = { minPositionMm: l.minPositionMm, endMarginMm: l.endMarginMm, minFootMm: l.minFootMm, maxFootMm: l.maxFootMm };
  if (l.minDiameterMm) $('min-diameter').value = l.minDiameterMm;
  if (l.maxDiameterMm) $('max-diameter').value = l.maxDiameterMm;
  if (l.minWallMm !== undefined && l.minWallMm !== null) $('min-wall').value = l.minWallMm;
  $('vary-foot').checked = l.varyFoot !== false;
  $('vary-diameters').checked = !!l.varyDiameters;
}

function fromBench() {
  let handed;
  try {
    handed = handedOver(BORE_FOR_TEMPLATES);
  } catch (error) {
    showProblem(borePanel, $('bore-message'), { detail: t('badJson', error.message) });
    return;
  }
  if (!handed) {
    say($('bore-message'), t('noBench'));
    return;
  }
  state.limits = {};
  showBore(handed.request || handed);
  say($('bore-message'), t('fromBench'));
}

async function boreTemplate(kind) {
  clearFieldErrors(borePanel);
  const { bore, problem } = readBore();
  if (problem) {
    showProblem(borePanel, $('bore-message'), problem);
    return;
  }
  const paper = $('bore-paper').value;
  const url = kind === 'pdf' ? `/api/v1/templates/tone-holes.pdf?paper=${encodeURIComponent(paper)}` : '/api/v1/templates/tone-holes.svg';
  const answer = await postForBlob(url, bore);
  if (!answer.ok) {
    showProblem(borePanel, $('bore-message'), answer.problem);
    return;
  }
  if (kind === 'pdf') {
    download(answer.blob, `tone-holes-${paper}.pdf`);
    say($('bore-message'), t('downloaded', `tone-holes-${paper}.pdf`));
  } else {
    showImage($('bore-image'), answer.blob, 'bore');
    say($('bore-message'), '');
  }
}

function setRunning(running) {
  $('solve-start').disabled = running;
  $('solve-cancel').disabled = !running;
}

async function startSolve() {
  clearFieldErrors(borePanel);
  const { bore, problem } = readBore();
  const f = readFingerings();
  if (problem || f.problems.length) {
    showProblem(borePanel, $('bore-message'), { errors: [...(problem ? problem.errors : []), ...f.problems] });
    return;
  }
  startJob('/api/v1/inverse/tone-holes', { bore: { ...bore, fingerings: f.rows }, limits: limits() });
}

/** The solve's status line and progress bar, from each poll of the job. */
function showJob(job) {
  $('solve-progress').value = job.status === 'succeeded' ? 1 : job.progress.fraction;
  $('solve-state').dataset.status = job.status;
  if (job.status === 'queued') {
    $('solve-state').textContent = t('queued');
  } else if (job.status === 'running') {
    $('solve-state').textContent = t('running', job.progress.evaluations,
      job.progress.worstCents == null ? '...' : fmt(job.progress.worstCents, 2));
  }
}

const solveJob = createJobFollower({
  interval: POLL_MS,
  progress: showJob,
  finished: (job) => { showJob(job); finish(job); },
  failed: (answer) => {
    setRunning(false);
    $('solve-state').textContent = t('error', answer.status);
  },
});

function finish(job) {
  setRunning(false);
  if (job.status === 'cancelled') {
    $('solve-state').textContent = t('cancelled');
    return;
  }
  if (job.status === 'failed') {
    $('solve-state').textContent = t('failed', job.error);
    return;
  }
  if (job.kind === 'calibration') {
    showCalibration(job.result);
    $('solve-state').textContent = '';
    return;
  }
  const r = job.kind === 'blank-tube' ? job.result.solution : job.result;
  if (job.kind === 'blank-tube') {
    const moves = mouthMoves(job.result).map((m) => t('mouthMoved', m.field, fmt(m.startMm, 2), fmt(m.solvedMm, 2)));
    $('blank-first').textContent = [t('firstLayout', fmt(job.result.firstLayout.worstCents, 1),
      job.result.chosenStart + 1, job.result.starts.length), ...moves].join(' ');
  }
  state.result = r;
  $('solve-state').textContent = r.withinTolerance ? t('succeeded', fmt(job.elapsedSeconds, 2), fmt(r.toleranceCents, 2))
    : t('notConverged', fmt(job.elapsedSeconds, 2), fmt(r.worstCents, 2));
  const cell = (tr, text) => { const td = document.createElement('td'); td.textContent = text; tr.appendChild(td); };
  const notes = $('note-rows');
  notes.replaceChildren();
  r.notes.forEach((n) => {
    const tr = document.createElement('tr');
    tr.dataset.cents = n.achievedCents;
    cell(tr, n.fingering); cell(tr, fmt(n.targetHz, 2)); cell(tr, fmt(n.startCents, 1));
    cell(tr, fmt(n.achievedHz, 2)); cell(tr, fmt(n.achievedCents, 2));
    notes.appendChild(tr);
  });
  const holes = $('hole-rows');
  holes.replaceChildren();
  r.holes.forEach((h) => {
    const tr = document.createElement('tr');
    cell(tr, String(h.hole)); cell(tr, fmt(h.positionMm, 2)); cell(tr, fmt(h.movedMm, 2));
    cell(tr, fmt(h.diameterMm, 2)); cell(tr, fmt(h.diameterChangeMm, 2));
    holes.appendChild(tr);
  });
  $('foot-line').textContent = t('foot', fmt(r.footMovedMm, 2));
  $('solve-result').hidden = false;
}

async function cancelSolve() {
  // A queued job is cancelled at once, a running one at its next evaluation: the follower polls until
  // the job says so. A refused or lost cancel is said on the page, and the job is still followed.
  const answer = await solveJob.cancel();
  if (answer && !answer.ok) $('solve-state').textContent = t('error', answer.status);
}

function applyResult() {
  if (!state.result) return;
  showBore(state.result.bore);
  say($('bore-message'), t('applied'));
}

/**
 * Hands the adjusted bore to the bore bench unsaved (sessionStorage); the bore bench opens it and
 * says that it is not saved yet. Nothing goes to the shop library until someone saves it there.
 */
function openInBench() {
  if (!state.result) return;
  handOver(OPEN_AIR_COLUMN, { source: 'templates', request: state.result.bore });
  window.location.assign('/air-columns#from-templates');
}

/** Starts a job and polls it with the same status line, progress bar and cancel button as the solve. */
async function startJob(url, body) {
  const answer = await postJson(url, body);
  if (!answer.ok) {
    showProblem(borePanel, $('bore-message'), answer.problem);
    return;
  }
  say($('bore-message'), '');
  $('solve-result').hidden = true;
  setRunning(true);
  $('solve-progress').value = 0;
  solveJob.follow(answer.data.id);
}

async function loadBlank() {
  const answer = await getJson('/api/v1/inverse/blank-tube/demo').catch((error) => ({ ok: false, problem: { detail: String(error) } }));
  if (!answer.ok) {
    showProblem(borePanel, $('bore-message'), { detail: t('demoFailed', answer.problem?.detail ?? answer.status) });
    return;
  }
  const d = answer.data;
  showBore({ ...d.bore, fingerings: d.fingerings });
  $('blank-count').value = d.holeCount;
  $('blank-chimney').value = d.chimneyMm;
  const l = d.limits || {};
  state.limits = { minPositionMm: l.minPositionMm, endMarginMm: l.endMarginMm, minFootMm: l.minFootMm, maxFootMm: l.maxFootMm };
  $('min-diameter').value = l.minDiameterMm;
  $('max-diameter').value = l.maxDiameterMm;
  $('min-wall').value = l.minWallMm;
  $('vary-foot').checked = l.varyFoot !== false;
  $('vary-diameters').checked = l.varyDiameters !== false;
  const m = d.mouthLimits || {};
  $('blank-vary-headspace').checked = !!m.varyHeadspace;
  $('blank-vary-window').checked = !!m.varyWindowLength;
}

function solveBlank() {
  clearFieldErrors(borePanel);
  const { bore, problem } = readBore();
  const f = readFingerings();
  const count = num($('blank-count').value);
  const chimney = num($('blank-chimney').value);
  if (problem || f.problems.length) {
    showProblem(borePanel, $('bore-message'), { errors: [...(problem ? problem.errors : []), ...f.problems] });
    return;
  }
  startJob('/api/v1/inverse/blank-tube', blankTubeBody(bore, {
    holeCount: count, chimneyMm: chimney, fingerings: f.rows, limits: limits(),
    varyHeadspace: $('blank-vary-headspace').checked, varyWindowLength: $('blank-vary-window').checked,
  }));
}

/** Measured lines "name, pitch" as the API's measured list (the pitch in Hz or as a note). */
function readMeasured(bore) {
  const { rows, bad } = parseMeasuredLines($('measured-lines').value, bore && bore.referenceA4Hz);
  return { rows, problems: bad.map((line) => ({ field: 'measured', message: t('badLine', line) })) };
}

/** The chosen impedance file's text, or null when none is chosen. */
function impedanceText() {
  const file = $('calib-impedance').files[0];
  return file ? file.text() : Promise.resolve(null);
}

async function calibrate() {
  clearFieldErrors(borePanel);
  const { bore, problem } = readBore();
  const f = readFingerings();
  const m = readMeasured(bore);
  if (problem || f.problems.length || m.problems.length) {
    showProblem(borePanel, $('bore-message'), { errors: [...(problem ? problem.errors : []), ...f.problems, ...m.problems] });
    return;
  }
  const csv = await impedanceText();
  startJob('/api/v1/inverse/calibration', calibrationBody(bore, f.rows, m.rows, $('calib-fit').value,
    csv === null ? null : { csv, fingering: $('calib-impedance-fingering').value }));
}

function showCalibration(r) {
  state.calibration = r;
  const p = r.parameters[0];
  const peaks = (r.impedancePeaks || []).map((k) => (k.used ? t('peakUsed', k.n, fmt(k.measuredHz, 2))
    : t('peakUnused', k.n, fmt(k.measuredHz, 2), k.reason)));
  $('calib-values').textContent = [t('calibrated', p.field, fmt(p.fittedValue, 3), p.unit, fmt(p.startValue, 3),
    fmt(r.rmsCentsBefore, 2), fmt(r.rmsCentsAfter, 2)), ...peaks].join(' ');
  const rows = $('calib-rows');
  rows.replaceChildren();
  r.notes.forEach((n) => {
    const tr = document.createElement('tr');
    tr.dataset.cents = n.centsAfter;
    [n.fingering, fmt(n.measuredHz, 2), fmt(n.centsBefore, 2), fmt(n.centsAfter, 2)].forEach((text) => {
      const td = document.createElement('td'); td.textContent = text; tr.appendChild(td);
    });
    rows.appendChild(tr);
  });
  $('calib-result').hidden = false;
}

function applyCalibration() {
  if (!state.calibration) return;
  showBore(state.calibration.bore);
  say($('bore-message'), t('calibApplied'));
}

$('blank-demo').addEventListener('click', loadBlank);
$('blank-solve').addEventListener('click', solveBlank);
$('calib-start').addEventListener('click', calibrate);
$('calib-apply').addEventListener('click', applyCalibration);
$('bore-demo').addEventListener('click', loadDemo);
$('bore-from-bench').addEventListener('click', fromBench);
$('bore-preview').addEventListener('click', () => boreTemplate('preview'));
$('bore-pdf').addEventListener('click', () => boreTemplate('pdf'));
$('solve-start').addEventListener('click', startSolve);
$('solve-cancel').addEventListener('click', cancelSolve);
$('solve-apply').addEventListener('click', applyResult);
$('solve-open').addEventListener('click', openInBench);

if (sessionStorage.getItem(BORE_FOR_TEMPLATES)) fromBench(); else loadDemo();
