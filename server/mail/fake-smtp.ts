import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export type CapturedMail = { id: number; to: string[]; from: string; subject: string; text: string; receivedAt: string };

/**
 * A local stand-in for a mail provider: accepts every message on loopback and keeps it
 * in memory (and, when given a folder, as .eml files) for the dev inbox and the tests.
 */
export type FakeSmtp = {
  port: number;
  messages: CapturedMail[];
  waitFor(match: (mail: CapturedMail) => boolean, timeoutMs?: number): Promise<CapturedMail>;
  close(): Promise<void>;
};

export function startFakeSmtp(options: { host?: string; port?: number; mailDir?: string } = {}): Promise<FakeSmtp> {
  const messages: CapturedMail[] = [];
  const waiters: { match: (mail: CapturedMail) => boolean; resolve: (mail: CapturedMail) => void }[] = [];
  if (options.mailDir) mkdirSync(options.mailDir, { recursive: true });

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', async () => {
        const raw = Buffer.concat(chunks);
        const parsed = await simpleParser(raw);
        const mail: CapturedMail = {
          id: messages.length + 1,
          to: session.envelope.rcptTo.map((r) => r.address),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          subject: parsed.subject ?? '',
          text: parsed.text ?? '',
          receivedAt: new Date().toISOString(),
        };
        messages.push(mail);
        if (options.mailDir) writeFileSync(path.join(options.mailDir, `${Date.now()}-${mail.id}.eml`), raw);
        for (const waiter of waiters.splice(0)) {
          if (waiter.match(mail)) waiter.resolve(mail);
          else waiters.push(waiter);
        }
        callback();
      });
    },
  });

  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, options.host ?? '127.0.0.1', () => {
      const address = server.server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      resolve({
        port,
        messages,
        waitFor(match, timeoutMs = 10_000) {
          const found = messages.find(match);
          if (found) return Promise.resolve(found);
          return new Promise((done, fail) => {
            const timer = setTimeout(() => fail(new Error('No matching mail arrived in time')), timeoutMs);
            waiters.push({ match, resolve: (mail) => (clearTimeout(timer), done(mail)) });
          });
        },
        close: () => new Promise((done) => server.close(() => done())),
      });
    });
  });
}
