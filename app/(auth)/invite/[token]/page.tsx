import type { Metadata } from 'next';
import Link from 'next/link';
import { Notice } from '@/components/ui/notice';
import { AppError } from '@/lib/api/errors';
import { ROLE_LABELS, type Role } from '@/lib/auth/roles';
import { currentProfile } from '@/lib/auth/current-user';
import { STATUS_MESSAGES, viewInvitation, type InvitationView } from '@/lib/services/invitations/find-invitation';
import { AcceptInvitationForm } from './accept-invitation-form';

export const metadata: Metadata = { title: 'Invitation' };
export const dynamic = 'force-dynamic';

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let invitation: InvitationView | null = null;
  try {
    invitation = await viewInvitation({ token });
  } catch (error) {
    if (!(error instanceof AppError)) throw error;
  }
  if (!invitation) {
    return <Closed title="This invitation link is not valid">Check that you opened the whole link from the e-mail, or ask your team lead for a new one.</Closed>;
  }
  if (invitation.status !== 'pending') {
    const titles = { accepted: 'Invitation already used', expired: 'Invitation expired', revoked: 'Invitation withdrawn' } as const;
    return <Closed title={titles[invitation.status]}>{STATUS_MESSAGES[invitation.status]}</Closed>;
  }
  const profile = await currentProfile();
  const roleLabel = ROLE_LABELS[invitation.role as Role] ?? invitation.role;
  return (
    <>
      <h1 className="text-lg font-semibold">Join {invitation.teamName}</h1>
      <p className="mt-1 text-sm text-ink-soft">
        You are invited as <strong>{roleLabel}</strong> with the address <strong>{invitation.email}</strong>.
      </p>
      <AcceptInvitationForm
        token={token}
        email={invitation.email}
        mode={profile ? (profile.user.email === invitation.email ? 'signed-in' : 'wrong-account') : invitation.hasAccount ? 'needs-sign-in' : 'new-account'}
        signedInAs={profile?.user.email ?? null}
      />
    </>
  );
}

function Closed({ title, children }: { title: string; children: string }) {
  return (
    <>
      <h1 className="text-lg font-semibold">{title}</h1>
      <div className="mt-3">
        <Notice tone="caution">{children}</Notice>
      </div>
      <p className="mt-4 text-sm">
        <Link href="/sign-in" className="text-pine-700 underline">
          Go to sign-in
        </Link>
      </p>
    </>
  );
}
