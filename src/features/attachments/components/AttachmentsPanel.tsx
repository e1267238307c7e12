import { useRef, useState, type DragEvent } from 'react';
import { Button } from '../../../components/Button';
import { usePageAttachments, useRemoveAttachment } from '../api/queries';
import { useUploadQueue } from '../hooks/useUploadQueue';
import { AttachmentItem, type AttachmentRenderers } from './AttachmentItem';
import { UploadQueue } from './UploadQueue';

function carriesFiles(event: DragEvent): boolean {
  return event.dataTransfer.types.includes('Files');
}

/**
 * The page's files: drop files anywhere on the panel or pick them with the button; each goes up
 * with its own progress bar. Spectra get their thumbnail and plot from the renderers the route
 * passes in (features do not import each other).
 */
export function AttachmentsPanel({ pageId, canUpload, renderers = {} }: { pageId: string; canUpload: boolean; renderers?: AttachmentRenderers }) {
  const attachments = usePageAttachments(pageId);
  const remove = useRemoveAttachment(pageId);
  const queue = useUploadQueue(pageId);
  const input = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);

  const dropProps = canUpload
    ? {
        onDragOver: (event: DragEvent) => {
          if (!carriesFiles(event)) return;
          event.preventDefault();
          setDragging(true);
        },
        onDragLeave: (event: DragEvent) => {
          if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setDragging(false);
        },
        onDrop: (event: DragEvent) => {
          if (!carriesFiles(event)) return;
          event.preventDefault();
          setDragging(false);
          queue.add(Array.from(event.dataTransfer.files));
        },
      }
    : {};

  return (
    <section
      aria-label="Attached files"
      className={`mt-6 rounded-lg border bg-paper-card shadow-sheet transition-colors ${dragging ? 'border-tide-400 bg-tide-50' : 'border-fold'}`}
      {...dropProps}
    >
      <header className="flex flex-wrap items-center justify-between gap-3 border-b border-fold px-5 py-3.5">
        <div>
          <h2 className="text-base font-semibold text-ink">Files and spectra</h2>
          <p className="mt-0.5 text-sm text-ink-soft">
            {canUpload ? 'Drop NMR, IR, MS or other files here, or add them with the button. JCAMP-DX and two-column CSV spectra are plotted.' : 'Files attached to this page.'}
          </p>
        </div>
        {canUpload && (
          <>
            <Button tone="secondary" onClick={() => input.current?.click()}>
              Add files
            </Button>
            <input
              ref={input}
              type="file"
              multiple
              hidden
              data-testid="attachment-input"
              onChange={(event) => {
                queue.add(Array.from(event.target.files ?? []));
                event.target.value = '';
              }}
            />
          </>
        )}
      </header>
      <div className="space-y-3 p-5">
        <UploadQueue items={queue.items} onCancel={queue.cancel} onDismiss={queue.dismiss} />
        {remove.isError && (
          <p role="alert" className="text-sm text-ember-700">
            {remove.error.message}
          </p>
        )}
        {attachments.isPending && <p className="text-sm text-ink-soft">Loading the page's files…</p>}
        {attachments.isError && <p className="text-sm text-ember-700">{attachments.error.message}</p>}
        {attachments.data?.length === 0 && !queue.items.length && (
          <p className="rounded-md border border-dashed border-fold-strong px-4 py-6 text-center text-sm text-ink-soft">No files attached yet.</p>
        )}
        {attachments.data && attachments.data.length > 0 && (
          <ul className="space-y-2" aria-label="Files of this page">
            {attachments.data.map((attachment) => (
              <AttachmentItem
                key={attachment.id}
                attachment={attachment}
                renderers={renderers}
                removing={remove.isPending && remove.variables === attachment.id}
                onRemove={() => remove.mutate(attachment.id)}
              />
            ))}
          </ul>
        )}
      </div>
    </section>
  );
}
