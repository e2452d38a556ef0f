// npm start's local stand-ins (mail capture, payment fake, SMS fake) start without the libraries
// they need only for a message (mailparser, the payment and SMS SDKs), so they cost the starting
// server less CPU; the capture still files the first message it is sent.
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, describe, expect, it, vi } from 'vitest';

const loaded = vi.hoisted(() => new Set<string>());
vi.mock('mailparser', async (real) => (loaded.add('mailparser'), real()));
vi.mock('stripe', async (real) => (loaded.add('stripe'), real()));
vi.mock('twilio', async (real) => (loaded.add('twilio'), real()));

const dir = mkdtempSync(join(tmpdir(), 'cw-stand-ins-'));
const closers: (() => Promise<unknown>)[] = [];
afterAll(async () => {
  await Promise.all(closers.map((c) => c()));
  rmSync(dir, { recursive: true, force: true });
});

describe('the local stand-ins', () => {
  it('start and listen without mailparser, the payment SDK or the SMS SDK', async () => {
    const { startMailCapture } = await import('../../scripts/mail-capture.mjs');
    const { startPaymentsFake } = await import('../../scripts/payments-fake.mjs');
    const { startSmsFake } = await import('../../scripts/sms-fake.mjs');
    const mail = await startMailCapture({ dir, port: 0, quiet: true });
    const pay = await startPaymentsFake({ port: 0, apiKey: 'sk_test_local', webhookUrl: 'http://127.0.0.1:9/none', webhookSecret: 'whsec_x', quiet: true });
    const sms = await startSmsFake({ port: 0, accountSid: 'AC0', authToken: 't', quiet: true });
    closers.push(mail.close, pay.close, sms.close);
    expect(mail.port).toBeGreaterThan(0);
    expect([...loaded]).toEqual([]);

    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: mail.port, secure: false, ignoreTLS: true });
    await transport.sendMail({ from: 'desk@stand-ins.test', to: 'owner@stand-ins.test', subject: 'Hem ready', text: 'Your trousers are ready.' });
    const files = readdirSync(dir).filter((f) => f.endsWith('.json'));
    expect(files).toHaveLength(1);
    expect(JSON.parse(readFileSync(join(dir, files[0]!), 'utf8'))).toMatchObject({ subject: 'Hem ready', to: ['owner@stand-ins.test'] });
    expect(loaded.has('mailparser')).toBe(true);
  });
});
