// The string bench's form: the analyze request it describes (mm, N, Hz, SI) with what the page can
// already refuse, and filling it from a saved or handed-over request.
import { form, $, t, io } from './context.js';
import { readNumber, readPitch, localChecks } from '../common/string-form.js';
import { nearestNote, a4Or440 } from '../common/notes.js';
import { addPickupRow, pickupRows, clearPickups } from './pickups.js';

const { readLength, readForce, writeLength, writeForce } = io;

export const drive = () => form.querySelector('input[name="drive"]:checked').value;
export const wound = () => $('construction').value === 'wound';

/** A measured-value override in SI: the exact value handed over by another panel, or typed × factor. */
function readOverride(input, factor) {
  const v = readNumber(input);
  if (typeof v !== 'number' || Number.isNaN(v)) return v;
  if (input.dataset.shown === input.value && input.dataset.canonical !== undefined) return Number(input.dataset.canonical);
  return v * factor;
}

/**
 * The analyze request for what the form shows now, and the local problems: text that is no number
 * (or no pitch) is named on its own field in the page's words, and an empty target pitch is named
 * on the pitch field, before anything reaches the server.
 */
export function buildRequest() {
  const c = localChecks();
  const number = (input, value) => c.check(input, value, t('notNumber'));
  const request = { lengthMm: number($('lengthMm'), readLength($('lengthMm'))) };
  if (drive() === 'pitch') {
    request.targetHz = c.check($('targetHz'), readPitch($('targetHz'), $('referenceA4Hz')), t('notANote'));
    if (request.targetHz === null && $('targetHz').value.trim() === '') c.add('targetHz', t('pitchNeeded'));
  } else {
    request.tensionN = number($('tensionN'), readForce($('tensionN')));
  }
  request.material = $('material').value;
  request.diameterMm = number($('diameterMm'), readLength($('diameterMm')));
  if (wound()) {
    request.wrapMaterial = $('wrapMaterial').value;
    request.wrapDiameterMm = number($('wrapDiameterMm'), readLength($('wrapDiameterMm')));
  }
  const mu = number($('linearDensity'), readOverride($('linearDensity'), 1e-3));        // g/m → kg/m
  if (mu !== null) request.linearDensityKgPerM = mu;
  const modulus = number($('youngsModulus'), readOverride($('youngsModulus'), 1e9));    // GPa → Pa
  if (modulus !== null) request.youngsModulusPa = modulus;
  request.endCondition = $('endCondition').value;
  request.stiffness = $('stiffness').checked;
  request.modeCount = number($('modeCount'), readNumber($('modeCount')));
  request.referenceA4Hz = number($('referenceA4Hz'), readNumber($('referenceA4Hz')));
  request.pluck = { positionMm: number($('pluckPosition'), readLength($('pluckPosition'))), kind: $('pluckKind').value };
  request.pickups = pickupRows().map((row) => ({
    positionMm: number(row.querySelector('.pickup-position'), readLength(row.querySelector('.pickup-position'))),
    apertureMm: number(row.querySelector('.pickup-aperture'), readLength(row.querySelector('.pickup-aperture'))),
  }));
  return { request, problems: c.problems };
}

export const a4 = () => a4Or440(readNumber($('referenceA4Hz')));

/** A target frequency as the user would write it: its note name when it is one exactly, else Hz. */
function pitchText(hz) {
  if (typeof hz !== 'number') return String(hz);
  const note = nearestNote(hz, a4());
  return Math.abs(note.centsOff) < 1e-6 ? note.name : String(hz);
}

function setIfPresent(p, key, apply) {
  if (Object.prototype.hasOwnProperty.call(p, key) && p[key] !== undefined) apply(p[key]);
}

export function showConstruction() {
  form.classList.toggle('is-wound', wound());
  form.classList.toggle('drive-tension', drive() === 'tension');
}

/** Fills the form from a request body (all of it, or only the keys a partial one carries). */
export function fillForm(p, partial) {
  // Numbers go in through the unit converters; anything else is shown as it came, for the server to judge.
  const put = (input, v, write) => {
    if (typeof v === 'number') { write(input, v); return; }
    input.value = v == null ? '' : String(v);
    delete input.dataset.canonical;
  };
  setIfPresent(p, 'referenceA4Hz', (v) => { $('referenceA4Hz').value = v === null ? '440' : String(v); });
  setIfPresent(p, 'lengthMm', (v) => put($('lengthMm'), v, writeLength));
  setIfPresent(p, 'targetHz', (v) => {
    if (v === null) return;
    $('targetHz').value = pitchText(v);
    form.querySelector('input[name="drive"][value="pitch"]').checked = true;
  });
  setIfPresent(p, 'tensionN', (v) => {
    if (v === null) return;
    put($('tensionN'), v, writeForce);
    if (!partial || p.targetHz == null) form.querySelector('input[name="drive"][value="tension"]').checked = true;
  });
  setIfPresent(p, 'material', (v) => { if (v !== null) $('material').value = v; });
  setIfPresent(p, 'diameterMm', (v) => put($('diameterMm'), v, writeLength));
  if (!partial || 'wrapMaterial' in p || 'wrapDiameterMm' in p) {
    const isWound = p.wrapMaterial != null || p.wrapDiameterMm != null;
    $('construction').value = isWound ? 'wound' : 'plain';
    if (p.wrapMaterial != null) $('wrapMaterial').value = p.wrapMaterial;
    if (p.wrapDiameterMm != null) put($('wrapDiameterMm'), p.wrapDiameterMm, writeLength);
  }
  const overrides = (key, input, factor) => {
    if (partial && !(key in p)) return;
    const v = p[key];
    input.value = v == null ? '' : String(Number((v * factor).toPrecision(6)));
    input.dataset.canonical = v == null ? '' : String(v);
    input.dataset.shown = input.value;
    if (v == null) delete input.dataset.canonical;
    if (v != null) input.closest('details').open = true;
  };
  overrides('linearDensityKgPerM', $('linearDensity'), 1000);   // kg/m → g/m
  overrides('youngsModulusPa', $('youngsModulus'), 1e-9);       // Pa → GPa
  setIfPresent(p, 'endCondition', (v) => { if (v !== null) $('endCondition').value = v; });
  setIfPresent(p, 'stiffness', (v) => { $('stiffness').checked = v === true; });   // the server's default is off
  setIfPresent(p, 'modeCount', (v) => { if (v !== null) $('modeCount').value = String(v); });
  setIfPresent(p, 'pluck', (v) => {
    if (!v) return;
    if (v.kind) $('pluckKind').value = v.kind;
    if (v.positionMm != null) put($('pluckPosition'), v.positionMm, writeLength);
  });
  setIfPresent(p, 'pickups', (list) => {
    clearPickups();
    (list || []).filter((pu) => pu && typeof pu.positionMm === 'number')
      .forEach((pu) => addPickupRow(pu.positionMm, typeof pu.apertureMm === 'number' ? pu.apertureMm : 0));
  });
  showConstruction();
}
