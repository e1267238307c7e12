import { $getRoot, createEditor } from 'lexical';
import { describe, expect, it } from 'vitest';
import { createBinding, syncLexicalUpdateToYjs } from '@lexical/yjs';
import * as Y from 'yjs';
import { $isReagentsNode, pageNodes, ReagentsNode, type ReagentRow } from '../../../shared/editor';
import { editorNodes } from '../../../src/features/page-editor/nodes/editorNodes';
import { ReagentsBlockNode } from '../../../src/features/page-editor/nodes/ReagentsBlockNode';
import { projectPage, silentProvider } from '../../../server/collab/projection';

// Amounts and hazard notes are invented test data, not hazard information.
const rows: ReagentRow[] = [
  { rowKey: 'r-1', name: 'ethanol', smiles: 'CCO', amount: '12.0', unit: 'mL', equivalents: '3.0', hazards: 'H225 flammable (test text)' },
  { rowKey: 'r-2', name: 'catalyst', smiles: '', amount: '0.2', unit: 'mL', equivalents: '', hazards: '' },
];

function headless(nodes: typeof pageNodes) {
  return createEditor({ namespace: 'test', nodes, onError: (error) => { throw error; } });
}

describe('reagents node', () => {
  it('round-trips rows between the browser and server classes and lists them in the page text', () => {
    const browser = headless(editorNodes);
    browser.update(() => $getRoot().append(new ReagentsBlockNode({ rows })), { discrete: true });
    const state = headless(pageNodes).parseEditorState(JSON.stringify(browser.getEditorState().toJSON()));
    const read = state.read(() => {
      const node = $getRoot().getFirstChild();
      return { node, fields: $isReagentsNode(node) ? node.fields() : null, text: $getRoot().getTextContent() };
    });
    expect(read.node).toBeInstanceOf(ReagentsNode);
    expect(read.fields).toEqual({ rows });
    expect(read.text).toBe('[reagents]\n- ethanol; SMILES CCO; 12.0 mL; 3.0 equiv; hazard notes: H225 flammable (test text)\n- catalyst; 0.2 mL\n');
  });

  it('keeps only text fields of row objects from untrusted JSON', () => {
    const editor = headless(pageNodes);
    let read: unknown = null;
    editor.update(
      () => {
        read = ReagentsNode.importJSON({ type: 'reagents', rows: [{ rowKey: 'a', name: 7, hazards: 'H319' }, 'junk', null] as unknown as ReagentRow[] }).fields();
      },
      { discrete: true },
    );
    expect(read).toEqual({ rows: [{ rowKey: 'a', name: '', smiles: '', amount: '', unit: '', equivalents: '', hazards: 'H319' }] });
  });

  it('travels through a Yjs document into the server projection (text and JSON)', () => {
    const doc = new Y.Doc();
    const editor = headless(pageNodes);
    const binding = createBinding(editor, silentProvider, 'page', doc, new Map([['page', doc]]));
    editor.registerUpdateListener(({ prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags }) =>
      syncLexicalUpdateToYjs(binding, silentProvider, prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags),
    );
    editor.update(() => $getRoot().append(new ReagentsNode({ rows })), { discrete: true });
    const projection = projectPage(Y.encodeStateAsUpdate(doc));
    expect(projection.text).toContain('hazard notes: H225 flammable (test text)');
    expect(JSON.stringify(projection.json)).toContain('"rows":[{"rowKey":"r-1"');
  });
});
