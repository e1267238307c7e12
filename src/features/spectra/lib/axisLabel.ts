import type { SpectrumAxis } from '../../../../shared/schemas';

/**
 * "Wavenumber / cm⁻¹": a physical quantity divided by its unit, as IUPAC recommends for graph
 * axes (Quantities, Units and Symbols in Physical Chemistry, 3rd ed., 2007, section 1.4).
 */
export function axisLabel(axis: SpectrumAxis): string {
  return axis.unit ? `${axis.title} / ${axis.unit}` : axis.title;
}
