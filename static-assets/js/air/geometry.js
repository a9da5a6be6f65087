// Pure geometry of the bore drawings (no DOM): the usable rows of a bore, the wall at a point,
// where a fingering's holes sit on its small drawing, the handles the bore drawing offers for
// editing, the steps the arrow keys move them by, and the cents gauge's scale.

const usable = (v) => Number.isFinite(v) && v > 0;

/** The segments whose three figures are usable (positive numbers), in order. */
export function usableSegments(segments) {
  return (segments ?? []).map((s, index) => ({ ...s, index }))
    .filter((s) => usable(s.lengthMm) && usable(s.inputDiameterMm) && usable(s.outputDiameterMm));
}

/** The holes whose position, diameter and chimney are usable (position and chimney may be 0). */
export function usableHoles(holes) {
  return (holes ?? []).map((h, index) => ({ ...h, index }))
    .filter((h) => [h.positionMm, h.diameterMm, h.chimneyMm].every((v) => Number.isFinite(v) && v >= 0) && h.diameterMm > 0);
}

/** The sum of the usable segments' lengths, mm. */
export function totalLengthMm(segments) {
  return usableSegments(segments).reduce((sum, s) => sum + s.lengthMm, 0);
}

/**
 * The bore diameter at a distance from the input end, linear within each segment (a conical
 * frustum has a straight wall); at a joint the downstream segment's input diameter. Beyond the
 * ends the end diameters. NaN without usable segments.
 */
export function wallDiameterAt(segments, mm) {
  const good = usableSegments(segments);
  if (!good.length) return NaN;
  let from = 0;
  for (const g of good) {
    if (mm < from + g.lengthMm) {
      const s = Math.max(0, (mm - from) / g.lengthMm);
      return g.inputDiameterMm + s * (g.outputDiameterMm - g.inputDiameterMm);
    }
    from += g.lengthMm;
  }
  return good[good.length - 1].outputDiameterMm;
}

/** The joints: the far end of each usable segment, {segment (its request index), atMm}. */
export function joints(segments) {
  let at = 0;
  return usableSegments(segments).map((g) => {
    at += g.lengthMm;
    return { segment: g.index, atMm: at };
  });
}

/**
 * The diameter handles of the bore drawing: one at each end of the bore, and one at each joint,
 * where a joint whose two sides meet at the same diameter gets ONE handle that moves both (the
 * bore stays continuous) and a step in the bore gets two, one each side. Each handle names the
 * request fields it moves: targets [{segment, field}].
 */
export function diameterHandles(segments) {
  const good = usableSegments(segments);
  const out = [];
  let at = 0;
  good.forEach((g, k) => {
    if (k === 0) out.push({ atMm: 0, side: 'after', diameterMm: g.inputDiameterMm, targets: [{ segment: g.index, field: 'inputDiameterMm' }] });
    at += g.lengthMm;
    const next = good[k + 1];
    if (!next) {
      out.push({ atMm: at, side: 'before', diameterMm: g.outputDiameterMm, targets: [{ segment: g.index, field: 'outputDiameterMm' }] });
    } else if (next.inputDiameterMm === g.outputDiameterMm) {
      out.push({ atMm: at, side: 'both', diameterMm: g.outputDiameterMm,
        targets: [{ segment: g.index, field: 'outputDiameterMm' }, { segment: next.index, field: 'inputDiameterMm' }] });
    } else {
      out.push({ atMm: at, side: 'before', diameterMm: g.outputDiameterMm, targets: [{ segment: g.index, field: 'outputDiameterMm' }] });
      out.push({ atMm: at, side: 'after', diameterMm: next.inputDiameterMm, targets: [{ segment: next.index, field: 'inputDiameterMm' }] });
    }
  });
  return out;
}

/**
 * How far one press of an arrow key moves a handle, in mm: lengths and positions by 1 mm (or
 * 1/32 inch when the page shows inches), diameters by 0.1 mm (or 1/256 inch); Shift moves ten steps.
 */
