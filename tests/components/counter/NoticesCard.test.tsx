// The notices card as the counter sees it: a failed send stays listed with its error, its next
// automatic try (or that none is left) and a retry button; a sent one shows when and how.
import { describe, expect, it } from 'vitest';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { renderToStaticMarkup } from 'react-dom/server';
import { NoticesCard } from '@/components/counter/NoticesCard';
// What the island receives: JSON, dates as strings.
import type { CounterSummaryJson as CounterSummary, NoticeJson as Notice } from '@/lib/shared/counter-views';

const TICKET = '00000000-0000-4000-8000-000000000001';

const summary = {
  ticket: {
    id: TICKET,
    number: 1042,
    status: 'ready',
    dueOn: null,
    customerId: null,
    customerName: 'Wendel Orrin',
    customerEmail: 'wendel@example.com',
    customerPhone: '07700 900100',
    contactBy: 'email',
  },
  textsReady: true,
  currency: 'EUR',
  lines: [],
  total: 2400,
  paid: 0,
  refunded: 0,
  due: 2400,
  credit: 0,
  payments: [],
  refunds: [],
  customerCredit: 0,
  link: null,
} as CounterSummary;

function notice(over: Partial<Notice>): Notice {
  return {
    id: 'n1',
    shopId: 's',
    ticketId: TICKET,
    kind: 'ready',
    to: 'wendel@example.com',
    subject: 'Ready',
    body: '',
    status: 'sent',
    attempts: 1,
    lastError: null,
    nextAttemptAt: null,
    sentAt: '2026-12-01T10:00:00Z',
    createdById: 'u',
    sequence: 1,
    createdAt: '2026-12-01T10:00:00Z',
    channel: 'email',
    note: null,
    providerId: null,
    delivery: null,
    deliveryError: null,
    deliveryAt: null,
    ...over,
  };
}

function render(notices: Notice[], canSend = true, s: CounterSummary = summary): string {
  const client = new QueryClient();
  client.setQueryData(['notices', TICKET], notices);
  return renderToStaticMarkup(
    <QueryClientProvider client={client}>
      <NoticesCard s={s} canSend={canSend} />
    </QueryClientProvider>,
  );
}

describe('NoticesCard', () => {
  it('shows a failed notice with its error, next try and a retry button', () => {
    const html = render([
      notice({ status: 'failed', attempts: 2, sentAt: null, lastError: 'connect ECONNREFUSED 127.0.0.1:2525', nextAttemptAt: '2026-12-01T10:02:00Z' }),
    ]);
    expect(html).toContain('Ready notice by e-mail to wendel@example.com: Not delivered');
    expect(html).toContain('2 attempts');
    expect(html).toContain('Last error: connect ECONNREFUSED 127.0.0.1:2525');
    expect(html).toContain('Next automatic try:');
    expect(html).toContain('Retry now');
  });

  it('says when the automatic tries are used up, and hides retry from those who may not send', () => {
    const html = render([notice({ status: 'failed', attempts: 5, sentAt: null, lastError: 'timeout', nextAttemptAt: null })], false);
    expect(html).toContain('No more automatic tries: retry by hand.');
    expect(html).not.toContain('Retry now');
  });

  it('marks a notice the shop setting sent, and offers to send it again rather than a first one', () => {
    const html = render([notice({ createdById: null })]);
    expect(html).toContain('Sent');
    expect(html).toContain('sent by the shop setting');
    expect(html).not.toContain('>Send the ready notice<');
    expect(html).toContain('Send the ready notice again');
  });

  it('numbers a re-send, and offers no re-send while the last one is undelivered or to those who may not send (issue 14)', () => {
    const html = render([notice({}), notice({ id: 'n2', sequence: 2 })]);
    expect(html).toContain('Ready notice (sent again, 2) by e-mail to wendel@example.com: Sent');
    expect(render([notice({}), notice({ id: 'n2', sequence: 2, status: 'failed', sentAt: null, lastError: 'timeout' })])).not.toContain(
      'Send the ready notice again',
    );
    expect(render([notice({})], false)).not.toContain('Send the ready notice again');
  });

  it('offers the ready notice when none was sent', () => {
    expect(render([])).toContain('Send the ready notice');
  });

  it('shows a text with what the SMS service reported, and a fallback with its reason (issue 14)', () => {
    const html = render([
      notice({ channel: 'sms', to: '07700 900100', delivery: 'failed', deliveryError: 'error 30003', deliveryAt: '2026-12-01T10:01:00Z' }),
      notice({ id: 'n2', kind: 'pay-link', note: 'Text messages are not set up for this shop: sent by e-mail instead.' }),
    ]);
    expect(html).toContain('Ready notice by text to 07700 900100: Sent');
    expect(html).toContain('The SMS service reports: the phone could not be reached (error 30003)');
    expect(html).toContain('Pay link by e-mail to wendel@example.com: Sent');
    expect(html).toContain('Text messages are not set up for this shop: sent by e-mail instead.');
  });

  it('tells the counter before sending how the customer wants it and why it will go otherwise', () => {
    const wantsText = { ...summary, ticket: { ...summary.ticket, contactBy: 'text' as const }, textsReady: false };
    const html = render([], true, wantsText);
    expect(html).toContain('The customer wants notices by text message.');
    expect(html).toContain('Text messages are not set up for this shop: sent by e-mail instead.');
    const nobody = { ...wantsText, ticket: { ...wantsText.ticket, customerEmail: null } };
    expect(render([], true, nobody)).toContain('Text messages are not set up for this shop, and the customer has no e-mail address: add one, or call them.');
  });
});
