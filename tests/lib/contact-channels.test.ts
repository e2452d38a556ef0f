// Issue 14: which channels a notice goes by, from the customer's preference, what is on file and
// whether the shop's texts are set up; the counter is told why a channel could not be used.
import { describe, expect, it } from 'vitest';
import { plannedSends } from '@/lib/shared/contact-channels';

const full = { email: 'wren@example.com', phone: '07700 900100' };

describe('plannedSends', () => {
  it('follows the preference when everything is there', () => {
    expect(plannedSends({ ...full, contactBy: 'email' }, true)).toEqual({ sends: [{ channel: 'email', to: full.email, note: null }], refused: null });
    expect(plannedSends({ ...full, contactBy: 'text' }, true)).toEqual({ sends: [{ channel: 'sms', to: full.phone, note: null }], refused: null });
    expect(plannedSends({ ...full, contactBy: 'both' }, true).sends.map((s) => s.channel)).toEqual(['sms', 'email']);
  });

  it('falls back to e-mail, saying why, when texts are not set up or there is no phone', () => {
    expect(plannedSends({ ...full, contactBy: 'text' }, false).sends).toEqual([
      { channel: 'email', to: full.email, note: 'Text messages are not set up for this shop: sent by e-mail instead.' },
    ]);
    expect(plannedSends({ ...full, phone: '  ', contactBy: 'text' }, true).sends).toEqual([
      { channel: 'email', to: full.email, note: 'Not sent by text: no phone number: sent by e-mail instead.' },
    ]);
    expect(plannedSends({ ...full, contactBy: 'both' }, false).sends).toEqual([
      { channel: 'email', to: full.email, note: 'Text messages are not set up for this shop.' },
    ]);
  });

  it('refuses with the reason when no channel can reach the customer', () => {
    expect(plannedSends({ email: null, phone: full.phone, contactBy: 'email' }, true)).toEqual({
      sends: [],
      refused: 'The customer has no e-mail address: add one, or call them.',
    });
    expect(plannedSends({ email: null, phone: null, contactBy: 'text' }, true).refused).toBe(
      'Not sent by text: no phone number, and the customer has no e-mail address: add one, or call them.',
    );
    expect(plannedSends({ email: '', phone: full.phone, contactBy: 'both' }, false).refused).toBe(
      'Text messages are not set up for this shop, and the customer has no e-mail address: add one, or call them.',
    );
  });

  it('sends a text to a customer who wants both but has no e-mail', () => {
    expect(plannedSends({ email: null, phone: full.phone, contactBy: 'both' }, true)).toEqual({
      sends: [{ channel: 'sms', to: full.phone, note: null }],
      refused: null,
    });
  });
});
