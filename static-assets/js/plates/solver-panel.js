// The plate thickness solver: targets for chosen modes, the unknowns and limits, a job on the shared solve
// machinery (POST /api/v1/inverse/plate-thickness, polled, cancellable), its answer (cents per target, the
// thicknesses to carve, Hz per 0.1 mm removed), "apply to the plate" and the graduation template.
import { clearFieldErrors, postJson, showFieldErrors, postForBlob, download } from '../common/api.js';
import { createJobFollower } from '../common/jobs.js';
import { parseNumber } from '../common/units.js';
import { pageText, labelByColumn } from '../common/text.js';

const POLL_MS = 250;
const $ = (id) => document.getElementById(id);
const t = pageText('#plate-text', 'plates.js.');
const state = { result: null, api: null };

/** "F3" stays a note, "174.6" or "174,6" becomes Hz; an empty cell is nothing. */
function pitch(text) {
  const s = String(text).trim();
  if (s === '') return {};
  const hz = parseNumber(s.replace(/\s*hz$/i, ''));
  return Number.isFinite(hz) ? { targetHz: hz } : { note: s };
}

/** "1 3" or "1, 3" (counted from 1 on the page) as the API's indexes from 0; anything else is sent as typed. */
function indexes(text) {
  const parts = String(text).split(/[\s,;]+/).filter(Boolean);
  return parts.map((p) => (/^\d+$/.test(p) ? Number(p) - 1 : p));
}

function addTarget(mode = '', target = '') {
  const rows = $('solver-target-rows');
  const i = rows.children.length;
  const tr = document.createElement('tr');
  tr.innerHTML = '<td><input type="text" inputmode="numeric" data-role="mode"></td>'
    + '<td><input type="text" data-role="target"></td><td class="now"></td>'
    + '<td><button type="button" class="secondary">\u00d7</button></td>';
  tr.querySelector('[data-role="mode"]').value = mode;
  tr.querySelector('[data-role="target"]').value = target;
  tr.querySelector('button').addEventListener('click', () => { tr.remove(); renumber(); });
  rows.appendChild(tr);
  renumber();
  showNow();
  return i;
}

function renumber() {
  [...$('solver-target-rows').children].forEach((tr, i) => {
    tr.querySelector('[data-role="mode"]').dataset.field = `targets[${i}].mode`;
    const target = tr.querySelector('[data-role="target"]');
    target.dataset.field = `targets[${i}].targetHz`;
  });
  labelByColumn($('solver-target-rows'));
}

/** The frequency each target's mode has now, from the bench's last answer. */
function showNow() {
  const last = state.api && state.api.last();
  [...$('solver-target-rows').children].forEach((tr) => {
    const n = Number(tr.querySelector('[data-role="mode"]').value);
    const mode = last && last.modes.find((m) => m.n === n);
    tr.querySelector('.now').textContent = mode ? mode.frequencyHz.toFixed(1) : '';
  });
}

function request() {
  const plate = state.api.getParameters();
  const targets = [...$('solver-target-rows').children].map((tr) => {
    const mode = parseNumber(tr.querySelector('[data-role="mode"]').value);
    return { mode: Number.isFinite(mode) ? mode : tr.querySelector('[data-role="mode"]').value,
      ...pitch(tr.querySelector('[data-role="target"]').value) };
  });
  const unknowns = {};
  if ($('solver-thickness').checked) unknowns.thickness = true;
  const points = indexes($('solver-points').value);
  if (points.length) unknowns.thicknessPoints = points;
  const braces = indexes($('solver-braces').value);
  if (braces.length) unknowns.braceHeights = braces;
  const limits = {};
  const limit = (id, key) => {
    const mm = state.api.lengthMm($(id)); // in the bench's length unit, as mm
    if (mm !== null) limits[key] = mm;
  };
  limit('solver-min-thickness', 'minThicknessMm');
  limit('solver-max-thickness', 'maxThicknessMm');
  limit('solver-min-brace', 'minBraceHeightMm');
  return { plate, targets, unknowns, limits };
}

function busy(on) {
  $('solver-start').disabled = on;
  $('solver-cancel').disabled = !on;
}

function refuse(problem) {
  // a target's note or Hz problem belongs to its one input
  const errors = (problem?.errors || []).map((e) => ({ ...e, field: e.field.replace(/^(targets\[\d+\])\.note$/, '$1.targetHz') }));
  const unclaimed = showFieldErrors($('solver-form'), state.api.shownProblem({ ...problem, errors }));
  $('solver-problem').textContent = unclaimed.length ? unclaimed.join('; ') : (errors.length ? '' : problem?.detail || '');
}

