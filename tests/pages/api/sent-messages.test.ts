// Without the local mail capture the sent-messages route does not exist: 404 for everyone,
// even the lead, and before any sign-in check.
import type { APIContext } from 'astro';
import { describe, expect, it, vi } from 'vitest';

vi.mock('astro:env/server', () => ({ MAIL_CAPTURE_DIR: undefined }));
vi.mock('@/services/sent-mail', () => ({ listSentMail: vi.fn(async () => []) }));

const { GET } = await import('@/pages/api/sent-messages');

const lead = { user: { id: 'u', name: 'Lead', email: 'l@example.com' }, member: { id: 'm', role: 'lead', shopId: 's', shopName: 'S' } };

describe('GET /api/sent-messages without the local capture', () => {
  it('answers 404 to the lead and to a signed-out caller', async () => {
    for (const locals of [lead, { user: null, member: null }]) {
      const res = await GET({ locals } as unknown as APIContext);
      expect(res.status).toBe(404);
      expect(typeof (await res.json()).error).toBe('string');
    }
  });
});
