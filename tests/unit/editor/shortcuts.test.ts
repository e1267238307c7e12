import { describe, expect, it } from 'vitest';
import { matchShortcut, shortcuts } from '../../../src/features/page-editor/toolbar/shortcuts';
import { safeLinkUrl } from '../../../src/features/page-editor/toolbar/LinkEditor';
import { presenceColour, presencePalette } from '../../../src/features/page-editor/collab/palette';

const key = (code: string, extra: Partial<KeyboardEvent> = {}) => ({ code, altKey: false, ctrlKey: true, metaKey: false, shiftKey: false, ...extra });

describe('keyboard map', () => {
  it('gives every shortcut its own key combination', () => {
    const combos = shortcuts.map((s) => `${s.alt}-${s.code}`);
    expect(new Set(combos).size).toBe(combos.length);
  });

  it('matches on Ctrl or Cmd, with Alt where the map says so, and never without a modifier', () => {
    expect(matchShortcut(key('Digit2', { altKey: true }))?.does).toBe('Sub-heading');
    expect(matchShortcut(key('Digit2', { altKey: true, ctrlKey: false, metaKey: true }))?.does).toBe('Sub-heading');
    expect(matchShortcut(key('Comma'))?.does).toMatch(/Subscript/);
    expect(matchShortcut(key('Digit2'))).toBeNull();
    expect(matchShortcut(key('Comma', { ctrlKey: false }))).toBeNull();
    // Shift combinations stay with the editor (e.g. redo).
    expect(matchShortcut(key('KeyK', { shiftKey: true }))).toBeNull();
  });
});

describe('links', () => {
  it('accepts web and mail addresses, adding https:// when none is given', () => {
    expect(safeLinkUrl('example.org/lab')).toBe('https://example.org/lab');
    expect(safeLinkUrl('mailto:chemist@saltmarsh.test')).toBe('mailto:chemist@saltmarsh.test');
  });

  it('refuses script and other schemes', () => {
    expect(safeLinkUrl('javascript:alert(1)')).toBeNull();
    expect(safeLinkUrl('file:///etc/passwd')).toBeNull();
    expect(safeLinkUrl('  ')).toBeNull();
  });
});

describe('presence colours', () => {
  it('gives a person the same colour from our palette every time', () => {
    const id = '5b0e1c4e-3f7a-4c55-9d7e-2a1f0e9b6c11';
    expect(presenceColour(id)).toBe(presenceColour(id));
    expect(presencePalette).toContain(presenceColour(id));
  });
});
