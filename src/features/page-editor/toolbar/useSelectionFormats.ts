import { $isListNode, ListNode } from '@lexical/list';
import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { $isHeadingNode, $isQuoteNode } from '@lexical/rich-text';
import { $getNearestNodeOfType } from '@lexical/utils';
import { $isLinkNode } from '@lexical/link';
import { $getSelection, $isRangeSelection, type TextFormatType } from 'lexical';
import { useEffect, useState } from 'react';
import type { TextBlockKind } from './blockActions';

export interface SelectionFormats {
  block: TextBlockKind;
  formats: Set<TextFormatType>;
  link: boolean;
}

const tracked: TextFormatType[] = ['bold', 'italic', 'subscript', 'superscript'];

/** What the caret sits in, so the toolbar can show which buttons are on. */
export function useSelectionFormats(): SelectionFormats {
  const [editor] = useLexicalComposerContext();
  const [state, setState] = useState<SelectionFormats>({ block: 'paragraph', formats: new Set(), link: false });

  useEffect(
    () =>
      editor.registerUpdateListener(({ editorState }) =>
        editorState.read(() => {
          const selection = $getSelection();
          if (!$isRangeSelection(selection)) return;
          const anchor = selection.anchor.getNode();
          const top = anchor.getKey() === 'root' ? anchor : anchor.getTopLevelElementOrThrow();
          const list = $getNearestNodeOfType(anchor, ListNode);
          let block: TextBlockKind = 'paragraph';
          if ($isListNode(list)) block = list.getListType() === 'check' ? 'check' : list.getListType() === 'number' ? 'number' : 'bullet';
          else if ($isHeadingNode(top)) block = top.getTag() as TextBlockKind;
          else if ($isQuoteNode(top)) block = 'quote';
          const parent = anchor.getParent();
          setState({
            block,
            formats: new Set(tracked.filter((format) => selection.hasFormat(format))),
            link: $isLinkNode(parent) || $isLinkNode(anchor),
          });
        }),
      ),
    [editor],
  );
  return state;
}
