import { useState } from 'react';
import { formatDateTime } from '../../../lib/format';
import { usePageHistory } from '../api/queries';

const reasons: Record<string, string> = {
  activity: 'while editing',
  signed: 'at signing',
  witnessed: 'at countersigning',
};

/** Saved versions of the page, newest first; opening one shows it read only. */
export function HistoryPanel({ pageId, onOpen }: { pageId: string; onOpen: (snapshotId: string) => void }) {
  const [open, setOpen] = useState(false);
  const history = usePageHistory(pageId, open);

  return (
    <section aria-labelledby="page-history-title" className="rounded-lg border border-fold bg-paper-card/90 p-3">
      <div className="flex items-center justify-between px-2.5">
        <h2 id="page-history-title" className="text-xs font-semibold uppercase tracking-[0.14em] text-tide-600">
          Earlier versions
        </h2>
        <button type="button" aria-expanded={open} onClick={() => setOpen((was) => !was)} className="text-xs font-medium text-tide-700 hover:underline">
          {open ? 'Hide' : 'Show'}
        </button>
      </div>
      {open && (
        <div className="mt-1">
          {history.isPending && <p className="px-2.5 text-sm text-ink-soft">Loading…</p>}
          {history.isError && <p className="px-2.5 text-sm text-ember-700">{history.error.message}</p>}
          {history.data?.length === 0 && <p className="px-2.5 text-sm text-ink-faint">No versions saved yet; they are kept every few minutes while people write.</p>}
          <ol className="max-h-72 space-y-0.5 overflow-auto">
            {history.data?.map((snapshot) => (
              <li key={snapshot.id}>
                <button type="button" onClick={() => onOpen(snapshot.id)} className="block w-full rounded-md px-2.5 py-1.5 text-left hover:bg-tide-50" data-testid="history-entry">
                  <span className="block text-sm text-ink">{formatDateTime(snapshot.takenAt)}</span>
                  <span className="block text-xs text-ink-faint">
                    {reasons[snapshot.reason] ?? snapshot.reason}
                    {snapshot.authors.length > 0 && ` · ${snapshot.authors.map((author) => author.name).join(', ')}`}
                  </span>
                </button>
              </li>
            ))}
          </ol>
        </div>
      )}
    </section>
  );
}
