// Listening panel of the bore bench: a rough timbre preview of the current fingering's bore.
// "tapped": each resonance as a decaying tone, amplitude ∝ |Z| at it, amplitude decay time
// τ = Q/(π f) (a resonator of quality factor Q loses amplitude as e^{−πft/Q}). "blown": the
// harmonics of the lowest resonance, each ∝ |Z(h·f1)|/h, held for 1.5 s — resonances that line up
// with harmonics strengthen them, as in a reed or lip-driven tone. Not a played note.
import { showPanelFailure } from './common/panels.js';
import { mountPanel, role, showPlaying, onPageEvent } from './measure/panel.js';
import { play, setVolume, stopAll, state as audioState } from './measure/voices.js';

const state = { panel: null, t: null, analysis: null };
const DEFAULT_Q = 20;      // when a resonance comes without Q
const MAX_RESONANCES = 16;
const HARMONICS = 20;

/** |Z| at f by linear interpolation of the analysis' curve (0 outside it). */
export function magnitudeAt(impedance, f) {
  const xs = impedance?.frequencyHz ?? [];
  const ys = impedance?.magnitude ?? [];
  if (xs.length < 2 || f < xs[0] || f > xs[xs.length - 1]) return 0;
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= f) lo = mid; else hi = mid;
  }
  const t = (f - xs[lo]) / (xs[hi] - xs[lo] || 1);
  return ys[lo] + t * (ys[hi] - ys[lo]);
}

export function tappedPartials(response) {
  return (response.resonances ?? []).slice(0, MAX_RESONANCES).map((r) => ({
    frequencyHz: r.frequencyHz,
    amplitude: magnitudeAt(response.impedance, r.frequencyHz) || 1,
    decayPerSecond: (Math.PI * r.frequencyHz) / (r.q ?? DEFAULT_Q),
  }));
}

export function blownPartials(response) {
  const f1 = response.resonances?.[0]?.frequencyHz;
  if (!f1) return [];
  const out = [];
  for (let h = 1; h <= HARMONICS; h++) {
    out.push({ frequencyHz: h * f1, amplitude: magnitudeAt(response.impedance, h * f1) / h, decayPerSecond: 0 });
  }
  return out;
}

async function onPlay() {
  const p = state.panel;
  if (!state.analysis) { role(p, 'status').textContent = state.t('empty'); return; }
  stopAll();
  setVolume(Number(role(p, 'volume').value));
  const blown = role(p, 'mode').value === 'blown';
  const partials = blown ? blownPartials(state.analysis.response) : tappedPartials(state.analysis.response);
  const seconds = blown ? 1.5 : 2.5;
  const count = await play(partials, seconds, { sustain: blown });
  showPlaying(state, role(p, 'status'), count, seconds);
  p.dataset.playing = String(count);
  p.dataset.audioState = audioState().contextState;
}

async function init() {
  const panel = await mountPanel(state, 'listen-panel', 'listen-air');
  if (!panel) return;
  role(panel, 'play').addEventListener('click', onPlay);
  role(panel, 'stop').addEventListener('click', () => { stopAll(); panel.dataset.audioState = audioState().contextState; });
  role(panel, 'volume').addEventListener('input', (e) => { if (audioState().contextState !== 'none') setVolume(Number(e.target.value)); });
}

onPageEvent('nodewright:air-analyzed', (e) => {
  if (e.detail?.response) state.analysis = e.detail;
});

init().catch((e) => showPanelFailure('listen-panel', 'listen-air', e));
