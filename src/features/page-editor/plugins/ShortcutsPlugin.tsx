import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { COMMAND_PRIORITY_NORMAL, KEY_DOWN_COMMAND } from 'lexical';
import { useEffect, useRef } from 'react';
import { matchShortcut, type ShortcutHandlers } from '../toolbar/shortcuts';

export function ShortcutsPlugin(handlers: ShortcutHandlers) {
  const [editor] = useLexicalComposerContext();
  const latest = useRef(handlers);
  latest.current = handlers;

  useEffect(
    () =>
      editor.registerCommand(
        KEY_DOWN_COMMAND,
        (event) => {
          const shortcut = matchShortcut(event);
          if (!shortcut || !editor.isEditable()) return false;
          event.preventDefault();
          shortcut.run(editor, latest.current);
          return true;
        },
        COMMAND_PRIORITY_NORMAL,
      ),
    [editor],
  );
  return null;
}
