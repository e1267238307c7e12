import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { REDO_COMMAND, UNDO_COMMAND, type TextFormatType } from 'lexical';
import { useState, type ReactNode } from 'react';
import type { StructureFields } from '../../../../shared/editor';
import { AttachmentPicker } from '../embeds/AttachmentPicker';
import { $createAttachmentEmbedBlockNode } from '../nodes/AttachmentEmbedBlockNode';
import { insertReagents } from '../reagents/reagentEdits';
import { $insertBlock, insertTable, setTextBlock, toggleFormat } from './blockActions';
import { BlockMenu, type BlockMenuAdd } from './BlockMenu';
import { LinkEditor } from './LinkEditor';
import { useSelectionFormats } from './useSelectionFormats';

function ToolButton({ label, pressed, onClick, children }: { label: string; pressed?: boolean; onClick: () => void; children: ReactNode }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      aria-pressed={pressed}
      onMouseDown={(event) => event.preventDefault()}
      onClick={onClick}
      className={`grid h-7 min-w-7 place-items-center rounded px-1.5 text-sm ${pressed ? 'bg-tide-100 text-tide-800' : 'text-ink-soft hover:bg-paper-deep hover:text-ink'}`}
    >
      {children}
    </button>
  );
}

const formatButtons: { format: TextFormatType; label: string; face: ReactNode }[] = [
  { format: 'bold', label: 'Bold', face: <b>B</b> },
  { format: 'italic', label: 'Italic', face: <i className="font-serif">I</i> },
  { format: 'subscript', label: 'Subscript', face: <span>x<sub>2</sub></span> },
  { format: 'superscript', label: 'Superscript', face: <span>x<sup>2</sup></span> },
];

export function EditorToolbar({
  pageId,
  structures,
  canEmbed,
  linkOpen,
  setLinkOpen,
  onAddStructure,
}: {
  pageId: string;
  structures: StructureFields[];
  canEmbed: boolean;
  linkOpen: boolean;
  setLinkOpen: (open: boolean) => void;
  onAddStructure: (start: 'text' | 'draw') => void;
}) {
  const [editor] = useLexicalComposerContext();
  const { block, formats, link } = useSelectionFormats();
  const [picking, setPicking] = useState(false);

  const adds: BlockMenuAdd[] = [
    { label: 'Structure from text or file', hint: 'SMILES, molfile', run: () => onAddStructure('text') },
    { label: 'Structure, drawn', hint: 'drawing pad', run: () => onAddStructure('draw') },
    { label: 'Reagent list', hint: 'amounts, hazard notes', run: () => insertReagents(editor) },
    { label: 'Table', hint: '3 × 3', run: () => insertTable(editor) },
    ...(canEmbed ? [{ label: 'Attached file', hint: 'spectrum, data', run: () => setPicking(true) }] : []),
  ];

  return (
    <div role="toolbar" aria-label="Formatting" className="sticky top-0 z-10 -mx-2 mb-3 flex flex-wrap items-center gap-1 rounded-md border border-fold bg-paper-card/95 px-2 py-1.5 shadow-sm backdrop-blur">
      <div className="relative">
        <BlockMenu current={block} onText={(kind) => setTextBlock(editor, kind)} adds={adds} />
        {picking && (
          <AttachmentPicker
            pageId={pageId}
            structures={structures}
            onClose={() => setPicking(false)}
            onPick={(attachmentId, linkedStructureKey) => {
              setPicking(false);
              editor.update(() => $insertBlock($createAttachmentEmbedBlockNode({ attachmentId, linkedStructureKey })));
            }}
          />
        )}
      </div>
      <span className="mx-1 h-5 w-px bg-fold" aria-hidden />
      {formatButtons.map(({ format, label, face }) => (
        <ToolButton key={format} label={label} pressed={formats.has(format)} onClick={() => toggleFormat(editor, format)}>
          {face}
        </ToolButton>
      ))}
      <div className="relative">
        <ToolButton label="Link" pressed={link} onClick={() => setLinkOpen(!linkOpen)}>
          <span className="underline decoration-tide-400 underline-offset-2">link</span>
        </ToolButton>
        {linkOpen && <LinkEditor editor={editor} hasLink={link} onClose={() => setLinkOpen(false)} />}
      </div>
      <span className="mx-1 h-5 w-px bg-fold" aria-hidden />
      <ToolButton label="Undo your last change" onClick={() => editor.dispatchCommand(UNDO_COMMAND, undefined)}>
        ↶
      </ToolButton>
      <ToolButton label="Redo" onClick={() => editor.dispatchCommand(REDO_COMMAND, undefined)}>
        ↷
      </ToolButton>
    </div>
  );
}
