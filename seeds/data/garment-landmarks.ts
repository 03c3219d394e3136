/**
 * The marks the studio measures placements from, on each demo garment's front drawing at its reference size, mm
 * down the centre-front line (the hem comes from the hem zone). Read off the drawings in seeds/garments/: a
 * neckline drawn as `Q` from (x0, y) over (xc, yc) is lowest at its middle, (y + yc) / 2.
 */
export const garmentLandmarks: Readonly<Record<string, { label: string; yMm: number }[]>> = {
  // M232 34 Q280 72 328 34
  'smocked-yoke-dress': [{ label: 'neckline', yMm: 53 }],
  // M190 36 Q230 62 270 36
  'bishop-dress': [{ label: 'neckline', yMm: 49 }],
  // M148 30 Q180 58 212 30
  'bubble-romper': [{ label: 'neckline', yMm: 44 }],
  // The neck opening's circle: centre (120, 60), radius 36.
  bib: [{ label: 'neckline', yMm: 96 }],
  // The brim's outer arc is highest at (130, 22).
  'sun-bonnet': [{ label: 'brim’s front edge', yMm: 22 }],
};
