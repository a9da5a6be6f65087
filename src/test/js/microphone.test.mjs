// The microphone's pure parts without a browser: the WAV bytes, the onset detector, the refusals.
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { encodeWav, createOnsetDetector, microphoneRefusal, loudestHz } from '../../../static-assets/js/common/microphone.js';

const hex = (buffer) => Buffer.from(buffer).toString('hex');

// The canonical 44-byte PCM header of the RIFF/WAVE layout (Microsoft & IBM, "Multimedia Programming
// Interface and Data Specifications 1.0", 1991, the "WAVE" form and its "fmt " chunk), written out
// by hand for 4 mono 16-bit samples at 48 000 Hz: RIFF size 36 + 8, fmt size 16, tag 1, 1 channel,
// 48000 = 0x0000BB80, 96000 bytes/s = 0x00017700, block align 2, 16 bits, data size 8. (Python's
// standard wave module reads such a file back as 1 channel, width 2, 48000 Hz, frames 0, 16384, −32768, 32767.)
test('four samples make the canonical header and little-endian 16-bit data', () => {
  const wav = encodeWav(new Float32Array([0, 0.5, -1, 1]), 48000);
  assert.equal(wav.byteLength, 44 + 8);
  assert.equal(hex(wav.slice(0, 44)),
    '52494646' + '2c000000' + '57415645' + '666d7420' + '10000000' + '0100' + '0100'
    + '80bb0000' + '00770100' + '0200' + '1000' + '64617461' + '08000000');
  // v·32768 rounded, clamped to the int16 range: 0, 16384, −32768, 32767 (two's complement, LE).
  assert.equal(hex(wav.slice(44)), '0000' + '0040' + '0080' + 'ff7f');
});

test('out-of-range and non-numbers are clamped or silenced, not wrapped', () => {
  const wav = new DataView(encodeWav([2, -3, NaN, Infinity, -0.25], 44100));
  assert.deepEqual([0, 1, 2, 3, 4].map((i) => wav.getInt16(44 + 2 * i, true)), [32767, -32768, 0, 0, -8192]);
  assert.equal(wav.getUint32(24, true), 44100);
  assert.equal(wav.getUint32(28, true), 88200);
});

test('a sample rate that is no rate is refused', () => {
  assert.throws(() => encodeWav([0], 0), RangeError);
  assert.throws(() => encodeWav([0], NaN), RangeError);
});

/** Seeded Gaussian noise (Park–Miller minimal standard generator, Box–Muller), rms given. */
function noise(n, rms, seed = 12345) {
  let s = seed;
  const u = () => { s = (s * 16807) % 2147483647; return s / 2147483647; };
  const out = new Float32Array(n);
  for (let i = 0; i < n; i++) out[i] = rms * Math.sqrt(-2 * Math.log(u())) * Math.cos(2 * Math.PI * u());
  return out;
}

const RATE = 48000;

/** Room noise at −70 dB, then from `at` a 220 Hz tone of amplitude 0.3 decaying in 1 s. */
function pluckAt(at, total) {
  const x = noise(total, Math.pow(10, -70 / 20));
  for (let i = at; i < total; i++) x[i] += 0.3 * Math.exp(-(i - at) / RATE) * Math.sin(2 * Math.PI * 220 * (i - at) / RATE);
  return x;
}

function feed(detector, x, block) {
  let found = -1;
  for (let i = 0; i < x.length && found < 0; i += block) found = detector.push(x.subarray(i, i + block));
  return found;
}

test('the pluck is found within one 10 ms frame of its first sample, whatever the block size', () => {
  const x = pluckAt(30000, 60000);
  for (const block of [128, 2048, 60000]) {
    const d = createOnsetDetector({ sampleRate: RATE });
    const at = feed(d, x, block);
    assert.ok(at >= 30000 - 480 && at <= 30000, `block ${block}: onset ${at}`);
    assert.ok(d.floorDb < -65 && d.floorDb > -75, `floor ${d.floorDb}`);
  }
});

test('steady room noise and a slow swell are no onset', () => {
  assert.equal(feed(createOnsetDetector({ sampleRate: RATE }), noise(RATE * 2, 1e-3), 2048), -1);
  // A tone swelling 10 dB per second: 5 dB over the half-second the room's level is taken from.
  const swell = new Float32Array(RATE * 3).map((_, i) => 0.01 * Math.pow(10, (10 * i / RATE) / 20) * Math.sin(2 * Math.PI * 330 * i / RATE));
  assert.equal(feed(createOnsetDetector({ sampleRate: RATE }), swell, 2048), -1);
});

test('a stream that starts in the middle of a note has nothing to jump from', () => {
  const x = pluckAt(0, RATE);
  assert.equal(feed(createOnsetDetector({ sampleRate: RATE }), x, 2048), -1);
});

test('a jump below the loudness floor is no onset (a click far away in a quiet room)', () => {
  const x = noise(RATE, Math.pow(10, -100 / 20));
  for (let i = 24000; i < RATE; i++) x[i] += Math.pow(10, -70 / 20) * Math.sin(2 * Math.PI * 440 * i / RATE);
  assert.equal(feed(createOnsetDetector({ sampleRate: RATE }), x, 2048), -1);
  assert.ok(feed(createOnsetDetector({ sampleRate: RATE, minDb: -90 }), x, 2048) > 0);
});

test('refusals: plain HTTP from another host, no mediaDevices, no AudioWorklet', () => {
  const gum = { getUserMedia: () => {} };
  const worklet = function AudioWorkletNode() {};
  assert.equal(microphoneRefusal({ isSecureContext: false, navigator: { mediaDevices: gum }, AudioWorkletNode: worklet }), 'insecure');
  assert.equal(microphoneRefusal({ isSecureContext: true, navigator: {}, AudioWorkletNode: worklet }), 'unsupported');
  assert.equal(microphoneRefusal({ isSecureContext: true, navigator: { mediaDevices: gum } }), 'unsupported');
  assert.equal(microphoneRefusal({ isSecureContext: true, navigator: { mediaDevices: gum }, AudioWorkletNode: worklet }), null);
});

test('the loudest bin is read as its frequency, k·rate/fftSize', () => {
  const db = new Float32Array(2048).fill(-120);
  db[94] = -20; // 94 · 48000 / 4096 = 1101.6 Hz
  assert.ok(Math.abs(loudestHz(db, 48000, 4096) - 1101.5625) < 1e-9);
  assert.equal(loudestHz(new Float32Array(2048).fill(-140), 48000, 4096), null);
});
