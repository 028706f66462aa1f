// The team page on a phone (issue 19): the members table scrolls inside its own named region, not the page, and
// long e-mail addresses may break. Invented demo people.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { MembersTable } from '@/app/(app)/team/members-table';
import { membersQuery } from '@/lib/queries/team';

const MEMBERS = [
  { userId: 1, name: 'Ines Halvorsen', email: 'ines.halvorsen@kestrel-ridge.example', role: 'lead' as const, joinedAt: '2026-01-05T09:00:00.000Z' },
  { userId: 2, name: 'Tomasz Reyes', email: 'tomasz.reyes.process.development@kestrel-ridge.example', role: 'designer' as const, joinedAt: '2026-02-11T09:00:00.000Z' },
];

function render(canManage: boolean): string {
  const client = new QueryClient();
  client.setQueryData(membersQuery(7).queryKey, MEMBERS);
  return renderToStaticMarkup(createElement(QueryClientProvider, { client }, createElement(MembersTable, { teamId: 7, canManage, selfId: 1 })));
}

describe('members table', () => {
  it('sits in a named region that scrolls sideways itself, with the table named by its caption', () => {
    const html = render(true);
    expect(html).toMatch(/<div role="region" aria-label="Members" class="relative overflow-x-auto[^"]*"><table[^>]*><caption class="sr-only">Members<\/caption>/);
    expect(html).toContain('aria-label="Role of Tomasz Reyes"');
  });

  it('lets a long e-mail address break rather than widen the page', () => {
    const html = render(false);
    expect(html).toContain('<td class="break-all px-3 py-2 text-ink-soft">tomasz.reyes.process.development@kestrel-ridge.example</td>');
    expect(html).not.toContain('Role of');
  });
});
