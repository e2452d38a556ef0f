// Every page file under src/pages, as an address to open: the header test covers them all, and a
// page file missing here fails it (add its address below; the browser sweep has its own table).
import { readdirSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { call, DEMO, signIn } from './client';

const PAGES_DIR = join(process.cwd(), 'src', 'pages');

/** The page files under src/pages (not the API), as route keys like `tickets/[id]`. */
export function pageFiles(dir = PAGES_DIR): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    if (e.isDirectory()) return e.name === 'api' ? [] : pageFiles(join(dir, e.name));
    if (!e.name.endsWith('.astro')) return [];
    return [
      relative(PAGES_DIR, join(dir, e.name))
        .split(sep)
        .join('/')
        .replace(/\.astro$/, '')
        .replace(/(^|\/)index$/, ''),
    ];
  });
}

/** Ids from the demo shop that the dynamic pages need, fetched as its lead. */
export interface PageIds {
  ticketId: string;
  garmentId: string;
  invitationId: string;
}

/** Signs the demo lead in and finds the ids; the invitation is a fresh one. */
export async function pageIds(lead?: string): Promise<PageIds & { lead: string }> {
  const cookie = lead ?? (await signIn(DEMO.lead));
  const garments = (await call('GET', '/api/garments', { cookie })).body as { id: string; ticketId: string }[];
  const invite = await call('POST', '/api/staff', { cookie, body: { email: `csp-${Date.now().toString(36)}@example.com`, role: 'counter' } });
  return { lead: cookie, ticketId: garments[0]!.ticketId, garmentId: garments[0]!.id, invitationId: invite.body.id };
}

/** Route key → address to open. */
export function pagePaths(ids: PageIds): Record<string, string> {
  return {
    '': '/',
    '404': '/no-such-page',
    'api-reference': '/api-reference',
    bench: '/bench',
    'bench-settings': '/bench-settings',
    'counter/[ticketId]': `/counter/${ids.ticketId}`,
    customers: '/customers',
    forgot: '/forgot',
    'garments/[id]': `/garments/${ids.garmentId}`,
    'invite/[id]': `/invite/${ids.invitationId}`,
    'sent-messages': '/sent-messages',
    overview: '/overview',
    paid: '/paid',
    presets: '/presets',
    prices: '/prices',
    queue: '/queue',
    reset: '/reset?token=not-a-real-token',
    'sign-in': '/sign-in',
    'sign-out': '/sign-out',
    'sign-up': '/sign-up',
    staff: '/staff',
    'tickets/[id]': `/tickets/${ids.ticketId}`,
    'tickets/new': '/tickets/new',
  };
}
