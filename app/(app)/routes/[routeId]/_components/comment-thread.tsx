'use client';

import { ChemText } from '@/components/chemistry/chem-text';
import { useState } from 'react';
import { CommentBody } from '@/components/review/comment-body';
import { Button } from '@/components/ui/button';
import { When } from '@/components/ui/when';
import type { CommentDto, ThreadDto } from '@/lib/schemas/comment';
import { CommentComposer } from './comment-composer';

export interface ThreadActions {
  selfId: number;
  canComment: boolean;
  handles: ReadonlyArray<{ handle: string; name: string }>;
  reply: (rootId: number, body: string) => Promise<void>;
  edit: (commentId: number, body: string) => Promise<void>;
  remove: (commentId: number) => Promise<void>;
  setResolved: (rootId: number, resolved: boolean) => Promise<void>;
}

function OneComment({ comment, actions }: { comment: CommentDto; actions: ThreadActions }) {
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const mine = comment.author?.id === actions.selfId && !comment.isDeleted;
  if (comment.isDeleted) return <p className="text-xs italic text-ink-faint">Comment deleted.</p>;
  return (
    <div className="flex flex-col gap-1" data-testid="comment">
      <p className="text-xs text-ink-soft">
        <span className="font-medium text-ink">{comment.author?.name ?? 'Former member'}</span> · <When iso={comment.createdAt} />
        {comment.editedAt ? <span> · edited</span> : null}
        {comment.outdated ? <span className="ml-1 rounded bg-paper-deep px-1 text-[11px]">written on an earlier version</span> : null}
      </p>
      {editing ? (
        <CommentComposer
          label="Edit comment"
          submitLabel="Save"
          initial={comment.body}
          handles={actions.handles}
          onSubmit={async (body) => {
            await actions.edit(comment.id, body);
            setEditing(false);
          }}
          onCancel={() => setEditing(false)}
        />
      ) : (
        <div className="text-sm">
          <CommentBody body={comment.body} mentions={comment.mentions} />
        </div>
      )}
      {mine && !editing ? (
        <div className="flex gap-1">
          <Button variant="quiet" className="!px-1.5 !py-0.5 text-xs" onClick={() => setEditing(true)}>
            Edit
          </Button>
          <Button
            variant="quiet"
            className="!px-1.5 !py-0.5 text-xs"
            onClick={() => {
              if (!window.confirm('Delete this comment?')) return;
              actions.remove(comment.id).catch((e: unknown) => setError(e instanceof Error ? e.message : 'Could not delete.'));
            }}
          >
            Delete
          </Button>
        </div>
      ) : null}
      {error ? <p role="alert" className="text-xs text-uphill">{error}</p> : null}
    </div>
  );
}

export function CommentThread({ thread, title, actions }: { thread: ThreadDto; title: string; actions: ThreadActions }) {
  const [replying, setReplying] = useState(false);
  const [busy, setBusy] = useState(false);
  const toggleResolved = async () => {
    setBusy(true);
    try {
      await actions.setResolved(thread.root.id, !thread.resolved);
    } finally {
      setBusy(false);
    }
  };
  return (
    <article className={`flex flex-col gap-2 rounded-md border p-2 ${thread.resolved ? 'border-paper-deep bg-paper' : 'border-paper-edge bg-white'}`} aria-label={`Thread on ${title}`}>
      <div className="flex items-center justify-between gap-2 text-xs">
        <ChemText className="font-medium text-ink-soft" text={title} />
        {thread.resolved ? <span className="text-downhill">✓ resolved{thread.resolvedBy ? ` by ${thread.resolvedBy.name}` : ''}</span> : null}
      </div>
      <OneComment comment={thread.root} actions={actions} />
      {thread.replies.length ? (
        <div className="ml-3 flex flex-col gap-2 border-l-2 border-paper-deep pl-2">
          {thread.replies.map((r) => (
            <OneComment key={r.id} comment={r} actions={actions} />
          ))}
        </div>
      ) : null}
      {actions.canComment ? (
        <div className="flex flex-wrap gap-1">
          {!replying ? (
            <Button variant="secondary" className="!py-0.5 text-xs" onClick={() => setReplying(true)}>
              Reply
            </Button>
          ) : null}
          <Button variant="secondary" className="!py-0.5 text-xs" disabled={busy} onClick={() => void toggleResolved()}>
            {thread.resolved ? 'Reopen' : 'Resolve'}
          </Button>
        </div>
      ) : null}
      {replying ? (
        <CommentComposer
          label="Reply"
          submitLabel="Reply"
          handles={actions.handles}
          onSubmit={async (body) => {
            await actions.reply(thread.root.id, body);
            setReplying(false);
          }}
          onCancel={() => setReplying(false)}
        />
      ) : null}
    </article>
  );
}
