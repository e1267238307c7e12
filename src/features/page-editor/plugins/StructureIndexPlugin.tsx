import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { $dfs } from '@lexical/utils';
import { useEffect, useRef } from 'react';
import { $isStructureNode, type StructureFields } from '../../../../shared/editor';

/** Reports the page's structures in document order whenever they change (for the side panel). */
export function StructureIndexPlugin({ onChange }: { onChange: (structures: StructureFields[]) => void }) {
  const [editor] = useLexicalComposerContext();
  const report = useRef(onChange);
  report.current = onChange;

  useEffect(() => {
    let previous = '';
    const read = () => {
      const structures = editor.getEditorState().read(() =>
        $dfs()
          .map(({ node }) => node)
          .filter($isStructureNode)
          .map((node) => node.fields()),
      );
      const signature = JSON.stringify(structures);
      if (signature === previous) return;
      previous = signature;
      report.current(structures);
    };
    read();
    return editor.registerUpdateListener(read);
  }, [editor]);
  return null;
}
