// Demo bores of the Harrowgate Lane Workshop (an invented shop). Dimensions are chosen to be
// physically sensible for each kind of pipe; every length in millimetres, as the API speaks.

const AIR = { temperatureC: 20.0, relativeHumidityPct: 50.0, losses: true };

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
  // The workshop's six-hole whistle in D: a 13 mm cylinder, open at the window (input) end.
  // Hole 1 is nearest the window; the bottom hole (6) gives E5 when it alone is open.
  'six-hole-whistle': {
    segments: [{ lengthMm: 285.0, inputDiameterMm: 13.0, outputDiameterMm: 13.0 }],
    inputEnd: 'open', outputEnd: 'open-unflanged',
    holes: [
      { positionMm: 128.0, diameterMm: 6.5, chimneyMm: 2.5, open: true },
      { positionMm: 148.0, diameterMm: 7.0, chimneyMm: 2.5, open: true },
      { positionMm: 170.0, diameterMm: 7.0, chimneyMm: 2.5, open: true },
      { positionMm: 196.0, diameterMm: 6.0, chimneyMm: 2.5, open: true },
      { positionMm: 214.0, diameterMm: 7.5, chimneyMm: 2.5, open: true },
      { positionMm: 238.0, diameterMm: 6.5, chimneyMm: 2.5, open: true },
    ],
    ...AIR, fMinHz: 300.0, fMaxHz: 3000.0, points: 3000,
    fingerings: [
      { name: 'D5', closedHoles: [1, 2, 3, 4, 5, 6], target: 'D5', register: 1 },
      { name: 'E5', closedHoles: [1, 2, 3, 4, 5], target: 'E5', register: 1 },
      { name: 'F#5', closedHoles: [1, 2, 3, 4], target: 'F#5', register: 1 },
      { name: 'G5', closedHoles: [1, 2, 3], target: 'G5', register: 1 },
      { name: 'A5', closedHoles: [1, 2], target: 'A5', register: 1 },
      { name: 'B5', closedHoles: [1], target: 'B5', register: 1 },
      { name: 'C#6', closedHoles: [], target: 'C#6', register: 1 },
      { name: 'D6', closedHoles: [1, 2, 3, 4, 5, 6], target: 'D6', register: 2 },
      { name: 'E6', closedHoles: [1, 2, 3, 4, 5], target: 'E6', register: 2 },
    ],
  },
  // A conical reed bore (a chanter-like cone, 3 % taper), closed at its narrow reed end: a
  // nearly complete harmonic series, unlike the stopped cylinder.
  'conical-chanter': {
    segments: [
      { lengthMm: 300.0, inputDiameterMm: 4.0, outputDiameterMm: 13.0 },
      { lengthMm: 250.0, inputDiameterMm: 13.0, outputDiameterMm: 20.5 },
    ],
    inputEnd: 'closed', outputEnd: 'open-unflanged', holes: [],
    ...AIR, fMinHz: 50.0, fMaxHz: 3000.0, points: 3000, fingerings: [],
  },
};

/** A deep copy of a preset, so the editor never changes the table above. */
export const preset = (id) => (PRESETS[id] ? structuredClone(PRESETS[id]) : null);
