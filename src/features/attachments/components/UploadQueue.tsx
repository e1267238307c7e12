import type { QueuedUpload } from '../hooks/useUploadQueue';
import { formatSize } from '../lib/format';

/** Files on their way up: one progress bar each, with cancel; failures stay until dismissed. */
export function UploadQueue({ items, onCancel, onDismiss }: { items: QueuedUpload[]; onCancel: (key: string) => void; onDismiss: (key: string) => void }) {
  if (!items.length) return null;
  return (
    <ul aria-label="Uploads in progress" className="space-y-2">
      {items.map((item) => {
        const percent = item.size ? Math.min(100, Math.round((item.sent / item.size) * 100)) : 100;
        return (
          <li key={item.key} className="rounded-md border border-fold bg-paper px-3 py-2 text-sm">
            <div className="flex items-center justify-between gap-3">
              <span className="truncate font-medium text-ink">{item.name}</span>
              {item.state === 'sending' ? (
                <button type="button" className="text-xs font-medium text-ember-700 hover:underline" onClick={() => onCancel(item.key)} aria-label={`Cancel upload of ${item.name}`}>
                  Cancel
                </button>
              ) : (
                <button type="button" className="text-xs text-ink-soft hover:underline" onClick={() => onDismiss(item.key)}>
                  Dismiss
                </button>
              )}
            </div>
            {item.state === 'sending' ? (
              <div className="mt-1.5 flex items-center gap-2">
                <div
                  role="progressbar"
                  aria-label={`Uploading ${item.name}`}
                  aria-valuemin={0}
                  aria-valuemax={100}
                  aria-valuenow={percent}
                  className="h-1.5 flex-1 overflow-hidden rounded-full bg-fold"
                >
                  <div className="h-full rounded-full bg-tide-500 transition-[width]" style={{ width: `${percent}%` }} />
                </div>
                <span className="w-28 text-right font-mono text-xs text-ink-soft">
                  {formatSize(item.sent)} / {formatSize(item.size)}
                </span>
              </div>
            ) : (
              <p role="alert" className="mt-1 text-xs text-ember-700">
                {item.error}
              </p>
            )}
          </li>
        );
      })}
    </ul>
  );
}
