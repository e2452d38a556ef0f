// Notices to customers: the ready notice, sent by the counter or by the shop's setting, and the pay
// link sent from the counter; each goes by e-mail, text message or both as the customer prefers
// (one row per channel), kept with its delivery state; a failed send is retried on a timer and by
// hand, and stays visible. A text's delivery report arrives later by the SMS service's signed
// status callback (recordDeliveryReport).
import { and, asc, desc, eq, gte, isNull, lte, ne, or, sql } from 'drizzle-orm';
import { NOTICE_LEASE_SECONDS } from 'astro:env/server';
import { db } from '@/db';
import { counterSettings, customers, garments, notices, organization, tickets, type DELIVERY_REPORTS, type Notice } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { sendMail } from '@/lib/server/mail';
import { recordSentMail } from '@/lib/server/sent-mail-record';
import { plannedSends, type Channel, type ContactPreference, type PlannedSend } from '@/lib/shared/contact-channels';
import { sendText, smsConfigured, statusCallbackUrl } from '@/lib/server/sms-service';
import { formatMoney, type Currency } from '@/lib/pricing/money';
import { translator, type Translate } from '@/lib/server/i18n/catalog';
import { intlLocale } from '@/lib/shared/i18n/languages';
import { benchSettings } from './shop-settings';
import { audit } from './audit';
import { ServiceError } from './errors';
import { isUuid } from './garments';
import { summaryOf } from './counter/payments';
import { counterSettingsOf } from './counter/prices';
import { shopTicket } from './ticket-core';
import { ticketLabel } from '@/lib/shared/ticket-number';

/** Automatic retries before a notice waits for someone to press "retry". */
export const MAX_AUTO_ATTEMPTS = 5;
// 30 s, 1 min, 2 min, 4 min: a mail server back from a restart is caught soon, a dead one is not hammered.
const BACKOFF_MS = 30_000;
/** How long (NOTICE_LEASE_SECONDS, 3 min) a claimed send is left to its server before another server may try it: longer than
 * the mail transport's own timeouts (src/lib/server/mail.ts), so only a server that died mid-send is overtaken. */
export const SEND_LEASE_MS = NOTICE_LEASE_SECONDS * 1000;

/** The ticket's notices, oldest first. */
export async function listNotices(actor: Actor, ticketId: string): Promise<Notice[]> {
  await shopTicket(actor, ticketId);
  return db
    .select()
    .from(notices)
    .where(and(eq(notices.shopId, actor.shopId), eq(notices.ticketId, ticketId)))
    .orderBy(asc(notices.createdAt));
}

/** The shop's words for its customers: the catalog in the shop's language, and money as that language writes it. */
async function shopWords(shopId: string): Promise<{ t: Translate; money: (minor: number, currency: Currency) => string }> {
  const { language } = await benchSettings(shopId);
  const locale = intlLocale(language);
  return { t: translator(language), money: (minor, currency) => formatMoney(minor, currency, locale) };
}

function hello(t: Translate, name: string | null): string {
  const n = (name ?? '').trim();
  return t('notice.hello', { hasName: n ? 'yes' : 'no', name: n });
}

/** The ready notice's subject and text (e-mail), its short form (text message), and who gets it; in the shop's language. */
export async function readyMessage(shopId: string, ticketId: string): Promise<Message> {
  const settings = await counterSettingsOf(shopId);
  const summary = await summaryOf(await shopTicket({ shopId }, ticketId), settings);
  const [shop] = await db.select({ name: organization.name }).from(organization).where(eq(organization.id, shopId));
  const { t, money } = await shopWords(shopId);
  const number = ticketLabel(summary.ticket.number, shop?.name ?? '');
  const amount = money(summary.due, summary.currency);
  const due = summary.due > 0 ? t('notice.ready.due', { amount }) : t('notice.ready.paid');
  const payUrl = summary.due > 0 && summary.link?.status === 'open' ? summary.link.url : null;
  const pay = payUrl ? [t('notice.ready.payAhead', { url: payUrl })] : [];
  const body = [
    hello(t, summary.ticket.customerName),
    '',
    t('notice.ready.line', { number, shop: shop?.name ?? t('notice.theShop') }),
    due,
    ...pay,
    '',
    t('notice.ready.hours', { hours: settings.hours || t('notice.askShop') }),
    ...(settings.location ? [t('notice.ready.where', { location: settings.location })] : []),
    '',
    t('notice.ready.bring', { number }),
  ].join('\n');
  // A text is read on a phone: the same facts, shorter.
  const text = [
    t('notice.ready.text', { shop: shop?.name ?? t('notice.TheShop'), number }),
    summary.due > 0 ? t('notice.ready.textDue', { amount }) : t('notice.ready.textPaid'),
    ...(payUrl ? [t('notice.ready.textPay', { url: payUrl })] : []),
    ...(settings.hours ? [t('notice.ready.textHours', { hours: settings.hours })] : []),
  ].join('\n');
  return { ...recipientOf(summary.ticket), subject: t('notice.ready.subject', { number }), body, text };
}

