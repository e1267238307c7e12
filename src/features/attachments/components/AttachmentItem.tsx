import { useState, type ReactNode } from 'react';
import type { AttachmentSummary } from '../../../../shared/schemas';
import { Badge } from '../../../components/Badge';
import { formatDateTime } from '../../../lib/format';
import { contentUrl } from '../api/queries';
import { formatSize, kindOf } from '../lib/format';

export interface AttachmentRenderers {
  /** A small picture of the file (the route passes the spectrum thumbnail). */
  thumbnail?: (attachment: AttachmentSummary) => ReactNode;
  /** The opened view of the file (the route passes the spectrum plot). */
  detail?: (attachment: AttachmentSummary) => ReactNode;
}

function Thumbnail({ attachment, renderers }: { attachment: AttachmentSummary; renderers: AttachmentRenderers }) {
  const custom = renderers.thumbnail?.(attachment);
  if (custom) return <>{custom}</>;
  if (attachment.mediaType.startsWith('image/')) {
    return <img src={contentUrl(attachment.id)} alt="" loading="lazy" className="h-full w-full rounded object-cover" />;
  }
  return <span className="font-mono text-[0.65rem] font-semibold tracking-wide text-ink-soft">{kindOf(attachment.mediaType)}</span>;
}

export function AttachmentItem({
  attachment,
  renderers,
  onRemove,
  removing,
}: {
  attachment: AttachmentSummary;
  renderers: AttachmentRenderers;
  onRemove: () => void;
  removing: boolean;
}) {
  const [open, setOpen] = useState(false);
  const canOpen = Boolean(attachment.spectrum && renderers.detail);
  return (
    <li className="rounded-md border border-fold bg-paper-card" data-testid="attachment-item">
      <div className="flex items-start gap-3 p-3">
        <div className="flex h-14 w-20 shrink-0 items-center justify-center overflow-hidden rounded border border-fold bg-paper">
          <Thumbnail attachment={attachment} renderers={renderers} />
        </div>
        <div className="min-w-0 flex-1">
          <div className="flex flex-wrap items-center gap-2">
            <a href={contentUrl(attachment.id)} download={attachment.displayName} className="truncate font-medium text-tide-700 hover:underline">
              {attachment.displayName}
            </a>
            {attachment.spectrum && <Badge tone="heron">{attachment.spectrum.dataType ? attachment.spectrum.dataType.toLowerCase() : 'spectrum'}</Badge>}
            {attachment.addendum && <Badge tone="reed">addendum</Badge>}
          </div>
          <p className="mt-0.5 text-xs text-ink-soft">
            {kindOf(attachment.mediaType)} · {formatSize(attachment.size)} · {attachment.uploader.name} · {formatDateTime(attachment.createdAt)}
          </p>
          <p className="mt-0.5 truncate font-mono text-[0.7rem] text-ink-faint" title={`SHA-256 ${attachment.sha256}`}>
            SHA-256 {attachment.sha256.slice(0, 16)}…
          </p>
          {attachment.parseError && (
            <p className="mt-1 text-xs text-ember-700" data-testid="parse-error">
              Kept as a plain file; it could not be read as a spectrum: {attachment.parseError}
            </p>
          )}
        </div>
        <div className="flex shrink-0 flex-col items-end gap-1">
          {canOpen && (
            <button type="button" className="text-xs font-medium text-tide-700 hover:underline" aria-expanded={open} onClick={() => setOpen(!open)}>
              {open ? 'Hide plot' : 'Show plot'}
            </button>
          )}
          {attachment.canDelete && (
            <button
              type="button"
              className="text-xs text-ember-700 hover:underline disabled:opacity-50"
              disabled={removing}
              onClick={() => window.confirm(`Remove “${attachment.displayName}” from this page?`) && onRemove()}
            >
              Remove
            </button>
          )}
        </div>
      </div>
      {open && canOpen && <div className="border-t border-fold p-3">{renderers.detail!(attachment)}</div>}
    </li>
  );
}
