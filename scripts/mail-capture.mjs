// A local SMTP capture for development and tests: accepts every message on loopback (no auth,
// no TLS) and saves it as JSON in a folder the app's sent-messages page reads (by Message-ID, for
// the messages the database says a shop sent). Never for production.
import { SMTPServer } from 'smtp-server';
import { mkdirSync, writeFileSync, renameSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { listenOrExplain } from './port-taken.mjs';

/** Starts the capture on host:port (port 0 = any free one); resolves with the port and a closer. */
export function startMailCapture({ dir, port = 1025, host = '127.0.0.1', quiet = false }) {
  mkdirSync(dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      // mailparser loads at the first message: npm start need not pay its modules while the server starts.
      import('mailparser')
        .then(({ simpleParser }) => simpleParser(stream))
        .then((mail) => {
          const at = new Date();
          const id = `${at.toISOString().replace(/[:.]/g, '-')}-${randomUUID().slice(0, 8)}`;
          const to = session.envelope.rcptTo.map((r) => r.address);
          const record = {
            id,
            at: at.toISOString(),
            messageId: mail.messageId ?? '',
            from: session.envelope.mailFrom?.address ?? '',
            to,
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            attachments: (mail.attachments ?? []).map((a) => ({ filename: a.filename ?? '', contentType: a.contentType, size: a.size })),
          };
          // Written then renamed, so a reader never sees half a message.
          const tmp = join(dir, `.${id}.tmp`);
          writeFileSync(tmp, JSON.stringify(record, null, 2));
          renameSync(tmp, join(dir, `${id}.json`));
          if (!quiet) console.log(`[mail] ${to.join(', ')}: ${record.subject}`);
          callback();
        })
        .catch(callback);
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      const address = server.server.address();
      resolve({ port: typeof address === 'object' && address ? address.port : port, close: () => new Promise((r) => server.close(r)) });
    });
  });
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const dir = process.env.MAIL_CAPTURE_DIR || join(process.env.DATA_DIR || './data', 'mail');
  const wanted = Number(process.env.SMTP_PORT || 1025);
  const { port } = await listenOrExplain(startMailCapture({ dir, port: wanted }), { port: wanted, what: 'mail capture', setting: 'SMTP_PORT' });
  console.log(`Mail capture on smtp://127.0.0.1:${port}, saving to ${dir}`);
}
