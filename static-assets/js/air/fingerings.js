// The fingering table: each fingering closes some holes (indices into the hole list as the API
// has them, shown numbered from 1 nearest the input end), names a target (a note such as D5, or
// hertz) and the register it should sound in. The server predicts each fingering's pitch; each row
// then shows it and its cents from the target against a tolerance.
// Two views of the same rows: the cards (each fingering drawn as the bore's own hole pattern,
// fingering-cards.js), the first view, and the table, the secondary one; both edit the rows.
import { fmt, parseNumber } from '../common/units.js';
import { keepFocus } from '../common/keep-focus.js';
import { cents, nearestNote, targetHz } from './tuning.js';
import { drawCards } from './fingering-cards.js';
import { t } from './text.js';
import { labelByColumn } from '../common/text.js';

export class FingeringTable {
  constructor({ body, cards, onChange, onApply }) {
    this.body = body;
    this.cards = cards ?? null;
    this.onChange = onChange;
    this.onApply = onApply;
    this.rows = [];
    this.holeCount = 0;
    this.predictions = [];
    this.bore = { segments: [], holes: [] };
    for (const view of [body, this.cards].filter(Boolean)) {
      view.addEventListener('input', (e) => this.#typed(e));
      view.addEventListener('change', (e) => this.#changed(e));
      view.addEventListener('click', (e) => this.#clicked(e));
    }
    this.cards?.addEventListener('keydown', (e) => {
      const hole = e.target.closest('[data-action=toggle]');
      if (hole && (e.key === 'Enter' || e.key === ' ')) {
        e.preventDefault();
        this.#toggle(Number(hole.dataset.row), Number(hole.dataset.hole));
      }
    });
  }

  #clicked(e) {
    const hole = e.target.closest('[data-action=toggle]');
    if (hole) {
      this.#toggle(Number(hole.dataset.row), Number(hole.dataset.hole));
      return;
    }
    const apply = e.target.closest('button[data-action=apply]');
    if (apply) {
      this.onApply?.(this.rows[Number(apply.dataset.row)].closedHoles);
      return;
    }
    const b = e.target.closest('button[data-action=remove]');
    if (!b) return;
    this.rows.splice(Number(b.dataset.row), 1);
    this.predictions = [];
    this.render();
    this.onChange();
  }

  /** Closes an open hole of a fingering or opens a closed one (a click on its card's drawing). */
  #toggle(row, hole) {
    const r = this.rows[row];
    if (!r || !(hole < this.holeCount)) return;
    r.closedHoles = r.closedHoles.includes(hole) ? r.closedHoles.filter((x) => x !== hole)
      : [...r.closedHoles, hole].sort((a, b) => a - b);
    // The old prediction no longer belongs to this fingering: the card shows it waiting.
    if (this.predictions[row]) this.predictions[row] = { ...this.predictions[row], pending: true };
    this.render();
    this.onChange();
  }

  /** The bore the cards draw (request lists in mm); only the cards are drawn again. */
  setBore(segments, holes) {
    this.bore = { segments, holes };
    this.#drawCards();
  }

  /** Rows from the request's fingerings: {name, closedHoles (0-based), targetNote | targetHz, register}. */
  load(rows) {
    this.rows = (rows ?? []).map((r) => ({
      name: r.name ?? '', closedHoles: [...(r.closedHoles ?? [])].sort((a, b) => a - b),
      target: String(r.targetNote ?? r.targetHz ?? r.target ?? ''), register: r.register ?? 1,
    }));
    this.predictions = [];
    this.render();
  }

  add() {
    this.rows.push({ name: `${t('fingeringName')} ${this.rows.length + 1}`, closedHoles: [], target: '', register: 1 });
    this.render();
    this.onChange();
  }

  /** The hole list changed: holeOrder[new] = old index (0-based), or null when only added. */
  holesChanged(holeCount, holeOrder) {
    if (holeOrder) {
      const newOf = new Map(holeOrder.map((old, neu) => [old, neu]));
      for (const r of this.rows) r.closedHoles = r.closedHoles.filter((h) => newOf.has(h)).map((h) => newOf.get(h)).sort((a, b) => a - b);
    }
    this.holeCount = holeCount;
    for (const r of this.rows) r.closedHoles = r.closedHoles.filter((h) => h < holeCount);
    this.render();
  }

  /**
   * The request's fingerings: a target that reads as a number goes as targetHz, anything else as
   * targetNote, exactly as typed (the server names the field when it cannot read it).
   */
  read() {
    return this.rows.map((r) => {
      const out = { name: r.name, closedHoles: [...r.closedHoles], register: r.register };
      const text = r.target.trim();
      const hz = parseHz(text);
      if (text === '') out.targetHz = null;
      else if (hz !== null) out.targetHz = hz;
      else out.targetNote = text;
      return out;
    });
  }

  /** predictions[i] = predicted Hz (or null); shows cents against the tolerance. */
  show(predictions, tolerance, a4) {
    this.predictions = predictions;
    this.tolerance = tolerance;
    this.a4 = a4;
    this.render();
  }

  render() {
    keepFocus(this.body, () => this.body.replaceChildren(...this.rows.map((r, i) => this.#row(r, i))));
    labelByColumn(this.body);
    this.#drawCards();
  }

  #drawCards() {
    if (!this.cards) return;
    keepFocus(this.cards, () => drawCards(this.cards, {
      rows: this.rows, holeCount: this.holeCount, bore: this.bore, tolerance: this.tolerance ?? 10,
      judge: (i) => this.judge(i),
    }));
  }

  /**
   * A fingering's reading: the predicted Hz, the note it sounds, its cents from the target and
   * the verdict against the tolerance; null without a prediction (undefined before any answer).
   */
  judge(i) {
    const p = this.predictions[i];
    if (p === undefined) return undefined;
    const r = this.rows[i];
    const hz = p?.frequencyHz ?? null;
    const goal = p?.targetHz ?? targetHz(r.target, this.a4 ?? 440);
    if (!hz || !goal) return null;
    const c = p.centsFromTarget ?? cents(hz, goal);
    const note = p.note ?? nearestNote(hz, this.a4 ?? 440);
    return { hz, note, cents: c, pending: Boolean(p.pending), ...verdict(c, this.tolerance ?? 10) };
  }

  #row(r, i) {
    const tr = document.createElement('tr');
    tr.dataset.row = String(i);
    const td = (child, cls) => {
      const c = document.createElement('td');
      if (cls) c.className = cls;
      if (child instanceof Node) c.append(child); else if (child !== undefined) c.textContent = child;
      tr.append(c);
      return c;
    };
    td(String(i + 1));
    const name = document.createElement('input');
    name.type = 'text'; name.size = 8; name.value = r.name; name.dataset.key = 'name'; name.dataset.row = String(i);
    name.dataset.field = `fingerings[${i}].name`;
    td(name, 'left');
    const holes = document.createElement('span');
    holes.className = 'fingering-holes';
    holes.dataset.field = `fingerings[${i}].closedHoles`;
    for (let h = 0; h < this.holeCount; h++) {
      const label = document.createElement('label');
      label.className = 'hole-pick';
      const box = document.createElement('input');
      box.type = 'checkbox'; box.checked = r.closedHoles.includes(h); box.dataset.hole = String(h); box.dataset.row = String(i);
      box.title = t('closeHole', h + 1);
      box.setAttribute('aria-label', t('closeHole', h + 1));
      label.append(box, document.createTextNode(String(h + 1)));
      holes.append(label);
    }
    td(holes, 'left');
    const target = document.createElement('input');
    target.type = 'text'; target.size = 6; target.value = r.target; target.dataset.key = 'target'; target.dataset.row = String(i);
    target.dataset.field = targetField(r.target, i);
    td(target);
    const reg = document.createElement('select');
    reg.dataset.key = 'register'; reg.dataset.row = String(i); reg.dataset.field = `fingerings[${i}].register`;
    for (let k = 1; k <= 4; k++) reg.append(new Option(String(k), String(k), false, k === r.register));
    td(reg);
    const j = this.judge(i);
    if (j) {
      td(fmt(j.hz, 1), 'predicted');
      td(`${j.note.name} ${signed(j.note.centsOff)}`);
      td(signed(j.cents), `cents ${j.cls}`);
      td(j.word, `verdict ${j.cls}`);
      tr.classList.add(j.cls);
    } else {
      td('—', 'predicted'); td('—'); td('—', 'cents');
      td(j === undefined ? '' : t('noPrediction'), 'verdict');
    }
    const apply = document.createElement('button');
    apply.type = 'button'; apply.className = 'secondary tiny apply'; apply.dataset.action = 'apply'; apply.dataset.row = String(i);
    apply.textContent = '⇧'; apply.title = t('applyFingering'); apply.setAttribute('aria-label', t('applyFingering'));
    const rm = document.createElement('button');
    rm.type = 'button'; rm.className = 'secondary tiny remove'; rm.dataset.action = 'remove'; rm.dataset.row = String(i);
    rm.textContent = '✕'; rm.title = t('remove'); rm.setAttribute('aria-label', t('remove'));
    const actions = td(apply, 'row-actions');
    actions.append(rm);
    return tr;
  }

  #typed(e) {
    const key = e.target.dataset.key;
    if (key !== 'name' && key !== 'target') return;
    const row = Number(e.target.dataset.row);
    this.rows[row][key] = e.target.value;
    if (key === 'target') e.target.dataset.field = targetField(e.target.value, row);
    this.#mirror(e.target, row, key);
    this.onChange();
  }

  #changed(e) {
    const row = this.rows[Number(e.target.dataset.row)];
    if (!row) return;
    if (e.target.dataset.hole) {
      const h = Number(e.target.dataset.hole);
      row.closedHoles = e.target.checked ? [...new Set([...row.closedHoles, h])].sort((a, b) => a - b) : row.closedHoles.filter((x) => x !== h);
      this.#drawCards();
      this.onChange();
    } else if (e.target.dataset.key === 'register') {
      row.register = Number(e.target.value);
      this.#mirror(e.target, Number(e.target.dataset.row), 'register');
      this.#drawCards();
      this.onChange();
    }
  }

