// Saddle (and nut) compensation for a set of strings.
import { clearFieldErrors } from '../common/api.js';
import { fmt } from '../common/units.js';
import { $, t, num, hz as typedHz, postChecked } from './shared.js';

const compForm = $('comp-form');
$('comp-strings').value = ['E4, nylon, 0.71', 'B3, nylon, 0.82', 'G3, nylon, 1.03', 'D3, nylon, 0.38, copper, 0.16',
  'A2, nylon, 0.38, copper, 0.22', 'E2, nylon, 0.40, copper, 0.29'].join('\n');

compForm.addEventListener('submit', async (e) => {
  e.preventDefault();
  clearFieldErrors(compForm);
  const problems = [];
  const field = (id, name) => {
    const v = num($(id).value);
    if (!Number.isFinite(v)) problems.push({ field: name, message: t('notNumber') });
    return Number.isFinite(v) ? v : null;
  };
  const request = {
    lengthMm: field('comp-scale', 'lengthMm'), actionAt12thMm: field('comp-action', 'actionAt12thMm'),
    nutHeightMm: field('comp-nut', 'nutHeightMm'), frets: field('comp-frets', 'frets'),
    compensateNut: $('comp-both').checked, strings: [],
  };
  $('comp-strings').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const p = line.split(',').map((x) => x.trim());
    const d = num(p[2] ?? '');
    const wd = num(p[4] ?? '');
    if ((p.length !== 3 && p.length !== 5) || !Number.isFinite(d) || (p.length === 5 && !Number.isFinite(wd))) {
      problems.push({ field: 'strings', message: t('badLine', i + 1) });
      return;
    }
    const hz = typedHz(p[0]);
    request.strings.push({
      ...(Number.isFinite(hz) ? { targetHz: hz } : { note: p[0] }), material: p[1], diameterMm: d,
      ...(p.length === 5 ? { wrapMaterial: p[3], wrapDiameterMm: wd } : {}),
    });
  });
  const data = await postChecked(compForm, $('comp-message'), '/api/v1/templates/compensation', { request, problems });
  if (!data) return;
  const rows = $('comp-rows');
  rows.replaceChildren();
  data.strings.forEach((s, i) => {
    const tr = document.createElement('tr');
    tr.dataset.setback = s.saddleSetbackMm;
    [String(i + 1), fmt(s.tensionN, 1), fmt(s.saddleSetbackMm, 2), fmt(s.nutSetbackMm, 2),
      s.uncompensatedCentsAt12th === null ? '' : fmt(s.uncompensatedCentsAt12th, 1), fmt(s.worstCompensatedCents, 2)]
      .forEach((text) => { const td = document.createElement('td'); td.textContent = text; tr.appendChild(td); });
    rows.appendChild(tr);
  });
  $('comp-table').hidden = false;
  $('comp-model').textContent = data.model;
  const list = $('comp-assumptions');
  list.replaceChildren();
  data.assumptions.forEach((a) => { const li = document.createElement('li'); li.textContent = a; list.appendChild(li); });
});

