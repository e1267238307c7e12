import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { PageSummary } from '../../../../shared/schemas';
import { DataTable } from '../../../components/DataTable';
import { formatDateTime, formatPageNumber } from '../../../lib/format';
import { PageStatusBadge } from './PageStatusBadge';

const column = createColumnHelper<PageSummary>();

const columns = [
  column.accessor('number', {
    header: 'No.',
    cell: (info) => <span className="font-mono text-ink-soft">{formatPageNumber(info.getValue())}</span>,
  }),
  column.accessor('title', {
    header: 'Title',
    cell: (info) => (
      <Link to={`/pages/${info.row.original.id}`} className="font-medium text-ink hover:text-tide-600 hover:underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor((page) => page.author.name, { id: 'author', header: 'Author' }),
  column.accessor('status', {
    header: 'Status',
    cell: (info) => <PageStatusBadge status={info.getValue()} locked={info.row.original.locked} />,
  }),
  column.accessor('updatedAt', {
    header: 'Last change',
    cell: (info) => <time dateTime={info.getValue()} className="text-ink-soft">{formatDateTime(info.getValue())}</time>,
  }),
];

export function PagesTable({ pages }: { pages: PageSummary[] }) {
  return <DataTable data={pages} columns={columns} caption="Pages of this notebook" initialSorting={[{ id: 'number', desc: false }]} getRowId={(page) => page.id} />;
}