/** A message to a customer: e-mail subject and body, the text message's words, and the customer's ways to be reached. */
export interface Message {
  to: string | null;
  phone: string | null;
  contactBy: ContactPreference;
  subject: string;
  body: string;
  text: string;
}

function recipientOf(t: { customerEmail: string | null; customerPhone: string | null; contactBy: ContactPreference }) {
  return { to: t.customerEmail, phone: t.customerPhone, contactBy: t.contactBy };
}

/** The sends of a message as the customer prefers and the shop can (422 when none can go). */
function sendsOf(message: Message): PlannedSend[] {
  const { sends, refused } = plannedSends({ email: message.to, phone: message.phone, contactBy: message.contactBy }, smsConfigured());
  if (refused) throw new ServiceError(422, refused);
  return sends;
}

/** The row of one send: the e-mail, or the text's words (kept in `body`, as sent). */
function rowOf(shopId: string, ticketId: string, kind: Notice['kind'], message: Message, send: PlannedSend, sequence: number, createdById: string | null) {
  const words = send.channel === 'sms' ? message.text : message.body;
  return { shopId, ticketId, kind, sequence, channel: send.channel, to: send.to, note: send.note, subject: message.subject, body: words, createdById };
}

const SENT_KIND = { ready: 'ready-notice', 'pay-link': 'pay-link' } as const;

async function deliver(notice: Notice): Promise<{ providerId: string | null }> {
  if (notice.channel === 'sms') {
    const sent = await sendText({ to: notice.to, body: notice.body, statusCallback: statusCallbackUrl(notice.id) });
    try {
      await recordSentMail(
        { shopId: notice.shopId, kind: SENT_KIND[notice.kind] },
        { to: notice.to, subject: notice.subject, messageId: sent.sid, channel: 'sms', body: notice.body },
      );
    } catch (e) {
      // As for e-mail (lib/server/mail.ts): the text is out, and a retry would send it twice.
      console.error('sent text not recorded:', e);
    }
    return { providerId: sent.sid };
  }
  await sendMail({ to: notice.to, subject: notice.subject, text: notice.body }, { shopId: notice.shopId, kind: SENT_KIND[notice.kind] });
  return { providerId: null };
}

/** Tries one delivery and records the outcome; a failure schedules the next automatic try. */
export async function attemptDelivery(notice: Notice, now = new Date()): Promise<Notice> {
  const attempts = notice.attempts + 1;
  // The attempt is claimed first, so the timer and a retry by hand at the same moment (on this
  // server or another) send one mail. The claim is a lease: if this server dies before recording
  // the outcome, the notice falls due again when the lease ends and another server's timer sends it.
  const [claimed] = await db
    .update(notices)
    // The lease runs on the caller's clock, the one that found the notice due.
    .set({ attempts, nextAttemptAt: new Date(now.getTime() + SEND_LEASE_MS) })
    .where(and(eq(notices.id, notice.id), eq(notices.attempts, notice.attempts), ne(notices.status, 'sent')))
    .returning({ id: notices.id });
  if (!claimed) {
    const [now] = await db.select().from(notices).where(eq(notices.id, notice.id));
    return now!;
  }
  try {
    const { providerId } = await deliver(notice);
    const [row] = await db
      .update(notices)
      .set({ status: 'sent', attempts, sentAt: new Date(), lastError: null, nextAttemptAt: null, providerId })
      .where(eq(notices.id, notice.id))
      .returning();
    return row!;
  } catch (e) {
    const next = attempts < MAX_AUTO_ATTEMPTS ? new Date(now.getTime() + BACKOFF_MS * 2 ** (attempts - 1)) : null;
    const [row] = await db
      .update(notices)
      .set({ status: 'failed', attempts, lastError: String((e as Error).message ?? e).slice(0, 500), nextAttemptAt: next })
      .where(eq(notices.id, notice.id))
      .returning();
    return row!;
  }
}

