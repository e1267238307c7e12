/**
 * Alphanumerical ordering of IUPAC 2013 P-14.5: letters first (italic prefixes such as sec-,
 * tert- and italic locants such as N- ignored; multiplying prefixes are not part of a simple
 * prefix's name and therefore never seen here; 'iso' counts), then, at equal letters, the
 * italic prefix (none < sec < tert, P-14.5.2) and lower locants at the first point of
 * difference (P-14.5.4).
 */
const lettersCache = new Map<string, string>();

function alphaLetters(name: string): string {
  let letters = lettersCache.get(name);
  if (letters === undefined) {
    letters = name.replace(/\b(sec|tert)-/g, '').replace(/[^a-z]/g, '');
    if (lettersCache.size > 50_000) lettersCache.clear();
    lettersCache.set(name, letters);
  }
  return letters;
}

function italicRank(name: string): number {
  if (/^tert-/.test(name)) return 2;
  if (/^sec-/.test(name)) return 1;
  return 0;
}

function numbers(name: string): number[] {
  return (name.match(/\d+/g) ?? []).map(Number);
}

export function compareNumberLists(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i] - b[i];
  return a.length - b.length;
}

export function compareAlphanumerical(a: string, b: string): number {
  if (a === b) return 0;
  const la = alphaLetters(a);
  const lb = alphaLetters(b);
  if (la !== lb) return la < lb ? -1 : 1;
  const italic = italicRank(a) - italicRank(b);
  if (italic !== 0) return italic;
  const byNumbers = compareNumberLists(numbers(a), numbers(b));
  if (byNumbers !== 0) return byNumbers;
  return a < b ? -1 : a > b ? 1 : 0;
}
