import { locantText, type Prefix, type SubstituentName } from '../numbering/context';
import { compareAlphanumerical } from './alphanumeric';
import { enclose } from './enclosing';
import { complexMultiplier, multiplier } from './numerals';

export interface CitedPrefix {
  /** Locants as cited, in ascending order; empty when P-31.1.4.2.4 lets them go. */
  locants: string[];
  text: string;
  name: string;
}

/**
 * Detachable prefixes in alphanumerical order (P-14.5) with multiplying prefixes (P-16.9: di, tri
 * for simple prefixes; bis, tris for substituted ones and whenever di could mislead), enclosing
 * marks (P-16.5) and hyphens between locants and words (P-16.3).
 */
export function citePrefixes(prefixes: Prefix[], omitLocants: boolean): CitedPrefix[] {
  const byName = new Map<string, Prefix[]>();
  for (const p of prefixes) byName.set(p.substituent.name, [...(byName.get(p.substituent.name) ?? []), p]);
  const groups = [...byName.values()].sort((a, b) => compareAlphanumerical(a[0].substituent.name, b[0].substituent.name));
  return groups.map((group) => {
    const { substituent } = group[0];
    const locants = group.map((p) => p.locant).sort((a, b) => a - b).map(locantText);
    const [mult, body] = multipliedParts(substituent, group.length);
    const text = (omitLocants ? '' : `${locants.join(',')}-`) + mult + body;
    return { locants: omitLocants ? [] : locants, text, name: substituent.name };
  });
}

/**
 * `count` equal substituents as cited: the multiplying prefix (P-16.9: di, tri for simple prefixes;
 * bis, tris for substituted ones) and the name after it, enclosed where it carries locants or is
 * substituted (P-16.5): ['di', 'methyl'], ['', '(propan-2-yl)'], ['bis', '(2-chloroethyl)'].
 * An italic sec-/tert- prefix keeps a hyphen after the multiplier: ['di-', 'tert-butyl'].
 */
export function multipliedParts(substituent: SubstituentName, count: number): [string, string] {
  const wrapped = substituent.enclose ? enclose(substituent.name) : substituent.name;
  if (count === 1) return ['', wrapped];
  if (!substituent.compound) return [multiplier(count) + (/^(sec|tert)-/.test(wrapped) ? '-' : ''), wrapped];
  return [complexMultiplier(count), substituent.enclose ? wrapped : enclose(wrapped)];
}

export function joinPrefixes(cited: CitedPrefix[]): string {
  return cited.map((c, i) => (i > 0 && /^(\d|N[,-])/.test(c.text) ? '-' : '') + c.text).join('');
}