/** Queues the ready notice of a ready ticket by the customer's channels and tries each at once;
 * answers the first channel's row (the ticket's list has them all). */
async function queueReady(shopId: string, ticketId: string, actorId: string | null): Promise<Notice> {
  const message = await readyMessage(shopId, ticketId);
  const sends = sendsOf(message);
  const rows = await db.transaction(async (tx) => {
    const queued = await tx
      .insert(notices)
      .values(sends.map((send) => rowOf(shopId, ticketId, 'ready', message, send, 1, actorId)))
      .onConflictDoNothing()
      .returning();
    if (queued.length < sends.length)
      throw new ServiceError(409, 'The ready notice of this ticket is already on record: send it again if the customer needs it.');
    await audit(tx, shopId, actorId, 'notice.queued', ticketId, { kind: 'ready', automatic: actorId === null, channels: sends.map((x) => x.channel) });
    return queued;
  });
  return deliverAll(rows);
}

async function deliverAll(rows: Notice[]): Promise<Notice> {
  const done: Notice[] = [];
  for (const row of rows) done.push(await attemptDelivery(row));
  return done[0]!;
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
  const sends = sendsOf(message);
  const rows = await db.transaction(async (tx) => {
    const [last] = await tx
      .select()
      .from(notices)
      .where(and(eq(notices.shopId, actor.shopId), eq(notices.ticketId, ticketId), eq(notices.kind, 'ready')))
      .orderBy(desc(notices.sequence))
      .limit(1);
    if (!last) throw new ServiceError(409, 'The ready notice has not been sent yet: send it first.');
    // Every channel of the last send must have gone (a failed one is retried instead).
    const lastRows = await tx
      .select()
      .from(notices)
      .where(and(eq(notices.shopId, actor.shopId), eq(notices.ticketId, ticketId), eq(notices.kind, 'ready'), eq(notices.sequence, last.sequence)));
    if (lastRows.some((r) => r.status !== 'sent')) throw new ServiceError(409, 'The last ready notice is not delivered yet: retry that one instead.');
    // Two re-sends at once both ask for the next number: the unique index lets one through.
    const queued = await tx
      .insert(notices)
      .values(sends.map((send) => rowOf(actor.shopId, ticketId, 'ready', message, send, last.sequence + 1, actor.userId)))
      .onConflictDoNothing()
      .returning();
    if (queued.length < sends.length) throw new ServiceError(409, 'The ready notice is being sent again already.');
    await audit(tx, actor.shopId, actor.userId, 'notice.resent', ticketId, {
      kind: 'ready',
      noticeId: queued[0]!.id,
      sequence: queued[0]!.sequence,
      previousId: last.id,
      channels: sends.map((x) => x.channel),
    });
    return queued;
  });
  return deliverAll(rows);
}

/** The open pay link's message: the amount and the link, as an e-mail and as a text. */
async function payLinkMessage(shopId: string, ticketId: string): Promise<Message> {
  const settings = await counterSettingsOf(shopId);
  const summary = await summaryOf(await shopTicket({ shopId }, ticketId), settings);
  if (!(summary.link?.status === 'open' && summary.link.amountMinor === summary.due && summary.due > 0)) {
    throw new ServiceError(409, 'There is no open pay link for the balance: make one first.');
  }
  const [shop] = await db.select({ name: organization.name }).from(organization).where(eq(organization.id, shopId));
  const { t, money } = await shopWords(shopId);
  const number = ticketLabel(summary.ticket.number, shop?.name ?? '');
  const amount = money(summary.due, summary.currency);
  const body = [
    hello(t, summary.ticket.customerName),
    '',
    t('notice.pay.line', { amount, number, shop: shop?.name ?? t('notice.theShop') }),
    summary.link.url,
    '',
    t('notice.pay.counter'),
  ].join('\n');
  const text = t('notice.pay.text', { shop: shop?.name ?? t('notice.TheShop'), amount, number, url: summary.link.url });
  return { ...recipientOf(summary.ticket), subject: t('notice.pay.subject', { number }), body, text };
}

/** Sends the ticket's open pay link to the customer by the channel the counter chose (a new
 * numbered notice of kind pay-link, with its own delivery state); 422 when that channel cannot
 * reach the customer, saying why. */
