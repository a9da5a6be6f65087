// Listening through the microphone for every measured-partials panel: the capture (Web Audio
// getUserMedia and an AudioWorklet tap), the running spectrum drawn while it listens, the onset
// detector that finds the pluck or tap, and the 16-bit PCM WAV the panels send to the server exactly
// as an uploaded file. The pure parts (encodeWav, createOnsetDetector, microphoneRefusal) touch no
// DOM and are tested with node --test; mountMicrophone wires the shared fragment
// templates/fragments/microphone.html (its texts: messages/measurements.properties, measure.mic.*).

/** What a listen keeps and how it hears the onset; a panel may override keepSeconds. */
export const LISTEN_DEFAULTS = Object.freeze({
  keepSeconds: 3,       // the recording sent: enough for 0.3 Hz bins and a dozen partials of a pluck
  preRollSeconds: 0.02, // kept before the onset frame, so the attack is not cut
  waitSeconds: 20,      // no onset by then: the listen ends and says so
  frameSeconds: 0.01,   // energy frames of the onset detector
  floorSeconds: 0.5,    // the room's level is the quietest frame of this long a past
  riseDb: 15,           // a frame this much above the room's level is an onset
  minDb: -60,           // ... and it must be at least this loud (dB re full scale, mean square)
});

const WORKLET_URL = '/js/common/microphone-worklet.js';
const WORKLET_NAME = 'nodewright-microphone-tap';

/**
 * Mono samples in [−1, 1] as a 16-bit PCM WAV (the canonical 44-byte RIFF/WAVE header: "fmt "
 * chunk of 16 bytes, format tag 1, then the "data" chunk; little-endian). A sample v becomes
 * round(v·32768) clamped to [−32768, 32767]; a sample that is not a finite number becomes 0.
 */
export function encodeWav(samples, sampleRate) {
  const rate = Math.round(sampleRate);
  if (!(rate >= 1)) throw new RangeError(`sampleRate must be at least 1 Hz, got ${sampleRate}`);
  const n = samples.length;
  const buffer = new ArrayBuffer(44 + 2 * n);
  const v = new DataView(buffer);
  const ascii = (at, s) => { for (let i = 0; i < s.length; i++) v.setUint8(at + i, s.charCodeAt(i)); };
  ascii(0, 'RIFF');
  v.setUint32(4, 36 + 2 * n, true);
  ascii(8, 'WAVE');
  ascii(12, 'fmt ');
  v.setUint32(16, 16, true);       // fmt chunk size
  v.setUint16(20, 1, true);        // PCM
  v.setUint16(22, 1, true);        // mono
  v.setUint32(24, rate, true);
  v.setUint32(28, rate * 2, true); // bytes per second
  v.setUint16(32, 2, true);        // bytes per frame
  v.setUint16(34, 16, true);       // bits per sample
  ascii(36, 'data');
  v.setUint32(40, 2 * n, true);
  for (let i = 0; i < n; i++) {
    const x = Number.isFinite(samples[i]) ? samples[i] : 0;
    v.setInt16(44 + 2 * i, Math.max(-32768, Math.min(32767, Math.round(x * 32768))), true);
  }
  return buffer;
}

/**
 * An energy-jump onset detector, fed block by block: the mean square of each frame in dB, the
 * room's level as the quietest frame of the last floorSeconds, and an onset where a frame is riseDb
 * above that level and at least minDb loud. A frame is only judged once a tenth of floorSeconds
 * (at least one frame) has been heard, so a stream that starts loud has no level to jump from.
 * push(block) answers the index (from the first sample pushed) of the onset frame's first sample,
 * or −1; after an onset it keeps answering that index. levelDb is the last frame's level.
 */
export function createOnsetDetector(options = {}) {
  const o = { ...LISTEN_DEFAULTS, ...options };
  if (!(o.sampleRate > 0)) throw new RangeError(`sampleRate must be positive, got ${o.sampleRate}`);
  const frame = Math.max(1, Math.round(o.frameSeconds * o.sampleRate));
  const history = Math.max(1, Math.round(o.floorSeconds / o.frameSeconds));
  const settle = Math.max(1, Math.round(history / 10));
  const levels = [];
  let sum = 0;
  let count = 0;
  let seen = 0;
  let onset = -1;
  const detector = {
    frameSamples: frame,
    levelDb: -Infinity,
    floorDb: Infinity,
    get onset() { return onset; },
    push(block) {
      if (onset >= 0) { seen += block.length; return onset; }
      for (let i = 0; i < block.length; i++) {
        const x = block[i];
        sum += Number.isFinite(x) ? x * x : 0;
        if (++count < frame) continue;
        const level = 10 * Math.log10(sum / frame + 1e-30);
        detector.levelDb = level;
        if (levels.length >= settle) {
          const floor = Math.min(...levels);
          detector.floorDb = floor;
          if (level >= o.minDb && level - floor >= o.riseDb) {
            onset = seen + i + 1 - frame;
            seen += block.length;
            return onset;
          }
        }
        levels.push(level);
        if (levels.length > history) levels.shift();
        sum = 0;
        count = 0;
      }
      seen += block.length;
      return -1;
    },
  };
  return detector;
}

