import { alkaneStem, multiplier } from './numerals';

export type FreeValenceKind = 'yl' | 'ylidene' | 'ylidyne';

export interface HydrideSpec {
  size: number;
  ring: boolean;
  /** Multiple bonds of the parent, by locant (lower end); ignored for benzene. */
  multiple: { locant: number; order: 2 | 3 }[];
  /** Free valence of a substituent group, or null for a parent compound. */
  freeValence: { locant: number; kind: FreeValenceKind } | null;
  /** Write the ene/yne locants (false only where P-31.1.4.2.4 lets them go). */
  citeMultipleBondLocants: boolean;
}

const vowelStart = (text: string) => /^[aeiouy]/.test(text);

/**
 * Name of a chain or monocycle hydride with its unsaturation endings (P-31.1.4) and, for a
 * substituent group, its free-valence suffix (P-29.2). Method (1) names — 'propyl', 'cyclohexyl',
 * 'ethylidene' — serve saturated groups whose free valence is at locant 1; otherwise method (2)
 * with cited locants: 'propan-2-yl', 'prop-2-en-1-yl', 'cyclohex-2-en-1-yl'.
 */
export function hydrideName(spec: HydrideSpec): string {
  const stem = (spec.ring ? 'cyclo' : '') + alkaneStem(spec.size);
  const enes = spec.multiple.filter((m) => m.order === 2).map((m) => m.locant).sort((a, b) => a - b);
  const ynes = spec.multiple.filter((m) => m.order === 3).map((m) => m.locant).sort((a, b) => a - b);
  const fv = spec.freeValence;
  if (enes.length === 0 && ynes.length === 0) {
    if (!fv) return `${stem}ane`;
    if (fv.locant === 1) return stem + fv.kind;
    return `${stem}an-${fv.locant}-${fv.kind}`;
  }
  const cite = (locants: number[]) => (spec.citeMultipleBondLocants ? `-${locants.join(',')}-` : '');
  const parts: string[] = [];
  if (enes.length) parts.push(`${cite(enes)}${multiplier(enes.length)}ene`);
  if (ynes.length) parts.push(`${cite(ynes)}${multiplier(ynes.length)}yne`);
  // 'a' is added to the stem before a consonant (buta-1,3-diene, hexa-1,5-diyne), P-31.1.4.2.1.
  const first = parts[0].replace(/^-[\d,]+-/, '');
  let text = stem + (vowelStart(first) ? '' : 'a');
  for (let i = 0; i < parts.length; i++) {
    let part = parts[i];
    const next = i + 1 < parts.length ? parts[i + 1].replace(/^-[\d,]+-/, '') : fv ? fv.kind : '';
    // A final 'e' is elided before a vowel or 'y' (hex-1-en-5-yne, prop-2-en-1-yl).
    if (next && vowelStart(next)) part = part.slice(0, -1);
    text += part;
  }
  if (fv) text += spec.citeMultipleBondLocants ? `-${fv.locant}-${fv.kind}` : fv.kind;
  return text;
}
