// The bar bench page: form → POST /api/v1/bars/analyze through the shared request loop; side view,
// mode shapes, partials against the target ratios, results table, cautions; the tuning solver panel
// (polled solve job), the undercut template (SVG / tiled PDF), listen (a synthesised tap) and
// measure-the-blank. Lengths are shown in mm or inches (js/common/units.js); requests speak mm.
import { getJson, postJson, postForm, postForBlob, download, problemLine, showFieldErrors, clearFieldErrors, escapeHtml }
  from '../common/api.js';
import { createJobFollower } from '../common/jobs.js';
import { createRequestLoop } from '../common/request-loop.js';
import { pageText } from '../common/text.js';
import { drawChart, baseOptions, colour, translucent, STATE } from '../common/charts.js';
import { mountDesignBar } from '../common/design-bar.js';
import { parseNumber, toMm, fromMm, problemInUserUnits } from '../common/units.js';
import { PRESETS } from './presets.js';
import { tapPartials, playTap, LOSS_FACTOR, MAX_SECONDS } from './listen.js';
import { parseRatios, ratioOffsets } from './targets.js';
import { mountMicrophone } from '../common/microphone.js';

const t = pageText('#bar-texts');
const form = document.getElementById('bar-form');
const $ = (id) => document.getElementById(id);
const field = (name) => form.querySelector(`[data-field="${name}"]`);
const LENGTH_FIELDS = ['lengthMm', 'widthMm', 'thicknessMm', 'diameterMm', 'boreMm'];
/** Inputs outside the form that also hold a length. */
const OTHER_LENGTHS = ['solver-min', 'solver-flat', 'strikeMm'];
const GPA = 1e9;

let unit = 'mm';
let materials = [];

// --- lengths in the unit shown -------------------------------------------------------------
// Each length input keeps the exact mm it was last written with (data-mm) so that switching units
// back and forth never rounds a value the maker did not touch.

const shownDigits = () => (unit === 'inch' ? 4 : 2);
const show = (mm) => String(Number(fromMm(mm, unit).toFixed(shownDigits())));

function writeLength(input, mm) {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) {
    input.value = '';
    delete input.dataset.mm;
    return;
  }
  input.value = show(mm);
  input.dataset.mm = String(mm);
  input.dataset.shown = input.value;
}

/** mm, null when empty, NaN when the text is no number. */
function readLength(input) {
  const text = input.value.trim();
  if (text === '') return null;
  if (input.dataset.mm !== undefined && input.dataset.shown === input.value) return Number(input.dataset.mm);
  const v = parseNumber(text);
  return Number.isFinite(v) ? toMm(v, unit) : NaN;
}

function writeProfile(points) {
  const area = field('profile');
  area.value = (points ?? []).map((p) => `${show(p.positionMm)} : ${show(p.thicknessMm)}`).join('\n');
  area.dataset.mm = JSON.stringify(points ?? []);
  area.dataset.shown = area.value;
}

function readProfile() {
  const area = field('profile');
  if (area.dataset.mm !== undefined && area.dataset.shown === area.value) {
    const p = JSON.parse(area.dataset.mm);
    return p.length ? p : null;
  }
  const rows = area.value.split('\n').map((l) => l.trim()).filter((l) => l);
  if (!rows.length) return null;
  return rows.map((l) => {
    const [p, th] = l.split(/\s*[:;\t]\s*|\s+/);
    const a = parseNumber(p);
    const b = parseNumber(th);
    return { positionMm: Number.isFinite(a) ? toMm(a, unit) : NaN, thicknessMm: Number.isFinite(b) ? toMm(b, unit) : NaN };
  });
}

function setUnit(next) {
  const lengths = [...LENGTH_FIELDS.map(field), ...OTHER_LENGTHS.map($)].map((input) => [input, readLength(input)]);
  const profile = readProfile();
  unit = next;
  for (const [input, mm] of lengths) {
    if (mm === null || Number.isNaN(mm)) continue;
    writeLength(input, mm);
  }
  if (profile && profile.every((p) => Number.isFinite(p.positionMm) && Number.isFinite(p.thicknessMm))) writeProfile(profile);
  document.querySelectorAll('.unit').forEach((el) => { el.textContent = unit === 'inch' ? 'in' : 'mm'; });
}

const xTitle = () => t('axis.x', unit === 'inch' ? 'in' : 'mm');
const L = (mm) => fromMm(mm, unit);

// --- the request ---------------------------------------------------------------------------

function usedFields(section) {
  return { rectangle: ['widthMm', 'thicknessMm'], round: ['diameterMm'], tube: ['diameterMm', 'boreMm'] }[section];
}

