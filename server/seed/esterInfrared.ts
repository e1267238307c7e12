import { writeJcampDx } from './jcampWriter';

/**
 * An invented infrared spectrum of isoamyl acetate for the demo, built from Lorentzian bands at
 * the positions where esters usually absorb (C–H stretches near 2960–2870 cm⁻¹, the ester C=O near
 * 1740 cm⁻¹, C–O stretches near 1240 and 1050 cm⁻¹: common practice, no source). Depths, widths and
 * the noise are made up; this is not a measured spectrum.
 */
const BANDS: { at: number; absorbance: number; halfWidth: number }[] = [
  { at: 2961, absorbance: 0.55, halfWidth: 16 },
  { at: 2934, absorbance: 0.32, halfWidth: 14 },
  { at: 2873, absorbance: 0.28, halfWidth: 12 },
  { at: 1741, absorbance: 1.05, halfWidth: 11 },
  { at: 1467, absorbance: 0.3, halfWidth: 9 },
  { at: 1368, absorbance: 0.48, halfWidth: 7 },
  { at: 1239, absorbance: 0.95, halfWidth: 16 },
  { at: 1057, absorbance: 0.5, halfWidth: 11 },
  { at: 1029, absorbance: 0.3, halfWidth: 9 },
  { at: 607, absorbance: 0.22, halfWidth: 8 },
];

/** A fixed-seed generator (xorshift32) so every demo start writes the same file. */
function noise(seed: number): () => number {
  let state = seed;
  return () => {
    state ^= state << 13;
    state ^= state >>> 17;
    state ^= state << 5;
    return ((state >>> 0) / 0xffffffff - 0.5) * 2;
  };
}

export function esterInfraredJcamp(): string {
  const firstX = 4000;
  const deltaX = -2;
  const points = (4000 - 400) / 2 + 1;
  const jitter = noise(20240611);
  const y = Array.from({ length: points }, (_, i) => {
    const wavenumber = firstX + deltaX * i;
    const absorbance = BANDS.reduce((sum, b) => sum + b.absorbance / (1 + ((wavenumber - b.at) / b.halfWidth) ** 2), 0.02);
    const transmittance = 10 ** -absorbance * (0.97 - (4000 - wavenumber) * 0.00001) + jitter() * 0.002;
    return Math.min(1, Math.max(0, transmittance));
  });
  return writeJcampDx({
    title: 'Isoamyl acetate, crude, neat film (demo)',
    dataType: 'INFRARED SPECTRUM',
    xUnits: '1/CM',
    yUnits: 'TRANSMITTANCE',
    firstX,
    deltaX,
    y,
    yFactor: 0.0001,
    records: {
      ORIGIN: 'Saltmarsh Lane flavour-ester group (invented demo data)',
      OWNER: 'Quillane demo; generated, not measured',
      'SAMPLING PROCEDURE': 'Neat film between salt plates (invented)',
    },
  });
}
