import path from 'node:path';
import { startFakeSmtpServer } from '../lib/mail/fake-smtp-server';
import { loadEnvFiles } from './load-env';

loadEnvFiles();
const url = new URL(process.env.SMTP_URL ?? 'smtp://127.0.0.1:2525');
const dir = path.resolve(process.env.MAIL_DIR ?? './var/mail');
startFakeSmtpServer({ port: Number(url.port || 2525), host: url.hostname, dir })
  .then(({ port }) => console.log(`[mail] fake SMTP on ${url.hostname}:${port}, keeping messages in ${dir}`))
  .catch((error: NodeJS.ErrnoException) => {
    if (error.code === 'EADDRINUSE') console.log(`[mail] port ${url.port} busy; assuming a fake SMTP server already runs there`);
    else {
      console.error(error);
      process.exit(1);
    }
  });
