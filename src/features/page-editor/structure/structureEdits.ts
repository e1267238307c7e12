import { $getNodeByKey, type LexicalEditor } from 'lexical';
import { $isStructureNode } from '../../../../shared/editor';
import { $createStructureBlockNode } from '../nodes/StructureBlockNode';
import { $insertBlock } from '../toolbar/blockActions';

export interface StructureContent {
  molfile: string;
  smiles: string;
  label: string;
}

export function insertStructure(editor: LexicalEditor, content: StructureContent): void {
  editor.update(() => $insertBlock($createStructureBlockNode(content)));
}

export function replaceStructure(editor: LexicalEditor, nodeKey: string, content: StructureContent): void {
  editor.update(() => {
    const node = $getNodeByKey(nodeKey);
    if ($isStructureNode(node)) node.setStructure(content);
  });
}
