// Notices to customers: the ready notice, sent by the counter or by the shop's setting, kept with
// its delivery state; a failed send is retried on a timer and by hand, and stays visible.
import { and, asc, desc, eq, gte, isNull, lte, ne, sql } from 'drizzle-orm';
import { NOTICE_LEASE_SECONDS } from 'astro:env/server';
import { db } from '@/db';
import { counterSettings, customers, garments, notices, organization, tickets, type Notice } from '@/db/schema';
import type { Actor } from '@/lib/api';
import { sendMail } from '@/lib/mail';
import { formatMoney } from '@/lib/pricing/money';
import { audit } from './audit';
import { ServiceError } from './errors';
import { isUuid } from './garments';
import { summaryOf } from './counter/payments';
import { counterSettingsOf } from './counter/prices';
import { shopTicket } from './ticket-core';
import { ticketLabel } from '@/lib/ticket-number';

/** Automatic retries before a notice waits for someone to press "retry". */
export const MAX_AUTO_ATTEMPTS = 5;
// 30 s, 1 min, 2 min, 4 min: a mail server back from a restart is caught soon, a dead one is not hammered.
const BACKOFF_MS = 30_000;
/** How long (NOTICE_LEASE_SECONDS, 3 min) a claimed send is left to its server before another server may try it: longer than
 * the mail transport's own timeouts (src/lib/mail.ts), so only a server that died mid-send is overtaken. */
export const SEND_LEASE_MS = NOTICE_LEASE_SECONDS * 1000;

/** The ticket's notices, oldest first. */
export async function listNotices(actor: Actor, ticketId: string): Promise<Notice[]> {
  await shopTicket(actor, ticketId);
  return db.select().from(notices).where(and(eq(notices.shopId, actor.shopId), eq(notices.ticketId, ticketId))).orderBy(asc(notices.createdAt));
}

/** The ready notice's subject and text: the balance due and the shop's hours. */
export async function readyMessage(shopId: string, ticketId: string): Promise<{ to: string | null; subject: string; body: string }> {
  const settings = await counterSettingsOf(shopId);
  const summary = await summaryOf(await shopTicket({ shopId }, ticketId), settings);
  const [shop] = await db.select({ name: organization.name }).from(organization).where(eq(organization.id, shopId));
  const number = ticketLabel(summary.ticket.number, shop?.name ?? '');
  const due = summary.due > 0 ? `Balance due at pickup: ${formatMoney(summary.due, summary.currency)}.` : 'Nothing is left to pay: the ticket is paid in full.';
  const pay = summary.due > 0 && summary.link?.status === 'open' ? [`You may pay ahead online: ${summary.link.url}`] : [];
  const body = [
    `Hello ${summary.ticket.customerName ?? ''}`.trim() + ',',
    '',
    `Your trousers on ticket ${number} at ${shop?.name ?? 'the shop'} are ready to collect.`,
    due,
    ...pay,
    '',
    `Opening hours: ${settings.hours || 'ask the shop'}`,
    ...(settings.location ? [`Where: ${settings.location}`] : []),
    '',
    `Bring your claim slip or quote ${number}.`,
  ].join('\n');
  return { to: summary.ticket.customerEmail, subject: `Ready to collect: ticket ${number}`, body };
}

