// A comment's markdown as one short line of plain text for the feed. Pure. Raw HTML stays as text, as the renderer shows it.

export const EXCERPT_CHARS = 160;

export function markdownToPlain(markdown: string): string {
  return (
    markdown
      // fenced code: keep the code, drop the fences and the language tag
      .replace(/^ {0,3}(`{3,}|~{3,})[^\n]*\n([\s\S]*?)(?:^ {0,3}\1[^\n]*$|(?![\s\S]))/gm, '$2')
      .replace(/!\[([^\]]*)\]\([^)]*\)/g, '$1')
      .replace(/\[([^\]]+)\]\([^)]*\)/g, '$1')
      .replace(/<((?:https?|mailto):[^>\s]+)>/g, '$1')
      .replace(/`+([^`]+?)`+/g, '$1')
      .replace(/^ {0,3}(?:#{1,6}\s+|>\s?|[-*+]\s+|\d{1,9}[.)]\s+)/gm, '')
      .replace(/(\*\*|__)(?=\S)([\s\S]*?\S)\1/g, '$2')
      .replace(/(^|[^\w*])\*(?=\S)([^*\n]*?\S)\*(?![\w*])/g, '$1$2')
      .replace(/(^|[^\w])_(?=\S)([^_\n]*?\S)_(?!\w)/g, '$1$2')
      .replace(/~~(?=\S)([\s\S]*?\S)~~/g, '$1')
      .replace(/\\([\\`*_{}[\]()#+\-.!~>|])/g, '$1')
      .replace(/\s+/g, ' ')
      .trim()
  );
}

/** At most `max` characters, cut at a word where one is near, with an ellipsis when cut. */
export function plainExcerpt(markdown: string, max = EXCERPT_CHARS): string {
  const plain = markdownToPlain(markdown);
  if (plain.length <= max) return plain;
  const cut = plain.slice(0, max - 1);
  const space = cut.lastIndexOf(' ');
  return `${(space > max * 0.6 ? cut.slice(0, space) : cut).trimEnd()}…`;
}
