import { beforeAll, describe, expect, it } from 'vitest';
import { describeSync, loadChemistry } from '../../../shared/chem/index';
import { namesExamples, refusesExamples } from './support/examples';

/**
 * Alcohols and phenols, ketones, aldehydes and ethers, IUPAC 2013 Recommendations. Names written
 * from memory of the rules and their examples (P-41 seniority of classes, P-44.1 parent selection
 * with principal characteristic groups first, P-31.1.4 numbering, P-63 alcohols and ethers, P-64
 * ketones, P-66.6 aldehydes, P-22.1 / P-34 retained names, P-29.6 prefixes). Every structure's
 * formula and masses are also checked against @rdkit/rdkit.
 */
beforeAll(loadChemistry);

const preferred: [string, string, string][] = [
  // P-63.1.2 alcohols: -ol suffix, di/tri, locants (P-31.1.4.2.4: omitted only where unambiguous)
  ['CO', 'methanol', 'P-63.1.2'],
  ['CCO', 'ethanol', 'P-63.1.2'],
  ['CCCO', 'propan-1-ol', 'P-63.1.2'],
  ['CC(C)O', 'propan-2-ol', 'P-63.1.2'],
  ['OCCO', 'ethane-1,2-diol', 'P-63.1.2 / P-16.9'],
  ['OCC(O)CO', 'propane-1,2,3-triol', 'P-63.1.2'],
  ['OC(C)(C)C', '2-methylpropan-2-ol', 'P-63.1.2'],
  ['CC(O)CC(C)C', '4-methylpentan-2-ol', 'P-31.1.4.2.4 principal group before prefixes'],
  ['C=CCO', 'prop-2-en-1-ol', 'P-31.1.4.2.4 principal group before multiple bonds'],
  ['CC(O)C=C', 'but-3-en-2-ol', 'P-31.1.4.2.4'],
  ['OCCCC#C', 'pent-4-yn-1-ol', 'P-31.1.4.2.4'],
  ['CCCC(CO)CCC=C', '2-propylhex-5-en-1-ol', 'P-44.1.1 then P-44.3 length before unsaturation'],
  ['OCC(Cl)(Cl)Cl', '2,2,2-trichloroethan-1-ol', 'P-31.1.4.3.4 all locants cited'],
  ['OC1CCCCC1', 'cyclohexanol', 'P-31.1.4.2.4 locant omitted'],
  ['CC1CCCCC1O', '2-methylcyclohexan-1-ol', 'P-31.1.4.3.4'],
  ['OC1CC(O)CC(O)C1', 'cyclohexane-1,3,5-triol', 'P-63.1.2'],
  ['OC1C=CCCC1', 'cyclohex-2-en-1-ol', 'P-31.1.4.2.4'],
  ['OCCC1CCCCC1', '2-cyclohexylethan-1-ol', 'P-44.1.1 principal group before ring seniority'],
  ['OCc1ccccc1', 'phenylmethanol', 'P-44.1.1 (benzyl alcohol is not a PIN)'],
  ['OCC1CCC(O)CC1', '4-(hydroxymethyl)cyclohexan-1-ol', 'P-44.1.2.2 ring senior to chain at equal group count'],
  ['OCC(CO)(CO)CO', '2,2-bis(hydroxymethyl)propane-1,3-diol', 'P-44.1.1'],
  // P-63.1.1 phenol (retained, substitutable); P-22.1.3 no toluene-based names for substituted phenols
  ['Oc1ccccc1', 'phenol', 'P-63.1.1'],
  ['Oc1ccc(Cl)cc1', '4-chlorophenol', 'P-63.1.1'],
  ['Cc1ccccc1O', '2-methylphenol', 'P-63.1.1'],
  ['Oc1ccccc1O', 'benzene-1,2-diol', 'P-63.1.2 (catechol is not retained)'],
  ['Oc1cc(O)cc(O)c1', 'benzene-1,3,5-triol', 'P-63.1.2'],
  ['CC(O)c1ccc(O)cc1', '4-(1-hydroxyethyl)phenol', 'P-44.1.2.2'],
  ['[O-][N+](=O)c1ccc(O)cc1', '4-nitrophenol', 'P-63.1.1 with P-61.5'],
  // P-64.2 ketones
  ['CC(=O)C', 'propan-2-one', 'P-64.2.1 (acetone is not a PIN)'],
  ['CCC(=O)C', 'butan-2-one', 'P-64.2.1'],
  ['CCC(=O)CC', 'pentan-3-one', 'P-64.2.1'],
  ['O=C1CCCCC1', 'cyclohexanone', 'P-64.2.1, P-31.1.4.2.4'],
  ['CC1CCCCC1=O', '2-methylcyclohexan-1-one', 'P-64.2.1'],
  ['O=C1C=CCCC1', 'cyclohex-2-en-1-one', 'P-31.1.4.2.4'],
  ['CC1=CC(=O)CCC1', '3-methylcyclohex-2-en-1-one', 'P-31.1.4.2.4'],
  ['O=C1CCC(=O)CC1', 'cyclohexane-1,4-dione', 'P-64.2.1'],
  ['O=C1C=CC(=O)C=C1', 'cyclohexa-2,5-diene-1,4-dione', 'P-64.2.1'],
  ['CC(=O)c1ccccc1', '1-phenylethan-1-one', 'P-64.2.1 (acetophenone is not a PIN)'],
  ['O=C(c1ccccc1)c1ccccc1', 'diphenylmethanone', 'P-64.2.1 (benzophenone is not a PIN)'],
  ['CC(=O)C1CCCCC1', '1-cyclohexylethan-1-one', 'P-44.1.1'],
  ['O=C(CC1CCCCC1)c1ccccc1', '2-cyclohexyl-1-phenylethan-1-one', 'P-44.1.1'],
  ['CC(=O)CCO', '4-hydroxybutan-2-one', 'P-41 ketone senior to alcohol, P-63.1.3 hydroxy'],
  ['CC(=O)CC(C)(C)O', '4-hydroxy-4-methylpentan-2-one', 'P-41'],
  // P-66.6 aldehydes
  ['C=O', 'formaldehyde', 'P-66.6.1.1.1 retained PIN'],
  ['CC=O', 'acetaldehyde', 'P-66.6.1.1.1 retained PIN'],
  ['CCC=O', 'propanal', 'P-66.6.1.1.2'],
  ['CC(C)C=O', '2-methylpropanal', 'P-66.6.1.1.2'],
  ['O=CCC=O', 'propanedial', 'P-66.6.1.1.2'],
  ['C=CC=O', 'prop-2-enal', 'P-31.1.4.2.4'],
  ['CC=CC=O', 'but-2-enal', 'P-31.1.4.2.4'],
  ['O=Cc1ccccc1', 'benzaldehyde', 'P-66.6.1.1.1 retained PIN'],
  ['O=Cc1ccc(Cl)cc1', '4-chlorobenzaldehyde', 'P-66.6.1.1.1'],
  ['O=Cc1ccccc1O', '2-hydroxybenzaldehyde', 'P-41 aldehyde senior to phenol'],
  ['O=Cc1ccc(C=O)cc1', 'benzene-1,4-dicarbaldehyde', 'P-66.6.1.1.3'],
  ['O=CC1CCCCC1', 'cyclohexanecarbaldehyde', 'P-66.6.1.1.3'],
  ['O=CC1CCC(Cl)CC1', '4-chlorocyclohexane-1-carbaldehyde', 'P-66.6.1.1.3'],
  ['O=CCC(=O)C', '3-oxobutanal', 'P-41 aldehyde senior to ketone, P-64.2.2 oxo'],
  ['O=CCCC1CCC(=O)CC1', '3-(4-oxocyclohexyl)propanal', 'P-64.2.2 oxo in a substituent'],
  ['O=CCCc1ccc(C=O)cc1', '4-(3-oxopropyl)benzaldehyde', 'P-44.1.2.2'],
  ['O=Cc1ccccc1CC(C)=O', '2-(2-oxopropyl)benzaldehyde', 'P-64.2.2'],
  ['O=CC1CCCCC1C=O', 'cyclohexane-1,2-dicarbaldehyde', 'P-66.6.1.1.3'],
  ['CCC(C=O)c1ccc(C=O)cc1', '4-(1-oxobutan-2-yl)benzaldehyde', 'P-29.2 prefix chain includes the CHO carbon'],
  ['O=CC1CCC(CC1)C1CCCC1C=O', '4-(2-formylcyclopentyl)cyclohexane-1-carbaldehyde', 'P-66.6.1.2 formyl'],
  // P-65.1.7 acyl prefixes: a ketone attached through its carbonyl carbon to a senior parent
  ['CC(=O)C1CCC(=O)CC1', '4-acetylcyclohexan-1-one', 'P-65.1.7.2.1 acetyl'],
  ['CC(=O)c1ccc(cc1)C(=O)O', '4-acetylbenzoic acid', 'P-65.1.7.2.1'],
  ['O=C(c1ccccc1)c1ccc(cc1)C(=O)O', '4-benzoylbenzoic acid', 'P-65.1.7.2.1 benzoyl'],
  ['O=C(C1CCCCC1)c1ccc(cc1)C(=O)O', '4-(cyclohexanecarbonyl)benzoic acid', 'P-65.1.7.2.2 -carbonyl'],
  ['ClCC(=O)c1ccc(cc1)C(=O)O', '4-(chloroacetyl)benzoic acid', 'P-65.1.7.2.1'],
  ['CC(C)C(=O)c1ccc(cc1)C#N', '4-(2-methylpropanoyl)benzonitrile', 'P-65.1.7.2.2 -oyl'],
  ['O=C(c1ccc(Cl)cc1)c1ccc(cc1)C(=O)O', '4-(4-chlorobenzoyl)benzoic acid', 'P-65.1.7.2.1'],
  ['O=C(C1CCC(Cl)CC1)c1ccc(O)cc1', '(4-chlorocyclohexyl)(4-hydroxyphenyl)methanone', 'P-64.2.1, P-16.5.1 enclosing marks'],
  ['CC(=O)CC(=O)c1ccccc1', '1-phenylbutane-1,3-dione', 'P-64.2.1'],
  // P-63.2.2 ethers as alkoxy/aryloxy prefixes
  ['COC', 'methoxymethane', 'P-63.2.2.1'],
  ['CCOCC', 'ethoxyethane', 'P-63.2.2.1'],
  ['CCCOC', '1-methoxypropane', 'P-63.2.2.1'],
  ['COc1ccccc1', 'methoxybenzene', 'P-63.2.2.2 (anisole is not a PIN)'],
  ['CCOC1CCCCC1', 'ethoxycyclohexane', 'P-63.2.2.2'],
  ['CC(C)Oc1ccccc1', '[(propan-2-yl)oxy]benzene', 'P-63.2.2.2'],
  ['CCCCCOc1ccccc1', '(pentyloxy)benzene', 'P-63.2.2.2'],
  ['ClCCOc1ccccc1', '(2-chloroethoxy)benzene', 'P-63.2.2.2'],
  ['CC(C)(C)OC', '2-methoxy-2-methylpropane', 'P-63.2.2.1'],
  ['COCCO', '2-methoxyethan-1-ol', 'P-63.2.2.2 with P-63.1.2'],
  ['COCCOC', '1,2-dimethoxyethane', 'P-63.2.2.2'],
  ['CC(C)OC(C)C', '2-[(propan-2-yl)oxy]propane', 'P-63.2.2.2'],
  ['COc1ccc(C=O)cc1', '4-methoxybenzaldehyde', 'P-63.2.2.2'],
  ['Oc1ccc(OC2CCCCC2)cc1', '4-(cyclohexyloxy)phenol', 'P-63.2.2.2'],
  ['Clc1ccc(OC2CCCCCC2)cc1', '(4-chlorophenoxy)cycloheptane', 'P-63.2.2.2 phenoxy, P-44.2 larger ring'],
  ['CC(C)(C)OC1CCCCC1', 'tert-butoxycyclohexane', 'P-63.2.2.2'],
  ['COC(C)C(C)O', '3-methoxybutan-2-ol', 'P-31.1.4.2.4'],
  ['C[C@@H](O)CC', '(2R)-butan-2-ol', 'P-93.5 with P-63.1.2'],
];