/** Tries one delivery and records the outcome; a failure schedules the next automatic try. */
export async function attemptDelivery(notice: Notice): Promise<Notice> {
  const attempts = notice.attempts + 1;
  // The attempt is claimed first, so the timer and a retry by hand at the same moment (on this
  // server or another) send one mail. The claim is a lease: if this server dies before recording
  // the outcome, the notice falls due again when the lease ends and another server's timer sends it.
  const [claimed] = await db
    .update(notices)
    .set({ attempts, nextAttemptAt: new Date(Date.now() + SEND_LEASE_MS) })
    .where(and(eq(notices.id, notice.id), eq(notices.attempts, notice.attempts), ne(notices.status, 'sent')))
    .returning({ id: notices.id });
  if (!claimed) {
    const [now] = await db.select().from(notices).where(eq(notices.id, notice.id));
    return now!;
  }
  try {
    await sendMail({ to: notice.to, subject: notice.subject, text: notice.body }, { shopId: notice.shopId, kind: 'ready-notice' });
    const [row] = await db.update(notices).set({ status: 'sent', attempts, sentAt: new Date(), lastError: null, nextAttemptAt: null }).where(eq(notices.id, notice.id)).returning();
    return row!;
  } catch (e) {
    const next = attempts < MAX_AUTO_ATTEMPTS ? new Date(Date.now() + BACKOFF_MS * 2 ** (attempts - 1)) : null;
    const [row] = await db
      .update(notices)
      .set({ status: 'failed', attempts, lastError: String((e as Error).message ?? e).slice(0, 500), nextAttemptAt: next })
      .where(eq(notices.id, notice.id))
      .returning();
    return row!;
  }
}

/** Queues the ready notice of a ready ticket and tries to send it at once. */
async function queueReady(shopId: string, ticketId: string, actorId: string | null): Promise<Notice> {
  const message = await readyMessage(shopId, ticketId);
  const to = message.to;
  if (!to) throw new ServiceError(422, 'The customer has no e-mail address: add one, or call them.');
  const row = await db.transaction(async (tx) => {
    const [queued] = await tx
      .insert(notices)
      .values({ shopId, ticketId, kind: 'ready', to, subject: message.subject, body: message.body, createdById: actorId })
      .onConflictDoNothing()
      .returning();
    if (!queued) throw new ServiceError(409, 'The ready notice of this ticket is already on record: send it again if the customer needs it.');
    await audit(tx, shopId, actorId, 'notice.queued', ticketId, { kind: 'ready', automatic: actorId === null });
    return queued;
  });
  return attemptDelivery(row);
}

/** The counter's button: sends the ready notice of a ready ticket. */
export async function sendReadyNotice(actor: Actor, ticketId: string): Promise<Notice> {
  const ticket = await shopTicket(actor, ticketId);
  if (ticket.status !== 'ready') throw new ServiceError(422, `The ticket is not ready yet (it is ${ticket.status}).`);
  return queueReady(actor.shopId, ticketId, actor.userId);
}

/** Sends the ready notice of a ready ticket again (the customer lost it, or asks again): a new
 * notices row, numbered after the last, with the message as it reads now (balance, pay link) and
 * its own delivery state; the first send's record is left as it was. Audited as notice.resent. */
export async function resendReadyNotice(actor: Actor, ticketId: string): Promise<Notice> {
  const ticket = await shopTicket(actor, ticketId);
  if (ticket.status !== 'ready') throw new ServiceError(422, `The ticket is not ready (it is ${ticket.status}).`);
  const message = await readyMessage(actor.shopId, ticketId);
  if (!message.to) throw new ServiceError(422, 'The customer has no e-mail address: add one, or call them.');
  const to = message.to;
  const row = await db.transaction(async (tx) => {
    const [last] = await tx
      .select()
      .from(notices)
      .where(and(eq(notices.shopId, actor.shopId), eq(notices.ticketId, ticketId), eq(notices.kind, 'ready')))
      .orderBy(desc(notices.sequence))
      .limit(1);
    if (!last) throw new ServiceError(409, 'The ready notice has not been sent yet: send it first.');
    if (last.status !== 'sent') throw new ServiceError(409, 'The last ready notice is not delivered yet: retry that one instead.');
    // Two re-sends at once both ask for the next number: the unique index lets one through.
    const [queued] = await tx
      .insert(notices)
      .values({ shopId: actor.shopId, ticketId, kind: 'ready', sequence: last.sequence + 1, to, subject: message.subject, body: message.body, createdById: actor.userId })
      .onConflictDoNothing()
      .returning();
    if (!queued) throw new ServiceError(409, 'The ready notice is being sent again already.');
    await audit(tx, actor.shopId, actor.userId, 'notice.resent', ticketId, { kind: 'ready', noticeId: queued.id, sequence: queued.sequence, previousId: last.id });
    return queued;
  });
  return attemptDelivery(row);
}

