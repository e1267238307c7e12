import { $createParagraphNode, $getRoot } from 'lexical';
import { updateWrittenBy } from './editorWrite';

/**
 * The Yjs update that gives a new page its first (empty) paragraph, written by a headless editor
 * with the page's node types through the same binding the browser uses, so it has exactly the
 * shape a browser editor would have written. The server stores it before anyone gets the page:
 * editors opening a new page at the same moment then share this one paragraph instead of each
 * adding their own.
 */
export function firstParagraphUpdate(): Uint8Array {
  return updateWrittenBy(() => $getRoot().append($createParagraphNode()));
}
