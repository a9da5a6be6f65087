// The audio-thread half of common/microphone.js (an AudioWorklet module must be a file of its own):
// hands the microphone's samples, mixed to mono, to the page in blocks of 2048; its output is silence.
const BLOCK = 2048;

class MicrophoneTap extends AudioWorkletProcessor {
  constructor() {
    super();
    this.block = new Float32Array(BLOCK);
    this.filled = 0;
  }

  process(inputs) {
    const channels = inputs[0] ?? [];
    if (channels.length === 0) return true;
    const frames = channels[0].length;
    for (let i = 0; i < frames; i++) {
      let sum = 0;
      for (const ch of channels) sum += ch[i];
      this.block[this.filled++] = sum / channels.length;
      if (this.filled === BLOCK) {
        this.port.postMessage(this.block, [this.block.buffer]);
        this.block = new Float32Array(BLOCK);
        this.filled = 0;
      }
    }
    return true;
  }
}

registerProcessor('nodewright-microphone-tap', MicrophoneTap);
