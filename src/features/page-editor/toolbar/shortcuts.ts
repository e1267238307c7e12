import type { LexicalEditor } from 'lexical';
import { insertTable, setTextBlock, toggleFormat } from './blockActions';

export interface ShortcutHandlers {
  openStructureDialog: () => void;
  openLinkEditor: () => void;
}

export interface Shortcut {
  /** As shown to people, with "Mod" standing for Ctrl (Cmd on a Mac). */
  keys: string;
  does: string;
  /** Matched on the physical key (`KeyboardEvent.code`), so Alt combinations work on every layout. */
  code: string;
  alt: boolean;
  run: (editor: LexicalEditor, handlers: ShortcutHandlers) => void;
}

/** Our own keyboard map; the editor's built-in ones (bold, italic, undo, redo) are listed too. */
export const shortcuts: Shortcut[] = [
  { keys: 'Mod Alt 0', does: 'Body text', code: 'Digit0', alt: true, run: (e) => setTextBlock(e, 'paragraph') },
  { keys: 'Mod Alt 1', does: 'Section heading', code: 'Digit1', alt: true, run: (e) => setTextBlock(e, 'h1') },
  { keys: 'Mod Alt 2', does: 'Sub-heading', code: 'Digit2', alt: true, run: (e) => setTextBlock(e, 'h2') },
  { keys: 'Mod Alt 3', does: 'Minor heading', code: 'Digit3', alt: true, run: (e) => setTextBlock(e, 'h3') },
  { keys: 'Mod Alt 7', does: 'Numbered steps', code: 'Digit7', alt: true, run: (e) => setTextBlock(e, 'number') },
  { keys: 'Mod Alt 8', does: 'Bulleted list', code: 'Digit8', alt: true, run: (e) => setTextBlock(e, 'bullet') },
  { keys: 'Mod Alt 9', does: 'Checklist', code: 'Digit9', alt: true, run: (e) => setTextBlock(e, 'check') },
  { keys: 'Mod ,', does: 'Subscript (H₂O)', code: 'Comma', alt: false, run: (e) => toggleFormat(e, 'subscript') },
  { keys: 'Mod .', does: 'Superscript (¹H)', code: 'Period', alt: false, run: (e) => toggleFormat(e, 'superscript') },
  { keys: 'Mod K', does: 'Link', code: 'KeyK', alt: false, run: (_e, h) => h.openLinkEditor() },
  { keys: 'Mod Alt S', does: 'Add a structure', code: 'KeyS', alt: true, run: (_e, h) => h.openStructureDialog() },
  { keys: 'Mod Alt T', does: 'Table', code: 'KeyT', alt: true, run: (e) => insertTable(e) },
];

export const builtInShortcuts: { keys: string; does: string }[] = [
  { keys: 'Mod B', does: 'Bold' },
  { keys: 'Mod I', does: 'Italic' },
  { keys: 'Mod Z', does: 'Undo your own last change' },
  { keys: 'Mod Shift Z', does: 'Redo' },
];

export function matchShortcut(event: Pick<KeyboardEvent, 'code' | 'altKey' | 'ctrlKey' | 'metaKey' | 'shiftKey'>): Shortcut | null {
  if (!(event.ctrlKey || event.metaKey) || event.shiftKey) return null;
  return shortcuts.find((shortcut) => shortcut.code === event.code && shortcut.alt === event.altKey) ?? null;
}