export function buildRequest() {
  const section = field('section').value;
  const problems = [];
  const notNumber = (f) => problems.push({ field: f, message: 'is not a number' });
  const r = { lengthMm: readLength(field('lengthMm')), section };
  for (const f of usedFields(section)) r[f] = readLength(field(f));
  if (section === 'rectangle') {
    const profile = readProfile();
    if (profile) {
      r.profile = profile;
      profile.forEach((p, i) => {
        if (Number.isNaN(p.positionMm)) notNumber(`profile[${i}].positionMm`);
        if (Number.isNaN(p.thicknessMm)) notNumber(`profile[${i}].thicknessMm`);
      });
      if (problems.length) problems.unshift({ field: 'profile', message: 'each line needs two numbers: position : thickness' });
    }
  }
  r.material = field('material').value;
  const density = field('densityKgPerM3').value.trim();
  if (density) r.densityKgPerM3 = parseNumber(density);
  const e = field('youngsModulusPa').value.trim();
  if (e) r.youngsModulusPa = parseNumber(e) * GPA;
  const g = field('shearModulusPa').value.trim();
  if (g) r.shearModulusPa = parseNumber(g) * GPA;
  r.ends = field('ends').value;
  r.theory = field('theory').value;
  r.modeCount = parseNumber(field('modeCount').value);
  for (const f of ['lengthMm', ...usedFields(section), 'modeCount', 'densityKgPerM3', 'youngsModulusPa', 'shearModulusPa']) {
    if (r[f] !== null && r[f] !== undefined && !Number.isFinite(r[f])) notNumber(f);
  }
  return { request: r, problems };
}

function setParameters(p) {
  for (const f of LENGTH_FIELDS) if (p[f] !== undefined && p[f] !== null) writeLength(field(f), p[f]);
  for (const f of ['section', 'material', 'ends', 'theory']) if (p[f]) field(f).value = p[f];
  if (p.modeCount) field('modeCount').value = p.modeCount;
  field('densityKgPerM3').value = p.densityKgPerM3 ?? '';
  field('youngsModulusPa').value = p.youngsModulusPa ? String(Number((p.youngsModulusPa / GPA).toPrecision(6))) : '';
  field('shearModulusPa').value = p.shearModulusPa ? String(Number((p.shearModulusPa / GPA).toPrecision(6))) : '';
  writeProfile((p.profile ?? []).map((q) => (Array.isArray(q) ? { positionMm: q[0], thicknessMm: q[1] } : q)));
  writeLength($('strikeMm'), null);
  showSection();
}

function showSection() {
  const s = field('section').value;
  form.querySelectorAll('[data-for]').forEach((el) => { el.hidden = !el.dataset.for.split(' ').includes(s); });
}

// --- drawing -------------------------------------------------------------------------------

function drawSideView(request, response) {
  const len = request.lengthMm;
  let top;
  if (request.section === 'rectangle') {
    const pts = request.profile ?? [{ positionMm: 0, thicknessMm: request.thicknessMm }, { positionMm: len, thicknessMm: request.thicknessMm }];
    top = pts.map((p) => ({ x: L(p.positionMm), y: L(p.thicknessMm) }));
  } else {
    top = [{ x: 0, y: L(request.diameterMm) }, { x: L(len), y: L(request.diameterMm) }];
  }
  const holes = (response.cordHolesMm ?? []).map((x) => ({ x: L(x), y: 0 }));
  const opts = baseOptions({ xTitle: xTitle(), yTitle: unit === 'inch' ? 'in' : 'mm' });
  opts.scales.y.min = 0;
  opts.scales.x.min = 0;
  opts.scales.x.max = L(len);
  drawChart($('bar-side-chart'), {
    type: 'line',
    data: { datasets: [
      { label: 'profile', data: top, borderColor: colour(0), backgroundColor: translucent(colour(0), 0.15), fill: 'origin', pointRadius: 0 },
      { label: 'cord holes', data: holes, showLine: false, pointRadius: 6, pointStyle: 'circle', borderColor: colour(1), backgroundColor: colour(1) },
    ] },
    options: opts,
  });
}

