import fs from 'node:fs';
import path from 'node:path';

export interface StoredMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

export function readMailbox(dir: string): StoredMail[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8')) as StoredMail)
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id));
}

export function findInvitationLink(mail: StoredMail): string | null {
  return mail.text.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)?.[0] ?? null;
}
