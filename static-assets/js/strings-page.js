// String bench: one string's modes, nodes, partials and pluck × pickup spectra. The modules under
// strings/ hold the form (form.js), the pickups and sliders (pickups.js), the charts (charts.js) and
// the tables (tables.js); this file wires them to the page kernel's request loop.
// The form speaks the user's units; every request to the API is in mm and N (units.js converts).
import { postJson } from './common/api.js';
import { toMm, problemInUserUnits } from './common/units.js';
import { enableLineDrag, enableLineKeys } from './common/charts.js';
import { createRequestLoop, formView } from './common/request-loop.js';
import { loadPanels, showPanelFailure } from './common/panels.js';
import { loadMaterials, defaultWrap } from './common/string-form.js';
import { APPLY_STRING_PARAMETERS, handedOver } from './common/handover.js';
import { form, $, t, io } from './strings/context.js';
import { buildRequest, fillForm, showConstruction, wound } from './strings/form.js';
import { addPickupRow, addPickupWhereRoom, buildSliders, syncSliders, moveMarker, onPickupsChanged,
  markerName, markerRange, markerDigits, nudgeMarker } from './strings/pickups.js';
import { drawModeShapes, drawNodeMap, drawPartials, drawSpectrum, probeNodes } from './strings/charts.js';
import { drawSummary, drawTable, drawNearNodes } from './strings/tables.js';

const DEFAULT_WRAP_MM = 0.25;       // a starting wrap wire when a plain string is switched to wound

function render(request, response) {
  drawSummary(request, response);
  drawNodeMap(request, response);
  drawModeShapes(request, response);
  drawPartials(response);
  drawSpectrum(response);
  drawTable(request, response);
  drawNearNodes(request, response);
  syncSliders();
}

/** The request without what moves no mode shape (pluck, pickups, their combination). */
const shapeKey = (r) => JSON.stringify({ ...r, pluck: undefined, pickups: undefined, pickupCombination: undefined });

/**
 * Sends the analysis. A move of the pluck or a pickup changes no mode shape, so when only those
 * differ from the answer shown, the lighter answer (?shapes=none, no shape samples) is asked for
 * and the shapes already shown are kept in it.
 */
function send(request) {
  const last = loop.last;
  const reuse = last && shapeKey(last.request) === shapeKey(request)
    && last.response.modes.every((m) => Array.isArray(m.shape));
  if (!reuse) return postJson('/api/v1/strings/analyze', request);
  return postJson('/api/v1/strings/analyze?shapes=none', request).then((answer) => {
    if (answer.ok && answer.data.modes.length === last.response.modes.length) {
      answer.data.modes.forEach((m, i) => { m.shapeX = last.response.modes[i].shapeX; m.shape = last.response.modes[i].shape; });
    }
    return answer;
  });
}

const loop = createRequestLoop({
  build: buildRequest,
  send,
  event: 'nodewright:string-analyzed',
  view: formView({
    form, message: $('form-problem'), busy: $('busy'), render,
    stale: () => [...document.querySelectorAll('.bench-results, #modes-panel')],
    text: { fix: t('fixFields'), down: t('serverDown') },
    prepare: (problem) => problemInUserUnits(problem, io.units),
  }),
});
const analyze = () => loop.run();

function switchUnit(kind, unit) {
  io.switchUnit(form, kind, unit);
  syncSliders();
  if (loop.last) render(loop.last.request, loop.last.response);
}

/** Switching from pitch to tension starts from the tension the pitch needed (not an old typed one). */
function driveChanged(to) {
  const last = loop.last;
  if (to === 'tension' && last && typeof last.request.targetHz === 'number') io.writeForce($('tensionN'), last.response.tensionN);
}

async function loadCatalogue() {
  const materials = await loadMaterials([$('material'), $('wrapMaterial')]);
  if (!materials) {
    $('form-problem').textContent = t('materialsFailed');
    return;
  }
  $('wrapMaterial').value = defaultWrap(materials);
  if (materials.some((m) => m.id === 'plain-steel')) $('material').value = 'plain-steel';
}

function wire() {
  onPickupsChanged(analyze);
  form.addEventListener('submit', (e) => { e.preventDefault(); analyze(); });
  form.addEventListener('change', (e) => {
    const el = e.target;
    if (el.id === 'length-unit') { switchUnit('length', el.value); return; }
    if (el.id === 'force-unit') { switchUnit('force', el.value); return; }
    if (el.type === 'range') return;
    if (el.name === 'drive') driveChanged(el.value);
    showConstruction();
    if (el.id === 'pluckKind') buildSliders();
    if (el.id === 'construction' && wound() && $('wrapDiameterMm').value.trim() === '') io.writeLength($('wrapDiameterMm'), DEFAULT_WRAP_MM);
    if (el.id === 'lengthMm') syncSliders();
    analyze();
  });
  $('add-pickup').addEventListener('click', addPickupWhereRoom);
  for (const canvasId of ['node-map-chart', 'mode-shapes-chart']) {
    enableLineDrag($(canvasId), (id, x) => moveMarker(id, toMm(x, io.units.length), true));
    enableLineKeys($(canvasId), { label: markerName, range: markerRange, unit: () => io.units.length, digits: markerDigits, onMove: nudgeMarker });
  }
  $('node-map-chart').addEventListener('pointermove', (e) => probeNodes(e, loop.last));
  document.addEventListener('nodewright:apply-string-parameters', (e) => {
    if (!e.detail || typeof e.detail !== 'object') return;
    fillForm(e.detail, true);
    analyze();
  });
}

function mountNeighbours() {
  const getParameters = () => buildRequest().request;
  const setParameters = (p) => { fillForm(p || {}, false); return analyze(); };
  import('/js/common/design-bar.js')
    .then((m) => m.mountDesignBar($('design-bar'), {
      kind: 'string', getParameters, setParameters,
      getView: () => ({ units: { ...io.units } }),
      setView: (view) => { io.showUnits(form, view.units); syncSliders(); if (loop.last) render(loop.last.request, loop.last.response); },
    }))
    .catch((error) => showPanelFailure('design-bar', t('designBarName'), error));
  loadPanels([
    { url: '/js/listen-strings.js', place: 'listen-panel', name: t('listenName') },
    { url: '/js/measure-strings.js', place: 'measure-panel', name: t('measureName') },
  ], loop);
}

/** Values handed over by the Measure page's "Open the string bench with the fit" (unsaved). */
function takeHandOver() {
  try {
    const handed = handedOver(APPLY_STRING_PARAMETERS, { take: true });
    if (handed) fillForm(handed, true);
  } catch (error) {
    $('form-problem').textContent = t('handOverFailed', error.message);
  }
}

async function start() {
  // Harrowgate Lane Workshop's parlour guitar, first string: a bridge pickup and a neck pickup.
  addPickupRow(610, 10);
  addPickupRow(490, 10);
  io.showLabels();
  io.remember(form, 'strings');
  showConstruction();
  wire();
  await loadCatalogue();
  takeHandOver();
  mountNeighbours();
  await analyze();
}

start();
