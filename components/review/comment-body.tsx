import Markdown, { type Components } from 'react-markdown';
import type { MentionDto } from '@/lib/schemas/comment';
import { splitMentions } from '@/lib/review/mentions';

// The safe subset: no headings, images, tables or raw HTML. Anything else is unwrapped to its text.
const ALLOWED_ELEMENTS = ['p', 'em', 'strong', 'code', 'pre', 'ul', 'ol', 'li', 'blockquote', 'a', 'br', 'span'];
const SAFE_SCHEMES = new Set(['http', 'https', 'mailto']);

/** http, https and mailto links only; anything else (javascript:, data:, relative paths) loses its href. */
export function safeCommentUrl(url: string): string {
  const scheme = /^([a-z][a-z0-9+.-]*):/i.exec(url)?.[1]?.toLowerCase();
  return scheme && SAFE_SCHEMES.has(scheme) ? url : '';
}

interface MdNode {
  type: string;
  value?: string;
  alt?: string | null;
  children?: MdNode[];
  data?: Record<string, unknown>;
}

// Images show as their alt text; `@handle` of a mentioned member becomes a marked name. Code is left alone.
function reviewMarks(mentions: ReadonlyArray<MentionDto>) {
  const byHandle = new Map(mentions.map((m) => [m.handle.toLowerCase(), m]));
  const walk = (node: MdNode): void => {
    if (!node.children) return;
    node.children = node.children.flatMap((child): MdNode[] => {
      if (child.type === 'image') return child.alt ? [{ type: 'text', value: child.alt }] : [];
      if (child.type === 'text' && child.value && byHandle.size > 0) {
        return splitMentions(child.value, [...byHandle.keys()]).map((part) => {
          const mention = part.handle ? byHandle.get(part.handle) : undefined;
          if (!mention) return { type: 'text', value: part.text };
          return {
            type: 'text',
            value: `@${mention.name}`,
            data: { hName: 'span', hProperties: { className: ['mention', 'rounded', 'bg-pine-50', 'px-0.5', 'font-medium', 'text-pine-700'], title: `@${mention.handle}`, dataUserId: String(mention.userId) } },
          };
        });
      }
      walk(child);
      return [child];
    });
  };
  return () => (tree: MdNode) => walk(tree);
}

const COMPONENTS: Components = {
  a: ({ href, children }) =>
    href ? (
      <a href={href} target="_blank" rel="noopener noreferrer nofollow" className="text-pine-700 underline">
        {children}
      </a>
    ) : (
      <span>{children}</span>
    ),
  pre: ({ children }) => <pre className="my-2 overflow-x-auto rounded bg-paper-deep p-2 font-mono text-xs [&>code]:bg-transparent [&>code]:p-0">{children}</pre>,
  code: ({ children }) => <code className="rounded bg-paper-deep px-0.5 font-mono text-[0.9em]">{children}</code>,
  blockquote: ({ children }) => <blockquote className="my-2 border-l-2 border-paper-edge pl-3 text-ink-soft">{children}</blockquote>,
  ul: ({ children }) => <ul className="my-1 list-disc pl-5">{children}</ul>,
  ol: ({ children }) => <ol className="my-1 list-decimal pl-5">{children}</ol>,
  p: ({ children }) => <p className="my-1">{children}</p>,
};

/** A comment's markdown as React elements. Raw HTML in the text shows as text; it is never parsed. */
export function CommentBody({ body, mentions = [] }: { body: string; mentions?: ReadonlyArray<MentionDto> }) {
  return (
    <div className="text-sm leading-relaxed text-ink [overflow-wrap:anywhere]">
      <Markdown
        allowedElements={ALLOWED_ELEMENTS}
        unwrapDisallowed
        urlTransform={safeCommentUrl}
        remarkPlugins={[reviewMarks(mentions)]}
        components={COMPONENTS}
      >
        {body}
      </Markdown>
    </div>
  );
}
