import path from 'node:path';
import { notFound } from 'next/navigation';
import { env } from '@/lib/env';
import { devMailboxAllowed } from '@/lib/mail/dev-mailbox';
import { readMailbox } from '@/lib/mail/mailbox';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Captured mail (development)' };

// Development only: what the local fake SMTP server received. Production answers 404 unless the e2e
// server (which runs the fake SMTP server itself) opts in.
export default function DevMailPage() {
  if (!devMailboxAllowed(env())) notFound();
  const messages = readMailbox(path.resolve(/*turbopackIgnore: true*/ process.cwd(), env().MAIL_DIR));
  return (
    <main className="mx-auto max-w-4xl px-4 py-8">
      <h1 className="text-xl font-semibold">Captured mail</h1>
      <p className="mt-1 text-sm text-ink-soft">Messages the local fake SMTP server received. Nothing here left this machine.</p>
      {messages.length === 0 ? <p className="mt-6 text-sm">No messages yet.</p> : null}
      <ol className="mt-6 space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded-lg border border-paper-edge bg-white p-4">
            <p className="text-sm font-semibold">{m.subject}</p>
            <p className="text-xs text-ink-faint">
              to {m.to.join(', ')} · {new Date(m.receivedAt).toLocaleString()}
            </p>
            <pre className="mt-2 whitespace-pre-wrap text-sm">{m.text}</pre>
          </li>
        ))}
      </ol>
    </main>
  );
}
