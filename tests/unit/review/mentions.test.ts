import { describe, expect, it } from 'vitest';
import { handleOf, handlesInText, splitMentions } from '@/lib/review/mentions';
import { resolveMentions } from '@/lib/services/comments/mentions';

const MEMBERS = [
  { userId: 1, email: 'Ottilie.Marchetti@kestrel-ridge.test' },
  { userId: 2, email: 'baptiste.osei@kestrel-ridge.test' },
  { userId: 3, email: 'hanne.vasquez-lind@kestrel-ridge.test' },
];

describe('handles', () => {
  it('are the lower-cased local part of the address', () => {
    expect(handleOf('Ottilie.Marchetti@kestrel-ridge.test')).toBe('ottilie.marchetti');
  });

  it('are found at word starts only, not inside e-mail addresses', () => {
    expect(handlesInText('ask @baptiste.osei, not mail baptiste.osei@kestrel-ridge.test')).toEqual(['baptiste.osei']);
  });

  it('at the end of a sentence are offered with and without the full stop', () => {
    expect(handlesInText('Over to @ottilie.marchetti.')).toEqual(['ottilie.marchetti.', 'ottilie.marchetti']);
  });
});

describe('resolveMentions', () => {
  it('resolves handles case-insensitively to members, once each, in order', () => {
    expect(resolveMentions('@Hanne.Vasquez-Lind and @OTTILIE.MARCHETTI, again @hanne.vasquez-lind', MEMBERS)).toEqual([
      { userId: 3, handle: 'hanne.vasquez-lind' },
      { userId: 1, handle: 'ottilie.marchetti' },
    ]);
  });

  it('drops handles that name no member', () => {
    expect(resolveMentions('@someone.else and @baptiste', MEMBERS)).toEqual([]);
  });

  it('ignores handles inside inline code and code blocks', () => {
    expect(resolveMentions('`@baptiste.osei`\n\n```\n@hanne.vasquez-lind\n```\n\n    @ottilie.marchetti', MEMBERS)).toEqual([]);
  });

  it('finds handles in emphasis, lists and quotes', () => {
    expect(resolveMentions('- *@baptiste.osei*\n\n> @hanne.vasquez-lind.', MEMBERS).map((m) => m.userId)).toEqual([2, 3]);
  });

  it('links nobody for a handle two members share', () => {
    const twins = [...MEMBERS, { userId: 4, email: 'baptiste.osei@elsewhere.test' }];
    expect(resolveMentions('@baptiste.osei', twins)).toEqual([]);
  });
});

describe('splitMentions', () => {
  it('splits out known handles and keeps the rest as text', () => {
    expect(splitMentions('hi @Baptiste.Osei. and @x', ['baptiste.osei'])).toEqual([
      { text: 'hi ' },
      { text: '@Baptiste.Osei', handle: 'baptiste.osei' },
      { text: '. and @x' },
    ]);
  });

  it('returns the text whole when there are no handles', () => {
    expect(splitMentions('plain @text', [])).toEqual([{ text: 'plain @text' }]);
  });
});
