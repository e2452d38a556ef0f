// E-mail through SMTP to the local capture: invitations and password reset, end to end over HTTP.
import { describe, expect, it } from 'vitest';
import { call, cookieFrom, DEMO, freshEmail, newShop, signIn } from './client';
import { firstLink, waitForMail, waitForMailWith } from './mail';

describe('invitation by e-mail', () => {
  it('reaches the invitee, and its link lets them join with the invited role', async () => {
    const lead = await signIn(DEMO.lead);
    const email = freshEmail('mailed-tailor');
    expect((await call('POST', '/api/staff', { cookie: lead, body: { email, role: 'tailor' } })).status).toBe(201);
    const mail = await waitForMail(email);
    expect(mail.subject).toContain('Pinmark & Hem');
    const link = new URL(firstLink(mail));
    expect(link.pathname).toMatch(/^\/invite\/\w+/);
    const page = await call('GET', link.pathname);
    expect(page.status).toBe(200);
    expect(page.body).toContain('Join Pinmark &amp; Hem');
    const id = link.pathname.split('/').pop();
    const joined = await call('POST', `/api/invitations/${id}/accept`, { body: { name: 'Mailed Tailor', password: 'a-long-password' } });
    expect(joined.status).toBe(200);
    const me = await call('GET', '/api/me', { cookie: cookieFrom(joined.headers) });
    expect(me.body).toMatchObject({ email, role: 'tailor', shop: { name: 'Pinmark & Hem' } });
    // The link works once.
    expect((await call('GET', `/api/invitations/${id}`)).status).toBe(404);
    // The lead's sent messages show it, with its text; another shop's lead does not see it.
    const sent = await call('GET', '/api/sent-messages', { cookie: lead });
    expect(sent.body.find((m: { to: string }) => m.to === email)).toMatchObject({ kind: 'invitation', text: expect.stringContaining(link.pathname) });
    const other = await newShop('Sent Messages Other');
    const theirs = await call('GET', '/api/sent-messages', { cookie: other.cookie });
    expect(theirs.body.some((m: { to: string }) => m.to === email)).toBe(false);
  });
});

describe('re-invitation with another role', () => {
  it('sends, stores and answers the new role, and the person joins with it', async () => {
    const lead = await signIn(DEMO.lead);
    const email = freshEmail('re-invited');
    const first = await call('POST', '/api/staff', { cookie: lead, body: { email, role: 'apprentice' } });
    expect(first.body.role).toBe('apprentice');
    const oldLink = new URL(firstLink(await waitForMail(email)));
    const again = await call('POST', '/api/staff', { cookie: lead, body: { email, role: 'tailor' } });
    expect(again.status).toBe(201);
    expect(again.body.role).toBe('tailor');
    const mail = await waitForMailWith(email, (m) => m.text.includes(again.body.id));
    expect(mail.text).toMatch(/as tailor\./);
    const staff = await call('GET', '/api/staff', { cookie: lead });
    expect(staff.body.invitations.filter((i: { email: string }) => i.email === email).map((i: { role: string }) => i.role)).toEqual(['tailor']);
    const link = new URL(firstLink(mail));
    expect((await call('GET', `/api/invitations/${link.pathname.split('/').pop()}`)).body.role).toBe('tailor');
    const joined = await call('POST', `/api/invitations/${link.pathname.split('/').pop()}/accept`, {
      body: { name: 'Re Invited', password: 'a-long-password' },
    });
    expect(joined.status).toBe(200);
    expect((await call('GET', '/api/me', { cookie: cookieFrom(joined.headers) })).body).toMatchObject({ email, role: 'tailor' });
    // The first link, with the old role, no longer opens.
    if (oldLink.pathname !== link.pathname) expect((await call('GET', `/api/invitations/${oldLink.pathname.split('/').pop()}`)).status).toBe(404);
  });
});

describe('password reset by e-mail', () => {
  it('sends a link that sets a new password, which then signs in (and the old one does not)', async () => {
    const shop = await newShop('Reset Hems');
    expect((await call('POST', '/api/auth/request-password-reset', { body: { email: shop.email, redirectTo: '/reset' } })).status).toBe(200);
    const mail = await waitForMail(shop.email);
    expect(mail.subject).toMatch(/Reset your Cuffwright password/);
    const link = new URL(firstLink(mail));
    const hop = await call('GET', link.pathname + link.search);
    expect(hop.status).toBe(302);
    const target = new URL(hop.headers.get('location')!, link);
    expect(target.pathname).toBe('/reset');
    const token = target.searchParams.get('token');
    expect(token).toBeTruthy();
    expect((await call('GET', target.pathname + target.search)).status).toBe(200);
    const reset = await call('POST', '/api/auth/reset-password', { body: { newPassword: 'a-brand-new-password', token } });
    expect(reset.status).toBe(200);
    expect(await signIn(shop.email, 'a-brand-new-password')).toContain('better-auth.session_token=');
    expect((await call('POST', '/api/auth/sign-in/email', { body: { email: shop.email, password: 'a-long-password' } })).status).toBe(401);
    // The token is used up.
    expect((await call('POST', '/api/auth/reset-password', { body: { newPassword: 'yet-another-password', token } })).status).toBe(400);
  });
});
