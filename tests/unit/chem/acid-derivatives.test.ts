import { beforeAll } from 'vitest';
import { loadChemistry } from '../../../shared/chem/index';
import { namesExamples, refusesExamples } from './support/examples';

/**
 * Nitriles, esters, amides and acid halides, IUPAC 2013 Recommendations (written from memory of
 * the rules and their examples): P-66.5 nitriles (-nitrile, -carbonitrile, cyano; acetonitrile,
 * benzonitrile, formonitrile retained), P-65.6.3 esters (alkyl alkanoate, esters of ring acids and
 * of the retained acids), P-66.1 amides (-amide, -carboxamide, N-substituents; formamide,
 * acetamide, benzamide retained; carbamoyl prefix), P-65.5 acid halides (-oyl halide, -carbonyl
 * halide; acetyl, benzoyl, oxalyl), P-41 seniority (acids > esters > acid halides > amides >
 * nitriles > aldehydes > ketones > alcohols > amines).
 */
beforeAll(loadChemistry);

namesExamples('P-66.5 nitriles', [
  ['CC#N', 'acetonitrile', 'P-66.5.1.1.1 retained PIN'],
  ['C#N', 'formonitrile', 'P-66.5.1.1.1 retained PIN'],
  ['CCC#N', 'propanenitrile', 'P-66.5.1.1.2'],
  ['C=CC#N', 'prop-2-enenitrile', 'P-66.5.1.1.2 (acrylonitrile is not a PIN)'],
  ['N#CCC#N', 'propanedinitrile', 'P-66.5.1.1.2'],
  ['N#CCCCC#N', 'pentanedinitrile', 'P-66.5.1.1.2'],
  ['CC(C)(O)C#N', '2-hydroxy-2-methylpropanenitrile', 'P-41 nitrile senior to alcohol'],
  ['N#Cc1ccccc1', 'benzonitrile', 'P-66.5.1.1.1 retained PIN'],
  ['N#Cc1ccc(Cl)cc1', '4-chlorobenzonitrile', 'P-66.5.1.1.1'],
  ['N#CC1CCCCC1', 'cyclohexanecarbonitrile', 'P-66.5.1.1.3'],
  ['N#Cc1ccc(C#N)cc1', 'benzene-1,4-dicarbonitrile', 'P-66.5.1.1.3'],
  ['N#CCC(=O)O', 'cyanoacetic acid', 'P-66.5.1.2 cyano prefix, carbon not in the chain'],
  ['N#CCCC(=O)O', '3-cyanopropanoic acid', 'P-66.5.1.2'],
  ['N#Cc1ccc(cc1)C(=O)O', '4-cyanobenzoic acid', 'P-66.5.1.2'],
  ['N#CC(=O)CC', '2-oxobutanenitrile', 'P-41 nitrile senior to ketone'],
]);

namesExamples('P-65.6.3 esters', [
  ['CC(=O)OCC', 'ethyl acetate', 'P-65.6.3.2.1'],
  ['COC=O', 'methyl formate', 'P-65.6.3.2.1'],
  ['COC(=O)c1ccccc1', 'methyl benzoate', 'P-65.6.3.2.1'],
  ['CCCCOC(=O)CC', 'butyl propanoate', 'P-65.6.3.2.1'],
  ['CC(C)CCOC(C)=O', '3-methylbutyl acetate', 'P-65.6.3.2.1 (isoamyl acetate is not a PIN)'],
  ['CC(C)OC(C)=O', 'propan-2-yl acetate', 'P-65.6.3.2.1'],
  ['C=COC(C)=O', 'ethenyl acetate', 'P-65.6.3.2.1 (vinyl acetate is not a PIN)'],
  ['CC(=O)Oc1ccccc1', 'phenyl acetate', 'P-65.6.3.2.1'],
  ['CC(=O)OCc1ccccc1', 'benzyl acetate', 'P-65.6.3.2.1, P-29.6.2.3'],
  ['CCOC(=O)C1CCCCC1', 'ethyl cyclohexanecarboxylate', 'P-65.6.3.2.1'],
  ['CCOC(=O)CCC(=O)OCC', 'diethyl butanedioate', 'P-65.6.3.2.1'],
  ['CCOC(=O)C(=O)OCC', 'diethyl oxalate', 'P-65.6.3.2.1, P-65.1.1.1'],
  ['COC(=O)c1ccc(cc1)C(=O)OC', 'dimethyl benzene-1,4-dicarboxylate', 'P-65.6.3.2.1'],
  ['CCOC(=O)CCl', 'ethyl chloroacetate', 'P-65.1.1.1'],
  ['CCOC(=O)CC(C)=O', 'ethyl 3-oxobutanoate', 'P-64.2.2'],
  ['CC(=O)OCCO', '2-hydroxyethyl acetate', 'P-63.1.3 in the alkyl part'],
  ['CCOC(=O)c1ccc(N)cc1', 'ethyl 4-aminobenzoate', 'P-62.2.2'],
  ['CCOC(=O)C=C', 'ethyl prop-2-enoate', 'P-65.6.3.2.1'],
  ['COC(=O)C(C)=C', 'methyl 2-methylprop-2-enoate', 'P-65.6.3.2.1'],
]);

