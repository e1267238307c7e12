import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useState } from 'react';

interface DataTableProps<Row> {
  data: Row[];
  // Column value types differ per column; react-table's own examples type the array this way.
  columns: ColumnDef<Row, any>[];
  initialSorting?: SortingState;
  caption: string;
  getRowId?: (row: Row) => string;
}

function SortMark({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <svg viewBox="0 0 10 14" className={`size-2.5 ${direction ? 'text-tide-600' : 'text-fold-strong'}`} aria-hidden>
      <path d="M5 1 9 5H1Z" fill={direction === 'asc' ? 'currentColor' : direction ? 'none' : 'currentColor'} stroke="currentColor" strokeWidth="0.6" />
      <path d="M5 13 1 9h8Z" fill={direction === 'desc' ? 'currentColor' : direction ? 'none' : 'currentColor'} stroke="currentColor" strokeWidth="0.6" />
    </svg>
  );
}

/** A sortable table; click a column heading to sort, again to reverse. */
export function DataTable<Row>({ data, columns, initialSorting = [], caption, getRowId }: DataTableProps<Row>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId,
  });

  return (
    <div className="overflow-x-auto rounded-lg border border-fold bg-paper-card shadow-sheet">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-fold bg-paper-deep/60">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className="px-4 py-2.5 text-xs font-semibold uppercase tracking-wider text-ink-soft"
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1.5 uppercase tracking-wider hover:text-tide-700"
                      >
                        {label}
                        <SortMark direction={sorted} />
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-fold/70">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="transition-colors hover:bg-tide-50/60">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-4 py-3 align-middle">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
