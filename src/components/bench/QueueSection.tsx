import {
  flexRender,
  getCoreRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type OnChangeFn,
  type SortingState,
  type VisibilityState,
} from '@tanstack/react-table';
import { useRef, useState } from 'react';
import { useT } from '@/components/I18n';
import type { MessageKey } from '@/lib/shared/i18n/format';
import type { QueueRow } from '@/lib/shared/bench-types';

/** A queue row as the table holds it: with its rank (own work, unassigned, the rest). */
export type RankedRow = QueueRow & { rank: number };

interface Props {
  /** the section's heading, e.g. "At the bench" */
  title: string;
  /** what the rows are, for the caption and the pager: "garments at the bench" */
  what: string;
  testId: string;
  rows: RankedRow[];
  // any: TanStack's column list mixes value types (strings, numbers, none for the action column)
  // biome-ignore lint/suspicious/noExplicitAny: as the comment above says
  columns: ColumnDef<RankedRow, any>[];
  hidden: VisibilityState;
  sorting: SortingState;
  onSortingChange: OnChangeFn<SortingState>;
  /** rows per page; null draws every row (the history, already read a page at a time) */
  pageSize: number | null;
  /** changes when the filters or sort change: the section goes back to its first page */
  resetKey: string;
}

// The card below lg: on a phone one column with the action full width at the bottom; on an upright
// tablet the action stands at the right, in a column at least as wide in every card.
const CARD =
  "grid grid-cols-[auto_minmax(0,1fr)] items-center gap-x-4 gap-y-1 px-3 py-3 [grid-template-areas:'ticket_customer'_'garment_garment'_'due_due'_'step_step'_'whose_whose'_'move_move'] " +
  "sm:grid-cols-[auto_auto_minmax(0,1fr)_minmax(15rem,min-content)] sm:[grid-template-areas:'ticket_customer_whose_move'_'garment_garment_garment_move'_'due_due_step_move'] " +
  'lg:table-row lg:p-0';
// Where each column's cell sits in the card; the words that stand in for its header there come from the catalog (data-label).
const CELL: Record<string, string> = {
  rank: '[grid-area:whose] sm:max-lg:text-right max-lg:before:text-muted max-lg:before:content-[attr(data-label)]',
  due: '[grid-area:due] max-lg:before:text-muted max-lg:before:content-[attr(data-label)]',
  ticketNumber: '[grid-area:ticket]',
  customer: '[grid-area:customer] max-lg:font-semibold',
  description: '[grid-area:garment] max-lg:text-xl',
  step: '[grid-area:step] max-lg:before:text-muted max-lg:before:content-[attr(data-label)]',
  // A ready garment's wait takes the stage's place (every row here is ready).
  waiting: '[grid-area:step] font-semibold',
  move: '[grid-area:move] max-sm:pt-2 max-lg:[&_button]:w-full',
};
const SORT_BY = 'max-lg:before:font-semibold max-lg:before:text-muted max-lg:before:content-[attr(data-label)]';
// The card's stand-in for each header that has one (queue.card.<column>).
const CARD_LABEL: Record<string, MessageKey> = { rank: 'queue.card.rank', due: 'queue.card.due', step: 'queue.card.step' };
const PAGER_BUTTON =
  'inline-flex min-h-12 items-center rounded-lg border-2 border-ink bg-card px-5 text-lg font-bold aria-disabled:border-rule aria-disabled:text-muted';

/**
 * One part of the queue (bench work, work waiting for pickup, collected work) as a table, drawn a
 * page at a time: at a thousand open garments drawing every row took seconds. Pages rather than a
 * window of rows: every row on screen is a real row in the document, so find-in-page, a screen
 * reader's table reading and the keyboard's tab order all see what the eye sees, and the cards
 * (rows of unequal height below lg) need no measuring.
 */