/**
 * Why this browser will not give the page a microphone, or null when it may: "insecure" outside a
 * secure context (a page over plain HTTP from another machine; 127.0.0.1, localhost and HTTPS are
 * secure), "unsupported" without navigator.mediaDevices.getUserMedia or AudioWorklet.
 */
export function microphoneRefusal(win = globalThis) {
  if (!win.isSecureContext) return 'insecure';
  if (typeof win.navigator?.mediaDevices?.getUserMedia !== 'function') return 'unsupported';
  if (typeof win.AudioWorkletNode !== 'function') return 'unsupported';
  return null;
}

/** The loudest bin of an AnalyserNode's dB spectrum above 30 Hz, in Hz (null when all is silent). */
export function loudestHz(db, sampleRate, fftSize) {
  const binHz = sampleRate / fftSize;
  let best = -1;
  for (let k = Math.max(1, Math.ceil(30 / binHz)); k < db.length; k++) {
    if (Number.isFinite(db[k]) && (best < 0 || db[k] > db[best])) best = k;
  }
  return best < 0 || db[best] < -110 ? null : best * binHz;
}

/** A refusal of getUserMedia as one of the panel's words. */
function refusalWord(error) {
  switch (error?.name) {
    case 'NotAllowedError': case 'SecurityError': return 'denied';
    case 'NotFoundError': case 'OverconstrainedError': return 'nodevice';
    case 'NotReadableError': case 'AbortError': return 'busy';
    default: return 'failed';
  }
}

class ListenError extends Error {
  constructor(word, detail) {
    super(detail ?? word);
    this.word = word;
  }
}

/**
 * One listen: opens the microphone, reports each block's level and the analyser to onBlock, waits
 * for the onset and keeps keepSeconds from just before it. Resolves to {samples, sampleRate};
 * rejects with a ListenError whose word is a text key (denied, nodevice, busy, quiet, cancelled,
 * failed). Everything it opened is closed when it ends, whichever way.
 */
async function captureOnce({ keepSeconds, onBlock, onOnset, signal }) {
  let stream;
  try {
    stream = await navigator.mediaDevices.getUserMedia({
      audio: { echoCancellation: false, noiseSuppression: false, autoGainControl: false },
    });
  } catch (e) {
    throw new ListenError(refusalWord(e), e?.message);
  }
  const context = new AudioContext();
  const close = () => {
    stream.getTracks().forEach((track) => track.stop());
    context.close().catch(() => { /* already closed: nothing left to release */ });
  };
  try {
    await context.resume();
    await context.audioWorklet.addModule(WORKLET_URL);
    const source = context.createMediaStreamSource(stream);
    const analyser = context.createAnalyser();
    analyser.fftSize = 4096;
    analyser.smoothingTimeConstant = 0.5;
    const tap = new AudioWorkletNode(context, WORKLET_NAME, { numberOfInputs: 1, numberOfOutputs: 1, outputChannelCount: [1] });
    source.connect(analyser);
    source.connect(tap);
    tap.connect(context.destination); // pulled by the graph; the tap writes silence to it
    const rate = context.sampleRate;
    const o = LISTEN_DEFAULTS;
    const detector = createOnsetDetector({ sampleRate: rate });
    const keep = Math.round(keepSeconds * rate);
    const preRoll = Math.round(o.preRollSeconds * rate);
    return await new Promise((resolve, reject) => {
      const chunks = []; // [{start, data}] from the first sample heard
      let heard = 0;
      let start = -1;
      const timer = setTimeout(() => finish(new ListenError('quiet')), o.waitSeconds * 1000);
      const abort = () => finish(new ListenError('cancelled'));
      signal?.addEventListener('abort', abort);
      function finish(result) {
        clearTimeout(timer);
        signal?.removeEventListener('abort', abort);
        tap.port.onmessage = null;
        if (result instanceof Error) reject(result); else resolve(result);
      }
      tap.port.onmessage = (event) => {
        const data = event.data;
        chunks.push({ start: heard, data });
        heard += data.length;
        if (start < 0) {
          const at = detector.push(data);
          if (at >= 0) {
            start = Math.max(0, at - preRoll);
            clearTimeout(timer);
            onOnset?.();
          } else {
            // While waiting, a second of the past is enough for the pre-roll.
            while (chunks.length > 1 && chunks[1].start < heard - rate) chunks.shift();
          }
        }
        onBlock?.(analyser, detector, rate);
        if (start >= 0 && heard >= start + keep) {
          const samples = new Float32Array(keep);
          for (const c of chunks) {
            const from = Math.max(start, c.start);
            const to = Math.min(start + keep, c.start + c.data.length);
            if (to > from) samples.set(c.data.subarray(from - c.start, to - c.start), from - start);
          }
          finish({ samples, sampleRate: rate });
        }
      };
    });
  } catch (e) {
    throw e instanceof ListenError ? e : new ListenError('failed', e?.message);
  } finally {
    close();
  }
}

