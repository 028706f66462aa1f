// A comment's markdown as one short line of plain text for the feed: the words a reader sees, without markup.
// Raw HTML stays as text, as the comment renderer shows it. Pure.
import { fromMarkdown } from 'mdast-util-from-markdown';

export const EXCERPT_CHARS = 160;

interface MdNode {
  type: string;
  value?: string;
  alt?: string | null;
  children?: MdNode[];
}

const TEXT_NODES = new Set(['text', 'inlineCode', 'html', 'code']);
const BLOCK_NODES = new Set(['paragraph', 'heading', 'blockquote', 'list', 'listItem', 'code', 'table', 'tableRow', 'tableCell', 'thematicBreak']);

function collect(node: MdNode, out: string[]): string[] {
  if (TEXT_NODES.has(node.type)) out.push(node.value ?? '');
  else if (node.type === 'image') out.push(node.alt ?? '');
  else if (node.type === 'break') out.push(' ');
  for (const child of node.children ?? []) {
    collect(child, out);
    // Blocks (paragraphs, list items, quotes, code) end with a space so their words do not run together.
    if (BLOCK_NODES.has(child.type) || (node.type === 'root' && child.type === 'html')) out.push(' ');
  }
  return out;
}

export function markdownToPlain(markdown: string): string {
  return collect(fromMarkdown(markdown) as MdNode, []).join('').replace(/\s+/g, ' ').trim();
}

/** At most `max` characters, cut at a word where one is near, with an ellipsis when cut. */
export function plainExcerpt(markdown: string, max = EXCERPT_CHARS): string {
  const plain = markdownToPlain(markdown);
  if (plain.length <= max) return plain;
  const cut = plain.slice(0, max - 1);
  const space = cut.lastIndexOf(' ');
  return `${(space > max * 0.6 ? cut.slice(0, space) : cut).trimEnd()}…`;
}