  /** The same row's same input in the other view takes the value typed in this one. */
  #mirror(source, row, key) {
    for (const view of [this.body, this.cards].filter(Boolean)) {
      if (view.contains(source)) continue;
      const twin = view.querySelector(`[data-key="${key}"][data-row="${row}"]`);
      if (twin) {
        twin.value = source.value;
        if (key === 'target') twin.dataset.field = targetField(source.value, row);
      }
    }
  }
}

/** A target that reads as a positive number of hertz ("392", "392,0", "392 Hz"), else null. */
function parseHz(text) {
  const v = parseNumber(String(text).replace(/\s*hz$/i, ''));
  return Number.isFinite(v) && v > 0 ? v : null;
}

/** The request field a target goes to, so that the server's message lands on this input. */
export const targetField = (text, i) => {
  const s = String(text ?? '').trim();
  return `fingerings[${i}].${s === '' || parseHz(s) !== null ? 'targetHz' : 'targetNote'}`;
};

export const signed = (c) => `${c >= 0 ? '+' : '−'}${Math.abs(c).toFixed(1)}`;

/** Our own labels: within the tolerance "in tune"; up to three tolerances "sharp"/"flat"; beyond, "far". */
export function verdict(c, tolerance) {
  const a = Math.abs(c);
  if (a <= tolerance) return { cls: 'in-tune', word: t('inTune') };
  if (a <= 3 * tolerance) return c > 0 ? { cls: 'sharp', word: t('sharp') } : { cls: 'flat', word: t('flat') };
  return c > 0 ? { cls: 'far-sharp', word: t('farSharp') } : { cls: 'far-flat', word: t('farFlat') };
}
