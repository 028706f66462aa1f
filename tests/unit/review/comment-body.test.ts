// Server-renders comment bodies (no DOM in this suite) and checks that nothing executable reaches the page.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { CommentBody, safeCommentUrl } from '@/components/review/comment-body';
import type { MentionDto } from '@/lib/schemas/comment';

const render = (body: string, mentions: MentionDto[] = []) => renderToStaticMarkup(createElement(CommentBody, { body, mentions }));

// Tag names and attributes that would run script or load something, in the rendered markup.
function dangerous(html: string): string[] {
  const found: string[] = [];
  for (const m of html.matchAll(/<\s*([a-z0-9-]+)([^>]*)>/gi)) {
    const tag = m[1]!.toLowerCase();
    if (['script', 'img', 'iframe', 'svg', 'object', 'embed', 'style', 'link', 'meta', 'form', 'input', 'video', 'audio', 'math'].includes(tag)) found.push(`<${tag}>`);
    for (const a of m[2]!.matchAll(/([a-z-]+)\s*=\s*("[^"]*"|'[^']*'|[^\s>]+)/gi)) {
      const name = a[1]!.toLowerCase();
      const value = a[2]!.replace(/^["']|["']$/g, '').trim().toLowerCase();
      if (name.startsWith('on')) found.push(`${tag}[${name}]`);
      if ((name === 'href' || name === 'src') && !/^(https?:|mailto:)/.test(value)) found.push(`${tag}[${name}=${value}]`);
      if (name === 'style') found.push(`${tag}[style]`);
    }
  }
  return found;
}

const XSS_PAYLOADS = [
  '<script>alert(1)</script>',
  '<img src=x onerror="alert(1)">',
  '<a href="javascript:alert(1)" onclick="alert(2)">click</a>',
  '<svg onload=alert(1)><circle r=1 /></svg>',
  '<iframe src="https://example.test"></iframe>',
  '[click](javascript:alert(1))',
  '[click](JaVaScRiPt:alert(1))',
  '[click](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
  '[click](vbscript:msgbox(1))',
  '![x](javascript:alert(1))',
  '![pic](https://example.test/a.png "t")',
  '<div style="background:url(javascript:alert(1))">styled</div>',
  '<p onmouseover="alert(1)">hover</p>',
  '```html\n<script>alert(1)</script>\n```',
  '`<img src=x onerror=alert(1)>`',
  '> <script>alert(1)</script>',
  '- <img src=x onerror=alert(1)>',
  '<scr<script>ipt>alert(1)</script>',
  '[a](<javascript:alert(1)>)',
  '<javascript:alert(1)>',
  '[ref]\n\n[ref]: javascript:alert(1)',
];

describe('CommentBody: raw HTML and unsafe links never come out as markup', () => {
  it('the checker itself spots live markup', () => {
    expect(dangerous('<img src=x onerror="alert(1)"><a href="javascript:x">y</a><script></script>')).toEqual([
      '<img>', 'img[src=x]', 'img[onerror]', 'a[href=javascript:x]', '<script>',
    ]);
  });

  it.each(XSS_PAYLOADS)('renders %j without script, img, on* or unsafe href', (payload) => {
    const html = render(payload);
    expect(dangerous(html), html).toEqual([]);
  });

  it('shows a script tag as visible text', () => {
    const html = render('Before <script>alert("x")</script> after');
    expect(html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;');
    expect(html).not.toContain('<script');
  });

  it('keeps an HTML block as text, entities escaped', () => {
    const html = render('<img src=x onerror="alert(1)">');
    expect(html).toContain('&lt;img src=x onerror=&quot;alert(1)&quot;&gt;');
  });

  it('drops the href of a javascript: link but keeps its words', () => {
    const html = render('[click me](javascript:alert(1))');
    expect(html).toContain('click me');
    expect(html).not.toMatch(/<a\b/);
  });

  it('shows an image as its alt text, not an img element', () => {
    const html = render('![a reactor sketch](https://example.test/r.png)');
    expect(html).toContain('a reactor sketch');
    expect(html).not.toContain('<img');
  });
});

describe('CommentBody: the markdown subset', () => {
  it('renders paragraphs, emphasis, strong, inline code, code blocks, lists and quotes', () => {
    const html = render('First *soft* and **firm** with `K = 1e3`.\n\nSecond\n\n```\nΔG = ΔH − TΔS\n```\n\n- one\n- two\n\n1. a\n2. b\n\n> quoted');
    expect(html).toMatch(/<p[^>]*>First <em>soft<\/em> and <strong>firm<\/strong> with <code[^>]*>K = 1e3<\/code>\.<\/p>/);
    expect(html).toMatch(/<pre[^>]*><code[^>]*>ΔG = ΔH − TΔS\n<\/code><\/pre>/);
    expect(html).toMatch(/<ul[^>]*>\s*<li>one<\/li>\s*<li>two<\/li>\s*<\/ul>/);
    expect(html).toMatch(/<ol[^>]*>\s*<li>a<\/li>\s*<li>b<\/li>\s*<\/ol>/);
    expect(html).toMatch(/<blockquote[^>]*>\s*<p[^>]*>quoted<\/p>\s*<\/blockquote>/);
  });

  it('links http, https and mailto, opening outside the app without an opener', () => {
    const html = render('[data](https://example.test/x) and [ask](mailto:ottilie.marchetti@kestrel-ridge.test) and <http://example.test/y>');
    expect(html).toContain('href="https://example.test/x"');
    expect(html).toContain('href="mailto:ottilie.marchetti@kestrel-ridge.test"');
    expect(html).toContain('href="http://example.test/y"');
    expect(html).toContain('rel="noopener noreferrer nofollow"');
  });

  it('unwraps headings and rules to their text', () => {
    const html = render('# Big title\n\n---\n\ntext');
    expect(html).toContain('Big title');
    expect(html).not.toMatch(/<h1|<hr/);
  });

  it('marks a resolved mention with the member’s name, but not inside code or for unknown handles', () => {
    const mentions = [{ userId: 7, handle: 'hanne.vasquez-lind', name: 'Hanne Vasquez-Lind' }];
    const html = render('Thanks @Hanne.Vasquez-Lind. See `@hanne.vasquez-lind` and ask @nobody', mentions);
    expect(html).toMatch(/<span class="mention[^"]*" title="@hanne.vasquez-lind" data-user-id="7">@Hanne Vasquez-Lind<\/span>\. See/);
    expect(html).toContain('<code class="rounded bg-paper-deep px-0.5 font-mono text-[0.9em]">@hanne.vasquez-lind</code>');
    expect(html).toContain('ask @nobody');
  });
});

describe('safeCommentUrl', () => {
  it.each([
    ['https://example.test/a?b=1', 'https://example.test/a?b=1'],
    ['HTTP://example.test', 'HTTP://example.test'],
    ['mailto:baptiste.osei@kestrel-ridge.test', 'mailto:baptiste.osei@kestrel-ridge.test'],
    ['javascript:alert(1)', ''],
    ['data:text/html,x', ''],
    ['/routes/1', ''],
    ['#top', ''],
    ['ftp://example.test', ''],
  ])('%s → %j', (input, expected) => expect(safeCommentUrl(input)).toBe(expected));
});