export function keyStepMm(kind, unit, big = false) {
  const inch = unit === 'inch';
  const base = kind === 'diameter' ? (inch ? 25.4 / 256 : 0.1) : (inch ? 25.4 / 32 : 1);
  return big ? 10 * base : base;
}

/**
 * A dragged or stepped value kept in bounds: lengths and diameters stay at least `min` (the
 * smallest the editor offers by hand, 0.1 mm), positions within [0, totalMm]. Rounded to 0.01 mm
 * so the rows show a figure a maker can read back.
 */
export function boundedMm(kind, mm, { totalMm = Infinity, min = 0.1 } = {}) {
  let v = mm;
  if (kind === 'position') v = Math.min(Math.max(v, 0), totalMm);
  else v = Math.max(v, min);
  return Math.round(v * 100) / 100;
}

/**
 * A fingering's small drawing: the bore upright from the input end (top) to the output end
 * (bottom), the length to scale over heightPx; across the bore one scale for the walls and the
 * holes (the widest bore spans at most 2·halfWidthPx, and the scale across is never larger than
 * the one along), so every hole's circle is in proportion to the bore and to the other holes and
 * holes never look closer than they are. Returns {pxPerMm, acrossPxPerMm, totalMm, wall: [{y, half}],
 * holes: [{index, y, r, diameterMm}]}; holes beyond the bore are left out.
 */
export function fingeringLayout(segments, holes, { heightPx = 200, halfWidthPx = 10, padPx = 0 } = {}) {
  const good = usableSegments(segments);
  const total = good.reduce((sum, s) => sum + s.lengthMm, 0);
  if (!(total > 0)) return { pxPerMm: 0, acrossPxPerMm: 0, totalMm: 0, wall: [], holes: [] };
  const pxPerMm = (heightPx - 2 * padPx) / total;
  const widest = Math.max(...good.flatMap((g) => [g.inputDiameterMm, g.outputDiameterMm]));
  // Never wider across than along: a bore long enough for the height is drawn to one scale both ways.
  const across = Math.min(halfWidthPx / (widest / 2), pxPerMm);
  const wall = [];
  let at = 0;
  for (const g of good) {
    wall.push({ y: padPx + at * pxPerMm, half: (g.inputDiameterMm / 2) * across });
    at += g.lengthMm;
    wall.push({ y: padPx + at * pxPerMm, half: (g.outputDiameterMm / 2) * across });
  }
  return {
    pxPerMm,
    acrossPxPerMm: across,
    totalMm: total,
    wall,
    holes: usableHoles(holes).filter((h) => h.positionMm <= total)
      .map((h) => ({ index: h.index, y: padPx + h.positionMm * pxPerMm, r: (h.diameterMm / 2) * across, diameterMm: h.diameterMm })),
  };
}

/** The height of a fingering's drawing: 1 px per mm of bore, kept between 180 and 360 px. */
export function fingeringHeightPx(totalMm) {
  return Math.round(Math.min(360, Math.max(180, totalMm || 0)));
}

/**
 * The cents gauge's scale: symmetric about 0, at least ±50 cents (a quarter tone each side) and
 * at least three tolerances each side, so that the tolerance band and its neighbours both show.
 * x maps cents to 0..widthPx; a value beyond the scale is pinned to the edge and marked beyond.
 */
export function centsGauge(cents, tolerance, widthPx) {
  const tol = Number.isFinite(tolerance) && tolerance >= 0 ? tolerance : 0;
  const range = Math.max(50, 3 * tol);
  const x = (c) => ((Math.min(Math.max(c, -range), range) + range) / (2 * range)) * widthPx;
  const known = Number.isFinite(cents);
  return {
    range,
    bandFrom: x(-tol),
    bandTo: x(tol),
    centre: x(0),
    needle: known ? x(cents) : null,
    beyond: known && Math.abs(cents) > range ? Math.sign(cents) : 0,
  };
}
