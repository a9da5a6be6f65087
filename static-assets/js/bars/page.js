// The bar bench page: form → POST /api/v1/bars/analyze through the shared request loop; side view,
// mode shapes, results table, cautions; the tuning solver panel (polled solve job).
import { getJson, postJson, sendJson, showFieldErrors, clearFieldErrors, escapeHtml } from '../common/api.js';
import { createRequestLoop } from '../common/request-loop.js';
import { pageText } from '../common/text.js';
import { drawChart, baseOptions, colour } from '../common/charts.js';
import { mountDesignBar } from '../common/design-bar.js';
import { PRESETS } from './presets.js';

const t = pageText('#bar-texts');
const form = document.getElementById('bar-form');
const field = (name) => form.querySelector(`[data-field="${name}"]`);
const NUMBER_FIELDS = ['lengthMm', 'widthMm', 'thicknessMm', 'diameterMm', 'boreMm'];

function number(text) {
  const v = String(text ?? '').trim().replace(',', '.');
  return v === '' ? null : Number(v);
}

function parseProfile(text) {
  const rows = String(text ?? '').split('\n').map((l) => l.trim()).filter((l) => l);
  if (!rows.length) return null;
  return rows.map((l) => {
    const [p, th] = l.split(/[:;\s]+/);
    return { positionMm: number(p), thicknessMm: number(th) };
  });
}

function usedFields(section) {
  return { rectangle: ['widthMm', 'thicknessMm'], round: ['diameterMm'], tube: ['diameterMm', 'boreMm'] }[section];
}

export function buildRequest() {
  const section = field('section').value;
  const r = { lengthMm: number(field('lengthMm').value), section };
  for (const f of usedFields(section)) r[f] = number(field(f).value);
  if (section === 'rectangle') {
    const profile = parseProfile(field('profile').value);
    if (profile) r.profile = profile;
  }
  r.material = field('material').value;
  r.ends = field('ends').value;
  r.theory = field('theory').value;
  r.modeCount = number(field('modeCount').value);
  const problems = [];
  for (const f of ['lengthMm', ...usedFields(section), 'modeCount']) {
    if (r[f] !== null && !Number.isFinite(r[f])) problems.push({ field: f, message: 'is not a number' });
  }
  return { request: r, problems };
}

function setParameters(p) {
  for (const f of NUMBER_FIELDS) field(f).value = p[f] ?? field(f).value;
  for (const f of ['section', 'material', 'ends', 'theory']) if (p[f]) field(f).value = p[f];
  if (p.modeCount) field('modeCount').value = p.modeCount;
  field('profile').value = (p.profile ?? []).map((q) => (Array.isArray(q) ? `${q[0]} : ${q[1]}` : `${q.positionMm} : ${q.thicknessMm}`)).join('\n');
  showSection();
}

function showSection() {
  const s = field('section').value;
  form.querySelectorAll('[data-for]').forEach((el) => { el.hidden = !el.dataset.for.split(' ').includes(s); });
}

function drawSideView(request, response) {
  const len = request.lengthMm;
  let top;
  if (request.section === 'rectangle') {
    const pts = request.profile ?? [{ positionMm: 0, thicknessMm: request.thicknessMm }, { positionMm: len, thicknessMm: request.thicknessMm }];
    top = pts.map((p) => ({ x: p.positionMm, y: p.thicknessMm }));
  } else {
    top = [{ x: 0, y: request.diameterMm }, { x: len, y: request.diameterMm }];
  }
  const holes = (response.cordHolesMm ?? []).map((x) => ({ x, y: 0 }));
  const opts = baseOptions({ xTitle: 'x (mm)', yTitle: 'mm' });
  opts.scales.y.min = 0;
  opts.scales.x.min = 0;
  opts.scales.x.max = len;
  drawChart(document.getElementById('profile-chart'), {
    type: 'line',
    data: { datasets: [
      { label: 'profile', data: top, borderColor: colour(0), backgroundColor: 'rgba(43,93,138,0.15)', fill: 'origin', pointRadius: 0 },
      { label: 'cord holes', data: holes, showLine: false, pointRadius: 6, pointStyle: 'circle', borderColor: colour(1), backgroundColor: colour(1) },
    ] },
    options: opts,
  });
}

function drawShapes(response) {
  const bending = response.modes.filter((m) => m.kind === 'bending');
  const datasets = [];
  bending.forEach((m, i) => {
    datasets.push({ label: `${m.n}: ${m.frequencyHz.toFixed(1)} Hz`, data: m.shapeX.map((x, j) => ({ x, y: m.shape[j] })),
      borderColor: colour(i), pointRadius: 0, borderWidth: 1.5 });
    datasets.push({ label: `nodes ${m.n}`, data: m.nodesMm.map((x) => ({ x, y: 0 })), showLine: false, pointRadius: 4,
      borderColor: colour(i), backgroundColor: colour(i) });
  });
  const opts = baseOptions({ xTitle: 'x (mm)', yTitle: 'shape' });
  opts.plugins.legend.labels.filter = (item) => !item.text.startsWith('nodes');
  drawChart(document.getElementById('mode-shapes-chart'), { type: 'line', data: { datasets }, options: opts });
}

