import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { TextNode } from 'lexical';
import { useEffect } from 'react';

/**
 * Text pasted from other editors keeps its meaning (bold, italic, sub/superscript, lists,
 * headings) but not their look: inline styles such as fonts, sizes and colours are dropped.
 */
export function PlainPastePlugin() {
  const [editor] = useLexicalComposerContext();
  useEffect(
    () =>
      editor.registerNodeTransform(TextNode, (node) => {
        if (node.getStyle() !== '') node.setStyle('');
      }),
    [editor],
  );
  return null;
}
