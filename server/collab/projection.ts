import { createBinding, syncYjsChangesToLexical, type Provider } from '@lexical/yjs';
import { $getRoot, $isElementNode, createEditor, type LexicalNode, type SerializedEditorState } from 'lexical';
import * as Y from 'yjs';
import { $isStructureNode, pageNodes } from '../../shared/editor';
import type { ProjectedStructure } from '../db/schema';

export interface PageProjection {
  text: string;
  json: SerializedEditorState;
  structures: ProjectedStructure[];
}

const noop = () => undefined;

/** The binding wants a provider for cursors and presence; a projection has neither. */
const silentProvider: Provider = {
  awareness: {
    getLocalState: () => null,
    getStates: () => new Map(),
    on: noop,
    off: noop,
    setLocalState: noop,
    setLocalStateField: noop,
  },
  connect: noop,
  disconnect: noop,
  on: noop,
  off: noop,
};

/**
 * Reads a page's Yjs state the way a browser editor would (same binding, same node classes from
 * shared/editor) and returns its plain text, Lexical JSON and structures in document order.
 * The binding is one-way (Yjs → Lexical) on a throwaway copy of the state, so a projection can
 * never write anything back into the shared document.
 */
export function projectPage(state: Uint8Array): PageProjection {
  const editor = createEditor({
    namespace: 'page-projection',
    nodes: pageNodes,
    onError: (error) => {
      throw error;
    },
  });
  const doc = new Y.Doc();
  const binding = createBinding(editor, silentProvider, 'page', doc, new Map([['page', doc]]));
  binding.root.getSharedType().observeDeep((events) => syncYjsChangesToLexical(binding, silentProvider, events, false));
  Y.applyUpdate(doc, state);
  editor.update(noop, { discrete: true });

  const editorState = editor.getEditorState();
  const { text, structures } = editorState.read(() => {
    const found: ProjectedStructure[] = [];
    for (const node of $getRoot().getChildren()) collectStructures(node, found);
    return { text: $getRoot().getTextContent(), structures: found };
  });
  doc.destroy();
  return { text, json: editorState.toJSON(), structures };
}

function collectStructures(node: LexicalNode, found: ProjectedStructure[]): void {
  if ($isStructureNode(node)) {
    const { structureKey, molfile, smiles } = node.fields();
    found.push({ key: structureKey, molfile, smiles });
  } else if ($isElementNode(node)) {
    for (const child of node.getChildren()) collectStructures(child, found);
  }
}
