import { afterAll, beforeAll } from 'vitest';
import { setupTestDb, teardownTestDb } from './test-db';
import { getDb } from '@/db';
import type { Role } from '@/lib/auth/roles';
import { startFakeSmtpServer } from '@/lib/mail/fake-smtp-server';
import { readMailbox, type StoredMail } from '@/lib/mail/mailbox';
import { signUp } from '@/lib/services/users/sign-up';
import { makeRoute } from './fixtures';

let counter = 0;

async function addPerson(teamId: number, role: Role, name: string, email: string): Promise<number> {
  const { User, Membership, UserPreference } = getDb().models;
  const user = await User.create({ email, name, passwordHash: 'x' });
  await Membership.create({ teamId, userId: user.id, role });
  await UserPreference.create({ userId: user.id, activeTeamId: teamId });
  return user.id;
}

/** The invented review team, plus an outsider in another team. Addresses differ per call so a file can make several. */
export async function makeReviewTeam() {
  counter += 1;
  const domain = `kestrel-ridge-${counter}.example`;
  const { userId: leadId, teamId } = await signUp({
    name: 'Ottilie Marchetti',
    email: `ottilie.marchetti@${domain}`,
    password: 'a-strong-password-1',
    teamName: 'Kestrel Ridge Fine Chemicals — Process Development',
  });
  const designerId = await addPerson(teamId, 'designer', 'Baptiste Osei', `baptiste.osei@${domain}`);
  const reviewerId = await addPerson(teamId, 'reviewer', 'Hanne Vasquez-Lind', `hanne.vasquez-lind@${domain}`);
  const outsider = await signUp({ name: 'Outside Lead', email: `outside.lead@other-${counter}.example`, password: 'a-strong-password-1', teamName: `Elsewhere ${counter}` });
  return {
    teamId,
    leadId,
    designerId,
    reviewerId,
    outsiderId: outsider.userId,
    outsiderTeamId: outsider.teamId,
    email: { lead: `ottilie.marchetti@${domain}`, designer: `baptiste.osei@${domain}`, reviewer: `hanne.vasquez-lind@${domain}`, outsider: `outside.lead@other-${counter}.example` },
  };
}
export type ReviewTeam = Awaited<ReturnType<typeof makeReviewTeam>>;

/** A route of two steps (s1, s2) owned by `ownerId`. */
export async function makeOwnedRoute(team: ReviewTeam, ownerId = team.designerId) {
  return makeRoute(team.teamId, ownerId);
}

export async function startMailbox() {
  const smtp = await startFakeSmtpServer({ port: 0, dir: process.env.MAIL_DIR! });
  process.env.SMTP_URL = `smtp://127.0.0.1:${smtp.port}`;
  return smtp;
}

/** Mails the fake SMTP server received for one address, newest first. */
export function mailTo(address: string): StoredMail[] {
  return readMailbox(process.env.MAIL_DIR!).filter((m) => m.to.includes(address));
}

/**
 * The shared set-up of the review tests: a temporary database with real migrations, the fake SMTP
 * server and the invented team, made before the file's tests and removed after them.
 */
export function withReviewWorld(onReady: (team: ReviewTeam) => void): void {
  let dir = '';
  let smtp: Awaited<ReturnType<typeof startMailbox>> | undefined;
  beforeAll(async () => {
    ({ dir } = await setupTestDb());
    smtp = await startMailbox();
    onReady(await makeReviewTeam());
  });
  afterAll(async () => {
    await smtp?.close();
    await teardownTestDb(dir);
  });
}
