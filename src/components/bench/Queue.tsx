import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import { createColumnHelper, type SortingState, type Updater } from '@tanstack/react-table';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useT, withLanguage } from '@/components/I18n';
import { withQuery } from '@/components/WithQuery';
import type { QueueRow, WhoOption } from '@/lib/shared/bench-types';
import { todayIso } from '@/lib/shared/due-date';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import { GARMENT_STEPS } from '@/lib/shared/garment-steps';
import { matchesQueue, queueRank, queueSection, queueSheetsHref, readyAge, type QueueFilter, type QueueSection as Section } from '@/lib/shared/queue-filter';
import { queueUrlSearch, readQueueUrl } from '@/lib/shared/queue-url';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { DueBadge } from './DueBadge';
import { QueueFilters } from './QueueFilters';
import { QueueSection, type RankedRow } from './QueueSection';
import { StageMarks } from './StageMarks';
import { StepButton } from './StepButton';
import { useStepLabel } from './use-bench';

interface Props {
  userId: string;
  /** the shop's name: its initials start every ticket number */
  shopName: string;
  canAdvance: boolean;
  canPickup: boolean;
  /** may print cut sheets (apprentice, tailor, lead) */
  canPrint?: boolean;
  /** the Tailor filter's choices for this reader: only what can match (services/queue.ts) */
  who: WhoOption[];
  /** the page address's query as the server read it (filters, sort, search), so the first draw
   * on the server and in the browser agree */
  search?: string;
  /** the counter's view: work waiting for pickup comes before bench work */
  pickupFirst?: boolean;
}

/** Rows per page of bench work and of work waiting for pickup. */
const PAGE_SIZE = 50;

const col = createColumnHelper<RankedRow>();

/** One page of collected history (GET /api/garments?view=history) and the next page's cursor. */
async function historyPage(after: string): Promise<{ rows: QueueRow[]; next: string | null }> {
  const res = await fetch(`/api/garments?view=history${after ? `&after=${encodeURIComponent(after)}` : ''}`, { credentials: 'same-origin' });
  const body = (await res.json().catch(() => ({}))) as QueueRow[] | { error?: string };
  if (!res.ok || !Array.isArray(body)) throw new ApiError(res.status, (!Array.isArray(body) && body.error) || `The server answered ${res.status}.`);
  return { rows: body, next: res.headers.get('x-next-cursor') };
}

// What each section shows: a ready garment's wait instead of its stage (every one is ready).
const HIDDEN: Record<Section, Record<string, boolean>> = {
  bench: { waiting: false },
  waiting: { step: false },
  collected: { waiting: false },
};

