import { beforeAll, describe, expect, it } from 'vitest';
import { describeSync, loadChemistry, type NameStyle } from '../../../shared/chem/index';

/**
 * Worked examples for the rules the engine applies, IUPAC Recommendations 2013 ("Nomenclature of
 * Organic Chemistry", Favre & Powell, RSC 2014). Structures and names written from memory of the
 * rules and their examples, not copied from the book; the P-number says which rule each checks.
 */
function name(smiles: string, style: NameStyle = 'preferred'): string {
  const { naming } = describeSync({ smiles }, { style });
  if (!naming.ok) throw new Error(`${smiles}: ${naming.reason}`);
  return naming.name;
}

const chain = (n: number) => 'C'.repeat(n);

beforeAll(loadChemistry);

describe('P-21.2 unbranched alkanes (written from memory)', () => {
  it.each([
    [1, 'methane'], [2, 'ethane'], [4, 'butane'], [10, 'decane'], [11, 'undecane'], [12, 'dodecane'],
    [20, 'icosane'], [21, 'henicosane'], [22, 'docosane'], [23, 'tricosane'], [30, 'triacontane'],
    [31, 'hentriacontane'], [32, 'dotriacontane'], [40, 'tetracontane'], [99, 'nonanonacontane'],
    [100, 'hectane'], [101, 'henhectane'], [111, 'undecahectane'], [132, 'dotriacontahectane'],
  ])('C%i is %s', (n, expected) => expect(name(chain(n))).toBe(expected));
});

describe('P-44.3 / P-45 principal chain and P-31.1.4 numbering (written from memory)', () => {
  it.each([
    ['CC(C)C', '2-methylpropane'], // P-21.2.2
    ['CC(C)(C)C', '2,2-dimethylpropane'],
    ['CC(C)CC(C)(C)C', '2,2,4-trimethylpentane'], // P-44.3 longest chain
    ['CCC(C(C)C)CCC', '3-ethyl-2-methylhexane'], // P-45.2.1 greater number of substituents
    ['CC(C)CC(C)C(C)C', '2,3,5-trimethylhexane'], // P-31.1.4.3.4 lowest locants (not 2,4,5)
    ['CCC(CC)CC(C)CC', '3-ethyl-5-methylheptane'], // P-31.1.4.3.4 first cited in alphanumerical order
    ['CC(C)(C)C(CC)CC', '3-ethyl-2,2-dimethylpentane'], // P-14.5.1 multiplying prefixes ignored in ordering
    ['BrCCCl', '1-bromo-2-chloroethane'], // P-31.1.4.3.4
    ['CCCC(C(C)C)CCC', '4-(propan-2-yl)heptane'], // P-29.2 method (2) prefix, P-16.5.1 enclosing marks
    ['CCCCC(C(C)C(C)C)CCCC', '5-(3-methylbutan-2-yl)nonane'], // P-29.2 longest chain in the substituent
    ['CC(C)CC(C(C)CC)CCCC', '4-(butan-2-yl)-2-methyloctane'],
    ['CCCCCC(CC(C)CC)CCCCC', '6-(2-methylbutyl)undecane'],
    ['CCC(C)(CC)C(C)(CC)CC', '3,4-diethyl-3,4-dimethylhexane'], // every hexane chain carries four prefixes
  ])('%s → %s', (smiles, expected) => expect(name(smiles)).toBe(expected));
});

describe('traditional style: general nomenclature prefixes (P-29.6, written from memory)', () => {
  it.each([
    ['CCCC(C(C)C)CCC', '4-isopropylheptane'],
    ['CC(C)CC(C(C)CC)CCCC', '4-sec-butyl-2-methyloctane'], // sec- ignored in ordering: b before m
    ['CCCCC(C(C)C(C)C)CCCC', '5-(1,2-dimethylpropyl)nonane'], // 'alkyl' method, free valence at 1
    ['CC(C)CC1CCCCC1', 'isobutylcyclohexane'],
    ['CC(C)(C)CC1CCCCC1', 'neopentylcyclohexane'],
    ['CC(C)c1ccc(C(C)C)cc1', '1,4-diisopropylbenzene'],
    ['CC(C)=C1CCCCC1', 'isopropylidenecyclohexane'],
    ['C=CC1CCCCC1', 'vinylcyclohexane'],
    ['CCC(C)(C)C1CCCCC1', 'tert-pentylcyclohexane'],
  ])('%s → %s', (smiles, expected) => expect(name(smiles, 'traditional')).toBe(expected));
});