export async function sendPayLink(actor: Actor, ticketId: string, channel: Channel): Promise<Notice> {
  await shopTicket(actor, ticketId);
  const message = await payLinkMessage(actor.shopId, ticketId);
  let to: string | null;
  if (channel === 'sms') {
    if (!smsConfigured()) throw new ServiceError(422, 'Text messages are not set up for this shop: send the link by e-mail instead.');
    to = message.phone?.trim() || null;
    if (!to) throw new ServiceError(422, 'Not sent by text: no phone number. Add one, or send it by e-mail.');
  } else {
    to = message.to?.trim() || null;
    if (!to) throw new ServiceError(422, 'The customer has no e-mail address: add one, or send the link by text.');
  }
  const send: PlannedSend = { channel, to, note: null };
  const row = await db.transaction(async (tx) => {
    const [last] = await tx
      .select({ sequence: notices.sequence })
      .from(notices)
      .where(and(eq(notices.shopId, actor.shopId), eq(notices.ticketId, ticketId), eq(notices.kind, 'pay-link'), eq(notices.channel, channel)))
      .orderBy(desc(notices.sequence))
      .limit(1);
    const [queued] = await tx
      .insert(notices)
      .values(rowOf(actor.shopId, ticketId, 'pay-link', message, send, (last?.sequence ?? 0) + 1, actor.userId))
      .onConflictDoNothing()
      .returning();
    if (!queued) throw new ServiceError(409, 'The pay link is being sent already.');
    await audit(tx, actor.shopId, actor.userId, 'notice.queued', ticketId, { kind: 'pay-link', channel, noticeId: queued.id });
    return queued;
  });
  return attemptDelivery(row);
}

const REPORTS: Record<string, (typeof DELIVERY_REPORTS)[number]> = { delivered: 'delivered', undelivered: 'undelivered', failed: 'failed' };

/** Records a text's delivery report from the SMS service's status callback (its signature already
 * checked): only on the text notice the callback's address names AND whose text the service says
 * it is, so a report can never land on another notice or another shop's. A report may come before
 * this server has written the service's id down (a fast phone, a slow database): then the id is
 * written with it. Reports other than delivered / undelivered / failed (queued, sent) change
 * nothing. Returns whether a notice changed. */
export async function recordDeliveryReport(noticeId: string, report: { messageSid: string; status: string; errorCode?: string | null }): Promise<boolean> {
  const delivery = REPORTS[report.status];
  if (!delivery || !isUuid(noticeId) || !report.messageSid) return false;
  const [row] = await db
    .update(notices)
    .set({
      providerId: report.messageSid,
      delivery,
      deliveryError: delivery === 'delivered' ? null : report.errorCode ? `error ${report.errorCode}`.slice(0, 100) : null,
      deliveryAt: new Date(),
    })
    .where(and(eq(notices.id, noticeId), eq(notices.channel, 'sms'), or(eq(notices.providerId, report.messageSid), isNull(notices.providerId))))
    .returning({ id: notices.id });
  return Boolean(row);
}

/** Tries a failed notice again by hand, whatever its count of attempts. */
export async function retryNotice(actor: Actor, ticketId: string, noticeId: string): Promise<Notice> {
  await shopTicket(actor, ticketId);
  const [row] = isUuid(noticeId)
    ? await db
        .select()
        .from(notices)
        .where(and(eq(notices.id, noticeId), eq(notices.ticketId, ticketId), eq(notices.shopId, actor.shopId)))
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
  const due = await db
    .select()
    .from(notices)
    .where(and(ne(notices.status, 'sent'), lte(notices.nextAttemptAt, now)));
  for (const n of due) await attemptDelivery(n, now);
  return due.length;
}

/** Queues the automatic ready notice of one ticket when its shop wants it and every garment is ready. */
export async function autoReadyNotice(shopId: string, ticketId: string): Promise<Notice | null> {
  const settings = await counterSettingsOf(shopId);
  if (!settings.autoReadyNotice) return null;
  const [ticket] = await db
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, shopId)));
  if (!ticket) return null;
  const steps = await db.select({ status: garments.status }).from(garments).where(eq(garments.ticketId, ticketId));
  const ready = steps.length > 0 ? steps.every((g) => g.status === 'ready') : ticket.status === 'ready';
  if (!ready) return null;
  const [already] = await db
    .select({ id: notices.id })
    .from(notices)
    .where(and(eq(notices.ticketId, ticketId), eq(notices.kind, 'ready')));
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
        // Reachable by what they prefer: the shop's texts (and any fallback) are decided in queueReady.
        or(ne(sql`coalesce(${customers.email}, '')`, ''), and(ne(sql`coalesce(${customers.phone}, '')`, ''), ne(customers.contactBy, 'email'))),
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