namesExamples('P-66.1 amides', [
  ['NC=O', 'formamide', 'P-66.1.1.1 retained PIN'],
  ['CC(N)=O', 'acetamide', 'P-66.1.1.1 retained PIN'],
  ['NC(=O)c1ccccc1', 'benzamide', 'P-66.1.1.1 retained PIN'],
  ['CCC(N)=O', 'propanamide', 'P-66.1.1.2'],
  ['NC(=O)CCCCC(N)=O', 'hexanediamide', 'P-66.1.1.2'],
  ['NC(=O)C1CCCCC1', 'cyclohexanecarboxamide', 'P-66.1.1.3'],
  ['CNC(=O)C', 'N-methylacetamide', 'P-66.1.1.4'],
  ['CN(C)C(=O)C', 'N,N-dimethylacetamide', 'P-66.1.1.4'],
  ['CN(C)C=O', 'N,N-dimethylformamide', 'P-66.1.1.4'],
  ['CC(=O)Nc1ccccc1', 'N-phenylacetamide', 'P-66.1.1.4 (acetanilide is not a PIN)'],
  ['CNC(=O)c1ccccc1', 'N-methylbenzamide', 'P-66.1.1.4'],
  ['CCN(C)C(=O)CC', 'N-ethyl-N-methylpropanamide', 'P-66.1.1.4, P-14.5'],
  ['NC(=O)c1ccc(Cl)cc1', '4-chlorobenzamide', 'P-66.1.1.1'],
  ['NC(=O)c1ccc(cc1)C(=O)O', '4-carbamoylbenzoic acid', 'P-66.1.4.1 carbamoyl'],
  ['NC(=O)CCC#N', '3-cyanopropanamide', 'P-41 amide senior to nitrile'],
]);

namesExamples('P-65.5 acid halides', [
  ['CC(Cl)=O', 'acetyl chloride', 'P-65.5.1, P-65.1.7.2'],
  ['ClC(=O)c1ccccc1', 'benzoyl chloride', 'P-65.5.1'],
  ['CCC(Cl)=O', 'propanoyl chloride', 'P-65.5.1'],
  ['BrC(=O)CC', 'propanoyl bromide', 'P-65.5.1'],
  ['ClC(=O)CCC(Cl)=O', 'butanedioyl dichloride', 'P-65.5.1'],
  ['ClC(=O)C1CCCCC1', 'cyclohexanecarbonyl chloride', 'P-65.5.1'],
  ['ClCC(Cl)=O', 'chloroacetyl chloride', 'P-65.5.1'],
  ['O=C(Cl)C(Cl)=O', 'oxalyl dichloride', 'P-65.5.1'],
  ['ClC(=O)c1ccc(cc1)[N+](=O)[O-]', '4-nitrobenzoyl chloride', 'P-65.5.1, P-61.5'],
]);

namesExamples('traditional style: general names', [
  ['C=COC(C)=O', 'vinyl acetate', 'P-65.6.3.2.1 with P-29.6 vinyl'],
  ['CC(C)OC(C)=O', 'isopropyl acetate', 'P-29.6 isopropyl'],
  ['CC(C)CCOC(C)=O', 'isopentyl acetate', 'P-29.6 isopentyl'],
  ['N#CCc1ccccc1', 'phenylacetonitrile', 'P-66.5.1.1.1 general name'],
  ['NC(=O)CCl', 'chloroacetamide', 'P-66.1.1.1 general name'],
], 'traditional');

// A multiplied italic prefix keeps its hyphen: di-tert-butyl, never "ditert-butyl" (P-16.9 with
// P-29.6, as in 1,4-di-tert-butylbenzene; written from memory). Same rule in the ester word and
// inside an amino prefix.
namesExamples('P-16.9 multiplied sec-/tert- prefixes', [
  ['CC(C)(C)OC(=O)CCC(=O)OC(C)(C)C', 'di-tert-butyl butanedioate', 'P-65.6.3.2.1 with P-29.6 tert-butyl'],
  ['OCCN(C(C)(C)C)C(C)(C)C', '2-(di-tert-butylamino)ethan-1-ol', 'P-62.2.1.1.2 amino prefix with P-29.6'],
]);

namesExamples('traditional style: multiplied sec- prefix', [
  ['CCC(C)OC(=O)CC(=O)OC(C)CC', 'di-sec-butyl propanedioate', 'P-65.6.3.2.1 with P-29.6 sec-butyl'],
], 'traditional');

refusesExamples('refused whole', [
  ['CC(=O)OCCOC(C)=O', /polyols|multiplicative/],
  ['CCOC(=O)CCC(=O)OC', /O-locants/],
  ['COC(=O)CCC(=O)O', /ester group .* prefix/],
  ['OC(=O)CC(Cl)=O', /acid halide group .* prefix/],
  ['CNC(=O)c1ccc(cc1)C(=O)O', /N-substituted amide/],
  ['ClC(=O)CCC(Br)=O', /different halogens/],
  ['N#CC(C#N)CC#N', /more than two/],
  ['N#CCc1ccccc1', /acetonitrile/],
  ['NC(=O)CCl', /acetamide/],
  ['CNC(=O)CNC', /acetamide/],
  ['CC(=O)OC(C)=O', /anhydride/],
  ['CC(=O)N1CCCC1', /heterocycles/],
  ['NC(=O)N', /not named yet/],
  ['CCOC(=O)OCC', /carbonate/],
  ['CC(=O)NN', /not named yet/],
  ['CC(=O)NC(C)=O', /amide/],
  ['NC(=O)C(N)=O', /two-carbon/],
  ['CC(=O)SC', /not named yet/],
]);