describe('P-29.6 tert-butyl is a preferred prefix; P-16.9 multiplying prefixes (written from memory)', () => {
  it.each([
    ['CC(C)(C)C1CCCCC1', 'tert-butylcyclohexane'],
    ['CC(C)(C)c1ccc(cc1)C(C)(C)C', '1,4-di-tert-butylbenzene'],
    ['CC(C)c1ccc(C(C)C)cc1', '1,4-di(propan-2-yl)benzene'],
    ['CC(C)CC1(CC(C)C)CCCCC1', '1,1-bis(2-methylpropyl)cyclohexane'],
    ['CC(C)CC1CCCCC1', '(2-methylpropyl)cyclohexane'],
    ['ClC(Cl)(Cl)c1ccccc1', '(trichloromethyl)benzene'],
  ])('%s → %s', (smiles, expected) => expect(name(smiles)).toBe(expected));
});

describe('P-31.1.4 unsaturation: ene, yne, and P-44.4.1 (2013: length before unsaturation) (written from memory)', () => {
  it.each([
    ['C=C', 'ethene'],
    ['C#C', 'ethyne'],
    ['C=CC', 'prop-1-ene'],
    ['C=CCC', 'but-1-ene'],
    ['CC=CC', 'but-2-ene'],
    ['C=C(C)C', '2-methylprop-1-ene'],
    ['C=CC=C', 'buta-1,3-diene'],
    ['C=C=C', 'propa-1,2-diene'],
    ['C=CC#C', 'but-1-en-3-yne'], // P-31.1.4.2.4: multiple bonds together, then double bonds lowest
    ['C=CCCC#C', 'hex-1-en-5-yne'],
    ['C#CCC#C', 'penta-1,4-diyne'],
    ['C=C(CCC)CCCC', '4-methylideneoctane'], // P-44.4.1: the longest chain, the double bond becomes ylidene
    ['ClC=C', 'chloroethene'],
    ['C=CCCl', '3-chloroprop-1-ene'],
    ['C=CC1CCCCC1', 'ethenylcyclohexane'],
    ['C=CCC1CCCC1', '(prop-2-en-1-yl)cyclopentane'],
    ['CC=CC1CCCCC1', '(prop-1-en-1-yl)cyclohexane'],
    ['CC(=C)C1CCCCC1', '(prop-1-en-2-yl)cyclohexane'],
    ['C#CC1CCCCC1', 'ethynylcyclohexane'],
  ])('%s → %s', (smiles, expected) => expect(name(smiles)).toBe(expected));
});

describe('P-22.1 / P-31.1.3 monocycles, P-44.1.2.2 ring senior to chain, P-29 ylidene (written from memory)', () => {
  it.each([
    ['C1CC1', 'cyclopropane'],
    ['C1CCCCC1', 'cyclohexane'],
    ['CC1CCCCC1', 'methylcyclohexane'], // P-31.1.4.2.4: locant omitted
    ['CC1CCCC(C)C1', '1,3-dimethylcyclohexane'],
    ['C1=CCCCC1', 'cyclohexene'],
    ['CC1CCCC=C1', '3-methylcyclohex-1-ene'],
    ['CC1=CCCCC1', '1-methylcyclohex-1-ene'],
    ['C1=CCC=CC1', 'cyclohexa-1,4-diene'],
    ['C1=CC=CCC1', 'cyclohexa-1,3-diene'],
    ['CCCCCCCCCCC1CC1', 'decylcyclopropane'], // P-44.1.2.2 (2013): ring senior to chain
    ['C1CCC(CC1)C1CC1', 'cyclopropylcyclohexane'], // larger ring is the parent
    ['C1CCCCC1c1ccccc1', 'cyclohexylbenzene'],
    ['C1CCCCC1Cc1ccccc1', '(cyclohexylmethyl)benzene'],
    ['C=C1CCCCC1', 'methylidenecyclohexane'],
    ['CC=C1CCCCC1', 'ethylidenecyclohexane'],
    ['CC(C)=C1CCCCC1', '(propan-2-ylidene)cyclohexane'],
    ['C1CCC(=C2CCCC2)CC1', 'cyclopentylidenecyclohexane'],
    ['CC1CCC(C)C(C)C1', '1,2,4-trimethylcyclohexane'],
    ['CC1CCC(C=C1)C', '3,6-dimethylcyclohex-1-ene'],
    ['CC1CC=C(C)CC1', '1,4-dimethylcyclohex-1-ene'],
  ])('%s → %s', (smiles, expected) => expect(name(smiles)).toBe(expected));
});

