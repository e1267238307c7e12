import { INSERT_CHECK_LIST_COMMAND, INSERT_ORDERED_LIST_COMMAND, INSERT_UNORDERED_LIST_COMMAND } from '@lexical/list';
import { $createHeadingNode, $createQuoteNode, type HeadingTagType } from '@lexical/rich-text';
import { $setBlocksType } from '@lexical/selection';
import { INSERT_TABLE_COMMAND } from '@lexical/table';
import { $insertNodeToNearestRoot } from '@lexical/utils';
import {
  $createParagraphNode,
  $getRoot,
  $getSelection,
  $isRangeSelection,
  FORMAT_TEXT_COMMAND,
  type LexicalEditor,
  type LexicalNode,
  type TextFormatType,
} from 'lexical';

/** The kinds of text block the block menu and the keyboard can switch to. */
export type TextBlockKind = 'paragraph' | 'h1' | 'h2' | 'h3' | 'quote' | 'bullet' | 'number' | 'check';

export const textBlockLabels: Record<TextBlockKind, string> = {
  paragraph: 'Body text',
  h1: 'Section heading',
  h2: 'Sub-heading',
  h3: 'Minor heading',
  quote: 'Set-apart note',
  bullet: 'Bulleted list',
  number: 'Numbered steps',
  check: 'Checklist',
};

export function setTextBlock(editor: LexicalEditor, kind: TextBlockKind): void {
  if (kind === 'bullet') return void editor.dispatchCommand(INSERT_UNORDERED_LIST_COMMAND, undefined);
  if (kind === 'number') return void editor.dispatchCommand(INSERT_ORDERED_LIST_COMMAND, undefined);
  if (kind === 'check') return void editor.dispatchCommand(INSERT_CHECK_LIST_COMMAND, undefined);
  editor.update(() => {
    const selection = $getSelection();
    if (!$isRangeSelection(selection)) return;
    $setBlocksType(selection, () =>
      kind === 'paragraph' ? $createParagraphNode() : kind === 'quote' ? $createQuoteNode() : $createHeadingNode(kind as HeadingTagType),
    );
  });
}

export function toggleFormat(editor: LexicalEditor, format: TextFormatType): void {
  editor.dispatchCommand(FORMAT_TEXT_COMMAND, format);
}

export function insertTable(editor: LexicalEditor, rows = 3, columns = 3): void {
  editor.dispatchCommand(INSERT_TABLE_COMMAND, { rows: String(rows), columns: String(columns), includeHeaders: { rows: true, columns: false } });
}

/** Puts a block node at the caret (splitting the paragraph) or, without a caret, at the end. */
export function $insertBlock(node: LexicalNode): void {
  if (!$isRangeSelection($getSelection())) $getRoot().selectEnd();
  $insertNodeToNearestRoot(node);
}
