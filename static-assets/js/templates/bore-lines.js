// The bore panel's text lines and request bodies, without the page: fingering lines, measured
// pitches, the blank-tube and calibration requests and what a solve moved at the player's end.
// Imported by solver.js; tested with Node's test runner (src/test/js/bore-lines.test.mjs).
import { hzNumber, pitchHz } from '../common/notes.js';

/** Fingerings as text lines "name, target, closed holes from 1[, register]" (the API counts closedHoles from 0). */
export function fingeringLines(fingerings) {
  return fingerings.map((f) => `${f.name}, ${f.targetNote ?? f.targetHz}, ${(f.closedHoles || []).map((h) => h + 1).join(' ')}${(f.register ?? 1) > 1 ? `, ${f.register}` : ''}`).join('\n');
}

/**
 * Fingering lines as the API's fingerings (closedHoles from 0, the target in Hz when it is a
 * number of hertz, else as a note name); each bad line gives {line} (counted from 1).
 */
export function parseFingeringLines(text) {
  const rows = [];
  const bad = [];
  text.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const parts = line.split(',').map((s) => s.trim());
    const closed = (parts[2] ?? '').split(/\s+/).filter(Boolean).map(Number);
    const register = parts[3] ? Number(parts[3]) : 1;
    if (parts.length < 2 || !parts[0] || !parts[1] || closed.some((n) => !Number.isInteger(n) || n < 1)
      || !Number.isInteger(register) || register < 1) {
      bad.push(i + 1);
      return;
    }
    const hz = hzNumber(parts[1]);
    rows.push({
      name: parts[0], closedHoles: closed.map((n) => n - 1),
      ...(Number.isFinite(hz) ? { targetHz: hz } : { targetNote: parts[1] }), register,
    });
  });
  return { rows, bad };
}

/**
 * Measured lines "name, pitch" as the API's measured list: the pitch in Hz (with or without the
 * unit, decimal comma or point) or a note name on the given A4.
 */
export function parseMeasuredLines(text, a4) {
  const rows = [];
  const bad = [];
  text.split('\n').forEach((line, i) => {
    if (!line.trim()) return;
    const parts = line.split(',').map((s) => s.trim());
    // a comma inside the pitch ("329,63") makes three parts: the pitch is the rest of the line
    const pitch = parts.slice(1).join(',');
    const hz = pitch ? pitchHz(pitch, a4) : null;
    if (!parts[0] || hz === null || !Number.isFinite(hz) || !(hz > 0)) {
      bad.push(i + 1);
      return;
    }
    rows.push({ fingering: parts[0], measuredHz: hz });
  });
  return { rows, bad };
}

/** Which of the mouth's figures can move with the holes: a window's headspace and length, an embouchure's headspace. */
export function movableMouth(bore) {
  const kind = bore && bore.mouth ? bore.mouth.kind : null;
  return { headspace: kind === 'window' || kind === 'embouchure', windowLength: kind === 'window' };
}

/**
 * The blank-tube request: the bore without holes, the chart, the limits, and mouthLimits only for
 * what the maker lets move and the mouth has (a switch the mouth cannot follow is left out, not sent).
 */
export function blankTubeBody(bore, { holeCount, chimneyMm, fingerings, limits, varyHeadspace, varyWindowLength }) {
  const blank = { ...bore };
  delete blank.holes;
  const can = movableMouth(bore);
  const body = { bore: blank, holeCount, chimneyMm, fingerings, limits };
  const mouthLimits = {};
  if (varyHeadspace && can.headspace) mouthLimits.varyHeadspace = true;
  if (varyWindowLength && can.windowLength) mouthLimits.varyWindowLength = true;
  if (Object.keys(mouthLimits).length) body.mouthLimits = mouthLimits;
  return body;
}

/**
 * The calibration request: measured pitches, a measured impedance curve (its CSV text and the
 * fingering it was measured with, blank for the holes as the bore has them), or both.
 */
export function calibrationBody(bore, fingerings, measured, fit, impedance) {
  const body = { bore: { ...bore, fingerings }, fit: [fit] };
  if (measured.length) body.measured = measured;
  if (impedance && impedance.csv) {
    body.impedance = { csv: impedance.csv };
    if (impedance.fingering && impedance.fingering.trim()) body.impedance.fingering = impedance.fingering.trim();
  }
  return body;
}

/** What a blank-tube solve moved at the player's end, as [field, start, solved, moved] lines' values. */
export function mouthMoves(result) {
  return (result && result.mouth ? result.mouth : []).map((m) => ({
    field: m.field, startMm: m.startMm, solvedMm: m.solvedMm, movedMm: m.movedMm,
  }));
}
