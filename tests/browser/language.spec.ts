// Issue 13: a shop working in French. The lead switches the shop to Français in the bench settings;
// the garment page, the fitting form and the printed cut sheet then speak French (A4 for this
// metric shop), while the lengths stay as the tailor writes them. The public calculator follows the
// visitor's browser (Accept-Language) or its language switch, and prints its sheet in that language.
// Works in a shop of its own, made through sign-up, so no other story sees French.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';

const browser = sharedBrowser();
const dir = mkdtempSync(join(tmpdir(), 'cuffwright-language-'));

/** The text of a PDF (all pages, spaces collapsed) and its paper, read back with poppler. */
function pdfText(bytes: Buffer): { text: string; info: string } {
  const file = join(dir, `s-${Date.now()}-${Math.random().toString(36).slice(2)}.pdf`);
  writeFileSync(file, bytes);
  return {
    text: spawnSync('pdftotext', [file, '-'], { encoding: 'utf8' }).stdout.replace(/\s+/g, ' '),
    info: spawnSync('pdfinfo', [file], { encoding: 'utf8' }).stdout,
  };
}

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });

describe('a shop switched to French', () => {
  it('sees French on the garment page and the fitting form, and prints the cut sheet in French on A4', async () => {
    const page = await tabletPage(browser());
    const headers = { origin: inject('baseURL') };
    const email = `francais-${Date.now().toString(36)}@example.com`;
    const shop = await page.request.post('/api/shops', {
      headers,
      data: { shopName: 'Retouches Bellevue', name: 'Odile Bellevue', email, password: 'a-long-password' },
    });
    expect(shop.status()).toBe(201);

    // The lead chooses millimetres and Français on the settings screen.
    await page.goto('/bench-settings');
    await ready(page);
    await page.locator('label', { has: page.getByRole('radio', { name: 'Millimetres', exact: true }) }).click();
    await page.locator('label', { has: page.getByRole('radio', { name: 'Français', exact: true }) }).click();
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByText('Saved.').waitFor();

    const ticket = await page.request.post('/api/tickets', {
      headers,
      data: { customer: { name: 'Aurèle Fontange' }, garments: [{ description: 'Pantalon en flanelle grise', dueOn: '2026-12-18' }] },
    });
    expect(ticket.status()).toBe(201);
    const detail = await (await page.request.get(`/api/tickets/${(await ticket.json()).id}`)).json();
    const id = detail.garments[0].id as string;

    await page.goto(`/garments/${id}`);
    await ready(page);
    expect(await page.locator('html').getAttribute('lang')).toBe('fr');
    await page.getByText('Confié à').waitFor();
    expect(await page.getByTestId('garment-step').textContent()).toBe('Reçu');
    await field(page, 'Épingle arrière (longueur finie)').fill('780');
    await field(page, 'Hauteur du revers').fill('40');
    await field(page, 'Tissu sous le repère').fill('150');
    // The plan beside the form, worked out as typed: 40 + 40 + 40 = 120 mm below the mark (plain arithmetic).
    await expect
      .poll(
        () =>
          page
            .getByTestId('summary-cut')
            .textContent()
            .catch(() => null),
        { timeout: 10_000 },
      )
      .toBe('120 mm');
    expect(await page.getByTestId('plan-summary').innerText()).toContain('sous le repère');
    // The right leg as the left: both legs are on the sheet.
    await page.locator('label', { has: page.getByRole('radio', { name: 'Jambe droite', exact: true }) }).click();
    await page.getByRole('button', { name: 'Comme la jambe gauche' }).click();
    await page.getByRole('button', { name: 'Enregistrer les mesures' }).click();
    await page.getByText('Les deux jambes sont enregistrées.').waitFor();

    const answer = page.waitForResponse((r) => new URL(r.url()).pathname === `/api/garments/${id}/sheet`);
    await page.getByRole('button', { name: 'Imprimer la fiche de coupe' }).click();
    const r = await answer;
    expect(r.status()).toBe(200);
    expect(new URL(r.url()).searchParams.get('page')).toBe('A4');
    // The same sheet again for its bytes (the page turned its answer into a blob for the new tab).
    const { text, info } = pdfText(await (await page.request.get(r.url())).body());
    // (No word with ’ here: a sheet drawn after others reads its ’ back as a space, tests/lib/cut-sheet/to-unicode.test.ts.)
    for (const words of [
      'FICHE DE COUPE',
      'Toutes les longueurs en millimètres',
      'Revers, 40 mm de haut',
      'Pli intérieur',
      'Tissu : il faut 120 mm sous le repère, il y a 150 mm, reste 30 mm.',
      'DANS CET ORDRE',
      'ATTENTION AUX MAINS',
      'ven. 18 déc.',
    ]) {
      expect(text).toContain(words);
    }
    expect(text).not.toContain('CUT SHEET');
    expect(info).toMatch(/Page size:\s+595\.\d* x 841\.\d* pts \(A4\)/);
    await page.context().close();
  });
});