function fillTable(response) {
  const body = document.querySelector('#bar-modes tbody');
  body.innerHTML = response.modes.map((m) => `<tr data-kind="${m.kind}"><td>${m.n}</td><td>${escapeHtml(t('kind.' + m.kind))}</td>
    <td>${m.frequencyHz.toFixed(2)}</td><td>${m.ratioToFirst.toFixed(3)}</td><td>${escapeHtml(m.note.name)}</td>
    <td>${m.note.centsOff.toFixed(1)}</td><td>${m.nodesMm.map((x) => x.toFixed(1)).join(', ')}</td></tr>`).join('');
  document.getElementById('cord-holes').textContent = (response.cordHolesMm ?? []).map((x) => x.toFixed(1)).join(', ');
  document.getElementById('shear-coefficient').textContent = response.shearCoefficient.toFixed(4);
  document.getElementById('bar-cautions').innerHTML = (response.cautions ?? []).map((c) => `<li>${escapeHtml(t('caution.' + c))}</li>`).join('');
}

const loop = createRequestLoop({
  build: buildRequest,
  send: (r) => postJson('/api/v1/bars/analyze', r),
  event: 'nodewright:bar-analyzed',
  view: {
    busy: () => {},
    answered(request, response) {
      clearFieldErrors(form);
      document.getElementById('form-problem').textContent = '';
      drawSideView(request, response);
      drawShapes(response);
      fillTable(response);
    },
    refused(problem) {
      clearFieldErrors(form);
      showFieldErrors(form, problem);
      const first = (problem.errors ?? [])[0];
      document.getElementById('form-problem').textContent = first ? `${first.field}: ${first.message}` : (problem.detail ?? '');
    },
    failed() { document.getElementById('form-problem').textContent = t('error'); },
  },
});

// --- tuning solver panel ---
let jobId = null;
let lastResult = null;

async function poll() {
  if (!jobId) return;
  const res = await getJson(`/api/v1/inverse/jobs/${jobId}`);
  if (!res.ok) return;
  const job = res.data;
  const status = document.getElementById('solver-status');
  if (job.status === 'queued' || job.status === 'running') {
    status.textContent = t('solver.progress', job.progress.evaluations, job.progress.maxEvaluations,
      job.progress.worstCents == null ? '–' : job.progress.worstCents.toFixed(2));
    status.dataset.state = job.status;
    setTimeout(poll, 300);
    return;
  }
  status.dataset.state = job.status;
  if (job.status === 'succeeded') {
    lastResult = job.result;
    status.textContent = t('solver.done', job.result.worstCents.toFixed(2), job.result.evaluations);
    document.getElementById('solver-apply').disabled = false;
    drawSensitivity(job.result.sensitivity);
  } else {
    status.textContent = t('solver.failed', job.error ?? job.status);
  }
  jobId = null;
}

function drawSensitivity(s) {
  const datasets = s.centsPerMm2.map((row, i) => ({ label: `mode ${i + 1}`,
    data: s.positionsMm.map((x, j) => ({ x, y: row[j] })), borderColor: colour(i), pointRadius: 0 }));
  drawChart(document.getElementById('sensitivity-chart'), { type: 'line', data: { datasets },
    options: baseOptions({ xTitle: 'x (mm)', yTitle: 'cents / mm²' }) });
}

async function startSolve() {
  const { request } = buildRequest();
  const note = document.getElementById('solver-note').value.trim();
  const body = { bar: { ...request, profile: undefined, thicknessMm: request.thicknessMm }, ratios: document.getElementById('solver-ratios').value.split(',').map(Number),
    limits: { minimumThicknessMm: number(document.getElementById('solver-min').value), flatEndMm: number(document.getElementById('solver-flat').value) } };
  if (/^[0-9.]+$/.test(note)) body.targetHz = Number(note); else body.note = note;
  const problem = document.getElementById('solver-problem');
  problem.textContent = '';
  const res = await postJson('/api/v1/inverse/bar-tuning', body);
  if (!res.ok) {
    const first = (res.problem?.errors ?? [])[0];
    problem.textContent = first ? `${first.field}: ${first.message}` : (res.problem?.detail ?? t('error'));
    return;
  }
  jobId = res.data.id;
  document.getElementById('solver-apply').disabled = true;
  poll();
}

document.getElementById('solver-start').addEventListener('click', startSolve);
document.getElementById('solver-cancel').addEventListener('click', async () => {
  if (jobId) await sendJson('DELETE', `/api/v1/inverse/jobs/${jobId}`);
});
document.getElementById('solver-apply').addEventListener('click', () => {
  if (!lastResult) return;
  setParameters(lastResult.bar);
  loop.run();
});

// --- start-up ---
async function start() {
  const mats = await getJson('/api/v1/bar-materials');
  if (mats.ok) {
    field('material').innerHTML = mats.data.map((m) => `<option value="${escapeHtml(m.id)}">${escapeHtml(m.name)}</option>`).join('');
  }
  document.getElementById('bar-preset').addEventListener('change', (e) => {
    const p = PRESETS[e.target.value];
    if (p) { setParameters(p); loop.run(); }
  });
  field('section').addEventListener('change', showSection);
  form.addEventListener('submit', (e) => { e.preventDefault(); loop.run(); });
  setParameters(PRESETS.marimba);
  mountDesignBar(document.getElementById('design-bar'), {
    kind: 'bar', getParameters: () => buildRequest().request, setParameters: (p) => { setParameters(p); loop.run(); },
    formRoot: form,
  });
  loop.run();
}

start();
