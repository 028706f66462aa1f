import 'server-only';
import { getServerSession } from 'next-auth';
import { getProfile, type ProfileDto } from '../services/users/get-profile';
import { authOptions } from './options';

// For server components: the signed-in user's profile, or null.
export async function currentProfile(): Promise<ProfileDto | null> {
  const session = await getServerSession(authOptions());
  const id = Number((session?.user as { id?: string } | undefined)?.id);
  if (!Number.isInteger(id) || id <= 0) return null;
  return getProfile({ userId: id });
}
