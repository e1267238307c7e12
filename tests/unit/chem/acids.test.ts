import { beforeAll } from 'vitest';
import { loadChemistry } from '../../../shared/chem/index';
import { namesExamples, refusesExamples } from './support/examples';

/**
 * Carboxylic acids, IUPAC 2013 Recommendations (written from memory of the rules and their
 * examples): P-65.1.1 retained names (formic, acetic, benzoic, oxalic acid), P-65.1.2 -oic acid
 * and -carboxylic acid, P-65.1.5.1 carboxy prefix, P-41 (acids senior to all other classes named
 * here), P-44.1.1 / P-44.1.2.2 parent selection.
 */
beforeAll(loadChemistry);

namesExamples('P-65.1 carboxylic acids', [
  ['OC=O', 'formic acid', 'P-65.1.1.1 retained PIN'],
  ['CC(=O)O', 'acetic acid', 'P-65.1.1.1 retained PIN'],
  ['OC(=O)C(=O)O', 'oxalic acid', 'P-65.1.1.1 retained PIN'],
  ['CCC(=O)O', 'propanoic acid', 'P-65.1.2.1'],
  ['CCCCCC(=O)O', 'hexanoic acid', 'P-65.1.2.1'],
  ['CCC(CC)C(=O)O', '2-ethylbutanoic acid', 'P-65.1.2.1, P-44.3'],
  ['OC(=O)CC(=O)O', 'propanedioic acid', 'P-65.1.2.1 (malonic acid is not a PIN)'],
  ['OC(=O)CCCCC(=O)O', 'hexanedioic acid', 'P-65.1.2.1'],
  ['OC(=O)C=C', 'prop-2-enoic acid', 'P-65.1.2.1 (acrylic acid is not a PIN)'],
  ['ClCC(=O)O', 'chloroacetic acid', 'P-65.1.1.1 acetic acid substituted, no locants'],
  ['ClC(Cl)(Cl)C(=O)O', 'trichloroacetic acid', 'P-65.1.1.1'],
  ['OC(=O)Cc1ccccc1', 'phenylacetic acid', 'P-65.1.1.1'],
  ['OCC(=O)O', 'hydroxyacetic acid', 'P-65.1.1.1'],
  ['O=CC(=O)O', 'oxoacetic acid', 'P-41 acid senior to aldehyde'],
  ['CC(O)C(=O)O', '2-hydroxypropanoic acid', 'P-65.1.2.1 (lactic acid is not a PIN)'],
  ['CC(=O)C(=O)O', '2-oxopropanoic acid', 'P-41 acid senior to ketone'],
  ['CC(=O)CCC(=O)O', '4-oxopentanoic acid', 'P-64.2.2'],
  ['OC(=O)c1ccccc1', 'benzoic acid', 'P-65.1.1.1 retained PIN'],
  ['OC(=O)c1ccc(Cl)cc1', '4-chlorobenzoic acid', 'P-65.1.1.1'],
  ['OC(=O)c1ccccc1O', '2-hydroxybenzoic acid', 'P-65.1.1.1 (salicylic acid is not a PIN)'],
  ['COc1ccc(cc1)C(=O)O', '4-methoxybenzoic acid', 'P-63.2.2.2'],
  ['OC(=O)c1ccc(C(=O)O)cc1', 'benzene-1,4-dicarboxylic acid', 'P-65.1.2.2 (terephthalic acid is not a PIN)'],
  ['OC(=O)C1CCCCC1', 'cyclohexanecarboxylic acid', 'P-65.1.2.2'],
  ['OC(=O)C1CCC(Cl)CC1', '4-chlorocyclohexane-1-carboxylic acid', 'P-65.1.2.2'],
  ['OC(=O)CCc1ccc(C=O)cc1', '3-(4-formylphenyl)propanoic acid', 'P-44.1.1, P-66.6.1.2 formyl'],
  ['OC(=O)c1ccc(CCC(=O)O)cc1', '4-(2-carboxyethyl)benzoic acid', 'P-44.1.2.2, P-65.1.5.1 carboxy'],
  ['OC(=O)CC1CCC(CC1)C(=O)O', '4-(carboxymethyl)cyclohexane-1-carboxylic acid', 'P-44.1.2.2'],
  ['C[C@H](O)C(=O)O', '(2S)-2-hydroxypropanoic acid', 'P-93.5'],
]);

refusesExamples('refused whole', [
  ['OC(=O)CC(CC(=O)O)C(=O)O', /tricarboxylic/],
  ['CC(=O)OC(C)=O', /anhydride/],
  ['OC(=O)CC(=O)OC', /ester/],
  ['CC(=O)[O-]', /ion|charged/],
  ['OC(=O)C#N', /one-carbon/],
]);