/** Draws an AnalyserNode's spectrum as a line, log frequency 30 Hz – 12 kHz, −110 … −10 dB. */
function drawSpectrum(canvas, analyser, rate) {
  const g = canvas.getContext('2d');
  if (!g) return;
  const db = new Float32Array(analyser.frequencyBinCount);
  analyser.getFloatFrequencyData(db);
  const w = canvas.width;
  const h = canvas.height;
  g.clearRect(0, 0, w, h);
  g.strokeStyle = getComputedStyle(canvas).color || '#2b5d8a';
  g.lineWidth = 1.5;
  g.beginPath();
  const lo = Math.log(30);
  const hi = Math.log(12000);
  const binHz = rate / analyser.fftSize;
  let first = true;
  for (let k = 1; k < db.length; k++) {
    const f = k * binHz;
    if (f < 30 || f > 12000) continue;
    const x = ((Math.log(f) - lo) / (hi - lo)) * w;
    const y = h * (1 - (Math.max(-110, Math.min(-10, db[k])) + 110) / 100);
    if (first) g.moveTo(x, y); else g.lineTo(x, y);
    first = false;
  }
  g.stroke();
  canvas.dataset.frames = String(Number(canvas.dataset.frames || 0) + 1);
  return db;
}

/**
 * Wires one microphone fragment (element [data-mic]) of a panel. onRecording(file, seconds) gets the
 * WAV as a File named like an upload and returns a promise (the panel's own upload path); the
 * fragment's state is in data-state: idle | refused | asking | waiting | recording | sending | done | failed.
 */
export function mountMicrophone(root, { onRecording, keepSeconds = LISTEN_DEFAULTS.keepSeconds }) {
  const part = (name) => root.querySelector(`[data-mic-role="${name}"]`);
  const words = Object.fromEntries([...root.querySelectorAll('[data-mic-k]')].map((e) => [e.dataset.micK, e.textContent]));
  const t = (key, ...args) => (words[key] ?? key).replace(/\{(\d+)\}/g, (_, i) => String(args[Number(i)] ?? ''));
  const listen = part('listen');
  const stop = part('stop');
  const canvas = part('spectrum');
  const status = part('status');
  const say = (state, text) => { root.dataset.state = state; status.textContent = text; };
  let controller = null;
  part('lede').textContent = t('lede', keepSeconds);

  const refusal = microphoneRefusal(window);
  if (refusal) {
    listen.disabled = true;
    say('refused', t(refusal));
    return;
  }
  say('idle', '');

  listen.addEventListener('click', async () => {
    if (controller) return;
    controller = new AbortController();
    listen.hidden = true;
    stop.hidden = false;
    canvas.hidden = false;
    canvas.dataset.frames = '0';
    say('asking', t('asking'));
    try {
      const heard = await captureOnce({
        keepSeconds,
        signal: controller.signal,
        onOnset: () => say('recording', t('recording', keepSeconds)),
        onBlock: (analyser, detector, rate) => {
          const db = drawSpectrum(canvas, analyser, rate);
          if (root.dataset.state === 'asking' || root.dataset.state === 'waiting') {
            const f = db ? loudestHz(db, rate, analyser.fftSize) : null;
            say('waiting', t('waiting', f == null ? '—' : f.toFixed(0), Number.isFinite(detector.levelDb) ? detector.levelDb.toFixed(0) : '—'));
          }
        },
      });
      const seconds = (heard.samples.length / heard.sampleRate).toFixed(1);
      say('sending', t('sending', seconds));
      stop.hidden = true;
      const file = new File([encodeWav(heard.samples, heard.sampleRate)], 'microphone.wav', { type: 'audio/wav' });
      root.dataset.sampleRate = String(heard.sampleRate);
      const ok = await onRecording(file, heard.samples.length / heard.sampleRate);
      say(ok === false ? 'failed' : 'done', ok === false ? '' : t('done', seconds));
    } catch (e) {
      say(e.word === 'cancelled' ? 'idle' : 'failed', e.word === 'cancelled' ? '' : t(e.word ?? 'failed', e.word === 'quiet' ? LISTEN_DEFAULTS.waitSeconds : e.message));
    } finally {
      controller = null;
      listen.hidden = false;
      stop.hidden = true;
    }
  });
  stop.addEventListener('click', () => controller?.abort());
}
