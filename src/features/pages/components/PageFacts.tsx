import type { PageDetail } from '../../../../shared/schemas';
import { formatDateTime } from '../../../lib/format';
import { membershipLabels } from '../../../lib/roles';
import { PageStatusBadge } from './PageStatusBadge';

/** The line under a page title: who wrote it, its state, when it last changed, what you may do. */
export function PageFacts({ page }: { page: PageDetail }) {
  return (
    <dl className="mt-3 flex flex-wrap items-center gap-x-6 gap-y-2 text-sm">
      <div className="flex items-center gap-1.5">
        <dt className="text-ink-faint">Author</dt>
        <dd className="font-medium text-ink">{page.author.name}</dd>
      </div>
      <div className="flex items-center gap-1.5">
        <dt className="sr-only">Status</dt>
        <dd>
          <PageStatusBadge status={page.status} locked={page.locked} />
        </dd>
      </div>
      <div className="flex items-center gap-1.5">
        <dt className="text-ink-faint">Last change</dt>
        <dd className="text-ink-soft">
          <time dateTime={page.updatedAt}>{formatDateTime(page.updatedAt)}</time>
        </dd>
      </div>
      <div className="flex items-center gap-1.5">
        <dt className="text-ink-faint">Your part</dt>
        <dd className="text-ink-soft">
          {membershipLabels[page.access.role]}
          {!page.access.canEdit && ' · read only'}
        </dd>
      </div>
    </dl>
  );
}