/** Tries a failed notice again by hand, whatever its count of attempts. */
export async function retryNotice(actor: Actor, ticketId: string, noticeId: string): Promise<Notice> {
  await shopTicket(actor, ticketId);
  const [row] = isUuid(noticeId)
    ? await db.select().from(notices).where(and(eq(notices.id, noticeId), eq(notices.ticketId, ticketId), eq(notices.shopId, actor.shopId)))
    : [];
  if (!row) throw new ServiceError(404, 'No such notice on this ticket.');
  if (row.status === 'sent') throw new ServiceError(409, 'This notice was already sent.');
  // The retry itself changes no row (the attempt below records its own outcome): a lone entry.
  await audit(db, actor.shopId, actor.userId, 'notice.retried', ticketId, { noticeId });
  return attemptDelivery(row);
}

/** Tries every unsent notice whose next try is due (a failure's retry, or a send whose server
 * died before recording it); returns how many were tried. */
export async function retryDueNotices(now = new Date()): Promise<number> {
  const due = await db.select().from(notices).where(and(ne(notices.status, 'sent'), lte(notices.nextAttemptAt, now)));
  for (const n of due) await attemptDelivery(n);
  return due.length;
}

/** Queues the automatic ready notice of one ticket when its shop wants it and every garment is ready. */
export async function autoReadyNotice(shopId: string, ticketId: string): Promise<Notice | null> {
  const settings = await counterSettingsOf(shopId);
  if (!settings.autoReadyNotice) return null;
  const [ticket] = await db.select().from(tickets).where(and(eq(tickets.id, ticketId), eq(tickets.shopId, shopId)));
  if (!ticket) return null;
  const steps = await db.select({ status: garments.status }).from(garments).where(eq(garments.ticketId, ticketId));
  const ready = steps.length > 0 ? steps.every((g) => g.status === 'ready') : ticket.status === 'ready';
  if (!ready) return null;
  const [already] = await db.select({ id: notices.id }).from(notices).where(and(eq(notices.ticketId, ticketId), eq(notices.kind, 'ready')));
  if (already) return null;
  try {
    return await queueReady(shopId, ticketId, null);
  } catch (e) {
    // No e-mail on file, or the counter sent it a moment ago: the counter panel shows either.
    if (e instanceof ServiceError) return null;
    throw e;
  }
}

/** Finds ready tickets of shops that send automatically (since they turned it on) without a notice. */
export async function sweepReadyTickets(): Promise<number> {
  const rows = await db
    .select({ shopId: tickets.shopId, ticketId: tickets.id })
    .from(tickets)
    .innerJoin(counterSettings, eq(counterSettings.shopId, tickets.shopId))
    .innerJoin(customers, eq(customers.id, tickets.customerId))
    .leftJoin(notices, and(eq(notices.ticketId, tickets.id), eq(notices.kind, 'ready')))
    .where(
      and(
        eq(tickets.status, 'ready'),
        eq(counterSettings.autoReadyNotice, true),
        gte(tickets.updatedAt, sql`coalesce(${counterSettings.autoReadySince}, now())`),
        isNull(notices.id),
        ne(sql`coalesce(${customers.email}, '')`, ''),
      ),
    );
  let sent = 0;
  for (const r of rows) if (await autoReadyNotice(r.shopId, r.ticketId)) sent += 1;
  return sent;
}

const timer = globalThis as typeof globalThis & { __cuffwrightNoticeTimer?: ReturnType<typeof setInterval> };

/** Starts the server's notice timer once per process: automatic ready notices, then due retries. */
export function startNoticeTimer(seconds: number): void {
  if (timer.__cuffwrightNoticeTimer || seconds <= 0) return;
  let busy = false;
  timer.__cuffwrightNoticeTimer = setInterval(() => {
    if (busy) return;
    busy = true;
    sweepReadyTickets()
      .then(() => retryDueNotices())
      .catch((e) => console.error('notice timer:', e))
      .finally(() => (busy = false));
  }, seconds * 1000);
  timer.__cuffwrightNoticeTimer.unref();
}
