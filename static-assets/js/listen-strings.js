// Listening panel of the string bench: plays the designed string from its last analysis —
// predicted partials (stiffness included) weighted by the pluck and the chosen pickups, each
// decaying at its own rate — and compares two remembered versions ("A" and "B").
import { showPanelFailure } from './common/panels.js';
import { mountPanel, role, showPlaying, sig, onPageEvent } from './measure/panel.js';
import { play, schedule, audio, setVolume, stopAll, state as audioState } from './measure/voices.js';

const LN_1000 = Math.log(1000); // T60: the time to fall 60 dB, e^{−σ·T60} = 1/1000
const state = { analysis: null, panel: null, t: null, sourceChosen: false, snapshots: { A: null, B: null } };

/**
 * Decay rates σn = b1 + b3·kn², kn = nπ/L: the two loss terms of Chaigne & Askenfelt's string
 * model (JASA 95(2), 1994), b1 and b3 solved from the decay times of partials 1 and 10.
 */
export function decayRates(modes, lengthMm, t60, t60At10) {
  const L = lengthMm / 1000;
  const k = (n) => (n * Math.PI) / L;
  const s1 = LN_1000 / t60;
  const s10 = LN_1000 / Math.min(t60At10, t60); // partial 10 never dies slower than the fundamental
  const b3 = (s10 - s1) / (k(10) ** 2 - k(1) ** 2);
  const b1 = s1 - b3 * k(1) ** 2;
  return modes.map((m) => b1 + b3 * k(m.n) ** 2);
}

/** Weight of each mode as heard: |excitation × pickup gain × n| (velocity at a magnetic pickup). */
export function weights(modes, source) {
  return modes.map((m) => {
    const excitation = m.excitation ?? 1 / m.n;
    const gains = m.pickupResponse ?? [];
    let gain = 1;
    if (source === 'both') gain = (gains[0] ?? 0) + (gains[1] ?? 0);
    else if (source.startsWith('pickup')) gain = gains[Number(source.slice(6))] ?? 0;
    return Math.abs(excitation * gain * m.n);
  });
}

function currentPartials() {
  const { request, response } = state.analysis;
  const p = state.panel;
  const t60 = Number(role(p, 't60').value) || 4;
  const t60high = Number(role(p, 't60high').value) || 1;
  const source = role(p, 'source').value || 'plain';
  const rates = decayRates(response.modes, request.lengthMm, t60, t60high);
  const w = weights(response.modes, source);
  const partials = response.modes.map((m, i) => ({ n: m.n, frequencyHz: m.frequencyHz, amplitude: w[i], decayPerSecond: rates[i] }));
  const sourceLabel = role(p, 'source').selectedOptions[0]?.textContent ?? '';
  return { partials, durationS: Math.min(8, t60 + 0.2), fundamentalHz: response.fundamentalHz, sourceLabel };
}

function fillSources() {
  const select = role(state.panel, 'source');
  const previous = select.value;
  const count = state.analysis?.response.modes?.[0]?.pickupResponse?.length ?? 0;
  const options = [];
  for (let i = 0; i < count; i++) options.push([`pickup${i}`, state.t('pickup', i + 1)]);
  if (count >= 2) options.push(['both', state.t('both')]);
  options.push(['plain', state.t('plain')]);
  select.replaceChildren(...options.map(([value, label]) => Object.assign(document.createElement('option'), { value, textContent: label })));
  // Keep the user's choice; until there is one, the first pickup (or the string alone).
  if (state.sourceChosen && options.some(([v]) => v === previous)) select.value = previous;
}

function report() {
  const s = audioState();
  state.panel.dataset.audioState = s.contextState;
  state.panel.dataset.voices = String(s.voices);
}

async function onPlay() {
  const status = role(state.panel, 'status');
  if (!state.analysis) { status.textContent = state.t('empty'); return; }
  stopAll();
  setVolume(Number(role(state.panel, 'volume').value));
  const { partials, durationS } = currentPartials();
  const count = await play(partials, durationS);
  showPlaying(state, status, count, durationS);
  state.panel.dataset.playing = String(count);
  report();
}

function remember(slot) {
  if (!state.analysis) { role(state.panel, 'status').textContent = state.t('empty'); return; }
  state.snapshots[slot] = currentPartials();
  showSnapshots();
}

function showSnapshots() {
  const parts = ['A', 'B'].filter((k) => state.snapshots[k])
    .map((k) => state.t('snapshot', k, sig(state.snapshots[k].fundamentalHz, 6), state.snapshots[k].sourceLabel));
  role(state.panel, 'snapshots').textContent = parts.length ? parts.join(' · ') : state.t('nothing');
}

async function onCompare() {
  const { A, B } = state.snapshots;
  if (!A || !B) { role(state.panel, 'status').textContent = state.t('nothing'); return; }
  stopAll();
  setVolume(Number(role(state.panel, 'volume').value));
  const ctx = audio();
  if (ctx.state === 'suspended') await ctx.resume();
  const each = 2.5; // seconds of each version, then a short gap
  const t0 = ctx.currentTime + 0.03;
  const a = schedule(A.partials, t0, Math.min(each, A.durationS));
  const b = schedule(B.partials, t0 + each + 0.4, Math.min(each, B.durationS));
  state.panel.dataset.playing = String(a + b);
  report();
}

async function init() {
  const panel = await mountPanel(state, 'listen-panel', 'listen-strings');
  if (!panel) return;
  role(panel, 'rememberA').textContent = state.t('remember', 'A');
  role(panel, 'rememberB').textContent = state.t('remember', 'B');
  role(panel, 'play').addEventListener('click', onPlay);
  role(panel, 'stop').addEventListener('click', () => { stopAll(); report(); });
  role(panel, 'volume').addEventListener('input', (e) => { if (audioState().contextState !== 'none') setVolume(Number(e.target.value)); });
  role(panel, 'source').addEventListener('change', () => { state.sourceChosen = true; });
  role(panel, 'rememberA').addEventListener('click', () => remember('A'));
  role(panel, 'rememberB').addEventListener('click', () => remember('B'));
  role(panel, 'compare').addEventListener('click', onCompare);
  fillSources();
  showSnapshots();
}

onPageEvent('nodewright:string-analyzed', (e) => {
  if (!e.detail?.response?.modes) return;
  state.analysis = e.detail;
  if (state.panel) fillSources();
});

init().catch((e) => showPanelFailure('listen-panel', 'listen-strings', e));
