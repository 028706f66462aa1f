'use client';

import { activeMembership, useProfile } from '@/lib/queries/me';
import { can } from '@/lib/auth/permissions';
import { ROLE_LABELS, ROLES } from '@/lib/auth/roles';
import { InvitationsPanel } from './invitations-panel';
import { MembersTable } from './members-table';

export function TeamClient() {
  const { data: profile } = useProfile();
  const membership = activeMembership(profile);
  if (!profile || !membership) return <p className="text-sm text-ink-soft">Loading team…</p>;
  const isLead = can(membership.role, 'team.manage');
  return (
    // minmax(0, …) tracks: a grid item's min-content (the members table) must not widen the page on a phone.
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
      <section aria-labelledby="members-heading" className="min-w-0">
        <h2 id="members-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-faint">
          Members of {membership.teamName}
        </h2>
        <MembersTable teamId={membership.teamId} canManage={isLead} selfId={profile.user.id} />
      </section>
      <aside className="flex min-w-0 flex-col gap-6">
        {isLead ? <InvitationsPanel teamId={membership.teamId} /> : null}
        <section className="rounded-lg border border-paper-edge bg-white p-4 text-sm">
          <h2 className="font-semibold">Roles</h2>
          <dl className="mt-2 space-y-2 text-ink-soft">
            {ROLES.slice()
              .reverse()
              .map((role) => (
                <div key={role}>
                  <dt className="font-medium text-ink">{ROLE_LABELS[role]}</dt>
                  <dd>{ROLE_HELP[role]}</dd>
                </div>
              ))}
          </dl>
        </section>
      </aside>
    </div>
  );
}

const ROLE_HELP = {
  lead: 'Everything a designer does, plus members, invitations, approving and shelving routes, and recording decisions.',
  designer: 'Creates and edits routes, steps, species and data sets.',
  reviewer: 'Reads everything in the team, comments and flags steps; edits nothing else.',
} as const;
