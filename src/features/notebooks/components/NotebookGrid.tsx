import { Link } from 'react-router-dom';
import type { NotebookSummary } from '../../../../shared/schemas';
import { formatDate } from '../../../lib/format';
import { membershipLabels } from '../../../lib/roles';

/** The notebooks on a shelf: one card each with its page count and the caller's part in it. */
export function NotebookGrid({ notebooks }: { notebooks: NotebookSummary[] }) {
  return (
    <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3" aria-label="Notebooks">
      {notebooks.map((notebook) => (
        <li key={notebook.id}>
          <Link
            to={`/notebooks/${notebook.id}`}
            className="group flex h-full flex-col rounded-lg border border-fold bg-paper-card shadow-sheet transition hover:-translate-y-0.5 hover:border-tide-300"
          >
            <div className="flex h-full">
              <div className="w-2 shrink-0 rounded-l-lg bg-tide-600 group-hover:bg-reed-500" aria-hidden />
              <div className="flex flex-1 flex-col p-5">
                <h2 className="text-base font-semibold text-ink group-hover:text-tide-700">{notebook.title}</h2>
                <p className="mt-1 line-clamp-2 flex-1 text-sm text-ink-soft">{notebook.description || 'No description.'}</p>
                <div className="mt-4 flex items-center justify-between text-xs text-ink-faint">
                  <span>
                    <span className="font-mono text-sm font-semibold text-ink">{notebook.pageCount}</span>{' '}
                    {notebook.pageCount === 1 ? 'page' : 'pages'}
                  </span>
                  <span>
                    {notebook.myRole ? membershipLabels[notebook.myRole] : 'Admin access'} · since {formatDate(notebook.createdAt)}
                  </span>
                </div>
              </div>
            </div>
          </Link>
        </li>
      ))}
    </ul>
  );
}