const traditional: [string, string, string][] = [
  ['CC(=O)C', 'acetone', 'P-64.2.1 general name'],
  ['COc1ccccc1', 'anisole', 'P-63.2.2.2 general name'],
  ['COc1ccc(Cl)cc1', '1-chloro-4-methoxybenzene', 'anisole is not substituted here'],
  ['CC(C)Oc1ccccc1', 'isopropoxybenzene', 'P-63.2.2.2 general prefix'],
  ['CC(C)COc1ccccc1', 'isobutoxybenzene', 'P-63.2.2.2 general prefix'],
  ['O=CCc1ccccc1', 'phenylacetaldehyde', 'P-66.6.1.1.1 general name'],
  ['OCC=O', 'hydroxyacetaldehyde', 'P-66.6.1.1.1 general name'],
  ['CC(O)C(C)C', '3-methylbutan-2-ol', 'P-63.1.2'],
  ['OCC(C)C1CCCCC1', '2-cyclohexylpropan-1-ol', 'P-44.1.1'],
];

namesExamples('P-63, P-64, P-66.6 worked examples (preferred names)', preferred);
namesExamples('traditional style: general names (written from memory)', traditional, 'traditional');

describe('explanation of principal groups', () => {
  it('lists the suffix with its locant and atoms', () => {
    const { naming } = describeSync({ smiles: 'CC(O)CC=O' }); // 3-hydroxybutanal
    if (!naming.ok) throw new Error(naming.reason);
    expect(naming.name).toBe('3-hydroxybutanal');
    expect(naming.explanation.parent.atoms).toEqual([4, 3, 1, 0]);
    expect(naming.explanation.principalGroups).toEqual([{ locant: '1', suffix: 'al', atoms: [4, 5] }]);
    expect(naming.explanation.substituents).toEqual([{ locant: '3', name: 'hydroxy', atoms: [2] }]);
  });
});