describe('the public calculator in French', () => {
  it('says the engine’s refusals and its own checks in French, beside the field', async () => {
    const context = await browser().newContext({
      baseURL: inject('baseURL'),
      viewport: { width: 1180, height: 820 },
      extraHTTPHeaders: { 'accept-language': 'fr-FR,fr;q=0.9' },
    });
    const page = await context.newPage();
    await page.goto('/');
    await ready(page);
    // A cuff of 0: the engine refuses it (not-positive); the server's English stays in its JSON.
    const refused = page.waitForResponse((r) => new URL(r.url()).pathname === '/api/plan' && r.status() === 422);
    await field(page, 'Hauteur du revers').fill('0');
    expect((await (await refused).json()).issues.cuffDepth).toBe('Cuff depth must be more than 0.');
    await page.getByText('Hauteur du revers : doit être supérieur à 0.').first().waitFor({ timeout: 10_000 });
    // Too long to be a length: the page's own check, before anything is sent.
    await field(page, 'Hauteur du revers').fill('1'.repeat(41));
    await page.getByText('Hauteur du revers : trop long ; tapez une longueur comme 1 1/2.').first().waitFor({ timeout: 10_000 });
    expect(await page.getByText(/must be|too long/).count()).toBe(0);
    await context.close();
  });

  it('follows the browser’s Accept-Language, prints its sheet in French, and switches back to English', async () => {
    const context = await browser().newContext({
      baseURL: inject('baseURL'),
      viewport: { width: 1180, height: 820 },
      extraHTTPHeaders: { 'accept-language': 'fr-FR,fr;q=0.9,en;q=0.5' },
    });
    const page = await context.newPage();
    await page.goto('/');
    await ready(page);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe('Calculateur d’ourlets et de revers');
    await field(page, 'Hauteur du revers').fill('1 1/2');
    await page.getByRole('heading', { name: 'Couper à la ligne 4' }).waitFor({ timeout: 10_000 });
    // 1 1/2 in three times is 4 1/2 in; 4 in of cloth is 1/2 in short (plain arithmetic).
    await field(page, 'Tissu sous le repère').fill('4');
    await page.getByTestId('no-fit').waitFor({ timeout: 10_000 });
    expect(await page.getByTestId('no-fit').innerText()).toContain('Ne tient pas : ne coupez pas. Il manque 1/2 in.');
    expect(await page.getByTestId('what-fits').innerText()).toContain('Un ourlet simple demande 1 1/2 in : tient.');

    const answer = page.waitForResponse((r) => new URL(r.url()).pathname === '/api/plan/sheet');
    await page.getByRole('button', { name: 'Imprimer la fiche de coupe' }).click();
    const r = await answer;
    expect(r.status()).toBe(200);
    const asked = r.request().postDataJSON();
    expect(asked).toMatchObject({ language: 'fr', pageSize: 'LETTER' });
    // The same request again for its bytes (the page turned its answer into a blob for the new tab).
    const again = await page.request.post('/api/plan/sheet', { data: asked, headers: { origin: inject('baseURL') } });
    expect(again.status()).toBe(200);
    const { text } = pdfText(await again.body());
    expect(text).toContain('Plan non enregistré du calculateur');
    expect(text).toContain('PAS ASSEZ DE TISSU : ne coupez pas.');

    await page.getByRole('link', { name: 'English' }).click();
    await page.waitForURL((u) => u.search === '?lang=en');
    await ready(page);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe('Hem and cuff calculator');
    await field(page, 'Cuff depth').waitFor();
    await context.close();
  });
});