export function QueueSection({ title, what, testId, rows, columns, hidden, sorting, onSortingChange, pageSize, resetKey }: Props) {
  const t = useT();
  const [page, setPage] = useState({ index: 0, key: resetKey });
  // New filters or sort: back to the first page (set during render, React's way to reset on a prop).
  if (page.key !== resetKey) setPage({ index: 0, key: resetKey });
  const pages = pageSize ? Math.max(1, Math.ceil(rows.length / pageSize)) : 1;
  // A move or a refresh that shortened the list keeps the reader on the last page there is.
  const index = Math.min(page.key === resetKey ? page.index : 0, pages - 1);
  const heading = useRef<HTMLHeadingElement>(null);

  // Rows keyed by garment, so a row's Undo offer stays with its garment when the order changes.
  const table = useReactTable({
    data: rows,
    columns,
    getRowId: (r) => r.id,
    state: { sorting, columnVisibility: hidden, pagination: { pageIndex: index, pageSize: pageSize ?? Math.max(rows.length, 1) } },
    onSortingChange,
    sortDescFirst: false,
    autoResetPageIndex: false,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });
  const go = (to: number) => {
    if (to < 0 || to >= pages) return;
    setPage({ index: to, key: resetKey });
    // The new page starts at the heading: the focus goes there, so the keyboard and a screen reader
    // continue from the first of the new rows, not from a button at the bottom of the old ones.
    requestAnimationFrame(() => {
      heading.current?.focus();
      heading.current?.scrollIntoView({ block: 'start' });
    });
  };
  const first = pageSize ? index * pageSize + 1 : 1;
  const last = pageSize ? Math.min(rows.length, (index + 1) * pageSize) : rows.length;
  const shown = pages > 1 ? t('queue.shownOf', { first, last, count: rows.length }) : `${rows.length}`;
  const headingId = `${testId}-heading`;

  return (
    <section aria-labelledby={headingId} data-testid={testId} className="flex flex-col gap-2">
      <h2 id={headingId} ref={heading} tabIndex={-1} className="scroll-mt-4 text-2xl font-extrabold">
        {title} <span className="font-semibold text-muted">({rows.length})</span>
      </h2>
      {/* Below lg (a tablet held upright, a phone) each row is a card with its action at the side or
          underneath, so "Mark …" and Undo are never cut off; the header row becomes the sort buttons.
          The roles are explicit because a table laid out as blocks and grids can lose them. */}
      <div className="rounded-lg border-2 border-rule bg-card">
        <table className="block w-full border-collapse text-left text-lg lg:table">
          <caption className="sr-only">{t('queue.caption', { what, shown, page: index + 1, pages })}</caption>
          <thead className="block lg:table-header-group">
            {table.getHeaderGroups().map((hg) => (
              <tr
                key={hg.id}
                data-label={t('queue.sortBy')}
                className={`flex flex-wrap items-center gap-x-3 border-b-2 border-ink px-3 py-1 lg:table-row lg:p-0 ${SORT_BY}`}
              >
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      className={`block text-base lg:table-cell lg:px-2 lg:py-2 ${h.column.getCanSort() ? '' : 'max-lg:sr-only'}`}
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    >
                      {h.column.getCanSort() ? (
                        <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex min-h-11 items-center gap-1 font-extrabold">
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}</span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="block lg:table-row-group">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} data-testid="queue-row" className={`border-b border-rule ${CARD}`}>
                {row.getVisibleCells().map((cell) => (
                  <td
                    key={cell.id}
                    data-label={CARD_LABEL[cell.column.id] ? t(CARD_LABEL[cell.column.id]!) : undefined}
                    className={`block lg:table-cell lg:px-2 lg:py-2 lg:align-middle ${CELL[cell.column.id] ?? ''}`}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {pages > 1 && (
        <nav aria-label={t('queue.pages', { what })} className="flex flex-wrap items-center gap-3">
          {/* aria-disabled, not disabled: the focus stays on the button at the first or last page. */}
          <button type="button" className={PAGER_BUTTON} aria-disabled={index === 0 || undefined} onClick={() => go(index - 1)}>
            {t('queue.prev')}
          </button>
          <p className="text-lg" aria-live="polite">
            {t('queue.pageOf', { page: index + 1, pages })} <span className="text-muted">{t('queue.range', { first, last, count: rows.length })}</span>
          </p>
          <button type="button" className={PAGER_BUTTON} aria-disabled={index === pages - 1 || undefined} onClick={() => go(index + 1)}>
            {t('queue.next')}
          </button>
        </nav>
      )}
    </section>
  );
}