function QueueTable({ userId, shopName, canAdvance, canPickup, canPrint = false, who, search = '', pickupFirst = false }: Props) {
  // Open work (the server's default); an unchanged list comes back as 304 to the browser's copy.
  const queue = useQuery({ queryKey: ['queue'], queryFn: () => fetchJson<QueueRow[]>('/api/garments'), refetchInterval: 60_000 });
  const label = useStepLabel();
  const t = useT();
  // Filters, sort and search start from the address, so a reload or a shared link opens this queue.
  const [start] = useState(() =>
    readQueueUrl(
      search,
      who.map((o) => o.value),
    ),
  );
  const [filters, setFilters] = useState<QueueFilter>(start.filter);
  const [sorting, setSorting] = useState<SortingState>(start.sort);
  const today = todayIso();

  // Kept in the address as they change. replaceState, not pushState: Back leaves the queue for the
  // page before it instead of stepping through every letter typed, and coming Back to the queue
  // opens it as it was left.
  useEffect(() => {
    const want = `${location.pathname}${queueUrlSearch(filters, sorting)}${location.hash}`;
    if (want !== `${location.pathname}${location.search}${location.hash}`) window.history.replaceState(window.history.state, '', want);
  }, [filters, sorting]);

  // Collected work is history: read a page at a time, only when the stage filter asks for it.
  const wantsHistory = filters.step === 'all' || filters.step === 'collected';
  const history = useInfiniteQuery({
    queryKey: ['queue', 'history'],
    queryFn: ({ pageParam }) => historyPage(pageParam),
    initialPageParam: '',
    getNextPageParam: (last) => last.next ?? undefined,
    enabled: wantsHistory,
  });

  // A garment just moved on stays in its section while its "Marked …" and Undo show, so a wrong
  // tap can be taken back where it was made (pressed → ready would otherwise jump to pickup).
  const [stay, setStay] = useState<ReadonlyMap<string, Section>>(new Map());
  const sectionOf = useRef(new Map<string, Section>());
  const onOffer = useCallback((id: string, showing: boolean) => {
    setStay((m) => {
      if (showing === m.has(id)) return m;
      const next = new Map(m);
      if (showing) next.set(id, sectionOf.current.get(id) ?? 'bench');
      else next.delete(id);
      return next;
    });
  }, []);

  const sections = useMemo(() => {
    const open = queue.data ?? [];
    const ids = new Set(open.map((r) => r.id));
    const older = wantsHistory ? (history.data?.pages ?? []).flatMap((p) => p.rows).filter((r) => !ids.has(r.id)) : [];
    const parts: Record<Section, RankedRow[]> = { bench: [], waiting: [], collected: [] };
    for (const r of [...open, ...older]) {
      if (!matchesQueue(r, filters, userId, today)) continue;
      parts[stay.get(r.id) ?? queueSection(r)].push({ ...r, rank: queueRank(r, userId) });
    }
    return parts;
  }, [queue.data, history.data, wantsHistory, filters, userId, today, stay]);
  useEffect(() => {
    sectionOf.current = new Map(Object.entries(sections).flatMap(([s, rows]) => rows.map((r) => [r.id, s as Section] as const)));
  }, [sections]);

  const columns = useMemo(
    () => [
      col.accessor('rank', {
        header: t('queue.col.tailor'),
        cell: (c) => (c.getValue() === 0 ? t('queue.you') : c.getValue() === 1 ? t('queue.notTaken') : (c.row.original.assigneeName ?? '')),
      }),
      col.accessor((r) => r.dueOn ?? '9999-12-31', {
        id: 'due',
        header: t('queue.col.due'),
        cell: (c) => <DueBadge dueOn={c.row.original.dueOn} status={c.row.original.status} />,
      }),
      col.accessor('ticketNumber', {
        header: t('queue.col.ticket'),
        cell: (c) => (
          <a href={`/tickets/${c.row.original.ticketId}`} className="inline-flex min-h-11 items-center font-extrabold whitespace-nowrap text-accent underline">
            {ticketLabel(c.getValue(), shopName)}
          </a>
        ),
      }),
      col.accessor((r) => r.customerName ?? '', { id: 'customer', header: t('queue.col.customer') }),
      col.accessor('description', {
        header: t('queue.col.garment'),
        cell: (c) => (
          <>
            <a href={`/garments/${c.row.original.id}`} className="inline-flex min-h-11 items-center font-semibold text-accent underline">
              {c.getValue()}
            </a>
            {/* Trousers are the usual work; any other kind is named beside the garment. */}
            {c.row.original.kind && c.row.original.kind !== 'trousers' && <span className="ml-2 text-muted">{t(`kind.${c.row.original.kind}`)}</span>}
          </>
        ),
      }),
      col.accessor((r) => GARMENT_STEPS.indexOf(r.status), {
        id: 'step',
        header: t('queue.col.step'),
        cell: (c) => <StageMarks status={c.row.original.status} label={label(c.row.original.status)} />,
      }),
      // The oldest wait first when sorted up: ISO times sort as text.
      col.accessor((r) => r.readyAt ?? '~', {
        id: 'waiting',
        header: t('queue.col.waiting'),
        cell: (c) => (
          <span data-testid="ready-age">
            {(() => {
              const age = readyAge(c.row.original.readyAt, todayIso());
              return age ? t('queue.readyAge', { days: age.days }) : label('ready');
            })()}
          </span>
        ),
      }),
      col.display({
        id: 'move',
        header: t('queue.col.move'),
        cell: (c) => (
          <StepButton
            garmentId={c.row.original.id}
            status={c.row.original.status}
            canAdvance={canAdvance}
            canPickup={canPickup}
            size="row"
            what={`${ticketLabel(c.row.original.ticketNumber, shopName)} ${c.row.original.description}`}
            onOffer={(showing) => onOffer(c.row.original.id, showing)}
          />
        ),
      }),
    ],
    [label, t, canAdvance, canPickup, shopName, onOffer],
  );

  const onSortingChange = (u: Updater<SortingState>) => setSorting((s) => (typeof u === 'function' ? u(s) : u));
  const resetKey = queueUrlSearch(filters, sorting);
  const parts: { key: Section; title: string; what: string }[] = [
    { key: 'bench', title: t('queue.section.bench'), what: t('queue.section.benchWhat') },
    { key: 'waiting', title: t('queue.section.waiting'), what: t('queue.section.waitingWhat') },
  ];
  if (pickupFirst) parts.reverse();
  parts.push({ key: 'collected', title: t('queue.section.collected'), what: t('queue.section.collectedWhat') });
  const shown = parts.filter((p) => sections[p.key].length > 0);
  const count = shown.reduce((n, p) => n + sections[p.key].length, 0);

  return (
    <div className="flex flex-col gap-4">
      <QueueFilters value={filters} onChange={setFilters} who={who} label={label} />
      {canPrint && count > 0 && (
        // The same filters and day as the table: the PDF holds exactly the garments shown.
        <a
          href={queueSheetsHref(filters, today)}
          target="_blank"
          rel="noopener"
          className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-ink bg-card px-5 text-lg font-bold max-sm:order-last"
        >
          {t('queue.print')}
        </a>
      )}
      {queue.isPending ? (
        <p className="text-lg text-muted">{t('queue.loading')}</p>
      ) : queue.isError ? (
        <p role="alert" className="font-semibold text-cut">
          {t('queue.failed', { error: queue.error.message })}
        </p>
      ) : shown.length === 0 ? (
        <p className="rounded-lg border-2 border-rule bg-card px-4 py-6 text-lg text-muted">{t('queue.empty')}</p>
      ) : (
        shown.map((p) => (
          <QueueSection
            key={p.key}
            title={p.title}
            what={p.what}
            testId={`queue-${p.key}`}
            rows={sections[p.key]}
            columns={columns}
            hidden={HIDDEN[p.key]}
            sorting={sorting}
            onSortingChange={onSortingChange}
            pageSize={p.key === 'collected' ? null : PAGE_SIZE}
            resetKey={resetKey}
          />
        ))
      )}
      {wantsHistory ? (
        history.isError ? (
          <p role="alert" className="font-semibold text-cut">
            {t('queue.historyFailed', { error: history.error.message })}
          </p>
        ) : history.isPending || history.isFetchingNextPage ? (
          <p className="text-lg text-muted">{t('queue.historyLoading')}</p>
        ) : history.hasNextPage ? (
          <button
            type="button"
            onClick={() => void history.fetchNextPage()}
            className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-ink bg-card px-5 text-lg font-bold"
          >
            {t('queue.older')}
          </button>
        ) : (
          <p className="text-muted">{t('queue.allCollected')}</p>
        )
      ) : (
        <button
          type="button"
          onClick={() => setFilters({ ...filters, step: 'all' })}
          className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-rule bg-card px-5 text-lg font-semibold"
        >
          {t('queue.showCollected')}
        </button>
      )}
    </div>
  );
}

/** The queue island: the shop's garments to filter, sort and move along, bench work apart from
 * work waiting for pickup, each a page at a time. */
export default withLanguage(withQuery(QueueTable));
