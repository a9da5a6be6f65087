// Pure geometry of the set planner's drawing (no DOM): each string's outside diameter, the one
// magnification all gauges are drawn at, the rows across the nut, the tension scale along the
// neck, the stress-share band and where the server's limits fall on it.

/**
 * The outside diameter of a set member, mm: the core for a plain string, the core plus twice the
 * wrap wire for a round-wound one (one layer of wrap each side, common practice). NaN when unreadable.
 */
export function outerDiameterMm(member) {
  const core = member?.diameterMm;
  if (!(Number.isFinite(core) && core > 0)) return NaN;
  const wrap = member.wrapDiameterMm;
  return Number.isFinite(wrap) && wrap > 0 ? core + 2 * wrap : core;
}

/** A round figure at or above v (1, 2, 2.5 or 5 times a power of ten) for a scale's end. */
export function niceCeil(v) {
  if (!(v > 0) || !Number.isFinite(v)) return 1;
  const p = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) {
    if (m * p >= v * (1 - 1e-12)) return m * p;
  }
  return 10 * p;
}

/**
 * The drawing's magnification of the gauges: every string drawn at the same px per mm of
 * diameter, the thickest maxWidthPx wide (at most `cap` px per mm, so a set of thin strings is
 * not blown up past legibility's need).
 */
export function gaugeScale(outerDiametersMm, { maxWidthPx = 11, cap = 16 } = {}) {
  const good = outerDiametersMm.filter((d) => Number.isFinite(d) && d > 0);
  if (!good.length) return cap;
  return Math.min(cap, maxWidthPx / Math.max(...good));
}

/**
 * The rows of the drawing: strings in their set order, top to bottom, each `pitch` px apart
 * (enough for the thickest string and its bar), widths at one magnification, tension bars on
 * one scale (0..tensionScaleN over barPx), the stress share on a 0..100 % band of bandPx with the
 * server's limits marked. members: [{outerMm, tensionN, stressFraction}].
 */
export function neckRows(members, { top = 0, pitch = 30, barPx = 300, bandPx = 120, maxWidthPx = 11 } = {}) {
  const pxPerMm = gaugeScale(members.map((m) => m.outerMm), { maxWidthPx });
  const tensionScaleN = niceCeil(Math.max(0, ...members.map((m) => (Number.isFinite(m.tensionN) ? m.tensionN : 0))));
  return {
    pxPerMm,
    tensionScaleN,
    rows: members.map((m, i) => ({
      y: top + pitch / 2 + i * pitch,
      widthPx: Number.isFinite(m.outerMm) ? m.outerMm * pxPerMm : 0,
      barPx: Number.isFinite(m.tensionN) ? (m.tensionN / tensionScaleN) * barPx : 0,
      bandPx: Number.isFinite(m.stressFraction) ? Math.min(1, Math.max(0, m.stressFraction)) * bandPx : null,
    })),
  };
}

/** Where a share of the strength (0.75 = 75 %) falls on a band of bandPx; null without a limit. */
export const bandAt = (fraction, bandPx) => (Number.isFinite(fraction) ? Math.min(1, Math.max(0, fraction)) * bandPx : null);

/** Each string's share of the neck's total load, for the stacked bar above the neck (shares sum to 1). */
export function loadShares(tensionsN) {
  const total = tensionsN.reduce((s, v) => s + (Number.isFinite(v) && v > 0 ? v : 0), 0);
  return tensionsN.map((v) => (total > 0 && Number.isFinite(v) && v > 0 ? v / total : 0));
}
