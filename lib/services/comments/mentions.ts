import 'server-only';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { handleOf, handlesInText } from '../../review/mentions';

interface MdNode {
  type: string;
  value?: string;
  children?: MdNode[];
}

// Only prose counts: "@x" inside inline code or a code block names nobody, exactly as the renderer shows it.
function proseOf(node: MdNode, out: string[]): string[] {
  if (node.type === 'text' && node.value) out.push(node.value);
  for (const child of node.children ?? []) proseOf(child, out);
  return out;
}

export interface ResolvedMention {
  userId: number;
  handle: string;
}

/**
 * The members a comment mentions, once each, in order. Handles that name no member are dropped, and so
 * is a handle two members share (same local part at different domains): it is not clear who is meant.
 */
export function resolveMentions(markdown: string, members: ReadonlyArray<{ userId: number; email: string }>): ResolvedMention[] {
  const byHandle = new Map<string, number | null>();
  for (const m of members) {
    const handle = handleOf(m.email);
    byHandle.set(handle, byHandle.has(handle) && byHandle.get(handle) !== m.userId ? null : m.userId);
  }
  const resolved: ResolvedMention[] = [];
  for (const text of proseOf(fromMarkdown(markdown) as MdNode, [])) {
    for (const handle of handlesInText(text)) {
      const userId = byHandle.get(handle);
      if (typeof userId === 'number' && !resolved.some((r) => r.userId === userId)) resolved.push({ userId, handle });
    }
  }
  return resolved;
}
