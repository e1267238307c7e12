import { $getNodeByKey, type LexicalEditor } from 'lexical';
import { $isReagentsNode, type ReagentRow } from '../../../../shared/editor';
import { $createReagentsBlockNode } from '../nodes/ReagentsBlockNode';
import { $insertBlock } from '../toolbar/blockActions';

export type ReagentTextField = Exclude<keyof ReagentRow, 'rowKey'>;

export function emptyReagentRow(): ReagentRow {
  return { rowKey: crypto.randomUUID(), name: '', smiles: '', amount: '', unit: '', equivalents: '', hazards: '' };
}

export function insertReagents(editor: LexicalEditor): void {
  editor.update(() => $insertBlock($createReagentsBlockNode([emptyReagentRow()])));
}

/**
 * Changes the block's rows as they are in the editor at this moment (not as a component last saw
 * them), so an edit to one cell keeps what others changed elsewhere in the block meanwhile.
 */
function changeRows(editor: LexicalEditor, nodeKey: string, change: (rows: ReagentRow[]) => ReagentRow[]): void {
  editor.update(() => {
    const node = $getNodeByKey(nodeKey);
    if ($isReagentsNode(node)) node.setRows(change(node.fields().rows));
  });
}

export function setReagentField(editor: LexicalEditor, nodeKey: string, rowKey: string, field: ReagentTextField, value: string): void {
  changeRows(editor, nodeKey, (rows) => rows.map((row) => (row.rowKey === rowKey ? { ...row, [field]: value } : row)));
}

export function addReagentRow(editor: LexicalEditor, nodeKey: string): void {
  changeRows(editor, nodeKey, (rows) => [...rows, emptyReagentRow()]);
}

export function removeReagentRow(editor: LexicalEditor, nodeKey: string, rowKey: string): void {
  changeRows(editor, nodeKey, (rows) => rows.filter((row) => row.rowKey !== rowKey));
}

export function removeReagents(editor: LexicalEditor, nodeKey: string): void {
  editor.update(() => $getNodeByKey(nodeKey)?.remove());
}
