// Notes, cents and register alignment, in the page (the server may send its own; we use those
// when present). 12-tone equal temperament on A4 (common practice: A4 = 440 Hz, ISO 16:1975).

const NAMES = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B'];
const LETTER = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };

/** Cents from b to a: 1200·log2(a/b) (definition of the cent, Ellis 1885). */
export const cents = (a, b) => 1200 * Math.log2(a / b);

/** Nearest equal-tempered note: {name, centsOff, midi}. */
export function nearestNote(hz, a4 = 440) {
  const midi = 69 + 12 * Math.log2(hz / a4);
  const m = Math.round(midi);
  const name = NAMES[((m % 12) + 12) % 12] + (Math.floor(m / 12) - 1);
  return { name, centsOff: (midi - m) * 100, midi: m };
}

/** Frequency of a note name such as "D5", "F#4", "Bb3" (MIDI 69 = A4), or null. */
export function noteHz(name, a4 = 440) {
  const m = /^\s*([A-Ga-g])([#♯b♭]?)(-?\d+)\s*$/.exec(name ?? '');
  if (!m) return null;
  let semis = LETTER[m[1].toUpperCase()];
  if (m[2] === '#' || m[2] === '♯') semis += 1;
  if (m[2] === 'b' || m[2] === '♭') semis -= 1;
  const midi = 12 * (Number(m[3]) + 1) + semis;
  return a4 * 2 ** ((midi - 69) / 12);
}

/** A target given as a note name or a number of hertz, as Hz (null when it is neither). */
export function targetHz(text, a4 = 440) {
  const s = String(text ?? '').trim();
  if (s === '') return null;
  if (/^[+]?\d+(\.\d+)?$/.test(s)) {
    const v = Number(s);
    return v > 0 ? v : null;
  }
  return noteHz(s, a4);
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
