/**
 * Numerical terms of IUPAC 2013 P-14.2.1 (Table 1.4) and the hydrocarbon stems of P-21.2.1.
 * Composite terms are built from units, tens, hundreds (and thousands), read from the units up:
 * 21 hen+icosa, 32 do+triaconta, 111 un+deca+hecta, with 'un' for 1 only directly before 'deca'.
 */
const UNITS = ['', 'hen', 'do', 'tri', 'tetra', 'penta', 'hexa', 'hepta', 'octa', 'nona'];
const TENS = ['', 'deca', 'icosa', 'triaconta', 'tetraconta', 'pentaconta', 'hexaconta', 'heptaconta', 'octaconta', 'nonaconta'];
const HUNDREDS = ['', 'hecta', 'dicta', 'tricta', 'tetracta', 'pentacta', 'hexacta', 'heptacta', 'octacta', 'nonacta'];
const THOUSANDS = ['', 'kilia', 'dilia', 'trilia', 'tetralia', 'pentalia', 'hexalia', 'heptalia', 'octalia', 'nonalia'];

/** Numerical term for n ≥ 10 as used inside hydrocarbon names (ends in 'a'). */
function compositeTerm(n: number): string {
  const unit = n % 10;
  const ten = Math.floor(n / 10) % 10;
  const hundred = Math.floor(n / 100) % 10;
  const thousand = Math.floor(n / 1000) % 10;
  let unitText = UNITS[unit];
  if (unit === 1 && ten === 1) unitText = 'un';
  let tenText = TENS[ten];
  // 'icosa' loses its initial 'i' after a vowel-ending unit term (tricosa, docosa) but not after 'hen'.
  if (ten === 2 && unit >= 2) tenText = 'cosa';
  if (n % 100 === 1 && n > 100) unitText = 'hen';
  return unitText + tenText + HUNDREDS[hundred] + THOUSANDS[thousand];
}

/** Retained stems of the first four hydrocarbons (P-21.2.1); from pent on the stem is the numerical term. */
const RETAINED_STEMS = ['', 'meth', 'eth', 'prop', 'but'];

/** Stem of the saturated unbranched hydrocarbon with n carbons: meth, eth, … undec, henicos. */
export function alkaneStem(n: number): string {
  if (n < 1 || n > 9999) throw new RangeError(`no stem for ${n}`);
  if (n <= 4) return RETAINED_STEMS[n];
  return (n < 10 ? UNITS[n] : compositeTerm(n)).slice(0, -1);
}

/** Basic multiplying prefix (P-14.2.1): di, tri, tetra, … for simple substituents. */
export function multiplier(n: number): string {
  if (n === 1) return '';
  if (n === 2) return 'di';
  if (n < 10) return UNITS[n];
  return compositeTerm(n);
}

/** Multiplying prefix for substituted substituents (P-14.2.2): bis, tris, tetrakis, … */
export function complexMultiplier(n: number): string {
  if (n === 1) return '';
  if (n === 2) return 'bis';
  if (n === 3) return 'tris';
  return `${multiplier(n)}kis`;
}
