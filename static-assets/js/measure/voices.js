// Web Audio voices for the listening previews: a bank of sine partials, each with its own
// amplitude and exponential decay, through one master gain. No samples, no downloads.

let context = null;
let master = null;
let voices = [];

/** The shared AudioContext, created on first use (inside a click, so browsers allow it). */
export function audio() {
  if (!context) {
    const Ctx = window.AudioContext || window.webkitAudioContext;
    context = new Ctx();
    master = context.createGain();
    master.connect(context.destination);
  }
  return context;
}

export function setVolume(v) {
  audio();
  master.gain.setValueAtTime(Math.max(0, Math.min(1, v)), context.currentTime);
}

/**
 * Schedules partials [{frequencyHz, amplitude, decayPerSecond}] at time t0 (seconds on the
 * context's clock) for durationS seconds. Amplitudes are scaled together so that their sum is at
 * most 0.9 (no clipping whatever the phases); partials above 95 % of Nyquist are left out.
 * sustain: hold each partial at its level (release at the end) instead of decaying.
 */
export function schedule(partials, t0, durationS, { sustain = false } = {}) {
  const ctx = audio();
  const nyquist = ctx.sampleRate / 2;
  const audible = partials.filter((p) => p.frequencyHz > 20 && p.frequencyHz < 0.95 * nyquist && p.amplitude > 0);
  const sum = audible.reduce((s, p) => s + p.amplitude, 0);
  if (sum === 0) return 0;
  const scale = 0.9 / sum;
  const end = t0 + durationS;
  for (const p of audible) {
    const osc = ctx.createOscillator();
    osc.type = 'sine';
    osc.frequency.setValueAtTime(p.frequencyHz, t0);
    const g = ctx.createGain();
    const a = p.amplitude * scale;
    g.gain.setValueAtTime(0, t0);
    g.gain.linearRampToValueAtTime(a, t0 + 0.004);   // 4 ms onset: no click
    if (sustain) {
      g.gain.setValueAtTime(a, Math.max(t0 + 0.004, end - 0.12));
      g.gain.linearRampToValueAtTime(0, end);
    } else {
      const sigma = Math.max(p.decayPerSecond, 1e-3);
      g.gain.setTargetAtTime(0, t0 + 0.004, 1 / sigma); // a·e^{−σt}
      g.gain.setValueAtTime(a * Math.exp(-sigma * Math.max(0, durationS - 0.024)), end - 0.02);
      g.gain.linearRampToValueAtTime(0, end);
    }
    osc.connect(g).connect(master);
    osc.start(t0);
    osc.stop(end + 0.01);
    const voice = { osc, g };
    osc.onended = () => { voices = voices.filter((v) => v !== voice); g.disconnect(); };
    voices.push(voice);
  }
  return audible.length;
}

/** Starts playing now (after resuming a suspended context); resolves to the number of partials. */
export async function play(partials, durationS, options) {
  const ctx = audio();
  if (ctx.state === 'suspended') await ctx.resume();
  return schedule(partials, ctx.currentTime + 0.03, durationS, options);
}

export function stopAll() {
  for (const v of voices) {
    try { v.osc.stop(); } catch (e) { /* already stopped */ }
  }
  voices = [];
}

export function state() {
  return { contextState: context ? context.state : 'none', voices: voices.length };
}