refusesExamples('refused whole rather than half-named', [
  ['OCC=O', /acetaldehyde/], // preferred style only
  ['O=CC(C=O)CC=O', /tricarbox|more than two CHO/],
  ['CC(=O)N(C)c1ccc(cc1)C(=O)O', /acylamino/],
  ['c1ccccc1Oc1ccccc1', /multiplicative/],
  ['OCCOCCO', /multiplicative/], // P-15.3: 2,2'-oxydi(ethan-1-ol)
  ['O=C(C1CCCCC1)c1ccccc1', /parentheses/], // cyclohexyl(phenyl)methanone, P-16.5.1.3
  ['ClC(c1ccccc1)C(=O)O', /parentheses/], // chloro(phenyl)acetic acid
  ['ClC(C1CCCCC1)c1ccccc1', /parentheses/], // [chloro(cyclohexyl)methyl]benzene
  ['ClCCOCCCl', /multiplicative/],
  ['COCCOCCOC', /multiplicative/],
  ['Oc1ccc(cc1)-c1ccccc1', /ring assembly/],
  ['OC1CCC(CC1)C1CCCCC1', /ring assembly/],
  ['C=C=O', /ketene/],
  ['CCOC(=O)OCC', /carbonate/],
  ['CC(=O)OC(C)=O', /anhydride/],
  ['COO', /not named yet/],
  ['OC1CCOCC1', /heterocycles/],
  ['CC(=O)OCC(O)COC(C)=O', /polyols|multiplicative/],
  ['C[O-]', /ion|charged/],
]);
