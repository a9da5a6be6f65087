// Listen: a struck bar synthesised from its computed bending modes (no recording involved).
// Each mode rings as an exponentially decaying sine: amplitude from the mode shape at the strike
// point (a mallet excites a mode in proportion to its displacement there; a node is silent), damped
// above the mallet's own frequency (a soft mallet's contact time low-passes the blow), and decaying
// with the material's loss factor η as τ = 1 / (π f η) (the definition of the loss factor:
// η = 1/Q, τ = Q/(π f)). Pure functions first (tested with node --test), then the Web Audio part.

/** Loss factors, from memory: rosewood-like and other dense woods about 0.006, metals about 0.0005. */
export const LOSS_FACTOR = { wood: 0.006, metal: 0.0005 };
/** Longest preview (s). */
export const MAX_SECONDS = 3.0;

/** The displacement of a mode at x (mm), linearly interpolated between its shape samples. */
export function shapeAt(mode, xMm) {
  const xs = mode.shapeX;
  const ys = mode.shape;
  if (xMm <= xs[0]) return ys[0];
  for (let i = 1; i < xs.length; i++) {
    if (xMm <= xs[i]) {
      const s = (xMm - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return ys[i - 1] + s * (ys[i] - ys[i - 1]);
    }
  }
  return ys[ys.length - 1];
}

/**
 * The partials of a tap: [{frequencyHz, amplitude, decaySeconds}] for the bending modes, amplitudes
 * summing to 1 (none when every mode has a node at the strike point).
 *
 * @param modes      the answer's modes (only kind "bending" are used)
 * @param strikeMm   where the mallet lands, mm from x = 0
 * @param lossFactor η of the material
 * @param malletHz   the mallet's corner frequency: amplitude × 1 / (1 + (f / malletHz)²)
 */
export function tapPartials(modes, strikeMm, { lossFactor = LOSS_FACTOR.wood, malletHz = 2000 } = {}) {
  const bending = modes.filter((m) => m.kind === 'bending');
  const raw = bending.map((m) => ({
    frequencyHz: m.frequencyHz,
    amplitude: Math.abs(shapeAt(m, strikeMm)) / (1 + (m.frequencyHz / malletHz) ** 2),
    decaySeconds: 1 / (Math.PI * m.frequencyHz * lossFactor),
  }));
  const total = raw.reduce((s, p) => s + p.amplitude, 0);
  if (!(total > 0)) return [];
  return raw.map((p) => ({ ...p, amplitude: p.amplitude / total }));
}

/** Samples of the tap: Σ a e^(−t/τ) sin 2πft, 5 ms fade-out at the end, |peak| ≤ 1. */
export function renderTap(partials, sampleRate, seconds = MAX_SECONDS) {
  const n = Math.round(seconds * sampleRate);
  const out = new Float32Array(n);
  const nyquist = sampleRate / 2;
  for (const p of partials) {
    if (p.frequencyHz >= nyquist) continue;
    const w = 2 * Math.PI * p.frequencyHz / sampleRate;
    const k = Math.exp(-1 / (p.decaySeconds * sampleRate));
    let a = p.amplitude;
    for (let i = 0; i < n; i++) {
      out[i] += a * Math.sin(w * i);
      a *= k;
    }
  }
  const fade = Math.min(n, Math.round(0.005 * sampleRate));
  for (let i = 0; i < fade; i++) out[n - 1 - i] *= i / fade;
  return out;
}

/** Plays the tap through Web Audio; resolves with the buffer's duration once it has started. */
export async function playTap(partials, seconds = MAX_SECONDS) {
  const Context = window.AudioContext || window.webkitAudioContext;
  if (!Context) throw new Error('no Web Audio in this browser');
  const ctx = new Context();
  if (ctx.state === 'suspended') await ctx.resume();
  const samples = renderTap(partials, ctx.sampleRate, seconds);
  const buffer = ctx.createBuffer(1, samples.length, ctx.sampleRate);
  buffer.copyToChannel(samples, 0);
  const source = ctx.createBufferSource();
  source.buffer = buffer;
  const gain = ctx.createGain();
  gain.gain.value = 0.6;
  source.connect(gain).connect(ctx.destination);
  source.onended = () => ctx.close();
  source.start();
  return buffer.duration;
}
