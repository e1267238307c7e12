import type { SpectrumAxis } from '../../../shared/schemas/attachments';

/**
 * Axis titles and units for the units JCAMP-DX files state (##XUNITS / ##YUNITS, JCAMP-DX 4.24
 * and its NMR and MS extensions). Units we do not know are shown as the file spells them.
 */
const KNOWN_UNITS: Record<string, { title: string; unit: string }> = {
  '1/CM': { title: 'Wavenumber', unit: 'cm⁻¹' },
  PPM: { title: 'Chemical shift', unit: 'ppm' },
  HZ: { title: 'Frequency', unit: 'Hz' },
  'M/Z': { title: 'm/z', unit: '' },
  NANOMETERS: { title: 'Wavelength', unit: 'nm' },
  MICROMETERS: { title: 'Wavelength', unit: 'µm' },
  SECONDS: { title: 'Time', unit: 's' },
  MINUTES: { title: 'Time', unit: 'min' },
  TRANSMITTANCE: { title: 'Transmittance', unit: '' },
  ABSORBANCE: { title: 'Absorbance', unit: '' },
  'ARBITRARY UNITS': { title: 'Intensity', unit: 'arb. units' },
  'RELATIVE ABUNDANCE': { title: 'Relative abundance', unit: '' },
  'KUBELKA-MUNK': { title: 'Kubelka–Munk', unit: '' },
  REFLECTANCE: { title: 'Reflectance', unit: '' },
};

const ALIASES: Record<string, string> = {
  'CM-1': '1/CM',
  'CM^-1': '1/CM',
  'CM**-1': '1/CM',
  WAVENUMBERS: '1/CM',
  WAVENUMBER: '1/CM',
  NM: 'NANOMETERS',
  UM: 'MICROMETERS',
  MZ: 'M/Z',
  '%T': 'TRANSMITTANCE',
};

function titleCase(text: string): string {
  return text.toLowerCase().replace(/(^|\s)\S/g, (c) => c.toUpperCase());
}

export function axisFromUnits(raw: string, fallbackTitle: string): SpectrumAxis {
  const key = raw.trim().toUpperCase();
  const known = KNOWN_UNITS[ALIASES[key] ?? key];
  if (known) return { ...known, raw: raw.trim() };
  return { title: fallbackTitle, unit: raw.trim() ? titleCase(raw.trim()) : '', raw: raw.trim() };
}

/** Chemists read NMR chemical shift and IR wavenumber axes from high to low. */
export function runsHighToLow(x: SpectrumAxis, dataType: string): boolean {
  if (x.unit === 'ppm' || x.unit === 'cm⁻¹') return true;
  return /NMR/i.test(dataType) && x.unit !== 'Hz' && x.unit !== 's';
}
