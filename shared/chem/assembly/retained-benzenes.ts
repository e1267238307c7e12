import type { Evaluated } from '../numbering/evaluate';
import type { NameStyle } from './style';

/**
 * Retained names of alkylbenzenes and anisole (IUPAC 2013 P-22.1.3), for the unsubstituted compounds only:
 *  - toluene is the preferred IUPAC name of C6H5-CH3; its substituted derivatives get systematic
 *    names in preferred names (1-chloro-4-methylbenzene), so only the bare compound is renamed;
 *  - xylene (o-, m-, p-), mesitylene, cumene and styrene are general (traditional) names only, with
 *    no substitution; their preferred names are 1,2-dimethylbenzene, 1,3,5-trimethylbenzene,
 *    (propan-2-yl)benzene and ethenylbenzene;
 *  - anisole (P-63.2.2.2) is a general name only; the preferred name is methoxybenzene.
 * Returns null when the benzene parent is not one of these exact compounds.
 */
export function retainedBenzeneName(e: Evaluated, style: NameStyle): string | null {
  if (e.skeleton.kind !== 'benzene' || e.attachment || e.principal.length) return null;
  const names = e.prefixes.map((p) => p.substituent.name);
  const locants = e.prefixes.map((p) => p.locant).sort((a, b) => a - b).join(',');
  const only = (name: string) => names.length > 0 && names.every((n) => n === name);
  if (names.length === 1 && only('methyl')) return 'toluene';
  if (style !== 'traditional') return null;
  if (names.length === 2 && only('methyl')) return ({ '1,2': 'o-xylene', '1,3': 'm-xylene', '1,4': 'p-xylene' } as Record<string, string>)[locants] ?? null;
  if (names.length === 3 && only('methyl') && locants === '1,3,5') return 'mesitylene';
  if (names.length === 1 && only('isopropyl')) return 'cumene';
  if (names.length === 1 && only('vinyl')) return 'styrene';
  if (names.length === 1 && only('methoxy')) return 'anisole';
  return null;
}
