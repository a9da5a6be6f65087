// Gauge picker: the gauge per string for a target tension, from the catalogue or a stock list.
import { clearFieldErrors } from '../common/api.js';
import { fmt } from '../common/units.js';
import { $, t, num, hz as typedHz, postChecked } from './shared.js';

const gaugeForm = $('gauge-form');
$('gauge-strings').value = ['E4, 72, plain-steel', 'B3, 68, plain-steel', 'G3, 70, plain-steel',
  'D3, 76, nickel-plated-steel/nickel-plated-steel', 'A2, 78, nickel-plated-steel/nickel-plated-steel',
  'E2, 75, nickel-plated-steel/nickel-plated-steel'].join('\n');

function gaugeRequest() {
  const problems = [];
  const lengthMm = num($('gauge-scale').value);
  if (!Number.isFinite(lengthMm)) problems.push({ field: 'lengthMm', message: t('notNumber') });
  const strings = [];
  $('gauge-strings').value.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const parts = line.split(',').map((s) => s.trim());
    const tension = num(parts[1] ?? '');
    if (parts.length !== 3 || !Number.isFinite(tension) || !parts[2]) {
      problems.push({ field: 'strings', message: t('badLine', i + 1) });
      return;
    }
    const [material, wrapMaterial] = parts[2].split('/');
    const hz = typedHz(parts[0]);
    strings.push({
      ...(Number.isFinite(hz) ? { targetHz: hz } : { note: parts[0] }),
      targetTensionN: tension, material, ...(wrapMaterial ? { wrapMaterial } : {}),
    });
  });
  const request = { lengthMm: Number.isFinite(lengthMm) ? lengthMm : null, strings };
  const available = $('gauge-available').value.trim();
  if (available) {
    request.availableGaugesMm = available.split(/[,\s]+/).filter(Boolean).map(num);
    if (request.availableGaugesMm.some((v) => !Number.isFinite(v))) problems.push({ field: 'availableGaugesMm', message: t('notNumber') });
  }
  return { request, problems };
}

gaugeForm.addEventListener('submit', async (e) => {
  e.preventDefault();
  clearFieldErrors(gaugeForm);
  const data = await postChecked(gaugeForm, $('gauge-message'), '/api/v1/inverse/gauges', gaugeRequest());
  if (!data) return;
  const rows = $('gauge-rows');
  rows.replaceChildren();
  const warnings = $('gauge-warnings');
  warnings.replaceChildren();
  data.strings.forEach((s, i) => {
    const tr = document.createElement('tr');
    const gauge = s.wound ? `${fmt(s.outerDiameterMm, 3)} mm (${fmt(s.outerDiameterIn, 3)} in) wound`
      : `${fmt(s.diameterMm, 3)} mm (${fmt(s.diameterIn, 4)} in)`;
    [String(i + 1), fmt(s.targetTensionN, 1), gauge, fmt(s.tensionN, 1), fmt(s.offPct, 1), fmt(s.stressPct, 0)]
      .forEach((text) => { const td = document.createElement('td'); td.textContent = text; tr.appendChild(td); });
    rows.appendChild(tr);
    (s.warnings || []).forEach((w) => {
      const li = document.createElement('li');
      li.textContent = `${i + 1}: ${w}`;
      warnings.appendChild(li);
    });
  });
  const total = document.createElement('tr');
  total.innerHTML = '<td></td><td></td><td></td><td></td><td></td><td></td>';
  total.children[3].textContent = fmt(data.totalTensionN, 1);
  rows.appendChild(total);
  $('gauge-table').hidden = false;
});

