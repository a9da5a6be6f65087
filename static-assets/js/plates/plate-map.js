// Draws one plate mode on a canvas: w on its grid as a two-phase colour map whose lightness also
// differs (light warm for +, dark cool for -), the node lines as a thick dark line with a light edge,
// and + / - marks on the two largest lobes, so the map reads without colour too.

function colour(w) {
  const t = Math.max(-1, Math.min(1, w));
  if (t >= 0) {
    // white to orange, stays light
    return `rgb(${255}, ${Math.round(255 - 120 * t)}, ${Math.round(255 - 220 * t)})`;
  }
  const s = -t;
  // white to dark blue
  return `rgb(${Math.round(255 - 225 * s)}, ${Math.round(255 - 195 * s)}, ${Math.round(255 - 95 * s)})`;
}

/** Draws mode {grid: {xMm, yMm, w}, nodalLines} on the canvas; x to the right, y up. */
export function drawMode(canvas, mode) {
  const ctx = canvas.getContext('2d');
  const { xMm, yMm, w } = mode.grid;
  const x0 = xMm[0];
  const x1 = xMm[xMm.length - 1];
  const y0 = yMm[0];
  const y1 = yMm[yMm.length - 1];
  const pad = 6;
  const scale = Math.min((canvas.width - 2 * pad) / (x1 - x0), (canvas.height - 2 * pad) / (y1 - y0));
  const px = (x) => pad + (x - x0) * scale;
  const py = (y) => canvas.height - pad - (y - y0) * scale;
  ctx.clearRect(0, 0, canvas.width, canvas.height);
  const dx = xMm.length > 1 ? (xMm[1] - xMm[0]) * scale : 1;
  const dy = yMm.length > 1 ? (yMm[1] - yMm[0]) * scale : 1;
  let best = { v: -2 };
  let worst = { v: 2 };
  for (let i = 0; i < xMm.length; i++) {
    for (let j = 0; j < yMm.length; j++) {
      const v = w[i][j];
      if (v === null) continue;
      ctx.fillStyle = colour(v);
      ctx.fillRect(px(xMm[i]) - dx / 2, py(yMm[j]) - dy / 2, dx + 0.6, dy + 0.6);
      if (v > best.v) best = { v, x: xMm[i], y: yMm[j] };
      if (v < worst.v) worst = { v, x: xMm[i], y: yMm[j] };
    }
  }
  ctx.lineJoin = 'round';
  ctx.lineCap = 'round';
  for (const [width, style] of [[5, '#ffffff'], [2.5, '#111111']]) {
    ctx.lineWidth = width;
    ctx.strokeStyle = style;
    for (const line of mode.nodalLines) {
      ctx.beginPath();
      line.forEach(([x, y], k) => (k === 0 ? ctx.moveTo(px(x), py(y)) : ctx.lineTo(px(x), py(y))));
      ctx.stroke();
    }
  }
  ctx.fillStyle = '#000';
  ctx.font = 'bold 14px sans-serif';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  if (best.v > 0.5) ctx.fillText('+', px(best.x), py(best.y));
  if (worst.v < -0.5) { ctx.fillStyle = '#fff'; ctx.fillText('\u2212', px(worst.x), py(worst.y)); }
  canvas.dataset.nodalLines = String(mode.nodalLines.length);
  canvas.dataset.frequencyHz = String(mode.frequencyHz);
}
