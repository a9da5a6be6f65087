// The bore editor: rows of segments and tone holes kept in a small model and drawn as table rows.
// Lengths are held in millimetres (what the API speaks) and shown in the chosen unit; what the
// user typed is kept as typed, even when it is not a number, so a bad row is never lost.
import { fromMm, toMm, parseNumber } from '../common/units.js';
import { t } from './text.js';

export const SEGMENT_FIELDS = ['lengthMm', 'inputDiameterMm', 'outputDiameterMm'];
export const HOLE_FIELDS = ['positionMm', 'diameterMm', 'chimneyMm'];

/** A typed number: the one rule of every page (common/units.js; a decimal comma is a point). */
export { parseNumber };

/** A length for display in a unit, without float noise. */
export function showLength(mm, unit) {
  const v = fromMm(mm, unit);
  const digits = unit === 'inch' ? 5 : 3;
  return String(Number(v.toFixed(digits)));
}

/** One editable length: the value in mm (NaN when unreadable) and the text shown. */
function cell(mm, unit) {
  return { mm, text: Number.isFinite(mm) ? showLength(mm, unit) : '' };
}

export class BoreEditor {
  constructor({ segmentBody, holeBody, onChange, onStructure }) {
    this.segmentBody = segmentBody;
    this.holeBody = holeBody;
    this.onChange = onChange;
    this.onStructure = onStructure;
    this.unit = 'mm';
    this.segments = [];
    this.holes = [];
    segmentBody.addEventListener('input', (e) => this.#typed(e, this.segments));
    holeBody.addEventListener('input', (e) => this.#typed(e, this.holes));
    holeBody.addEventListener('change', (e) => {
      if (e.target.matches('input[type=checkbox]')) {
        this.holes[Number(e.target.dataset.row)].open = e.target.checked;
        this.render();
        this.onChange();
      }
    });
    segmentBody.addEventListener('click', (e) => this.#rowAction(e, this.segments));
    holeBody.addEventListener('click', (e) => this.#rowAction(e, this.holes));
  }

  /** Fills the editor from request-shaped lists (millimetres). */
  load(segments, holes) {
    this.segments = (segments ?? []).map((s) => Object.fromEntries(SEGMENT_FIELDS.map((f) => [f, cell(s[f], this.unit)])));
    this.holes = (holes ?? []).map((h) => ({
      ...Object.fromEntries(HOLE_FIELDS.map((f) => [f, cell(h[f], this.unit)])),
      open: h.open !== false,
    }));
    this.render();
  }

  setUnit(unit) {
    this.unit = unit;
    for (const row of [...this.segments, ...this.holes]) {
      for (const f of [...SEGMENT_FIELDS, ...HOLE_FIELDS]) {
        if (row[f] && Number.isFinite(row[f].mm)) row[f].text = showLength(row[f].mm, unit);
      }
    }
    this.render();
  }

  addSegment() {
    const last = this.segments[this.segments.length - 1];
    const d = last && Number.isFinite(last.outputDiameterMm.mm) ? last.outputDiameterMm.mm : 15;
    this.segments.push({ lengthMm: cell(100, this.unit), inputDiameterMm: cell(d, this.unit), outputDiameterMm: cell(d, this.unit) });
    this.#structureChanged();
  }

  addHole() {
    const total = this.totalLengthMm();
    const last = this.holes[this.holes.length - 1];
    const pos = last && Number.isFinite(last.positionMm.mm) ? Math.min(total, last.positionMm.mm + 20) : total / 2;
    this.holes.push({ positionMm: cell(Math.round(pos), this.unit), diameterMm: cell(6, this.unit), chimneyMm: cell(3, this.unit), open: true });
    this.#structureChanged();
  }

  /** Opens every hole except the given indices (a fingering shown in the editor and drawing). */
  setClosedHoles(closed) {
    this.holes.forEach((h, i) => { h.open = !closed.includes(i); });
    this.render();
    this.onChange();
  }

  /**
   * Values set on the drawing (a dragged joint, diameter or hole): targets [{list: 'segments' |
   * 'holes', index, field}] all take valueMm; the rows show it in the unit chosen.
   */
  setValues(targets, valueMm) {
    for (const { list, index, field } of targets) {
      const row = (list === 'holes' ? this.holes : this.segments)[index];
      if (row && row[field]) row[field] = cell(valueMm, this.unit);
    }
    this.render();
    this.onChange();
  }

  toggleHole(index) {
    if (!this.holes[index]) return;
    this.holes[index].open = !this.holes[index].open;
    this.render();
    this.onChange();
  }

  totalLengthMm() {
    return this.segments.reduce((sum, s) => sum + (Number.isFinite(s.lengthMm.mm) ? s.lengthMm.mm : 0), 0);
  }

  /** Request lists in mm, plus local problems ({field, message}) for text that is not a number. */
  read() {
    const problems = [];
    const take = (list, name, fields) => list.map((row, i) => {
      const out = {};
      for (const f of fields) {
        if (!Number.isFinite(row[f].mm)) problems.push({ field: `${name}[${i}].${f}`, message: t('notNumber') });
        out[f] = Number.isFinite(row[f].mm) ? row[f].mm : null;
      }
      if (name === 'holes') out.open = row.open;
      return out;
    });
    return { segments: take(this.segments, 'segments', SEGMENT_FIELDS), holes: take(this.holes, 'holes', HOLE_FIELDS), problems };
  }

  render() {
    this.segmentBody.replaceChildren(...this.segments.map((row, i) => this.#row('segments', i, row, SEGMENT_FIELDS, this.segments.length)));
    this.holeBody.replaceChildren(...this.holes.map((row, i) => this.#row('holes', i, row, HOLE_FIELDS, this.holes.length)));
  }

  #row(name, i, row, fields, count) {
    const tr = document.createElement('tr');
    tr.dataset.row = String(i);
    const num = document.createElement('td');
    num.textContent = String(i + 1);
    tr.append(num);
    for (const f of fields) {
      const td = document.createElement('td');
      const input = document.createElement('input');
      input.type = 'text';
      input.inputMode = 'decimal';
      input.size = 7;
      input.value = row[f].text;
      input.dataset.field = `${name}[${i}].${f}`;
      input.dataset.row = String(i);
      input.dataset.key = f;
      input.setAttribute('aria-label', `${t(name === 'segments' ? 'segment' : 'hole')} ${i + 1} ${f}`);
      td.append(input);
      tr.append(td);
    }
    if (name === 'holes') {
      const td = document.createElement('td');
      const box = document.createElement('input');
      box.type = 'checkbox';
      box.checked = row.open;
      box.dataset.row = String(i);
      box.dataset.field = `holes[${i}].open`;
      box.className = 'hole-open';
      box.setAttribute('aria-label', `${t('hole')} ${i + 1} ${t('open')}`);
      const label = document.createElement('span');
      label.className = row.open ? 'hole-state open' : 'hole-state closed';
      label.textContent = row.open ? t('open') : t('closed');
      td.className = 'open-cell';
      td.append(box, label);
      tr.append(td);
    }
    const actions = document.createElement('td');
    actions.className = 'row-actions';
    actions.append(
      button('up', '↑', t('up'), i, i === 0),
      button('down', '↓', t('down'), i, i === count - 1),
      button('remove', '✕', t('remove'), i, false),
    );
    tr.append(actions);
    return tr;
  }

  #typed(e, list) {
    const input = e.target;
    if (!input.dataset.key) return;
    const row = list[Number(input.dataset.row)];
    const v = parseNumber(input.value);
    row[input.dataset.key] = { mm: Number.isFinite(v) ? toMm(v, this.unit) : NaN, text: input.value };
    this.onChange();
  }

  #rowAction(e, list) {
    const b = e.target.closest('button[data-action]');
    if (!b) return;
    const i = Number(b.dataset.row);
    const action = b.dataset.action;
    let order = list.map((_, k) => k);
    if (action === 'remove') {
      list.splice(i, 1);
      order.splice(i, 1);
    } else {
      const j = action === 'up' ? i - 1 : i + 1;
      if (j < 0 || j >= list.length) return;
      [list[i], list[j]] = [list[j], list[i]];
      [order[i], order[j]] = [order[j], order[i]];
    }
    this.#structureChanged(list === this.holes ? order : null);
  }

  /** Rows were added, removed or reordered; holeOrder maps new hole index to the old one. */
  #structureChanged(holeOrder = null) {
    this.render();
    this.onStructure?.(holeOrder);
    this.onChange();
  }
}

function button(action, glyph, title, row, disabled) {
  const b = document.createElement('button');
  b.type = 'button';
  b.className = `secondary tiny ${action}`;
  b.dataset.action = action;
  b.dataset.row = String(row);
  b.textContent = glyph;
  b.title = title;
  b.setAttribute('aria-label', title);
  b.disabled = disabled;
  return b;
}
