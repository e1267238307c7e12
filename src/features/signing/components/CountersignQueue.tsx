import { Link } from 'react-router-dom';
import { EmptyState } from '../../../components/EmptyState';
import { ErrorState } from '../../../components/ErrorState';
import { LoadingState } from '../../../components/LoadingState';
import { formatDateTime, formatPageNumber } from '../../../lib/format';
import { useCountersignQueue } from '../api/queries';

function waited(seconds: number): string {
  const days = Math.floor(seconds / 86_400);
  const hours = Math.floor((seconds % 86_400) / 3600);
  const minutes = Math.floor((seconds % 3600) / 60);
  if (days > 0) return `${days} d ${hours} h`;
  if (hours > 0) return `${hours} h ${minutes} min`;
  return `${minutes} min`;
}

/** Pages and addenda waiting for the signed-in supervisor, oldest first. */
export function CountersignQueue() {
  const queue = useCountersignQueue();
  if (queue.isPending) return <LoadingState label="Reading your queue…" />;
  if (queue.isError) return <ErrorState error={queue.error} />;
  if (queue.data.length === 0) return <EmptyState title="Nothing waiting">Signed pages addressed to you appear here.</EmptyState>;
  return (
    <ol className="divide-y divide-fold rounded-lg border border-fold bg-paper-card shadow-sheet" aria-label="Waiting for your countersignature">
      {queue.data.map((item) => (
        <li key={item.requestId} className="flex flex-wrap items-center justify-between gap-3 px-5 py-3">
          <div className="min-w-0">
            <Link to={`/pages/${item.pageId}`} className="font-medium text-tide-700 hover:underline">
              p. {formatPageNumber(item.pageNumber)} {item.pageTitle}
              {item.addendumNumber !== null && ` · addendum ${item.addendumNumber}`}
            </Link>
            <div className="text-sm text-ink-soft">
              {item.notebookTitle} · signed by {item.author.name} on {formatDateTime(item.requestedAt)}
            </div>
          </div>
          <span className="font-mono text-sm text-ink-soft" title="Waiting time">
            waiting {waited(item.waitingSeconds)}
          </span>
        </li>
      ))}
    </ol>
  );
}
