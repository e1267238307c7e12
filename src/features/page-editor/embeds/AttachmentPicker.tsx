import { useState } from 'react';
import type { StructureFields } from '../../../../shared/editor';
import { usePageAttachments } from '../api/queries';

/** Chooses one of the page's attached files to show in the text, optionally for one structure. */
export function AttachmentPicker({
  pageId,
  structures,
  onPick,
  onClose,
}: {
  pageId: string;
  structures: StructureFields[];
  onPick: (attachmentId: string, linkedStructureKey: string | null) => void;
  onClose: () => void;
}) {
  const attachments = usePageAttachments(pageId);
  const [structureKey, setStructureKey] = useState('');

  return (
    <div
      role="dialog"
      aria-label="Show an attached file in the text"
      className="absolute left-0 top-full z-30 mt-1 w-96 space-y-2 rounded-md border border-fold bg-paper-card p-3 shadow-sheet"
      onKeyDown={(event) => event.key === 'Escape' && onClose()}
    >
      <p className="text-sm font-medium text-ink">Show an attached file in the text</p>
      {structures.length > 0 && (
        <label className="block text-xs text-ink-soft">
          For structure{' '}
          <select value={structureKey} onChange={(event) => setStructureKey(event.target.value)} className="ml-1 rounded border border-fold-strong px-1 py-0.5 text-xs">
            <option value="">none</option>
            {structures.map((structure, i) => (
              <option key={structure.structureKey} value={structure.structureKey}>
                {structure.label || `structure ${i + 1}`}
              </option>
            ))}
          </select>
        </label>
      )}
      {attachments.isPending && <p className="text-sm text-ink-soft">Loading the page's files…</p>}
      {attachments.isError && <p className="text-sm text-ember-700">{attachments.error.message}</p>}
      {attachments.data?.length === 0 && <p className="text-sm text-ink-soft">No files are attached to this page yet.</p>}
      <ul className="max-h-60 space-y-1 overflow-auto">
        {attachments.data?.map((attachment) => (
          <li key={attachment.id}>
            <button
              type="button"
              className="w-full rounded px-2 py-1.5 text-left text-sm hover:bg-tide-50"
              onClick={() => onPick(attachment.id, structureKey || null)}
            >
              {attachment.displayName}
              {attachment.spectrum && <span className="ml-2 text-xs text-ink-faint">{attachment.spectrum.dataType || 'spectrum'}</span>}
            </button>
          </li>
        ))}
      </ul>
      <div className="flex justify-end">
        <button type="button" className="rounded px-2 py-1 text-xs text-ink-soft hover:bg-paper-deep" onClick={onClose}>
          Close
        </button>
      </div>
    </div>
  );
}
