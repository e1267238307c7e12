import { beforeAll } from 'vitest';
import { loadChemistry } from '../../../shared/chem/index';
import { namesExamples, refusesExamples } from './support/examples';

/**
 * Amines, IUPAC 2013 Recommendations (written from memory of the rules and their examples):
 * P-62.2.1.1 primary amines with the -amine suffix and aniline (retained PIN, substitutable on
 * the ring and on N); secondary and tertiary amines as N-substituted primary amines, the senior
 * carbon group being the parent (P-44.1.1, P-44.1.2.2); P-62.2.2 amino prefixes (amino,
 * methylamino, dimethylamino, anilino) when a senior class is present (P-41).
 */
beforeAll(loadChemistry);

namesExamples('P-62 amines (preferred names)', [
  ['CN', 'methanamine', 'P-62.2.1.1.1'],
  ['CCN', 'ethanamine', 'P-62.2.1.1.1, P-31.1.4.2.4'],
  ['CCCN', 'propan-1-amine', 'P-62.2.1.1.1'],
  ['CC(C)N', 'propan-2-amine', 'P-62.2.1.1.1'],
  ['NC(C)(C)C', '2-methylpropan-2-amine', 'P-62.2.1.1.1'],
  ['NCCN', 'ethane-1,2-diamine', 'P-62.2.1.1.1'],
  ['NC1CCCCC1', 'cyclohexanamine', 'P-62.2.1.1.1'],
  ['NCc1ccccc1', 'phenylmethanamine', 'P-62.2.1.1.1 (benzylamine is not a PIN)'],
  ['Nc1ccccc1', 'aniline', 'P-62.2.1.1.1 retained PIN'],
  ['Nc1ccc(Cl)cc1', '4-chloroaniline', 'P-62.2.1.1.1'],
  ['Nc1ccc(N)cc1', 'benzene-1,4-diamine', 'P-62.2.1.1.1'],
  ['CNC', 'N-methylmethanamine', 'P-62.2.1.1.2'],
  ['CCNC', 'N-methylethanamine', 'P-62.2.1.1.2'],
  ['CN(C)C', 'N,N-dimethylmethanamine', 'P-62.2.1.1.2'],
  ['CCN(CC)CC', 'N,N-diethylethanamine', 'P-62.2.1.1.2'],
  ['CCNC(C)C', 'N-ethylpropan-2-amine', 'P-62.2.1.1.2, P-44.3'],
  ['CNC1CCCCC1', 'N-methylcyclohexanamine', 'P-62.2.1.1.2, P-44.1.2.2'],
  ['CNCC(C)C', 'N,2-dimethylpropan-1-amine', 'P-62.2.1.1.2, P-14.3.5 N before numerals'],
  ['CNc1ccccc1', 'N-methylaniline', 'P-62.2.1.1.2'],
  ['CN(C)c1ccccc1', 'N,N-dimethylaniline', 'P-62.2.1.1.2'],
  ['CNc1ccc(Cl)cc1', '4-chloro-N-methylaniline', 'P-62.2.1.1.2, P-14.5 alphanumerical order'],
  ['C[C@H](N)CC', '(2S)-butan-2-amine', 'P-93.5'],
  ['NCCO', '2-aminoethan-1-ol', 'P-41 alcohol senior to amine, P-62.2.2'],
  ['CNCCO', '2-(methylamino)ethan-1-ol', 'P-62.2.2'],
  ['CN(C)CCO', '2-(dimethylamino)ethan-1-ol', 'P-62.2.2'],
  ['OC(=O)c1ccc(N)cc1', '4-aminobenzoic acid', 'P-62.2.2'],
  ['CN(C)c1ccc(cc1)C(=O)O', '4-(dimethylamino)benzoic acid', 'P-62.2.2'],
  ['Oc1ccc(Nc2ccccc2)cc1', '4-anilinophenol', 'P-62.2.2 anilino'],
  ['NCCC(=O)O', '3-aminopropanoic acid', 'P-62.2.2'],
  ['CC(=O)CCN', '4-aminobutan-2-one', 'P-41 ketone senior to amine'],
]);

refusesExamples('refused whole', [
  ['CNCCNC', /N1\/N2/],
  ['NCCNCCN', /N1\/N2|multiplicative/],
  ['CN(CC)CCO', /two different groups/],
  ['OC(=O)CN', /amino acids/],
  ['CC(N)C(=O)O', /amino acids/],
  ['c1ccccc1Nc1ccccc1', /equally senior rings/],
  ['CC(=N)C', /N atom/],
  ['C[NH3+]', /ion|charged/],
  ['CNO', /N atom/],
  ['CC(=O)NC(C)=O', /amide/],
]);
