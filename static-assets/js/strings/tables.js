// The string bench's figures in words and tables: the summary with its stress marking (the
// server's stressLevel), the modes table and the list of modes with a node near the pluck or a pickup.
import { $, t, io, fmtLen, signed } from './context.js';
import { fromNewton } from '../common/units.js';
import { nearestNote, midiName, spelledWithFlats } from '../common/notes.js';
import { cents } from './charts.js';

/** Notes are spelt with flats when the target was typed with one ("Eb4" stays Eb4, not D#4). */
const flats = () => spelledWithFlats($('targetHz').value);

export function drawSummary(request, response) {
  const note = { ...response.note, name: midiName(response.note.midi, flats()) };
  const ratio = response.stressFraction;
  const rows = [
    [t('tension'), `${fromNewton(response.tensionN, io.units.force).toFixed(io.units.force === 'N' ? 2 : 3)} ${io.units.force}`],
    [t('fundamental'), `${response.fundamentalHz.toFixed(3)} Hz`],
    [t('note'), `${note.name} ${signed(note.centsOff, 1)} ¢`],
    [t('linearDensity'), `${(response.linearDensityKgPerM * 1000).toFixed(4)} g/m`],
    [t('waveSpeed'), `${response.waveSpeedMps.toFixed(1)} m/s`],
    [t('inharmonicity'), response.inharmonicityB.toExponential(3)],
  ];
  if (response.stressPa != null) {
    rows.push([t('stress'), `${(response.stressPa / 1e6).toFixed(0)} MPa${ratio == null ? '' : ` · ${(100 * ratio).toFixed(0)} % ${t('ofStrength')}`}`]);
  }
  const dl = $('summary');
  dl.replaceChildren();
  for (const [k, v] of rows) {
    const dt = document.createElement('dt');
    dt.textContent = k;
    const dd = document.createElement('dd');
    dd.textContent = v;
    dl.append(dt, dd);
  }
  const danger = response.stressLevel === 'danger';
  const ul = $('warnings');
  ul.replaceChildren();
  for (const w of response.warnings || []) {
    const li = document.createElement('li');
    li.textContent = w;
    if (danger) li.classList.add('strong');
    ul.append(li);
  }
  $('summary-panel').classList.toggle('danger', danger);
  $('summary-panel').dataset.stressLevel = response.stressLevel ?? '';
}

export function drawTable(request, response) {
  const tbody = $('modes-table').querySelector('tbody');
  tbody.replaceChildren();
  for (const m of response.modes) {
    const note = nearestNote(m.frequencyHz, request.referenceA4Hz, { flats: flats() });
    const cells = [
      String(m.n), m.frequencyHz.toFixed(3), m.harmonicHz.toFixed(3), signed(cents(m), 2),
      `${note.name} ${signed(note.centsOff, 1)}`,
      m.nodesMm.map(fmtLen).join(', '),
      m.nodesFromBridgeMm.map(fmtLen).join(', '),
      m.antinodesMm.map(fmtLen).join(', '),
      m.antinodesFromBridgeMm.map(fmtLen).join(', '),
    ];
    const tr = document.createElement('tr');
    cells.forEach((v, i) => {
      const td = document.createElement('td');
      td.textContent = v;
      if (i >= 5) td.className = 'positions';
      tr.append(td);
    });
    tbody.append(tr);
  }
}

/** Which modes have a node close to the pluck and to each pickup (they barely sound there). */
export function drawNearNodes(request, response) {
  const ul = $('near-nodes');
  ul.replaceChildren();
  const places = [{ name: request.pluck.kind === 'strike' ? t('strike') : t('pluck'), x: request.pluck.positionMm, tol: 2 }];
  request.pickups.forEach((pu, i) => places.push({ name: `${t('pickup')} ${i + 1}`, x: pu.positionMm, tol: Math.max(2, pu.apertureMm / 2) }));
  for (const place of places) {
    const hits = response.modes.filter((m) => m.nodesMm.some((x) => x > 0 && x < request.lengthMm && Math.abs(x - place.x) <= place.tol)).map((m) => m.n);
    const li = document.createElement('li');
    const tol = `${fmtLen(place.tol)} ${io.units.length}`;
    li.textContent = hits.length ? `${place.name} ${t('nearNodes', tol)} ${hits.join(', ')}` : `${place.name} ${t('nearNone')}`;
    ul.append(li);
  }
}
