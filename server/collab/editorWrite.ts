import { createBinding, syncLexicalUpdateToYjs } from '@lexical/yjs';
import * as Y from 'yjs';
import { createProjectionEditor, silentProvider } from './projection';

/**
 * Writes into `doc` what `build` does to a headless editor with the page's node types, through
 * the same binding the browser editor uses, so the document gets exactly the shape a browser
 * would have written.
 */
export function writeThroughEditor(doc: Y.Doc, build: () => void): void {
  const editor = createProjectionEditor();
  const binding = createBinding(editor, silentProvider, 'page', doc, new Map([['page', doc]]));
  editor.registerUpdateListener(({ prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags }) => {
    syncLexicalUpdateToYjs(binding, silentProvider, prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags);
  });
  editor.update(build, { discrete: true });
}

/** The Yjs update of a fresh document written by `build` (see writeThroughEditor). */
export function updateWrittenBy(build: () => void): Uint8Array {
  const doc = new Y.Doc();
  writeThroughEditor(doc, build);
  const update = Y.encodeStateAsUpdate(doc);
  doc.destroy();
  return update;
}
