// A tailor photographs the pinned trousers on the garment page: the photo is uploaded from the
// file picker (the camera input takes the same path), its thumbnail shows, and it can be removed;
// something that is not a photo is refused in words.
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { sampleHeif } from '../lib/storage/heif-sample';
import { ready, sharedBrowser, tabletPage } from './browser';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

async function photo(): Promise<Buffer> {
  // A plain test card: grey field with a darker band where a pin line would be.
  const band = await sharp({ create: { width: 1200, height: 40, channels: 3, background: { r: 40, g: 40, b: 48 } } })
    .png()
    .toBuffer();
  return sharp({ create: { width: 1200, height: 900, channels: 3, background: { r: 150, g: 146, b: 138 } } })
    .composite([{ input: band, top: 600, left: 0 }])
    .jpeg()
    .toBuffer();
}

describe('fitting photos on the garment page', () => {
  it('a tailor adds a photo from the file picker, sees its thumbnail, and removes it', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const queue = (await (await page.request.get('/api/garments')).json()) as { id: string }[];
    await page.goto(`/garments/${queue[queue.length - 1]!.id}`);
    await ready(page);
    const photos = page.getByRole('region', { name: 'Fitting photos' });
    await photos
      .getByText(/No photos of this garment yet|Fitting photo/)
      .first()
      .waitFor();
    const before = await photos.getByRole('img').count();

    // Both ways in are there, labelled; the camera one asks for the back camera.
    await expect(photos.locator('input[type=file][capture=environment]').count()).resolves.toBe(1);
    await photos.getByLabel('Choose photos').setInputFiles({ name: 'left-leg-pinned.jpg', mimeType: 'image/jpeg', buffer: await photo() });
    await photos.getByText('Photo added.').waitFor();
    const img = photos.getByRole('img', { name: 'Fitting photo left-leg-pinned.jpg' });
    await img.waitFor();
    // Thumbnails load lazily: bring it on screen as the tailor would by scrolling.
    await img.scrollIntoViewIfNeeded();
    await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(480);
    expect(await photos.getByRole('img').count()).toBe(before + 1);

    await photos
      .getByLabel('Choose photos')
      .setInputFiles({ name: 'notes.svg', mimeType: 'image/svg+xml', buffer: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>') });
    await photos.getByText('notes.svg is not a photo we take').waitFor();
    await page.screenshot({ path: 'test-results/garment-photos.png', fullPage: true });

    page.once('dialog', (d) => d.accept());
    await photos.getByRole('button', { name: 'Remove: left-leg-pinned.jpg' }).click();
    await img.waitFor({ state: 'detached' });
    await page.context().close();
  });

  it('a HEIC photo from a phone shows a tile saying there is no preview here, not a broken image', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const queue = (await (await page.request.get('/api/garments')).json()) as { id: string }[];
    await page.goto(`/garments/${queue[queue.length - 1]!.id}`);
    await ready(page);
    const photos = page.getByRole('region', { name: 'Fitting photos' });
    await photos
      .getByText(/No photos of this garment yet|Fitting photo/)
      .first()
      .waitFor();
    // A HEIC's boxes around placeholder picture bytes: this server cannot decode HEVC anyway.
    const heic = await sampleHeif();
    await photos.getByLabel('Choose photos').setInputFiles({ name: 'IMG_2207.HEIC', mimeType: 'image/heic', buffer: heic });
    await photos.getByText('Photo added.').waitFor();
    const tile = photos.getByRole('img', { name: 'Fitting photo IMG_2207.HEIC: no preview here, open to view' });
    await tile.scrollIntoViewIfNeeded();
    await expect.poll(() => tile.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(480);
    await photos.getByText('No preview on this screen: open it on a device that reads HEIC.').waitFor();
    await page.screenshot({ path: 'test-results/garment-photos-heic.png', fullPage: true });
    page.once('dialog', (d) => d.accept());
    await photos.getByRole('button', { name: 'Remove: IMG_2207.HEIC' }).click();
    await tile.waitFor({ state: 'detached' });
    await page.context().close();
  });
});
