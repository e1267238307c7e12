import { Link } from 'react-router-dom';
import { isApiError } from '../lib/api';

function describe(error: unknown): { title: string; body: string } {
  if (isApiError(error, 403)) {
    return { title: 'Not open to you', body: 'Your role does not allow this. An admin of your group can change roles and memberships.' };
  }
  if (isApiError(error, 404)) {
    return { title: 'Nothing here', body: 'This does not exist, or it belongs to a notebook you are not a member of.' };
  }
  if (isApiError(error)) return { title: 'That did not work', body: error.message };
  return { title: 'That did not work', body: 'Something unexpected happened. Reload the page to try again.' };
}

/** Shows why something could not be loaded; 403 and 404 get their own plain wording. */
export function ErrorState({ error }: { error: unknown }) {
  const { title, body } = describe(error);
  const status = isApiError(error) && error.status > 0 ? error.status : null;
  return (
    <div role="alert" className="rounded-lg border border-fold bg-paper-card px-6 py-10 text-center shadow-sheet">
      {status && <div className="font-mono text-3xl font-semibold text-ember-500">{status}</div>}
      <h2 className="mt-1 text-lg font-semibold text-ink">{title}</h2>
      <p className="mx-auto mt-1 max-w-md text-sm text-ink-soft">{body}</p>
      <Link to="/notebooks" className="mt-4 inline-block text-sm font-medium text-tide-600 hover:underline">
        Back to notebooks
      </Link>
    </div>
  );
}
