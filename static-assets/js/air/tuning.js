// Register alignment of a bore's resonances, in the page. Notes and cents come from the one note
// module (common/notes.js); the server sends its own alignment, used when present.
import { cents, pitchHz } from '../common/notes.js';

export { cents, nearestNote, noteHz } from '../common/notes.js';

/** A target given as a note name or a number of hertz, as Hz (null when it is neither, or not positive). */
export function targetHz(text, a4 = 440) {
  const hz = pitchHz(text, a4);
  return hz !== null && hz > 0 ? hz : null;
}

/**
 * Register alignment of resonances against f1: each ratio f_n/f1, the series member it is
 * nearest (k, or odd k for the odd series) and the cents from that member k·f1.
 */
export function alignment(freqs, series) {
  if (!freqs.length) return [];
  const f1 = freqs[0];
  return freqs.map((f) => {
    const ratio = f / f1;
    let k = Math.max(1, Math.round(ratio));
    if (series === 'odd') k = Math.max(1, 2 * Math.round((ratio - 1) / 2) + 1);
    return { ratio, member: k, centsFromSeries: cents(f, k * f1) };
  });
}

/** The series the ends and the bore suggest: odd harmonics for a cylinder with one end closed. */
export function suggestedSeries(request) {
  const cylinder = request.segments.every((s) => s.inputDiameterMm === s.outputDiameterMm);
  const inputClosed = request.inputEnd === 'closed';
  const outputClosed = request.outputEnd === 'closed';
  return cylinder && inputClosed !== outputClosed ? 'odd' : 'harmonic';
}
