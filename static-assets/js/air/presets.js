// Demo bores of the Harrowgate Lane Workshop (an invented shop). Dimensions are chosen to be
// physically sensible for each kind of pipe; every length in millimetres, as the API speaks.

const AIR = { temperatureC: 20.0, relativeHumidityPct: 50.0, losses: true, referenceA4Hz: 440.0 };

// The six-hole whistle's D-major fingering chart over two registers, shared by the idealised tube
// and the tube as built (preset() clones a preset before the page uses it).
const WHISTLE_FINGERINGS = [
  { name: 'D5', closedHoles: [0, 1, 2, 3, 4, 5], targetNote: 'D5', register: 1 },
  { name: 'E5', closedHoles: [0, 1, 2, 3, 4], targetNote: 'E5', register: 1 },
  { name: 'F#5', closedHoles: [0, 1, 2, 3], targetNote: 'F#5', register: 1 },
  { name: 'G5', closedHoles: [0, 1, 2], targetNote: 'G5', register: 1 },
  { name: 'A5', closedHoles: [0, 1], targetNote: 'A5', register: 1 },
  { name: 'B5', closedHoles: [0], targetNote: 'B5', register: 1 },
  { name: 'C#6', closedHoles: [], targetNote: 'C#6', register: 1 },
  { name: 'D6', closedHoles: [0, 1, 2, 3, 4, 5], targetNote: 'D6', register: 2 },
  { name: 'E6', closedHoles: [0, 1, 2, 3, 4], targetNote: 'E6', register: 2 },
];

