'use client';

import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { UNDELETE_DAYS } from '@/lib/queries/routes';

// Asks before a soft delete and says how it can be undone.
export function DeleteRouteDialog({
  route,
  isLead,
  isDeleting,
  error,
  onConfirm,
  onClose,
}: {
  route: { id: number; name: string } | null;
  isLead: boolean;
  isDeleting: boolean;
  error: string | null;
  onConfirm: () => void;
  onClose: () => void;
}) {
  return (
    <Dialog open={route !== null} title={route ? `Delete “${route.name}”?` : 'Delete route?'} onClose={isDeleting ? () => undefined : onClose}>
      <p className="text-sm text-ink-soft">
        The route leaves the list for everyone on your team, and links to it stop working. Its steps, revisions, comments and flags are kept.
      </p>
      <p className="text-sm text-ink-soft">
        {isLead
          ? `You can undo this from “Recently deleted” for ${UNDELETE_DAYS} days.`
          : `A group lead can undo this for ${UNDELETE_DAYS} days; after that it stays deleted.`}
      </p>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <div className="mt-1 flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose} disabled={isDeleting} autoFocus>
          Keep it
        </Button>
        <Button variant="danger" onClick={onConfirm} disabled={isDeleting}>
          {isDeleting ? 'Deleting…' : 'Delete route'}
        </Button>
      </div>
    </Dialog>
  );
}