function drawShapes(response) {
  const bending = response.modes.filter((m) => m.kind === 'bending');
  const datasets = [];
  bending.forEach((m, i) => {
    datasets.push({ label: `${m.n}: ${m.frequencyHz.toFixed(1)} Hz`, data: m.shapeX.map((x, j) => ({ x: L(x), y: m.shape[j] })),
      borderColor: colour(i), pointRadius: 0, borderWidth: 1.5 });
    datasets.push({ label: `nodes ${m.n}`, data: m.nodesMm.map((x) => ({ x: L(x), y: 0 })), showLine: false, pointRadius: 4,
      borderColor: colour(i), backgroundColor: colour(i) });
  });
  const opts = baseOptions({ xTitle: xTitle(), yTitle: 'shape' });
  opts.plugins.legend.labels.filter = (item) => !item.text.startsWith('nodes');
  drawChart($('bar-shapes-chart'), { type: 'line', data: { datasets }, options: opts });
}

function drawTargets(response) {
  const status = $('targets-status');
  const ratios = parseRatios($('target-ratios').value);
  if (!ratios) {
    status.textContent = t('targets.badRatios');
    return;
  }
  status.textContent = '';
  const offsets = ratioOffsets(response.modes, ratios);
  const opts = baseOptions({ xTitle: '', yTitle: t('targets.axis'), legend: false });
  opts.scales.x = { type: 'category' };
  drawChart($('bar-ratios-chart'), {
    type: 'bar',
    data: {
      labels: offsets.map((o) => `${o.n}: ${o.ratio.toFixed(3)} / ${o.target}`),
      datasets: [{ label: 'cents', data: offsets.map((o) => o.cents),
        backgroundColor: offsets.map((o) => (Math.abs(o.cents) <= 5 ? STATE.ok : STATE.warn)) }],
    },
    options: opts,
  }, { replace: true });
}

function fillTable(response) {
  const digits = unit === 'inch' ? 3 : 1;
  const body = document.querySelector('#bar-modes tbody');
  body.innerHTML = response.modes.map((m) => `<tr data-kind="${m.kind}"><td>${m.n}</td><td>${escapeHtml(t('kind.' + m.kind))}</td>
    <td>${m.frequencyHz.toFixed(2)}</td><td>${m.ratioToFirst.toFixed(3)}</td><td>${escapeHtml(m.note.name)}</td>
    <td>${m.note.centsOff.toFixed(1)}</td><td>${m.nodesMm.map((x) => L(x).toFixed(digits)).join(', ')}</td></tr>`).join('');
  $('cord-holes').textContent = (response.cordHolesMm ?? []).map((x) => L(x).toFixed(digits)).join(', ');
  $('shear-coefficient').textContent = response.shearCoefficient.toFixed(4);
  $('bar-cautions').innerHTML = (response.cautions ?? []).map((c) => `<li>${escapeHtml(t('caution.' + c))}</li>`).join('');
}

let lastRequest = null;
let lastResponse = null;

const loop = createRequestLoop({
  build: buildRequest,
  send: (r) => postJson('/api/v1/bars/analyze', r),
  event: 'nodewright:bar-analyzed',
  view: {
    busy: () => {},
    answered(request, response) {
      lastRequest = request;
      lastResponse = response;
      clearFieldErrors(form);
      $('form-problem').textContent = '';
      drawSideView(request, response);
      drawShapes(response);
      drawTargets(response);
      fillTable(response);
    },
    refused(problem) {
      const shown = problemInUserUnits(problem, { length: unit });
      clearFieldErrors(form);
      showFieldErrors(form, shown);
      $('form-problem').textContent = problemLine(shown);
    },
    failed() { $('form-problem').textContent = t('error'); },
  },
});

// --- tuning solver panel -------------------------------------------------------------------
let lastResult = null;

const solveJob = createJobFollower({
  interval: 300,
  progress(job) {
    const status = $('solver-status');
    status.textContent = t('solver.progress', job.progress.evaluations, job.progress.maxEvaluations,
      job.progress.worstCents == null ? '–' : job.progress.worstCents.toFixed(2));
    status.dataset.state = job.status;
  },
  finished(job) {
    const status = $('solver-status');
    status.dataset.state = job.status;
    if (job.status === 'succeeded') {
      lastResult = job.result;
      status.textContent = t('solver.done', job.result.worstCents.toFixed(2), job.result.evaluations);
      $('solver-apply').disabled = false;
      drawSensitivity(job.result.sensitivity);
    } else {
      status.textContent = t('solver.failed', job.error ?? job.status);
    }
  },
  failed(answer) { $('solver-status').textContent = t('solver.failed', problemLine(answer.problem, String(answer.status))); },
});

function drawSensitivity(s) {
  const datasets = s.centsPerMm2.map((row, i) => ({ label: `mode ${i + 1}`,
    data: s.positionsMm.map((x, j) => ({ x: L(x), y: row[j] })), borderColor: colour(i), pointRadius: 0 }));
  drawChart($('bar-sensitivity-chart'), { type: 'line', data: { datasets },
    options: baseOptions({ xTitle: xTitle(), yTitle: 'cents / mm²' }) });
}

