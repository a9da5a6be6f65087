// Partials against the target ratios: how far each bending mode's ratio to mode 1 sits from the
// ratio the maker tunes to (1:4:10 marimba, 1:3:6 xylophone, or typed), in cents.
import { cents } from '../common/notes.js';

/** "4, 10" or "1:4:10" → [4, 10] (the ratios of modes 2, 3, ... to mode 1); null when unreadable. */
export function parseRatios(text) {
  const parts = String(text ?? '').split(/[,:;\s]+/).map((s) => s.trim()).filter((s) => s);
  const values = parts.map(Number);
  if (!values.length || values.some((v) => !Number.isFinite(v) || v <= 0)) return null;
  const ratios = values[0] === 1 && values.length > 1 ? values.slice(1) : values;
  for (let i = 1; i < ratios.length; i++) if (!(ratios[i] > ratios[i - 1])) return null;
  return ratios[0] > 1 ? ratios : null;
}

/** [{n, ratio, target, cents}] for the bending modes 2.. that have a target. */
export function ratioOffsets(modes, ratios) {
  const bending = modes.filter((m) => m.kind === 'bending');
  if (!bending.length) return [];
  const f1 = bending[0].frequencyHz;
  const out = [];
  for (let i = 0; i < ratios.length && i + 1 < bending.length; i++) {
    const m = bending[i + 1];
    const ratio = m.frequencyHz / f1;
    out.push({ n: m.n, ratio, target: ratios[i], cents: cents(ratio, ratios[i]) });
  }
  return out;
}
