// Display units. The API always speaks millimetres and newtons; pages convert at the edge.
export const LENGTH_UNITS = { mm: 1, inch: 25.4 };
export const FORCE_UNITS = { N: 1, kgf: 9.80665, lbf: 4.4482216152605 }; // kgf: ISO 80000-4 standard gravity; lbf: NIST SP 811

export const toMm = (value, unit) => value * LENGTH_UNITS[unit];
export const fromMm = (mm, unit) => mm / LENGTH_UNITS[unit];
export const toNewton = (value, unit) => value * FORCE_UNITS[unit];
export const fromNewton = (n, unit) => n / FORCE_UNITS[unit];

/** Rounds for display without trailing noise. */
export function fmt(value, digits = 3) {
  if (value === null || value === undefined || Number.isNaN(value)) return '';
  return Number(value).toFixed(digits);
}
