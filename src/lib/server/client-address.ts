// The client's address for the limits. Astro's clientAddress is the TCP peer (patches/astro+*.patch:
// Astro itself would take any X-Forwarded-For a client sends). Behind reverse proxies that append
// to X-Forwarded-For, TRUSTED_PROXY_HOPS says how many of its right-hand entries they wrote.
import { isIPv6 } from 'node:net';
import { TRUSTED_PROXY_HOPS } from 'astro:env/server';

/** An IPv6 address cut to its /64 (one customer's network), an IPv4-mapped one as plain IPv4. */
export function addressKey(address: string): string {
  const a = address.trim().toLowerCase().slice(0, 100);
  const mapped = a.match(/^::ffff:(\d+\.\d+\.\d+\.\d+)$/);
  if (mapped) return mapped[1]!;
  if (!isIPv6(a)) return a;
  const [head = '', tail = ''] = a.split('::');
  const left = head ? head.split(':') : [];
  const right = tail ? tail.split(':') : [];
  const groups = a.includes('::') ? [...left, ...Array(8 - left.length - right.length).fill('0'), ...right] : left;
  return `${groups
    .slice(0, 4)
    .map((g) => g.replace(/^0+(?=.)/, ''))
    .join(':')}::/64`;
}

/** The address `hops` entries back: the peer itself with 0, else from the right of X-Forwarded-For. */
export function clientAddressOf(peer: string, forwardedFor: string | null, hops: number): string {
  const chain = [
    peer,
    ...(forwardedFor ?? '')
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean)
      .reverse(),
  ];
  return addressKey(chain[Math.min(hops, chain.length - 1)]!);
}

/** The client address of an Astro request, as the limits count it. */
export function clientOf(context: { request: Request; clientAddress: string }): string {
  let peer = 'unknown';
  try {
    peer = context.clientAddress || peer;
  } catch {
    /* the adapter knows no address (a closed socket): all such requests share one count */
  }
  return clientAddressOf(peer, context.request.headers.get('x-forwarded-for'), TRUSTED_PROXY_HOPS);
}
