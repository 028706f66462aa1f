import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { currentProfile } from '@/lib/auth/current-user';
import { AppError } from '@/lib/api/errors';
import { getRoute } from '@/lib/services/routes/get-route';
import { teamOfRoute } from '@/lib/services/routes/route-team';
import { RouteEditorClient } from './route-editor-client';

export const metadata: Metadata = { title: 'Route' };

// Loads the route for the caller's team (404 for a bad id or another team's route) and hands it to the editor.
export default async function RouteEditorPage({ params }: { params: Promise<{ routeId: string }> }) {
  const { routeId } = await params;
  if (!/^\d{1,9}$/.test(routeId)) notFound();
  const profile = await currentProfile();
  if (!profile) redirect('/sign-in');
  const teamId = await teamOfRoute({ routeId });
  const membership = profile.memberships.find((m) => m.teamId === teamId);
  if (!teamId || !membership) notFound();
  const route = await getRoute({ teamId, routeId: Number(routeId) }).catch((error: unknown) => {
    if (error instanceof AppError && error.code === 'NOT_FOUND') return null;
    throw error;
  });
  if (!route) notFound();
  return <RouteEditorClient key={route.id} initialRoute={route} role={membership.role} teamId={teamId} selfId={profile.user.id} />;
}
