import { createBinding, syncYjsChangesToLexical, type Provider } from '@lexical/yjs';
import { $getRoot, $isElementNode, createEditor, type LexicalEditor, type LexicalNode, type SerializedEditorState } from 'lexical';
import * as Y from 'yjs';
import { $isStructureNode, pageNodes } from '../../shared/editor';
import type { ProjectedStructure } from '../db/schema';

export interface PageProjection {
  text: string;
  json: SerializedEditorState;
  structures: ProjectedStructure[];
}

const noop = () => undefined;

/** The binding wants a provider for cursors and presence; a headless editor has neither. */
export const silentProvider: Provider = {
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
 * Keeps a headless Lexical editor in step with a page, the way a browser editor reads it (same
 * binding, same node classes from shared/editor), so a projection costs a read of the editor
 * state rather than a rebuild. The editor follows a private mirror of the document, never the
 * shared one: the binding may tidy what it cannot map (text outside a paragraph, say), and such a
 * change must not reach the page. Should the editor fail to follow, projections rebuild instead.
 */
export class PageProjector {
  private readonly mirror = new Y.Doc();
  private readonly editor = createProjectionEditor();
  private following = true;

  constructor() {
    const binding = createBinding(this.editor, silentProvider, 'page', this.mirror, new Map([['page', this.mirror]]));
    binding.root.getSharedType().observeDeep((events) => {
      if (!this.following) return;
      try {
        syncYjsChangesToLexical(binding, silentProvider, events as Y.YEvent<Y.XmlText>[], false);
      } catch (error) {
        console.error('[collab] projection editor stopped following the page:', error);
        this.following = false;
      }
    });
  }

  /** Every change the page's document takes. */
  apply(update: Uint8Array): void {
    Y.applyUpdate(this.mirror, update);
  }

  project(): PageProjection {
    if (!this.following) return projectPage(Y.encodeStateAsUpdate(this.mirror));
    this.editor.update(noop, { discrete: true });
    return read(this.editor);
  }

  destroy(): void {
    this.following = false;
    this.mirror.destroy();
  }
}

/** A projection of a stored state on its own (a fresh editor and a throwaway document). */
export function projectPage(state: Uint8Array): PageProjection {
  const projector = new PageProjector();
  projector.apply(state);
  const projection = projector.project();
  projector.destroy();
  return projection;
}

/** A headless editor with every node type a page holds (see shared/editor). */
export function createProjectionEditor(): LexicalEditor {
  return createEditor({
    namespace: 'page-projection',
    nodes: pageNodes,
    onError: (error) => {
      throw error;
    },
  });
}

function read(editor: LexicalEditor): PageProjection {
  const editorState = editor.getEditorState();
  const { text, structures } = editorState.read(() => {
    const found: ProjectedStructure[] = [];
    for (const node of $getRoot().getChildren()) collectStructures(node, found);
    return { text: $getRoot().getTextContent(), structures: found };
  });
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