async function startSolve() {
  const { request } = buildRequest();
  const note = $('solver-note').value.trim();
  const body = { bar: { ...request, profile: undefined, thicknessMm: request.thicknessMm }, ratios: $('solver-ratios').value.split(',').map(Number),
    limits: { minimumThicknessMm: readLength($('solver-min')), flatEndMm: readLength($('solver-flat')) } };
  if (body.bar.thicknessMm == null && request.profile) body.bar.thicknessMm = Math.max(...request.profile.map((p) => p.thicknessMm));
  const hz = parseNumber(note);
  if (Number.isFinite(hz)) body.targetHz = hz; else body.note = note;
  const problem = $('solver-problem');
  problem.textContent = '';
  const res = await postJson('/api/v1/inverse/bar-tuning', body);
  if (!res.ok) {
    problem.textContent = problemLine(problemInUserUnits(res.problem, { length: unit }), t('error'));
    return;
  }
  $('solver-apply').disabled = true;
  solveJob.follow(res.data.id);
}

// --- undercut template ---------------------------------------------------------------------
async function downloadTemplate(kind) {
  const status = $('template-status');
  const { request, problems } = buildRequest();
  if (problems.length) {
    status.textContent = t('template.failed', `${problems[0].field}: ${problems[0].message}`);
    return;
  }
  const hole = parseNumber($('template-hole').value);
  const query = new URLSearchParams();
  if (Number.isFinite(hole)) query.set('cordHoleMm', String(hole));
  if (kind === 'pdf') query.set('paper', $('template-paper').value);
  const answer = await postForBlob(`/api/v1/templates/bar-undercut.${kind}?${query}`, request);
  delete status.dataset.bytes;
  if (!answer.ok) {
    status.textContent = t('template.failed', problemLine(answer.problem));
    status.dataset.state = 'failed';
    return;
  }
  const { blob } = answer;
  if (kind === 'svg') window.nodewrightBars.lastTemplate = await blob.text();
  const file = `bar-undercut.${kind}`;
  download(blob, file);
  status.textContent = t('template.saved', file, (blob.size / 1024).toFixed(1));
  status.dataset.state = 'saved';
  status.dataset.kind = kind;
  status.dataset.bytes = String(blob.size);
}

// --- listen --------------------------------------------------------------------------------
async function listen() {
  const status = $('listen-status');
  if (!lastResponse || !lastRequest) return;
  let strike = readLength($('strikeMm'));
  if (strike === null || Number.isNaN(strike)) {
    strike = (lastRequest.ends === 'free-free' ? 0.45 : 0.9) * lastRequest.lengthMm;
    writeLength($('strikeMm'), strike);
  }
  const material = materials.find((m) => m.id === lastRequest.material);
  const lossFactor = material && !material.wood ? LOSS_FACTOR.metal : LOSS_FACTOR.wood;
  const partials = tapPartials(lastResponse.modes, strike, { lossFactor });
  window.nodewrightBars.lastTap = partials;
  if (!partials.length) {
    status.textContent = t('listen.silent');
    status.dataset.state = 'silent';
    return;
  }
  try {
    const seconds = await playTap(partials, MAX_SECONDS);
    status.textContent = t('listen.playing', partials.filter((p) => p.amplitude > 0).length, seconds.toFixed(1));
    status.dataset.state = 'playing';
  } catch (e) {
    status.textContent = t('listen.failed', e.message);
    status.dataset.state = 'failed';
  }
}

// --- measure the blank ---------------------------------------------------------------------
let lastFit = null;

/** "1: 175.2" or "175.2" a line (then n is the line's place) → [{n, frequencyHz}]. */
export function parseHeard(text) {
  const rows = String(text ?? '').split('\n').map((l) => l.trim()).filter((l) => l);
  return rows.map((l, i) => {
    const parts = l.split(/\s*[:;=\t]\s*|\s+/).filter((s) => s);
    if (parts.length >= 2) return { n: parseNumber(parts[0]), frequencyHz: parseNumber(parts[1]) };
    return { n: i + 1, frequencyHz: parseNumber(parts[0]) };
  });
}