export const PRESETS = {
  // A stopped (gedackt) organ pipe: the stopper is the closed input end, the mouth end radiates.
  // Expect odd harmonics, f1 near c / 4(L + 0.61a) ≈ 280 Hz.
  'stopped-pipe': {
    segments: [{ lengthMm: 300.0, inputDiameterMm: 25.0, outputDiameterMm: 25.0 }],
    inputEnd: 'closed', outputEnd: 'open-unflanged', holes: [],
    ...AIR, fMinHz: 50.0, fMaxHz: 3000.0, points: 3000, fingerings: [],
  },
  // An open flue pipe, open at both ends: all harmonics, f1 near c / 2L' ≈ 280 Hz.
  'open-flue': {
    segments: [{ lengthMm: 600.0, inputDiameterMm: 30.0, outputDiameterMm: 30.0 }],
    inputEnd: 'open', outputEnd: 'open-unflanged', holes: [],
    ...AIR, fMinHz: 50.0, fMaxHz: 2000.0, points: 3000, fingerings: [],
  },
  // The workshop's six-hole whistle in D: a 13 mm cylinder, open at the window (input) end. The
  // API adds no end correction at the input, so the tube here stands for the sounding length
  // (the real tube is some 25 mm shorter; the window's correction makes up the rest). Hole places
  // were set on the bench model until the first register sits within a cent or so of each target;
  // the second register then comes out a little wide, as on real whistles.
  // Hole 1 (index 0) is nearest the window; the bottom hole (6) gives E5 when it alone is open.
  // Fingerings close holes by their index in the list, as the API has them.
  'six-hole-whistle': {
    segments: [{ lengthMm: 284.5, inputDiameterMm: 13.0, outputDiameterMm: 13.0 }],
    inputEnd: 'open', outputEnd: 'open-unflanged',
    holes: [
      { positionMm: 138.0, diameterMm: 6.5, chimneyMm: 2.5, open: true },
      { positionMm: 158.0, diameterMm: 7.0, chimneyMm: 2.5, open: true },
      { positionMm: 178.5, diameterMm: 7.0, chimneyMm: 2.5, open: true },
      { positionMm: 203.0, diameterMm: 6.0, chimneyMm: 2.5, open: true },
      { positionMm: 215.5, diameterMm: 7.5, chimneyMm: 2.5, open: true },
      { positionMm: 239.5, diameterMm: 6.5, chimneyMm: 2.5, open: true },
    ],
    ...AIR, fMinHz: 300.0, fMaxHz: 3000.0, points: 3000,
    fingerings: WHISTLE_FINGERINGS,
  },
  // A conical reed bore (a chanter-like cone, the diameter growing 0.03 mm per mm) closed at its
  // narrow reed end, in two sections of one taper: a nearly complete harmonic series, unlike the
  // stopped cylinder. The cut-off tip (50 mm short of the apex) stretches the upper resonances a
  // little, as tan kL = -k x1 says.
  'conical-chanter': {
    segments: [
      { lengthMm: 300.0, inputDiameterMm: 1.5, outputDiameterMm: 10.5 },
      { lengthMm: 250.0, inputDiameterMm: 10.5, outputDiameterMm: 18.0 },
    ],
    inputEnd: 'closed', outputEnd: 'open-unflanged', holes: [],
    ...AIR, fMinHz: 50.0, fMaxHz: 3000.0, points: 3000, fingerings: [],
  },
  // The same six-hole whistle as it is built: a 260 mm tube measured from the window's centre,
  // the 4 x 8 mm window cut through a 1.5 mm wall with the block face at the window's centre.
  // The window's own correction (about 25 mm) makes up what the idealised tube above adds; the
  // holes sit some 24 mm nearer the window than above. Placed on the bench model: the first
  // register within a few cents (C#6 about 8 sharp), the second register wide, as on real whistles.
  'whistle-window': {
    segments: [{ lengthMm: 260.0, inputDiameterMm: 13.0, outputDiameterMm: 13.0 }],
    inputEnd: 'open', outputEnd: 'open-unflanged',
    mouth: { kind: 'window', windowLengthMm: 4.0, windowWidthMm: 8.0, wallMm: 1.5, headspaceMm: 0.0 },
    holes: [
      { positionMm: 113.7, diameterMm: 6.5, chimneyMm: 2.5, open: true },
      { positionMm: 133.7, diameterMm: 7.0, chimneyMm: 2.5, open: true },
      { positionMm: 154.2, diameterMm: 7.0, chimneyMm: 2.5, open: true },
      { positionMm: 178.7, diameterMm: 6.0, chimneyMm: 2.5, open: true },
      { positionMm: 191.2, diameterMm: 7.5, chimneyMm: 2.5, open: true },
      { positionMm: 215.2, diameterMm: 6.5, chimneyMm: 2.5, open: true },
    ],
    ...AIR, fMinHz: 300.0, fMaxHz: 3000.0, points: 3000,
    fingerings: WHISTLE_FINGERINGS,
  },
  // A transverse flute's head on a plain 19 mm cylinder (no keys): a 10 x 12 mm embouchure hole
  // through a 4.5 mm wall and lip plate, the stopper 17 mm above the hole's centre, a quarter of
  // the hole under the lip. The tube's end is about 600 mm from the hole: near C4-D4 as a
  // keyless head-and-body would sound.
  'flute-head': {
    segments: [{ lengthMm: 600.0, inputDiameterMm: 19.0, outputDiameterMm: 19.0 }],
    inputEnd: 'open', outputEnd: 'open-unflanged', holes: [],
    mouth: { kind: 'embouchure', holeLengthMm: 12.0, holeWidthMm: 10.0, wallMm: 4.5, headspaceMm: 17.0,
      lipCoveragePct: 25.0 },
    ...AIR, fMinHz: 100.0, fMaxHz: 2500.0, points: 3000, fingerings: [],
  },
  // A clarinet-like bore: a 15 mm cylinder closed by the reed, whose compliance acts as 900 mm³
  // at the tip (a mouthpiece's own cavity would be a segment). Odd harmonics, a little stretched.
  'reed-cylinder': {
    segments: [{ lengthMm: 590.0, inputDiameterMm: 15.0, outputDiameterMm: 15.0 }],
    inputEnd: 'closed', outputEnd: 'open-unflanged', holes: [],
    mouth: { kind: 'reed', equivalentVolumeMm3: 900.0 },
    ...AIR, fMinHz: 50.0, fMaxHz: 2000.0, points: 3000, fingerings: [],
  },
  // A brass instrument in outline: a 1100 mm³ cup and a 3.7 x 7 mm throat, an 80 mm backbore
  // opening to the 11.7 mm cylinder (1100 mm), then a flare in three cones to a 120 mm bell.
  'brass-cup': {
    segments: [
      { lengthMm: 80.0, inputDiameterMm: 3.7, outputDiameterMm: 9.0 },
      { lengthMm: 150.0, inputDiameterMm: 9.0, outputDiameterMm: 11.7 },
      { lengthMm: 1100.0, inputDiameterMm: 11.7, outputDiameterMm: 11.7 },
      { lengthMm: 250.0, inputDiameterMm: 11.7, outputDiameterMm: 20.0 },
      { lengthMm: 120.0, inputDiameterMm: 20.0, outputDiameterMm: 45.0 },
      { lengthMm: 40.0, inputDiameterMm: 45.0, outputDiameterMm: 120.0 },
    ],
    inputEnd: 'closed', outputEnd: 'open-unflanged', holes: [],
    mouth: { kind: 'cup', cupVolumeMm3: 1100.0, throatDiameterMm: 3.7, throatLengthMm: 7.0 },
    ...AIR, fMinHz: 40.0, fMaxHz: 1200.0, points: 3000, fingerings: [],
  },
};

/** A deep copy of a preset, so the editor never changes the table above. */
export const preset = (id) => (PRESETS[id] ? structuredClone(PRESETS[id]) : null);
