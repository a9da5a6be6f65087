// What every module of the string bench shares: its form, its texts and its display units.
import { pageText } from '../common/text.js';
import { unitInputs } from '../common/string-form.js';
import { fromMm } from '../common/units.js';

export const form = document.getElementById('string-form');
export const $ = (id) => document.getElementById(id);
export const t = pageText('#page-text');
export const io = unitInputs();

/** mm in the display unit. */
export const L = (mm) => fromMm(mm, io.units.length);

/** A position for tables and labels: 2 decimals in mm, 4 in inch, no "-0.00" from rounding noise. */
export function fmtLen(mm) {
  const digits = io.units.length === 'mm' ? 2 : 4;
  const v = L(mm);
  return (Math.abs(v) < 0.5 * 10 ** -digits ? 0 : v).toFixed(digits);
}

/** A signed figure without a "-0.0" for values that round to zero. */
export function signed(value, digits) {
  const text = Math.abs(value).toFixed(digits);
  if (Number(text) === 0) return `±${text}`;
  return `${value > 0 ? '+' : '−'}${text}`;
}