describe('P-61.3 halogen and P-61.5 nitro prefixes, P-31.1.4.2.4 locant omission (written from memory)', () => {
  it.each([
    ['CCl', 'chloromethane'],
    ['ClC(Cl)Cl', 'trichloromethane'],
    ['ClC(Cl)(Cl)Cl', 'tetrachloromethane'],
    ['BrC(Cl)F', 'bromochlorofluoromethane'],
    ['CCBr', 'bromoethane'],
    ['BrCCBr', '1,2-dibromoethane'],
    ['CC(Cl)Cl', '1,1-dichloroethane'],
    ['CC(C)(C)Br', '2-bromo-2-methylpropane'],
    ['CC(C)CCl', '1-chloro-2-methylpropane'],
    ['Brc1ccccc1', 'bromobenzene'],
    ['Clc1ccc(Cl)cc1', '1,4-dichlorobenzene'],
    ['Clc1ccc(Br)cc1', '1-bromo-4-chlorobenzene'],
    ['C[N+](=O)[O-]', 'nitromethane'],
    ['CN(=O)=O', 'nitromethane'],
    ['CC(C)[N+](=O)[O-]', '2-nitropropane'],
    ['O=[N+]([O-])c1ccccc1', 'nitrobenzene'],
    ['Clc1ccccc1[N+](=O)[O-]', '1-chloro-2-nitrobenzene'],
    ['ClCC1CCCCC1', '(chloromethyl)cyclohexane'],
    ['ClCCC1CCCCC1', '(2-chloroethyl)cyclohexane'],
    ['CC(Cl)C1CCCCC1', '(1-chloroethyl)cyclohexane'],
    ['IC1CCCCC1', 'iodocyclohexane'],
    ['ClC1CCC(Cl)CC1', '1,4-dichlorocyclohexane'],
  ])('%s → %s', (smiles, expected) => expect(name(smiles)).toBe(expected));
});

describe('explanation output', () => {
  it('gives the parent atoms in numbering order and each substituent with locant and atoms', () => {
    const { naming } = describeSync({ smiles: 'CCC(C)C' }); // 2-methylbutane: atoms 0..4
    if (!naming.ok) throw new Error(naming.reason);
    expect(naming.name).toBe('2-methylbutane');
    // Atoms 3 and 4 are equivalent: either may start the chain, the other is the methyl.
    const { parent, substituents } = naming.explanation;
    expect(parent.kind).toBe('chain');
    expect(parent.name).toBe('butane');
    expect(parent.atoms.slice(1)).toEqual([2, 1, 0]);
    expect([3, 4]).toContain(parent.atoms[0]);
    expect(substituents).toEqual([{ locant: '2', name: 'methyl', atoms: [parent.atoms[0] === 3 ? 4 : 3] }]);
  });

  it('names the parent hydride with its unsaturation', () => {
    const { naming } = describeSync({ smiles: 'CC1CCCC=C1' });
    if (!naming.ok) throw new Error(naming.reason);
    expect(naming.explanation.parent.kind).toBe('ring');
    expect(naming.explanation.parent.name).toBe('cyclohex-1-ene');
    expect(naming.explanation.parent.atoms[2]).toBe(1);
  });
});

describe('refusals instead of wrong names', () => {
  it.each([
    ['CC(=O)OC(C)=O', /anhydride/],
    ['C1CCC2CCCCC2C1', /fused, bridged and spiro/],
    ['C1CCNCC1', /heterocycles|not named yet/],
    ['C1CCCCC1C1CCCCC1', /ring assembly/],
    ['c1ccccc1Oc1ccccc1', /multiplicative/],
    ['CC.CC', /disconnected/],
    ['C[C@H](CC)C1CCCCC1', /substituent group; descriptors there are not placed yet/],
    ['C/C=C/C1CCCCC1', /not in the parent chain or ring/],
    ['[CH3]', /radical/],
    ['[13CH4]', /isotop/],
    ['C[NH3+]', /ion|charged/],
    ['c1ccc2ccccc2c1', /fused/],
    ['C1=CC=CC=CC=C1', /annulene/],
  ])('%s is refused', (smiles, reason) => {
    const { naming } = describeSync({ smiles });
    expect(naming.ok).toBe(false);
    if (!naming.ok) expect(naming.reason).toMatch(reason);
  });
});
