import { useLexicalComposerContext } from '@lexical/react/LexicalComposerContext';
import { useLexicalEditable } from '@lexical/react/useLexicalEditable';
import { $getNodeByKey } from 'lexical';
import type { AttachmentEmbedFields } from '../../../../shared/editor';
import { useEditorEnvironment } from '../EditorEnvironment';

/** An attached file inside the text; the body is drawn by the renderer the route passed in. */
export function AttachmentEmbedBlock({ nodeKey, fields }: { nodeKey: string; fields: AttachmentEmbedFields }) {
  const [editor] = useLexicalComposerContext();
  const editable = useLexicalEditable();
  const { embedRenderers, structures } = useEditorEnvironment();
  const linkedStructure = fields.linkedStructureKey ? (structures.get(fields.linkedStructureKey) ?? null) : null;

  return (
    <section data-testid="attachment-embed" className="rounded-lg border border-fold bg-paper-card shadow-sheet">
      <header className="flex items-center justify-between gap-2 border-b border-fold px-4 py-2 text-sm">
        <span className="font-semibold text-ink">Attached file{linkedStructure?.label ? ` · for ${linkedStructure.label}` : ''}</span>
        {editable && (
          <button
            type="button"
            className="rounded px-2 py-1 text-xs font-medium text-ember-700 hover:bg-ember-50"
            onClick={() => editor.update(() => $getNodeByKey(nodeKey)?.remove())}
          >
            Take out of the text
          </button>
        )}
      </header>
      <div className="px-4 py-3">
        {embedRenderers.attachment ? (
          embedRenderers.attachment({ attachmentId: fields.attachmentId, linkedStructure })
        ) : (
          <p className="text-sm text-ink-soft">This file is listed with the page's attachments.</p>
        )}
      </div>
    </section>
  );
}
