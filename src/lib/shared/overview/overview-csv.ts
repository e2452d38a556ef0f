// The overview's figures per day as CSV for a spreadsheet: one row a day, then the period's totals.
// Only dates, counts and amounts go in, so no cell can start a formula.
import { CURRENCIES } from '../../pricing/money';
import type { Overview } from './overview-types';

// The ways money comes in (the payments table's methods but 'credit': paying from kept credit
// brings none); kept here, not read from db/, so this module may reach the browser.
const MONEY_IN: readonly string[] = ['cash', 'card', 'online'];

/** The payment methods to give a column: cash, card, online, then any other that took money. */
export function takingMethods(o: Overview): string[] {
  const seen = o.takings.map((t) => t.method).filter((m) => !MONEY_IN.includes(m));
  return [...MONEY_IN, ...seen];
}

/** The CSV text of the overview (header row, a row per day, a totals row; CRLF as RFC 4180 says). */
export function overviewCsv(o: Overview): string {
  const methods = takingMethods(o);
  const digits = CURRENCIES[o.currency];
  const money = (minor: number) => (minor / 10 ** digits).toFixed(digits);
  const header = [
    'date',
    'taken_in',
    'handed_over',
    'due_done',
    'due_open',
    'overdue',
    ...methods.map((m) => `takings_${m}_${o.currency}`),
    `takings_total_${o.currency}`,
  ];
  const row = (label: string, d: Omit<Overview['days'][number], 'day'>) => {
    const amounts = methods.map((m) => d.takings[m] ?? 0);
    return [label, d.takenIn, d.handedOver, d.dueDone, d.dueOpen, d.overdue, ...amounts.map(money), money(amounts.reduce((a, b) => a + b, 0))].join(',');
  };
  const sum = (pick: (d: Overview['days'][number]) => number) => o.days.reduce((s, d) => s + pick(d), 0);
  const totals = {
    takenIn: sum((d) => d.takenIn),
    handedOver: sum((d) => d.handedOver),
    dueDone: sum((d) => d.dueDone),
    dueOpen: sum((d) => d.dueOpen),
    overdue: sum((d) => d.overdue),
    takings: Object.fromEntries(methods.map((m) => [m, sum((d) => d.takings[m] ?? 0)])),
  };
  return `${[header.join(','), ...o.days.map((d) => row(d.day, d)), row('total', totals)].join('\r\n')}\r\n`;
}

/** The download's file name: the shop's period, e.g. cuffwright-overview-2026-11-30-to-2026-12-06.csv. */
export function overviewCsvName(o: Overview): string {
  return `cuffwright-overview-${o.days[0]?.day}-to-${o.days.at(-1)?.day}.csv`;
}
