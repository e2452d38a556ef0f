// The client address the limits count: the TCP peer unless proxies are trusted, then the entry the
// nearest trusted proxy wrote (never the left-most, which the client itself may have sent).
import { describe, expect, it } from 'vitest';
import { addressKey, clientAddressOf } from '@/lib/server/client-address';

describe('client address', () => {
  it('is the peer when no proxy is trusted, whatever X-Forwarded-For says', () => {
    expect(clientAddressOf('192.0.2.7', '203.0.113.1', 0)).toBe('192.0.2.7');
  });

  it('behind one trusted proxy is the right-most X-Forwarded-For entry, not a forged left-most one', () => {
    expect(clientAddressOf('127.0.0.1', '203.0.113.1, 198.51.100.20', 1)).toBe('198.51.100.20');
    expect(clientAddressOf('127.0.0.1', '203.0.113.1, 198.51.100.20, 10.0.0.2', 2)).toBe('198.51.100.20');
  });

  it('falls back to the furthest known address when the header is shorter than the hops', () => {
    expect(clientAddressOf('127.0.0.1', null, 1)).toBe('127.0.0.1');
    expect(clientAddressOf('127.0.0.1', '198.51.100.20', 3)).toBe('198.51.100.20');
  });

  it('counts an IPv6 client by its /64 and an IPv4-mapped one as IPv4', () => {
    expect(addressKey('2001:db8:0:12:aaaa::1')).toBe('2001:db8:0:12::/64');
    expect(addressKey('2001:DB8:0:12:bbbb:cccc:dddd:eeee')).toBe('2001:db8:0:12::/64');
    expect(addressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
    expect(addressKey('::ffff:192.0.2.9')).toBe('192.0.2.9');
    expect(addressKey('::1')).toBe('0:0:0:0::/64');
  });
});
