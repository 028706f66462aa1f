import { describe, expect, it } from 'vitest';
import { approvalSummary, stepPlace } from '@/lib/review/approval-summary';
import type { CommentDto, ThreadDto } from '@/lib/schemas/comment';
import type { FlagDto, FlagCategory } from '@/lib/schemas/flag';

const labels = { 's-8ab5e2fd': 'Step 1 (ester formation)', 's-c522bf8f': 'Step 2 (amide formation)' };

const flag = (id: number, stepKey: string, category: FlagCategory, reason: string, isOpen = true): FlagDto => ({
  id, routeId: 1, stepKey, category, reason, createdBy: null, createdAt: '2026-12-01T00:00:00.000Z', isOpen, clearedAt: null, clearedBy: null, clearCommentId: null,
});
const comment = (id: number, stepKey: string | null, body: string, isDeleted = false): CommentDto => ({
  id, routeId: 1, stepKey, parentId: null, author: null, body: isDeleted ? '' : body, mentions: [], routeVersion: 1, outdated: false, isDeleted, editedAt: null, createdAt: '2026-12-01T00:00:00.000Z',
});
const thread = (root: CommentDto, resolved = false, replies: CommentDto[] = []): ThreadDto => ({ root, replies, resolved, resolvedAt: null, resolvedBy: null });

describe('approvalSummary', () => {
  it('counts open flags and unresolved threads, safety first, and names steps by label, never by key', () => {
    const s = approvalSummary(
      [flag(1, 's-8ab5e2fd', 'cost', 'Palladium price'), flag(2, 's-c522bf8f', 'safety', 'Gas evolution at 450 K'), flag(3, 's-8ab5e2fd', 'supply', 'gone', false)],
      [thread(comment(10, 's-c522bf8f', 'Is the   yield\nrealistic?')), thread(comment(11, null, 'Looks fine'), true), thread(comment(12, null, 'Which solvent?'))],
      labels,
    );
    expect(s).toMatchObject({ openFlags: 2, safetyFlags: 1, unresolvedThreads: 2, isClear: false });
    expect(s.flags).toEqual([
      { place: 'Safety · Step 2 (amide formation)', text: 'Gas evolution at 450 K' },
      { place: 'Cost · Step 1 (ester formation)', text: 'Palladium price' },
    ]);
    expect(s.threads).toEqual([
      { place: 'Step 2 (amide formation)', text: 'Is the yield realistic?' },
      { place: 'The whole route', text: 'Which solvent?' },
    ]);
    expect(JSON.stringify(s)).not.toMatch(/s-[0-9a-f]{8}/);
  });

  it('shows only the first few, shortens long text and uses a reply when the root was deleted', () => {
    const many = Array.from({ length: 5 }, (_, i) => flag(i + 1, 's-8ab5e2fd', 'thermodynamics', 'x'.repeat(200)));
    const s = approvalSummary(many, [thread(comment(1, 's-gone', '', true), false, [{ ...comment(2, 's-gone', 'The reply stays'), parentId: 1 }])], labels, 3);
    expect(s.openFlags).toBe(5);
    expect(s.flags).toHaveLength(3);
    expect(s.flags[0]!.text).toHaveLength(90);
    expect(s.flags[0]!.text.endsWith('…')).toBe(true);
    expect(s.threads).toEqual([{ place: 'A step since removed', text: 'The reply stays' }]);
  });

  it('is clear with nothing open', () => {
    expect(approvalSummary([flag(1, 's-8ab5e2fd', 'safety', 'done', false)], [thread(comment(1, null, 'ok'), true)], labels).isClear).toBe(true);
    expect(stepPlace(null, labels)).toBe('The whole route');
  });
});
