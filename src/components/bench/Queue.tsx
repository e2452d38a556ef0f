import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { withQuery } from '@/components/WithQuery';
import type { QueueRow } from '@/lib/bench-types';
import { ApiError, fetchJson } from '@/lib/fetch-json';
import { GARMENT_STEPS } from '@/lib/garment-steps';
import { ticketLabel } from '@/lib/ticket-number';
import { StageMarks } from './StageMarks';
import { DEFAULT_QUEUE_FILTER, matchesQueue, queueRank, queueSheetsHref, type QueueFilter } from '@/lib/queue-filter';
import { DueBadge } from './DueBadge';
import { todayIso } from '@/lib/due-date';
import { QueueFilters } from './QueueFilters';
import { StepButton } from './StepButton';
import { useAssignees, useStepLabel } from './use-bench';

interface Props {
  userId: string;
  /** the shop's name: its initials start every ticket number */
  shopName: string;
  canAdvance: boolean;
  canPickup: boolean;
  /** may print cut sheets (apprentice, tailor, lead) */
  canPrint?: boolean;
}

const col = createColumnHelper<QueueRow & { rank: number }>();

// The card below lg: on a phone one column with the action full width at the bottom; on an upright
// tablet the action stands at the right, in a column at least as wide in every card.
const CARD =
  "grid grid-cols-[auto_minmax(0,1fr)] items-center gap-x-4 gap-y-1 px-3 py-3 [grid-template-areas:'ticket_customer'_'garment_garment'_'due_due'_'step_step'_'whose_whose'_'move_move'] " +
  "sm:grid-cols-[auto_auto_minmax(0,1fr)_minmax(15rem,min-content)] sm:[grid-template-areas:'ticket_customer_whose_move'_'garment_garment_garment_move'_'due_due_step_move'] " +
  'lg:table-row lg:p-0';
// Where each column's cell sits in the card, and the words that stand in for its header there.
const CELL: Record<string, string> = {
  rank: "[grid-area:whose] sm:max-lg:text-right max-lg:before:text-muted max-lg:before:content-['Tailor:_']",
  due: "[grid-area:due] max-lg:before:text-muted max-lg:before:content-['Wanted_by:_']",
  ticketNumber: '[grid-area:ticket]',
  customer: '[grid-area:customer] max-lg:font-semibold',
  description: '[grid-area:garment] max-lg:text-xl',
  step: "[grid-area:step] max-lg:before:text-muted max-lg:before:content-['Stage:_']",
  move: '[grid-area:move] max-sm:pt-2 max-lg:[&_button]:w-full',
};
/** One page of collected history (GET /api/garments?view=history) and the next page's cursor. */
async function historyPage(after: string): Promise<{ rows: QueueRow[]; next: string | null }> {
  const res = await fetch(`/api/garments?view=history${after ? `&after=${encodeURIComponent(after)}` : ''}`, { credentials: 'same-origin' });
  const body = (await res.json().catch(() => ({}))) as QueueRow[] | { error?: string };
  if (!res.ok || !Array.isArray(body)) throw new ApiError(res.status, (!Array.isArray(body) && body.error) || `The server answered ${res.status}.`);
  return { rows: body, next: res.headers.get('x-next-cursor') };
}

const SORT_BY = "max-lg:before:font-semibold max-lg:before:text-muted max-lg:before:content-['Sort_by']";

