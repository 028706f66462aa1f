'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ScrollRegion } from '@/components/tables/scroll-region';
import { ROLE_LABELS, ROLES, type Role } from '@/lib/auth/roles';
import { apiFetch, ApiError } from '@/lib/queries/api-fetch';
import { membersQuery, teamKeys } from '@/lib/queries/team';

export function MembersTable({ teamId, canManage, selfId }: { teamId: number; canManage: boolean; selfId: number }) {
  const queryClient = useQueryClient();
  const members = useQuery(membersQuery(teamId));
  const [message, setMessage] = useState<string | null>(null);
  const onError = (error: unknown) => setMessage(error instanceof ApiError ? error.message : 'That did not work. Try again.');
  const refresh = () => queryClient.invalidateQueries({ queryKey: teamKeys.members(teamId) });

  const changeRole = useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: Role }) => apiFetch(`/api/teams/${teamId}/members/${userId}`, { method: 'PATCH', body: { role } }),
    onSuccess: refresh,
    onError,
  });
  const remove = useMutation({
    mutationFn: (userId: number) => apiFetch(`/api/teams/${teamId}/members/${userId}`, { method: 'DELETE' }),
    onSuccess: refresh,
    onError,
  });

  if (members.isPending) return <p className="text-sm text-ink-soft">Loading members…</p>;
  if (members.isError) return <Notice tone="error">{members.error.message}</Notice>;

  return (
    <div className="flex flex-col gap-2">
      {message ? <Notice tone="error">{message}</Notice> : null}
      {/* A phone scrolls the table inside its own region, never the page. */}
      <ScrollRegion label="Members" className="rounded-lg border border-paper-edge bg-white">
        <table className="w-full text-sm">
          <caption className="sr-only">Members</caption>
          <thead className="bg-paper-deep text-left text-xs uppercase tracking-wide text-ink-faint">
            <tr>
              <th scope="col" className="px-3 py-2">Name</th>
              <th scope="col" className="px-3 py-2">E-mail</th>
              <th scope="col" className="px-3 py-2">Role</th>
              {canManage ? <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th> : null}
            </tr>
          </thead>
          <tbody>
            {members.data.map((m) => (
              <tr key={m.userId} className="border-t border-paper-edge">
                <td className="px-3 py-2 font-medium">{m.name}{m.userId === selfId ? <span className="ml-1 text-xs text-ink-faint">(you)</span> : null}</td>
                <td className="break-all px-3 py-2 text-ink-soft">{m.email}</td>
                <td className="px-3 py-2">
                  {canManage ? (
                    <select
                      aria-label={`Role of ${m.name}`}
                      value={m.role}
                      onChange={(e) => {
                        setMessage(null);
                        changeRole.mutate({ userId: m.userId, role: e.target.value as Role });
                      }}
                      className="rounded border border-paper-edge bg-white px-1.5 py-0.5"
                    >
                      {ROLES.map((r) => (
                        <option key={r} value={r}>{ROLE_LABELS[r]}</option>
                      ))}
                    </select>
                  ) : (
                    ROLE_LABELS[m.role]
                  )}
                </td>
                {canManage ? (
                  <td className="px-3 py-2 text-right">
                    <Button
                      variant="danger"
                      onClick={() => {
                        setMessage(null);
                        if (window.confirm(`Remove ${m.name} from the team?`)) remove.mutate(m.userId);
                      }}
                    >
                      Remove
                    </Button>
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
    </div>
  );
}
