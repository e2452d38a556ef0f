// The invitation e-mail from the catalog: English as it was written before (word for word), French
// for a French shop.
import { describe, expect, it } from 'vitest';
import { translator } from '@/lib/server/i18n/catalog';
import { invitationMail } from '@/lib/server/invitation-mail';

const invite = { id: 'inv-1', role: 'apprentice', shopName: 'Hemline Hall', inviterName: 'Maud Ferrand' };

describe('the invitation e-mail', () => {
  it('reads in English as before', () => {
    expect(invitationMail(translator('en'), 'http://localhost:4321', invite)).toEqual({
      subject: 'Maud Ferrand invited you to Hemline Hall on Cuffwright',
      text:
        'Maud Ferrand invited you to join Hemline Hall on Cuffwright as apprentice.\n\n' +
        'Open this link to accept and choose your password:\n\nhttp://localhost:4321/invite/inv-1\n',
    });
  });

  it('reads in French for a French shop, the role in French', () => {
    const m = invitationMail(translator('fr'), 'http://localhost:4321', invite);
    expect(m.subject).toBe('Maud Ferrand vous invite chez Hemline Hall sur Cuffwright');
    expect(m.text).toContain('comme apprenti.');
    expect(m.text).toContain('http://localhost:4321/invite/inv-1');
  });
});