function QueueTable({ userId, shopName, canAdvance, canPickup, canPrint = false }: Props) {
  // Open work (the server's default); an unchanged list comes back as 304 to the browser's copy.
  const queue = useQuery({ queryKey: ['queue'], queryFn: () => fetchJson<QueueRow[]>('/api/garments'), refetchInterval: 60_000 });
  const people = useAssignees();
  const label = useStepLabel();
  const [filters, setFilters] = useState<QueueFilter>(DEFAULT_QUEUE_FILTER);
  // Own work first, then unassigned, then the rest; within each, the earliest due first.
  const [sorting, setSorting] = useState<SortingState>([{ id: 'rank', desc: false }, { id: 'due', desc: false }]);
  const today = todayIso();

  // Collected work is history: read a page at a time, only when the step filter asks for it.
  const wantsHistory = filters.step === 'all' || filters.step === 'collected';
  const history = useInfiniteQuery({
    queryKey: ['queue', 'history'],
    queryFn: ({ pageParam }) => historyPage(pageParam),
    initialPageParam: '',
    getNextPageParam: (last) => last.next ?? undefined,
    enabled: wantsHistory,
  });

  const rows = useMemo(() => {
    const open = queue.data ?? [];
    const ids = new Set(open.map((r) => r.id));
    const older = wantsHistory ? (history.data?.pages ?? []).flatMap((p) => p.rows).filter((r) => !ids.has(r.id)) : [];
    return [...open, ...older].filter((r) => matchesQueue(r, filters, userId, today)).map((r) => ({ ...r, rank: queueRank(r, userId) }));
  }, [queue.data, history.data, wantsHistory, filters, userId, today]);

  const columns = useMemo(
    () => [
      col.accessor('rank', { header: 'Tailor', cell: (c) => (c.getValue() === 0 ? 'You' : c.getValue() === 1 ? 'Not yet taken' : c.row.original.assigneeName ?? '') }),
      col.accessor((r) => r.dueOn ?? '9999-12-31', { id: 'due', header: 'Wanted by', cell: (c) => <DueBadge dueOn={c.row.original.dueOn} /> }),
      col.accessor('ticketNumber', {
        header: 'Ticket no.',
        cell: (c) => (
          <a href={`/tickets/${c.row.original.ticketId}`} className="inline-flex min-h-11 items-center font-extrabold whitespace-nowrap text-accent underline">
            {ticketLabel(c.getValue(), shopName)}
          </a>
        ),
      }),
      col.accessor((r) => r.customerName ?? '', { id: 'customer', header: 'Customer' }),
      col.accessor('description', {
        header: 'Garment',
        cell: (c) => (
          <a href={`/garments/${c.row.original.id}`} className="inline-flex min-h-11 items-center font-semibold text-accent underline">
            {c.getValue()}
          </a>
        ),
      }),
      col.accessor((r) => GARMENT_STEPS.indexOf(r.status), { id: 'step', header: 'Stage', cell: (c) => <StageMarks status={c.row.original.status} label={label(c.row.original.status)} /> }),
      col.display({
        id: 'move',
        header: 'Move on',
        cell: (c) => (
          <StepButton
            garmentId={c.row.original.id}
            status={c.row.original.status}
            canAdvance={canAdvance}
            canPickup={canPickup}
            size="row"
            what={`${ticketLabel(c.row.original.ticketNumber, shopName)} ${c.row.original.description}`}
          />
        ),
      }),
    ],
    [label, canAdvance, canPickup, shopName],
  );

  // Rows keyed by garment, so a row's Undo offer stays with its garment when the order changes.
  const table = useReactTable({ data: rows, columns, getRowId: (r) => r.id, state: { sorting }, onSortingChange: setSorting, sortDescFirst: false, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  return (
    <div className="flex flex-col gap-4">
      <QueueFilters value={filters} onChange={setFilters} people={people.data ?? []} label={label} />
      {canPrint && rows.length > 0 && (
        // The same filters and day as the table: the PDF holds exactly the garments shown.
        <a href={queueSheetsHref(filters, today)} target="_blank" rel="noopener" className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-ink bg-card px-5 text-lg font-bold">
          Print the morning’s sheets
        </a>
      )}
      {queue.isPending ? (
        <p className="text-lg text-muted">Loading the queue…</p>
      ) : queue.isError ? (
        <p role="alert" className="font-semibold text-cut">The queue could not be loaded: {queue.error.message}</p>
      ) : (
        // Below lg (a tablet held upright, a phone) each row is a card with its action at the side or
        // underneath, so "Mark …" and Undo are never cut off; the header row becomes the sort buttons.
        // The roles are explicit because a table laid out as blocks and grids can lose them.
        <div className="rounded-lg border-2 border-rule bg-card">
          <table role="table" className="block w-full border-collapse text-left text-lg lg:table">
            <caption className="sr-only">Garments in the queue, {rows.length} shown</caption>
            <thead role="rowgroup" className="block lg:table-header-group">
              {table.getHeaderGroups().map((hg) => (
                <tr key={hg.id} role="row" className={'flex flex-wrap items-center gap-x-3 border-b-2 border-ink px-3 py-1 lg:table-row lg:p-0 ' + SORT_BY}>
                  {hg.headers.map((h) => {
                    const sorted = h.column.getIsSorted();
                    return (
                      <th key={h.id} role="columnheader" scope="col" className={'block text-base lg:table-cell lg:px-3 lg:py-2 ' + (h.column.getCanSort() ? '' : 'max-lg:sr-only')} aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}>
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
            <tbody role="rowgroup" className="block lg:table-row-group">
              {table.getRowModel().rows.map((row) => {
                return (
                  <tr key={row.id} role="row" data-testid="queue-row" className={'border-b border-rule ' + CARD}>
                    {row.getVisibleCells().map((cell) => (
                      <td key={cell.id} role="cell" className={'block lg:table-cell lg:px-3 lg:py-2 lg:align-middle ' + (CELL[cell.column.id] ?? '')}>
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ))}
                  </tr>
                );
              })}
            </tbody>
          </table>
          {rows.length === 0 && <p className="px-4 py-6 text-lg text-muted">Nothing here with these filters.</p>}
        </div>
      )}
      {wantsHistory ? (
        history.isError ? (
          <p role="alert" className="font-semibold text-cut">Collected work could not be loaded: {history.error.message}</p>
        ) : history.isPending || history.isFetchingNextPage ? (
          <p className="text-lg text-muted">Loading collected work…</p>
        ) : history.hasNextPage ? (
          <button type="button" onClick={() => void history.fetchNextPage()} className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-ink bg-card px-5 text-lg font-bold">
            Show older collected work
          </button>
        ) : (
          <p className="text-muted">That is all the collected work.</p>
        )
      ) : (
        <button type="button" onClick={() => setFilters({ ...filters, step: 'all' })} className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-rule bg-card px-5 text-lg font-semibold">
          Show collected work too (history)
        </button>
      )}
    </div>
  );
}

/** The queue island: the shop's garments as a table to filter, sort and move along. */
export default withQuery(QueueTable);