async function start(event) {
  event.preventDefault();
  clearFieldErrors($('solver-form'));
  $('solver-problem').textContent = '';
  $('solver-result').hidden = true;
  const answer = await postJson('/api/v1/inverse/plate-thickness', request());
  if (!answer.ok) { refuse(answer.problem); return; }
  busy(true);
  solveJob.follow(answer.data.id);
}

const solveJob = createJobFollower({
  interval: POLL_MS,
  progress(job) {
    const p = job.progress || {};
    $('solver-progress').value = p.fraction || 0;
    const worst = p.worstCents == null ? '-' : p.worstCents.toFixed(2);
    $('solver-status').textContent = t('running', p.evaluations || 0, p.maxEvaluations || 0, worst);
  },
  finished,
  failed(answer) {
    busy(false);
    $('solver-status').textContent = t('failed', answer.problem?.detail || '');
  },
});

function finished(job) {
  $('solver-progress').value = (job.progress || {}).fraction || 0;
  busy(false);
  if (job.status === 'succeeded') {
    $('solver-progress').value = 1;
    showResult(job.result);
  } else if (job.status === 'cancelled') {
    $('solver-status').textContent = t('cancelled');
  } else {
    $('solver-status').textContent = t('failed', job.error || '');
  }
}

function cell(tr, text) {
  const td = document.createElement('td');
  td.textContent = text;
  tr.appendChild(td);
}

function unknownName(u) {
  return u.kind === 'thickness' ? t('kind.thickness') : t(`kind.${u.kind}`, u.index + 1);
}

function showResult(r) {
  state.result = r;
  $('solver-status').textContent = r.converged ? t('done', r.evaluations, r.worstCents.toFixed(2))
    : t('notConverged', r.evaluations, r.worstCents.toFixed(2));
  const targets = $('solver-result-targets').querySelector('tbody');
  targets.replaceChildren(...r.targets.map((x) => {
    const tr = document.createElement('tr');
    tr.dataset.cents = String(x.cents);
    // a mode that changed its rank while the plate changed (followed by its shape) shows both ranks
    [x.modeNow === x.mode ? x.mode : `${x.mode} \u2192 ${x.modeNow}`, x.targetHz.toFixed(2), x.frequencyHz.toFixed(2),
      `${x.cents >= 0 ? '+' : ''}${x.cents.toFixed(2)}`]
      .forEach((v) => cell(tr, String(v)));
    return tr;
  }));
  const unknowns = $('solver-unknowns').querySelector('tbody');
  unknowns.replaceChildren(...r.unknowns.map((u) => {
    const tr = document.createElement('tr');
    tr.dataset.valueMm = String(u.valueMm);
    [unknownName(u), u.startMm.toFixed(2), u.valueMm.toFixed(2), u.removeMm.toFixed(2)].forEach((v) => cell(tr, v));
    return tr;
  }));
  const head = document.createElement('tr');
  ['#', ...r.unknowns.map(unknownName), t('whole')].forEach((h) => {
    const th = document.createElement('th');
    th.textContent = h;
    head.appendChild(th);
  });
  $('solver-sensitivity').querySelector('thead').replaceChildren(head);
  $('solver-sensitivity').querySelector('tbody').replaceChildren(...r.sensitivities.map((s) => {
    const tr = document.createElement('tr');
    [s.mode, ...s.hzPerTenthMmRemoved.map((v) => v.toFixed(2)), s.wholePlateHzPerTenthMmRemoved.toFixed(2)]
      .forEach((v) => cell(tr, String(v)));
    return tr;
  }));
  $('solver-result').hidden = false;
  document.dispatchEvent(new CustomEvent('nodewright:plate-solved', { detail: r }));
}

async function cancel() {
  const answer = await solveJob.cancel();
  if (answer && !answer.ok) $('solver-status').textContent = t('failed', answer.problem?.detail || answer.status);
}

async function template(kind) {
  const plate = state.result ? state.result.plate : state.api.getParameters();
  const answer = await postForBlob(`/api/v1/templates/plate-graduation.${kind}${kind === 'pdf' ? '?paper=a4' : ''}`, plate);
  if (!answer.ok) { refuse(answer.problem); return; }
  download(answer.blob, `plate-graduation.${kind}`);
}

export function mountSolver(api) {
  state.api = api;
  addTarget('1', '');
  addTarget('2', '');
  $('solver-add-target').addEventListener('click', () => addTarget());
  $('solver-target-rows').addEventListener('input', showNow);
  document.addEventListener('nodewright:plate-analyzed', showNow);
  $('solver-form').addEventListener('submit', start);
  $('solver-cancel').addEventListener('click', cancel);
  $('solver-apply').addEventListener('click', () => { if (state.result) { api.setParameters(state.result.plate); api.analyze(); } });
  $('template-svg').addEventListener('click', () => template('svg'));
  $('template-pdf').addEventListener('click', () => template('pdf'));
}
