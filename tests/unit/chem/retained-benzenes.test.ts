import { beforeAll, describe, expect, it } from 'vitest';
import { describeSync, loadChemistry, type NameStyle } from '../../../shared/chem/index';

/**
 * Retained names of alkylbenzenes, IUPAC 2013 P-22.1.3 (written from memory): toluene is the
 * preferred IUPAC name of the unsubstituted compound only (substituted toluenes are named as
 * substituted benzenes in preferred names); xylenes, mesitylene, cumene and styrene are general
 * nomenclature only, unsubstituted.
 */
beforeAll(loadChemistry);

function named(smiles: string, style: NameStyle) {
  const { naming } = describeSync({ smiles }, { style });
  if (!naming.ok) throw new Error(`${smiles}: ${naming.reason}`);
  return naming;
}

describe('P-22.1.3 toluene and the other alkylbenzenes', () => {
  it.each([
    ['Cc1ccccc1', 'toluene', 'toluene'],
    ['Cc1ccc(Cl)cc1', '1-chloro-4-methylbenzene', '1-chloro-4-methylbenzene'],
    ['ClCc1ccccc1', '(chloromethyl)benzene', '(chloromethyl)benzene'],
    ['Cc1ccccc1C', '1,2-dimethylbenzene', 'o-xylene'],
    ['Cc1cccc(C)c1', '1,3-dimethylbenzene', 'm-xylene'],
    ['Cc1ccc(C)cc1', '1,4-dimethylbenzene', 'p-xylene'],
    ['Cc1cc(C)c(Cl)c(C)c1', '2-chloro-1,3,5-trimethylbenzene', '2-chloro-1,3,5-trimethylbenzene'],
    ['Cc1cc(C)cc(C)c1', '1,3,5-trimethylbenzene', 'mesitylene'],
    ['Cc1ccc(C)c(C)c1', '1,2,4-trimethylbenzene', '1,2,4-trimethylbenzene'],
    ['CC(C)c1ccccc1', '(propan-2-yl)benzene', 'cumene'],
    ['C=Cc1ccccc1', 'ethenylbenzene', 'styrene'],
    ['C=Cc1ccc(C)cc1', '1-ethenyl-4-methylbenzene', '1-methyl-4-vinylbenzene'],
    ['CCc1ccccc1', 'ethylbenzene', 'ethylbenzene'],
  ])('%s → %s (preferred), %s (traditional)', (smiles, preferred, traditional) => {
    expect(named(smiles, 'preferred').name).toBe(preferred);
    expect(named(smiles, 'traditional').name).toBe(traditional);
  });

  it('explains a retained name with its alkyl carbons inside the parent', () => {
    const naming = named('c1ccccc1C', 'preferred');
    const { parent } = naming.explanation;
    expect(parent.kind).toBe('benzene');
    expect(parent.name).toBe('toluene');
    expect(parent.atoms[0]).toBe(5); // ring locant 1 carries the methyl group
    expect([...parent.atoms].sort()).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(naming.explanation.substituents).toEqual([]);
  });
});
