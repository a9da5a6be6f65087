// Display units and typed numbers. The API always speaks millimetres and newtons; pages convert at
// the edge, and every page reads a typed number with the same rule (parseNumber).
export const LENGTH_UNITS = { mm: 1, inch: 25.4 };  // inch: exactly 25.4 mm (international yard and pound, 1959)
export const FORCE_UNITS = { N: 1, kgf: 9.80665, lbf: 4.4482216152605 }; // kgf: ISO 80000-4 standard gravity; lbf: NIST SP 811

export const toMm = (value, unit) => value * LENGTH_UNITS[unit];
export const fromMm = (mm, unit) => mm / LENGTH_UNITS[unit];
export const toNewton = (value, unit) => value * FORCE_UNITS[unit];
export const fromNewton = (n, unit) => n / FORCE_UNITS[unit];

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * A typed number, the one rule of every page: blanks around are ignored, and a decimal comma is
 * taken as a decimal point ("300,5" = 300.5) when the text has no point of its own. Thousands
 * separators are not numbers ("1,234.5" and "1.234,5" are refused). NaN when the text is no number.
 */
export function parseNumber(text) {
  let s = String(text ?? '').trim();
  if (!s.includes('.') && (s.match(/,/g) || []).length === 1) s = s.replace(',', '.');
  return NUMBER.test(s) ? Number(s) : NaN;
}

const NUMBER_IN_TEXT = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/g;

/**
 * A text of lengths in mm (a list such as "x, y" a line, or "x, y, t") as shown in unit: every number in it
 * converted and rounded for reading (4 decimals of an inch, 3 of a mm), everything else kept as written.
 * In mm the text comes back untouched.
 */
export function textFromMm(text, unit) {
  const s = String(text ?? '');
  if (unit === 'mm') return s;
  const digits = unit === 'inch' ? 4 : 3;
  return s.replace(NUMBER_IN_TEXT, (v) => String(Number(fromMm(Number(v), unit).toFixed(digits))));
}

/** The reverse of textFromMm: a list typed in unit with every number turned into mm (not rounded). */
export function textToMm(text, unit) {
  const s = String(text ?? '');
  if (unit === 'mm') return s;
  return s.replace(NUMBER_IN_TEXT, (v) => String(toMm(Number(v), unit)));
}

/** Rounds for display without trailing noise. */
export function fmt(value, digits = 3) {
  if (value === null || value === undefined || Number.isNaN(value)) return '';
  return Number(value).toFixed(digits);
}

/** A figure for a message: six significant digits at most, no float noise ("647.7", not "647.6999999999999"). */
export function figure(value) {
  return String(Number(Number(value).toPrecision(6)));
}

const FIGURE = '(-?\\d+(?:\\.\\d+)?(?:[eE][+-]?\\d+)?)';

/**
 * A server message in the user's units: lengths written "… mm" in the length unit shown, linear
 * densities "… kg/m" in g/m (the field's unit), each figure rounded for reading. The server's
 * field names and meanings stay as they are; only the words shown change.
 */
export function inUserUnits(message, { length = 'mm' } = {}) {
  const lengthWord = length === 'inch' ? 'in' : length;
  return String(message ?? '')
    .replace(new RegExp(`${FIGURE} ?kg/m\\b`, 'g'), (_, v) => `${figure(Number(v) * 1000)} g/m`)
    .replace(new RegExp(`${FIGURE} ?mm\\b`, 'g'), (_, v) => `${figure(fromMm(Number(v), length))} ${lengthWord}`);
}

/** A problem document whose field messages are shown in the user's units (inUserUnits). */
export function problemInUserUnits(problem, units) {
  if (!problem?.errors) return problem;
  return { ...problem, errors: problem.errors.map((e) => ({ ...e, message: inUserUnits(e.message, units) })) };
}
