import { createBinding, syncLexicalUpdateToYjs } from '@lexical/yjs';
import { $createParagraphNode, $getRoot } from 'lexical';
import * as Y from 'yjs';
import { createProjectionEditor, silentProvider } from './projection';

/**
 * The Yjs update that gives a new page its first (empty) paragraph, written by a headless editor
 * with the page's node types through the same binding the browser uses, so it has exactly the
 * shape a browser editor would have written. The server stores it before anyone gets the page:
 * editors opening a new page at the same moment then share this one paragraph instead of each
 * adding their own.
 */
export function firstParagraphUpdate(): Uint8Array {
  const doc = new Y.Doc();
  const editor = createProjectionEditor();
  const binding = createBinding(editor, silentProvider, 'page', doc, new Map([['page', doc]]));
  editor.registerUpdateListener(({ prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags }) => {
    syncLexicalUpdateToYjs(binding, silentProvider, prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags);
  });
  editor.update(() => $getRoot().append($createParagraphNode()), { discrete: true });
  const update = Y.encodeStateAsUpdate(doc);
  doc.destroy();
  return update;
}
