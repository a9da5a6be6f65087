// The mouth (player's end) and breath editor of the bore bench: the kind and its fields, lengths
// in the chosen unit (mm or inch), volumes in mm³ or in³; what the user typed is kept as typed.
// The server judges every value (ranges, contradictions); the editor only reads numbers.
import { toMm } from '../common/units.js';
import { parseNumber, showLength } from './editor.js';
import { t } from './text.js';

const INCH3 = 25.4 ** 3;

/** The fields of each kind: [request field, 'length' | 'volume' | 'percent']; the API's names. */
export const MOUTH_FIELDS = {
  embouchure: [['holeLengthMm', 'length'], ['holeWidthMm', 'length'], ['wallMm', 'length'], ['headspaceMm', 'length'], ['lipCoveragePct', 'percent']],
  window: [['windowLengthMm', 'length'], ['windowWidthMm', 'length'], ['wallMm', 'length'], ['headspaceMm', 'length']],
  reed: [['equivalentVolumeMm3', 'volume']],
  cup: [['cupVolumeMm3', 'volume'], ['throatDiameterMm', 'length'], ['throatLengthMm', 'length']],
};

/** The input end each kind plays at (the server refuses a contradiction). */
export const MOUTH_INPUT_END = { embouchure: 'open', window: 'open', reed: 'closed', cup: 'closed' };

const toShown = (value, kind, unit) => {
  if (!Number.isFinite(value)) return '';
  if (kind === 'length') return showLength(value, unit);
  if (kind === 'volume') return String(Number((unit === 'inch' ? value / INCH3 : value).toFixed(unit === 'inch' ? 6 : 2)));
  return String(value);
};
const fromShown = (value, kind, unit) => {
  if (kind === 'length') return toMm(value, unit);
  if (kind === 'volume') return unit === 'inch' ? value * INCH3 : value;
  return value;
};

export class MouthEditor {
  /**
   * @param root the element holding #mouth-kind, inputs with data-mouth="field" and their
   *   labels' .mouth-unit spans, and the breath inputs (#breath-on, #breath-co2, ...)
   */
  constructor({ root, onChange, onKind }) {
    this.root = root;
    this.onChange = onChange;
    this.onKind = onKind;
    this.unit = 'mm';
    this.kind = root.querySelector('#mouth-kind');
    this.kind.addEventListener('change', () => {
      this.#showFields();
      if (this.kind.value && this.onKind) this.onKind(MOUTH_INPUT_END[this.kind.value]);
      this.onChange();
    });
    root.addEventListener('input', (e) => { if (e.target.matches('input')) this.onChange(); });
    root.querySelector('#breath-on').addEventListener('change', () => { this.#showBreath(); this.onChange(); });
    this.#showFields();
    this.#showBreath();
  }

  #inputs() {
    return [...this.root.querySelectorAll('input[data-mouth]')];
  }

  #showFields() {
    const kind = this.kind.value;
    const wanted = new Set((MOUTH_FIELDS[kind] ?? []).map(([f]) => f));
    for (const input of this.#inputs()) {
      const label = input.closest('label');
      label.hidden = !wanted.has(input.dataset.mouth);
    }
  }

  #showBreath() {
    const on = this.root.querySelector('#breath-on').checked;
    this.root.querySelectorAll('.breath-field').forEach((el) => { el.hidden = !on; });
  }

  /** Re-shows the lengths and volumes in another unit (the values stay). */
  setUnit(unit) {
    const current = this.read().mouth;
    this.unit = unit;
    this.root.querySelectorAll('.mouth-unit').forEach((el) => { el.textContent = el.dataset.kind === 'volume' ? (unit === 'inch' ? 'in³' : 'mm³') : (unit === 'inch' ? 'inch' : 'mm'); });
    if (current) this.load(current, this.readBreath());
  }

  /** Fills the editor from request-shaped mouth and breath (or null). */
  load(mouth, breath) {
    const kind = mouth?.kind ?? '';
    this.kind.value = kind;
    const fieldKinds = Object.fromEntries(Object.values(MOUTH_FIELDS).flat());
    for (const input of this.#inputs()) {
      const f = input.dataset.mouth;
      let v = mouth?.[f];
      // A round embouchure hole is shown as equal length and width.
      if (kind === 'embouchure' && (f === 'holeLengthMm' || f === 'holeWidthMm') && v == null) v = mouth?.holeDiameterMm;
      input.value = toShown(v, fieldKinds[f], this.unit);
    }
    const on = Boolean(breath);
    this.root.querySelector('#breath-on').checked = on;
    const set = (id, v, fallback) => { this.root.querySelector(id).value = v == null ? fallback : String(v); };
    set('#breath-co2', breath?.co2Pct, '4');
    set('#breath-humidity', breath?.relativeHumidityPct, '90');
    set('#breath-input-temperature', breath?.inputTemperatureC, '32');
    set('#breath-output-temperature', breath?.outputTemperatureC, '24');
    this.#showFields();
    this.#showBreath();
  }

  /** The request's mouth (null without one) and local problems (text that is not a number). */
  read() {
    const kind = this.kind.value;
    const problems = [];
    if (!kind) return { mouth: null, problems };
    const mouth = { kind };
    for (const [field, k] of MOUTH_FIELDS[kind]) {
      const input = this.root.querySelector(`input[data-mouth="${field}"]`);
      const text = input.value.trim();
      if (text === '') continue;
      const v = parseNumber(text);
      if (!Number.isFinite(v)) {
        problems.push({ field: `mouth.${field}`, message: t('notNumber') });
        continue;
      }
      mouth[field] = fromShown(v, k, this.unit);
    }
    return { mouth, problems };
  }

  /** The request's breath (null when off). */
  readBreath() {
    if (!this.root.querySelector('#breath-on').checked) return null;
    const num = (id) => {
      const v = parseNumber(this.root.querySelector(id).value);
      return Number.isFinite(v) ? v : null;
    };
    return {
      co2Pct: num('#breath-co2'), relativeHumidityPct: num('#breath-humidity'),
      inputTemperatureC: num('#breath-input-temperature'), outputTemperatureC: num('#breath-output-temperature'),
    };
  }
}

/** The mouth's extent upstream of x = 0 (mm) for the drawing: headspace, or the cup and throat. */
export function mouthExtentMm(mouth) {
  if (!mouth) return 0;
  if (mouth.kind === 'cup') {
    const r = Math.cbrt((3 * (mouth.cupVolumeMm3 ?? 0)) / (2 * Math.PI));
    return (Number.isFinite(r) ? r : 0) + (mouth.throatLengthMm ?? 0);
  }
  if (mouth.kind === 'reed') return 6;
  return Math.max(mouth.headspaceMm ?? 0, (mouth.holeLengthMm ?? mouth.windowLengthMm ?? 0) / 2);
}

