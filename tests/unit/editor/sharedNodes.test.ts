import { $createParagraphNode, $getRoot, createEditor } from 'lexical';
import { describe, expect, it } from 'vitest';
import { $isStructureNode, pageNodes, StructureNode } from '../../../shared/editor';
import { AttachmentEmbedBlockNode } from '../../../src/features/page-editor/nodes/AttachmentEmbedBlockNode';
import { editorNodes } from '../../../src/features/page-editor/nodes/editorNodes';
import { StructureBlockNode } from '../../../src/features/page-editor/nodes/StructureBlockNode';

const fields = { structureKey: 'k-1', molfile: '\n  x\n\n  0  0  0  0  0  0  0  0  0  0999 V2000\nM  END\n', smiles: 'CCO', label: 'compound 3' };

function headless(nodes: typeof pageNodes) {
  return createEditor({ namespace: 'test', nodes, onError: (error) => { throw error; } });
}

describe('page nodes shared by browser and server', () => {
  it('serialises a page written with the browser classes so the server classes read the same fields back', () => {
    const browser = headless(editorNodes);
    browser.update(
      () => {
        const root = $getRoot();
        root.append($createParagraphNode(), new StructureBlockNode(fields), new AttachmentEmbedBlockNode({ attachmentId: 'a-1', linkedStructureKey: 'k-1' }));
      },
      { discrete: true },
    );
    const json = JSON.stringify(browser.getEditorState().toJSON());

    const server = headless(pageNodes);
    const state = server.parseEditorState(json);
    const read = state.read(() => $getRoot().getChildren().map((node) => ({ type: node.getType(), node })));
    expect(read.map((entry) => entry.type)).toEqual(['paragraph', 'structure', 'attachment-embed']);
    const structure = read[1].node;
    expect(structure).toBeInstanceOf(StructureNode);
    expect(state.read(() => ($isStructureNode(structure) ? structure.fields() : null))).toEqual(fields);
    expect(state.read(() => $getRoot().getTextContent())).toContain('[structure compound 3: CCO]');
  });

  it('treats untrusted JSON values that are not text as empty', () => {
    const editor = headless(pageNodes);
    let read: unknown = null;
    editor.update(
      () => {
        read = StructureNode.importJSON({ type: 'structure', molfile: 42 as unknown as string, label: 'c' }).fields();
      },
      { discrete: true },
    );
    expect(read).toEqual({ structureKey: '', molfile: '', smiles: '', label: 'c' });
  });
});
