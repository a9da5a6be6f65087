// Where a new pickup goes on the string bench: in the middle of the widest free stretch of the
// pickup zone, or nowhere when no stretch is wide enough. Pure, for the page and its tests.

/** The zone pickups are placed in, as fractions of the vibrating length from the nut (common practice). */
export const PICKUP_ZONE = [0.70, 0.97];

/**
 * Position (mm from the nut) for a new pickup among the existing positions, or null when every
 * free stretch of the zone is narrower than minGapMm (then there is no room for another pickup).
 */
export function nextPickupMm(lengthMm, positionsMm, minGapMm) {
  const [from, to] = PICKUP_ZONE.map((f) => f * lengthMm);
  const inside = positionsMm.filter((x) => Number.isFinite(x) && x > from && x < to).sort((a, b) => a - b);
  const edges = [from, ...inside, to];
  let best = null;
  for (let i = 1; i < edges.length; i++) {
    const gap = edges[i] - edges[i - 1];
    // The new pickup goes in the middle of the stretch: half of it lies on each side.
    const room = inside.length === 0 ? gap : gap / 2;
    if (room >= minGapMm && (!best || gap > best.gap)) best = { gap, x: (edges[i - 1] + edges[i]) / 2 };
  }
  if (!best) return null;
  return Math.round(best.x * 10) / 10;   // a tenth of a millimetre: what a maker marks
}
