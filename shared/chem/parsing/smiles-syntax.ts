import { ChemInputError } from './errors';
import { ALL_ELEMENTS, MAX_HEAVY_ATOMS, ORGANIC_ELEMENTS } from './limits';

/** An organic-subset atom starting exactly at `lastIndex` (sticky: no copy of the rest of the string). */
const ORGANIC = /Cl|Br|B|C|N|O|P|S|F|I|b|c|n|o|p|s/y;

/**
 * Checks SMILES syntax (OpenSMILES grammar) before openchemlib sees the string, because that
 * parser silently accepts some broken input (an unclosed branch, a stray character). Reports
 * the 1-based position and what is wrong, and enforces the element and size limits.
 */
export function checkSmilesSyntax(smiles: string): void {
  const bracket = /^\[(\d+)?([A-Z][a-z]?|se|as|[bcnops]|\*)(@@?|@TH[12]|@AL[12]|@SP[123]|@TB\d{1,2}|@OH\d{1,2})?(H\d?)?((?:\+\+?|--?)\d*)?(:\d+)?\]/;
  const openRings = new Map<string, number>();
  const branches: number[] = [];
  let heavyAtoms = 0;
  let afterAtom = false; // an atom has been read and may take ring bonds, branches, bonds
  let branchOpened = false; // just after '(': a bond may come, an atom must
  let pendingBond = -1; // position of a bond symbol still waiting for its atom or ring digit
  let i = 0;
  const fail = (message: string): never => {
    throw new ChemInputError('unparsable', `SMILES: ${message}`);
  };
  const at = (pos: number) => `at position ${pos + 1}`;

  while (i < smiles.length) {
    const ch = smiles[i];
    if (/\s/.test(ch)) fail(`unexpected space ${at(i)}`);
    if (ch === '[') {
      const close = smiles.indexOf(']', i);
      if (close < 0) fail(`'[' ${at(i)} is never closed`);
      const m = bracket.exec(smiles.slice(i, close + 1));
      if (!m) fail(`cannot read the bracket atom '${smiles.slice(i, close + 1)}' ${at(i)}`);
      const symbol = m![2] === '*' ? '*' : m![2].length <= 2 && /^[a-z]/.test(m![2]) ? m![2][0].toUpperCase() + m![2].slice(1) : m![2];
      checkElement(symbol, i);
      if (symbol !== 'H') heavyAtoms += 1;
      i = close + 1;
      afterAtom = true;
      branchOpened = false;
      pendingBond = -1;
      continue;
    }
    ORGANIC.lastIndex = i;
    const organicMatch = ORGANIC.exec(smiles);
    if (organicMatch) {
      heavyAtoms += 1;
      i += organicMatch[0].length;
      afterAtom = true;
      branchOpened = false;
      pendingBond = -1;
      continue;
    }
    if (ch === '*') fail(`wildcard atom '*' ${at(i)} is not supported`);
    if (/[A-Za-z]/.test(ch)) {
      const symbol = /^[A-Z][a-z]?/.exec(smiles.slice(i, i + 2))?.[0] ?? ch;
      if (ALL_ELEMENTS.has(symbol) && !ORGANIC_ELEMENTS.has(symbol)) {
        fail(`element ${symbol} ${at(i)} must be written in brackets ([${symbol}])`);
      }
      fail(`unknown atom symbol '${ch}' ${at(i)}`);
    }
    if ('-=#$:/\\'.includes(ch)) {
      if (!afterAtom && !branchOpened) fail(`bond '${ch}' ${at(i)} does not follow an atom`);
      if (pendingBond >= 0) fail(`two bond symbols in a row ${at(i)}`);
      pendingBond = i;
      i += 1;
      continue;
    }
    if (/[0-9%]/.test(ch)) {
      if (!afterAtom) fail(`ring bond digit ${at(i)} does not follow an atom`);
      let label = ch;
      if (ch === '%') {
        label = smiles.slice(i + 1, i + 3);
        if (!/^\d\d$/.test(label)) fail(`'%' ${at(i)} must be followed by two digits`);
      }
      const opened = openRings.get(label);
      if (opened === undefined) openRings.set(label, i);
      else openRings.delete(label);
      i += ch === '%' ? 3 : 1;
      pendingBond = -1;
      continue;
    }
    if (ch === '(') {
      if (!afterAtom) fail(`branch '(' ${at(i)} does not follow an atom`);
      if (pendingBond >= 0) fail(`bond ${at(pendingBond)} is followed by a branch`);
      branches.push(i);
      afterAtom = false;
      branchOpened = true;
      i += 1;
      continue;
    }
    if (ch === ')') {
      if (branches.length === 0) fail(`')' ${at(i)} has no matching '('`);
      if (!afterAtom || pendingBond >= 0) fail(`empty or unfinished branch closed ${at(i)}`);
      branches.pop();
      i += 1;
      continue;
    }
    if (ch === '.') {
      if (!afterAtom || pendingBond >= 0) fail(`'.' ${at(i)} does not follow an atom`);
      afterAtom = false;
      i += 1;
      continue;
    }
    fail(`unexpected character '${ch}' ${at(i)}`);
  }
  if (pendingBond >= 0) fail(`bond ${at(pendingBond)} has no atom after it`);
  if (branches.length > 0) fail(`'(' ${at(branches[branches.length - 1])} is never closed`);
  for (const [label, pos] of openRings) fail(`ring bond ${label} opened ${at(pos)} is never closed`);
  if (heavyAtoms > MAX_HEAVY_ATOMS) {
    throw new ChemInputError('too_large', `the molecule has ${heavyAtoms} non-hydrogen atoms; at most ${MAX_HEAVY_ATOMS} are accepted`);
  }
}

export function checkElement(symbol: string, position: number | null): void {
  const where = position === null ? '' : ` at position ${position + 1}`;
  if (symbol === '*') throw new ChemInputError('unsupported_feature', `wildcard atom '*'${where} is not supported`);
  if (!ALL_ELEMENTS.has(symbol)) throw new ChemInputError('unparsable', `unknown element '${symbol}'${where}`);
  if (!ORGANIC_ELEMENTS.has(symbol)) {
    throw new ChemInputError(
      'unsupported_element',
      `element ${symbol}${where} is not supported (accepted: ${[...ORGANIC_ELEMENTS].join(', ')})`,
    );
  }
}