function showFit(res) {
  const problem = $('blank-problem');
  const status = $('blank-status');
  if (!res.ok) {
    problem.textContent = problemLine(problemInUserUnits(res.problem, { length: unit }), t('error'));
    status.dataset.state = 'refused';
    return;
  }
  problem.textContent = '';
  const f = res.data;
  lastFit = f;
  window.nodewrightBars.lastFit = f;
  status.textContent = `${t('blank.result', (f.youngsModulusPa / GPA).toFixed(3), (f.shearModulusPa / GPA).toFixed(3),
    f.rmsCents.toFixed(2), f.matches.length)} ${f.shearFitted ? t('blank.shear') : ''}`.trim();
  status.dataset.state = 'fitted';
  document.querySelector('#blank-matches tbody').innerHTML = f.matches.map((m) => `<tr><td>${m.n}</td>
    <td>${m.measuredHz.toFixed(2)}</td><td>${m.modelHz.toFixed(2)}</td><td>${m.centsOff.toFixed(2)}</td></tr>`).join('');
  $('blank-cautions').innerHTML = (f.cautions ?? []).map((c) => `<li>${escapeHtml(t('caution.' + c))}</li>`).join('');
  $('blank-apply').disabled = false;
}

async function fitTyped() {
  const modes = parseHeard($('blank-modes').value);
  if (!modes.length) {
    $('blank-problem').textContent = t('blank.noModes');
    return;
  }
  const { request } = buildRequest();
  showFit(await postJson('/api/v1/bars/measure-blank', { bar: request, modes, fitShear: $('blank-shear').checked }));
}

async function fitRecording() {
  const file = $('blank-file').files[0];
  if (!file) {
    $('blank-problem').textContent = t('blank.noFile');
    return;
  }
  await fitFile(file);
}

/** The blank's recording (uploaded, or heard through the microphone) fitted with the bar as it stands. */
async function fitFile(file) {
  const { request } = buildRequest();
  const data = new FormData();
  data.append('file', file);
  data.append('bar', new Blob([JSON.stringify(request)], { type: 'application/json' }));
  const query = new URLSearchParams({ fitShear: String($('blank-shear').checked) });
  const res = await postForm(`/api/v1/bars/measure-blank/recording?${query}`, data);
  showFit(res);
  return res.ok;
}

function applyFit() {
  if (!lastFit) return;
  field('youngsModulusPa').value = String(Number((lastFit.youngsModulusPa / GPA).toPrecision(6)));
  if (lastFit.shearFitted) field('shearModulusPa').value = String(Number((lastFit.shearModulusPa / GPA).toPrecision(6)));
  loop.run();
}

// --- start-up ------------------------------------------------------------------------------
window.nodewrightBars = { last: () => lastResponse, request: () => lastRequest, unit: () => unit, loop };

async function start() {
  const mats = await getJson('/api/v1/bar-materials');
  if (mats.ok) {
    materials = mats.data;
    field('material').innerHTML = mats.data.map((m) => `<option value="${escapeHtml(m.id)}">${escapeHtml(m.name)}</option>`).join('');
  }
  $('bar-preset').addEventListener('change', (e) => {
    const p = PRESETS[e.target.value];
    if (p) { setParameters(p); loop.run(); }
  });
  $('bar-units').addEventListener('change', (e) => { setUnit(e.target.value); loop.run(); });
  field('section').addEventListener('change', showSection);
  form.addEventListener('submit', (e) => { e.preventDefault(); loop.run(); });
  $('target-ratios').addEventListener('input', () => { if (lastResponse) drawTargets(lastResponse); });
  $('solver-ratios').addEventListener('change', (e) => {
    $('target-ratios').value = `1:${e.target.value.split(',').join(':')}`;
    if (lastResponse) drawTargets(lastResponse);
  });
  $('solver-start').addEventListener('click', startSolve);
  $('solver-cancel').addEventListener('click', () => solveJob.cancel());
  $('solver-apply').addEventListener('click', () => {
    if (!lastResult) return;
    setParameters(lastResult.bar);
    loop.run();
  });
  $('template-svg').addEventListener('click', () => downloadTemplate('svg'));
  $('template-pdf').addEventListener('click', () => downloadTemplate('pdf'));
  $('bar-listen').addEventListener('click', listen);
  $('blank-fit').addEventListener('click', fitTyped);
  $('blank-fit-recording').addEventListener('click', fitRecording);
  $('blank-apply').addEventListener('click', applyFit);
  mountMicrophone(document.querySelector('#bar-blank [data-mic]'), { onRecording: fitFile });
  writeLength($('solver-min'), 4);
  writeLength($('solver-flat'), 60);
  setParameters(PRESETS.marimba);
  mountDesignBar($('design-bar'), {
    kind: 'bar', getParameters: () => buildRequest().request, setParameters: (p) => { setParameters(p); loop.run(); },
    formRoot: form,
  });
  loop.run();
}

start();
