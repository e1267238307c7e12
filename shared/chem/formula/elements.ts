/**
 * Standard atomic weights: CIAAW, "Standard atomic weights of the elements 2021" (Prohaska et al.,
 * Pure Appl. Chem. 94 (2022) 573). For elements whose standard weight is an interval
 * (H, B, C, N, O, S, Cl, Br) the table's *conventional* values are used, as CIAAW recommends for
 * commerce and general use. Others are the single values with their last digits as published.
 */
export const ATOMIC_WEIGHT: Readonly<Record<string, number>> = {
  H: 1.008,
  B: 10.81,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  F: 18.998403162,
  P: 30.973761998,
  S: 32.06,
  Cl: 35.45,
  Br: 79.904,
  I: 126.90447,
};

/**
 * Atomic masses (Da) of nuclides: AME2020 (Wang et al., Chin. Phys. C 45 (2021) 030003), as
 * tabulated by IUPAC/CIAAW. The first entry per element is the most abundant isotope, used for
 * the monoisotopic mass; the others serve isotope labels such as [13C] or [2H].
 */
export const NUCLIDE_MASS: Readonly<Record<string, Readonly<Record<number, number>>>> = {
  H: { 1: 1.00782503223, 2: 2.01410177812, 3: 3.0160492779 },
  B: { 11: 11.00930536, 10: 10.01293695 },
  C: { 12: 12, 13: 13.00335483507, 14: 14.0032419884 },
  N: { 14: 14.00307400443, 15: 15.00010889888 },
  O: { 16: 15.99491461957, 17: 16.9991317565, 18: 17.99915961286 },
  F: { 19: 18.99840316273, 18: 18.0009380 },
  P: { 31: 30.97376199842, 32: 31.97390764 },
  S: { 32: 31.9720711744, 33: 32.9714589098, 34: 33.967867004, 35: 34.96903231, 36: 35.96708071 },
  Cl: { 35: 34.968852682, 36: 35.968306809, 37: 36.965902602 },
  Br: { 79: 78.9183376, 81: 80.9162897 },
  I: { 127: 126.9044719, 123: 122.905589, 125: 124.9046294, 131: 130.9061263 },
};

export const MOST_ABUNDANT: Readonly<Record<string, number>> = { H: 1, B: 11, C: 12, N: 14, O: 16, F: 19, P: 31, S: 32, Cl: 35, Br: 79, I: 127 };

/** Element symbols in order of atomic number (IUPAC periodic table, elements 1-118). */
export const ELEMENT_SYMBOLS: readonly string[] = (
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb ' +
  'Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr Rf ' +
  'Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
).split(' ');
