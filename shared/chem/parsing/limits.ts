/** Largest molecule accepted, counted in non-hydrogen atoms. */
export const MAX_HEAVY_ATOMS = 999;

/** Longest input accepted before any parsing (guards the parser against pathological input). */
export const MAX_INPUT_CHARACTERS = 100_000;

/**
 * Elements the engine accepts: the SMILES "organic subset" (OpenSMILES specification, section 3.1)
 * plus hydrogen. Anything else is refused before naming.
 */
export const ORGANIC_ELEMENTS: ReadonlySet<string> = new Set(['H', 'B', 'C', 'N', 'O', 'P', 'S', 'F', 'Cl', 'Br', 'I']);

/** Every element symbol, so that an unknown symbol and an unsupported element get different messages. */
export const ALL_ELEMENTS: ReadonlySet<string> = new Set(
  (
    'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
    'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb ' +
    'Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr Rf ' +
    'Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
  ).split(' '),
);
