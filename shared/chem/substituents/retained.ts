import type { NameStyle } from '../assembly/style';

/**
 * Retained prefixes, for the unsubstituted groups only (P-29.6, P-32.3). Keys are the systematic
 * names the engine builds: method (2) names in preferred style, 'alkyl' names from the
 * attachment atom in traditional style.
 */
const PREFERRED: Record<string, string> = {
  '2-methylpropan-2-yl': 'tert-butyl', // P-29.6.1: tert-butyl is the preferred prefix (no substitution)
  phenylmethyl: 'benzyl', // P-29.6.2.3: preferred prefix
  phenylmethylidene: 'benzylidene',
};

const TRADITIONAL: Record<string, string> = {
  '1-methylethyl': 'isopropyl',
  '2-methylpropyl': 'isobutyl',
  '1-methylpropyl': 'sec-butyl',
  '1,1-dimethylethyl': 'tert-butyl',
  '3-methylbutyl': 'isopentyl',
  '2,2-dimethylpropyl': 'neopentyl',
  '1,1-dimethylpropyl': 'tert-pentyl',
  '1-methylethylidene': 'isopropylidene',
  ethenyl: 'vinyl',
  'prop-2-en-1-yl': 'allyl',
  phenylmethyl: 'benzyl',
  phenylmethylidene: 'benzylidene',
};

export function retainedPrefix(systematic: string, style: NameStyle): string | null {
  return (style === 'preferred' ? PREFERRED : TRADITIONAL)[systematic] ?? null;
}
