// A loopback proxy in front of the payments fake for service tests: it can hold requests until the
// test releases them (a slow or lost answer), answers a repeated Idempotency-Key with the first
// answer as the hosted service documents (the fake has no idempotency), and logs every API call.
import { createServer } from 'node:http';

/** One API call as the proxy passed it on. */
export interface ProxiedCall {
  method: string;
  path: string;
  idempotencyKey: string | null;
  status: number;
  body: { id?: string; status?: string; [k: string]: unknown };
}

/** Requests held until released; `arrived` resolves when the first one is waiting. */
export interface Gate {
  arrived: Promise<void>;
  /** how many requests have come to the gate */
  count(): number;
  release(): void;
}

/** The proxy: its base URL, the calls it passed on, holding, and closing. */
export interface PaymentsProxy {
  base: string;
  calls: ProxiedCall[];
  hold(method: string, path: RegExp): Gate;
  close(): Promise<void>;
}

/** Starts a proxy on a free loopback port forwarding /v1 calls to the fake at `upstream`. */
export function startPaymentsProxy(upstream: string): Promise<PaymentsProxy> {
  const calls: ProxiedCall[] = [];
  const gates: { method: string; path: RegExp; arrivals: number; arrive: () => void; released: Promise<void>; release: () => void }[] = [];
  const answered = new Map<string, Promise<{ status: number; text: string }>>();

  async function forward(method: string, path: string, headers: Record<string, string>, body: string) {
    const res = await fetch(new URL(path, upstream), { method, headers, body: method === 'GET' ? undefined : body });
    return { status: res.status, text: await res.text() };
  }

  const server = createServer(async (req, res) => {
    let body = '';
    for await (const chunk of req) body += chunk;
    const method = req.method ?? 'GET';
    const path = req.url ?? '/';
    const gate = gates.find((g) => g.method === method && g.path.test(path));
    if (gate) {
      gate.arrivals += 1;
      gate.arrive();
      await gate.released;
    }
    const key = typeof req.headers['idempotency-key'] === 'string' ? req.headers['idempotency-key'] : null;
    const headers = {
      authorization: String(req.headers.authorization ?? ''),
      'content-type': String(req.headers['content-type'] ?? 'application/x-www-form-urlencoded'),
    };
    const cacheKey = key && method === 'POST' ? `${key} ${path}` : null;
    let answer = cacheKey ? answered.get(cacheKey) : undefined;
    if (!answer) {
      answer = forward(method, path, headers, body);
      if (cacheKey) answered.set(cacheKey, answer);
    }
    const { status, text } = await answer;
    let parsed: ProxiedCall['body'] = {};
    try {
      parsed = JSON.parse(text);
    } catch {
      // Not JSON: logged empty.
    }
    calls.push({ method, path, idempotencyKey: key, status, body: parsed });
    // The SDK may have given up (timeout) while the request was held: nobody reads this answer.
    if (!res.destroyed) {
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(text);
    }
  });

  return new Promise((resolve) => {
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      resolve({
        base: `http://127.0.0.1:${port}`,
        calls,
        hold(method, path) {
          let arrive!: () => void;
          let release!: () => void;
          const arrived = new Promise<void>((r) => (arrive = r));
          const released = new Promise<void>((r) => (release = r));
          const gate = { method, path, arrivals: 0, arrive, released, release: () => {} };
          gate.release = () => {
            const at = gates.indexOf(gate);
            if (at >= 0) gates.splice(at, 1);
            release();
          };
          gates.push(gate);
          return { arrived, count: () => gate.arrivals, release: gate.release };
        },
        close: () =>
          new Promise<void>((r) => {
            for (const g of [...gates]) g.release();
            server.closeAllConnections();
            server.close(() => r());
          }),
      });
    });
  });
}
