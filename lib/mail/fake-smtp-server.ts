import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { StoredMail } from './mailbox';

// A local stand-in for a mail provider: accepts everything on loopback and keeps each message as JSON.
export function startFakeSmtpServer({ port, host = '127.0.0.1', dir }: { port: number; host?: string; dir: string }) {
  fs.mkdirSync(dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'Stepwell fake SMTP (development only)',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const id = `${Date.now()}-${crypto.randomBytes(4).toString('hex')}`;
          const toField = parsed.to ? (Array.isArray(parsed.to) ? parsed.to : [parsed.to]) : [];
          const mail: StoredMail = {
            id,
            receivedAt: new Date().toISOString(),
            from: parsed.from?.text ?? session.envelope.mailFrom?.toString() ?? '',
            to: toField.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          };
          fs.writeFileSync(path.join(dir, `${id}.json`), JSON.stringify(mail, null, 2));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  return new Promise<{ port: number; close: () => Promise<void> }>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      const address = server.server.address();
      const actualPort = typeof address === 'object' && address ? address.port : port;
      resolve({ port: actualPort, close: () => new Promise<void>((done) => server.close(() => done())) });
    });
  });
}
