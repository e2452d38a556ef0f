// A shop's sent messages show only the mail that shop sent: typing someone's address in (as a
// customer or an invitee) must not let a shop read that person's password reset, another shop's
// invitation, or another shop's ready notice and pay link. Each case plays the attack end to end.
import { beforeAll, describe, expect, it } from 'vitest';
import { call, cookieFrom, DEMO, freshEmail, newShop, signIn } from './client';
import { firstLink, waitForMail } from './mail';

const SENT = '/api/sent-messages';

interface Sent {
  to: string | string[];
  subject: string;
  text: string | null;
}

async function sentBy(cookie: string): Promise<Sent[]> {
  const r = await call('GET', SENT, { cookie });
  expect(r.status).toBe(200);
  return r.body as Sent[];
}

const to = (m: Sent, email: string) => (Array.isArray(m.to) ? m.to : [m.to]).some((t) => t.toLowerCase() === email.toLowerCase());

/** Follows a password-reset link as a browser would and sets a new password with its token. */
async function resetThrough(link: string, password: string): Promise<number> {
  const url = new URL(link);
  const hop = await call('GET', url.pathname + url.search);
  const token = new URL(hop.headers.get('location') ?? '/', url).searchParams.get('token');
  return (await call('POST', '/api/auth/reset-password', { body: { newPassword: password, token } })).status;
}

async function addCustomer(cookie: string, email: string) {
  const r = await call('POST', '/api/customers', { cookie, body: { name: 'Typed-in Person', email } });
  expect(r.status).toBe(201);
}

describe("a shop's sent messages", () => {
  it("do not show another shop's lead their password reset (account takeover through a customer's address)", async () => {
    const victim = await newShop('Victim Hems');
    const attacker = await newShop('Attacker Hems');
    await addCustomer(attacker.cookie, victim.email);
    expect((await call('POST', '/api/auth/request-password-reset', { body: { email: victim.email, redirectTo: '/reset' } })).status).toBe(200);
    // The mail really went out (the test reads the capture; the attacker cannot).
    expect((await waitForMail(victim.email)).subject).toMatch(/Reset your Cuffwright password/);
    const leaked = (await sentBy(attacker.cookie)).find((m) => to(m, victim.email));
    // The attack as it ran: a reset link in the attacker's list sets the victim's password.
    if (leaked?.text) await resetThrough(firstLink(leaked as { text: string; subject: string; to: string[] }), 'taken-over-password');
    expect((await call('POST', '/api/auth/sign-in/email', { body: { email: victim.email, password: 'taken-over-password' } })).status).toBe(401);
    expect(leaked).toBeUndefined();
    expect(await signIn(victim.email, 'a-long-password')).toContain('better-auth.session_token=');
    // Nor does the victim's own shop list it: account mail belongs to no shop.
    expect((await sentBy(victim.cookie)).some((m) => to(m, victim.email))).toBe(false);
  });

  it('do not show a password reset to the shop that invited that address', async () => {
    const victim = await newShop('Invited Victim Hems');
    const attacker = await newShop('Inviting Attacker Hems');
    expect((await call('POST', '/api/staff', { cookie: attacker.cookie, body: { email: victim.email, role: 'apprentice' } })).status).toBe(201);
    await waitForMail(victim.email);
    expect((await call('POST', '/api/auth/request-password-reset', { body: { email: victim.email, redirectTo: '/reset' } })).status).toBe(200);
    const mine = await sentBy(attacker.cookie);
    // The attacker's own invitation is theirs to see; the reset is not.
    expect(mine.filter((m) => to(m, victim.email)).map((m) => m.subject)).toEqual([expect.stringContaining('Inviting Attacker Hems')]);
    expect(mine.some((m) => /reset/i.test(m.subject))).toBe(false);
  });

  it("do not show another shop's invitation of a new lead to a shop that typed the invitee in", async () => {
    const victim = await newShop('Growing Hems');
    const attacker = await newShop('Reading Hems');
    const invitee = freshEmail('new-lead');
    expect((await call('POST', '/api/staff', { cookie: victim.cookie, body: { email: invitee, role: 'lead' } })).status).toBe(201);
    await addCustomer(attacker.cookie, invitee);
    await waitForMail(invitee);
    const leaked = (await sentBy(attacker.cookie)).find((m) => to(m, invitee));
    if (leaked?.text) {
      // The attack as it ran: the link joins the victim's shop as its lead.
      const id = new URL(firstLink(leaked as { text: string; subject: string; to: string[] })).pathname.split('/').pop();
      const joined = await call('POST', `/api/invitations/${id}/accept`, { body: { name: 'Intruder', password: 'a-long-password' } });
      const me = await call('GET', '/api/me', { cookie: cookieFrom(joined.headers) });
      expect(me.body?.shop?.id).not.toBe(victim.shopId);
    }
    expect(leaked).toBeUndefined();
    // The shop that invited sees its own invitation.
    expect((await sentBy(victim.cookie)).some((m) => to(m, invitee) && m.subject.includes('Growing Hems'))).toBe(true);
  });

  describe('with a customer two shops share', () => {
    let lead = '';
    let counter = '';
    beforeAll(async () => {
      lead = await signIn(DEMO.lead);
      counter = await signIn(DEMO.counter);
      // Sent by hand below, after the pay link is made, so the notice carries it.
      const list = await call('GET', '/api/prices', { cookie: lead });
      expect((await call('PUT', '/api/prices', { cookie: lead, body: { ...list.body, autoReadyNotice: false } })).status).toBe(200);
    });

    it("do not show one shop's ready notice and pay link to the other", async () => {
      const shared = freshEmail('shared-customer');
      const c = await call('POST', '/api/customers', { cookie: counter, body: { name: 'Shared Customer', email: shared } });
      const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Olive chinos' }] } });
      expect(t.status).toBe(201);
      expect((await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: counter, body: { source: 'list', key: 'cuff-from-hem' } })).status).toBe(
        201,
      );
      for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
        expect((await call('PATCH', `/api/tickets/${t.body.id}`, { cookie: lead, body: { status } })).status).toBe(200);
      }
      const link = await call('POST', `/api/tickets/${t.body.id}/payments/link`, { cookie: counter });
      expect(link.status).toBe(201);
      const payUrl: string = link.body.link.url;
      expect((await call('POST', `/api/tickets/${t.body.id}/notices`, { cookie: counter, body: { kind: 'ready' } })).status).toBe(201);
      expect((await waitForMail(shared)).text).toContain(payUrl);

      const other = await newShop('Sharing Hems');
      await addCustomer(other.cookie, shared);
      const theirs = await sentBy(other.cookie);
      expect(theirs.some((m) => to(m, shared))).toBe(false);
      expect(JSON.stringify(theirs)).not.toContain(payUrl);
      // The shop that sent it still finds it.
      expect((await sentBy(lead)).some((m) => to(m, shared) && /^Ready to collect/.test(m.subject))).toBe(true);
    });
  });
});
