import { createColumnHelper } from '@tanstack/react-table';
import type { AuditEventView } from '../../../../shared/schemas/signing';
import { DataTable } from '../../../components/DataTable';
import { ErrorState } from '../../../components/ErrorState';
import { LoadingState } from '../../../components/LoadingState';
import { formatDateTime } from '../../../lib/format';
import { useAuditTrail } from '../api/queries';

const column = createColumnHelper<AuditEventView>();

const eventLabels: Record<string, string> = {
  'page.created': 'Page started',
  'page.retitled': 'Title changed',
  'page.editing_session': 'Editing session',
  'page.signed': 'Signed',
  'countersign.requested': 'Countersignature requested',
  'page.countersigned': 'Countersigned',
  'page.returned': 'Returned with a comment',
  'addendum.signed': 'Addendum signed',
  'addendum.countersigned': 'Addendum countersigned',
  'addendum.returned': 'Addendum returned',
  'signature.failed': 'Failed signature attempt',
  'attachment.added': 'File added',
};

function summary(event: AuditEventView): string {
  const d = event.details as Record<string, unknown>;
  if (typeof d.meaning === 'string') return `“${d.meaning}”`;
  if (typeof d.comment === 'string') return d.comment;
  if (typeof d.supervisorName === 'string') return `to ${d.supervisorName}`;
  if (typeof d.reason === 'string') return String(d.reason).replace(/_/g, ' ');
  if (typeof d.first === 'string' && typeof d.last === 'string') return `${formatDateTime(d.first)} – ${formatDateTime(d.last)}`;
  return '';
}

const columns = [
  column.accessor('occurredAt', { header: 'When', cell: (c) => <time dateTime={c.getValue()} title={`${c.getValue()} (UTC)`}>{formatDateTime(c.getValue())}</time> }),
  column.accessor('type', { header: 'What', cell: (c) => eventLabels[c.getValue()] ?? c.getValue() }),
  column.accessor((e) => e.actor?.name ?? '', { id: 'actor', header: 'Who' }),
  column.accessor(summary, { id: 'details', header: 'Details', enableSorting: false }),
  column.accessor('hash', { header: 'Hash', enableSorting: false, cell: (c) => <span className="font-mono text-xs" title={c.getValue()}>{c.getValue().slice(0, 12)}…</span> }),
];

/** The page's audit trail (21 CFR 11.10(e)) with the chain check and a CSV copy (11.10(b)). */
export function AuditTrailView({ pageId }: { pageId: string }) {
  const trail = useAuditTrail(pageId);
  if (trail.isPending) return <LoadingState label="Reading the audit trail…" />;
  if (trail.isError) return <ErrorState error={trail.error} />;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <span className={trail.data.chain.intact ? 'text-reed-700' : 'text-ember-700'}>
          {trail.data.chain.intact ? `Hash chain verified over ${trail.data.chain.checked} events.` : `Hash chain broken: ${trail.data.chain.problem}`}
        </span>
        <a href={`/api/pages/${encodeURIComponent(pageId)}/audit.csv`} download className="font-medium text-tide-600 hover:underline">
          Download CSV
        </a>
      </div>
      <DataTable data={trail.data.events} columns={columns} caption="Audit trail of this page" getRowId={(e) => String(e.id)} />
    </div>
  );
}
