// One JSON line per request (pino) when REQUEST_LOG=json: time, method, route pattern, status,
// milliseconds and the shop, never the path's ids, the query or a body. Off by default (npm start,
// tests); `npm run serve` turns it on.
import { REQUEST_LOG } from 'astro:env/server';

// pino is loaded only when the log is on (npm start leaves it off and need not pay its modules).
const pino = REQUEST_LOG === 'json' ? (await import('pino')).default : null;
const logger = pino ? pino({ base: { app: 'cuffwright' }, timestamp: pino.stdTimeFunctions.isoTime }) : null;

/** What one request line holds. */
export interface RequestLine {
  method: string;
  route: string;
  status: number;
  ms: number;
  shop: string | null;
}

/** Logs one finished request (a no-op unless REQUEST_LOG=json). */
export function logRequest(line: RequestLine): void {
  logger?.info({ ...line, ms: Math.round(line.ms * 10) / 10 }, 'request');
}

/** Logs a server error with its request's route (a no-op unless REQUEST_LOG=json). */
export function logError(route: string, error: unknown): void {
  logger?.error({ route, err: error }, 'request failed');
}
