// Workshop presets of the bar bench (invented instruments of the Harrowgate Lane Workshop).
// Dimensions are typical starting blanks, not anyone's drawings.

export const PRESETS = {
  // marimba F3 bar: the cut the bench's own solver found for a 440 x 60 x 22 mm rosewood-like blank
  // (1:4:10, 4 mm thinnest, 60 mm flat ends), rounded to 0.1 mm / 0.01 mm
  marimba: {
    lengthMm: 440, section: 'rectangle', widthMm: 60, thicknessMm: 22, material: 'rosewood',
    ends: 'free-free', theory: 'timoshenko', modeCount: 6,
    profile: [[0.0, 22.00], [111.5, 22.00], [125.1, 16.42], [138.6, 12.74], [152.2, 10.45], [165.8, 9.14],
      [179.3, 8.48], [192.9, 8.19], [206.4, 8.10], [220.0, 8.08], [233.6, 8.10], [247.1, 8.19], [260.7, 8.48],
      [274.2, 9.14], [287.8, 10.45], [301.4, 12.74], [314.9, 16.42], [328.5, 22.00], [440.0, 22.00]],
  },
  xylophone: {
    lengthMm: 300, section: 'rectangle', widthMm: 38, thicknessMm: 20, material: 'padauk',
    ends: 'free-free', theory: 'timoshenko', modeCount: 6, profile: null,
  },
  glockenspiel: {
    lengthMm: 160, section: 'rectangle', widthMm: 25, thicknessMm: 7, material: 'steel',
    ends: 'free-free', theory: 'timoshenko', modeCount: 6, profile: null,
  },
  chime: {
    lengthMm: 1000, section: 'tube', diameterMm: 25.4, boreMm: 22.0, material: 'brass',
    ends: 'free-free', theory: 'timoshenko', modeCount: 6, profile: null,
  },
  tine: {
    lengthMm: 60, section: 'rectangle', widthMm: 3, thicknessMm: 1, material: 'steel',
    ends: 'clamped-free', theory: 'timoshenko', modeCount: 4, profile: null,
  },
};
