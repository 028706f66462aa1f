import { describe, expect, it } from 'vitest';
import { insertMention, mentionCandidates, mentionQueryAt } from '@/lib/review/mention-complete';
import { handlesInText } from '@/lib/review/mentions';

const TEAM = [
  { handle: 'lead', name: 'Ottilie Marchetti' },
  { handle: 'designer', name: 'Baptiste Osei' },
  { handle: 'reviewer', name: 'Hanne Vasquez-Lind' },
  { handle: 'ottilie.m', name: 'Ottilie Mbeki' },
];

describe('mentionQueryAt', () => {
  it('finds the "@..." just before the caret, also a bare "@"', () => {
    expect(mentionQueryAt('ask @ott', 8)).toEqual({ start: 4, query: 'ott' });
    expect(mentionQueryAt('@', 1)).toEqual({ start: 0, query: '' });
    expect(mentionQueryAt('(@han', 5)).toEqual({ start: 1, query: 'han' });
  });

  it('is null inside an e-mail address, after a space, or with the caret elsewhere', () => {
    expect(mentionQueryAt('mail a@b', 8)).toBeNull();
    expect(mentionQueryAt('ask @ott now', 12)).toBeNull();
    expect(mentionQueryAt('ask @ott now', 2)).toBeNull();
  });
});

describe('mentionCandidates', () => {
  it('matches handles first, then any word of the name, ignoring case', () => {
    expect(mentionCandidates(TEAM, 'Ott').map((m) => m.handle)).toEqual(['ottilie.m', 'lead']);
    expect(mentionCandidates(TEAM, 'vasq').map((m) => m.handle)).toEqual(['reviewer']);
    expect(mentionCandidates(TEAM, 'lind').map((m) => m.handle)).toEqual(['reviewer']);
    expect(mentionCandidates(TEAM, 'zzz')).toEqual([]);
  });

  it('offers everyone (up to the limit) for a bare "@"', () => {
    expect(mentionCandidates(TEAM, '', 3)).toHaveLength(3);
  });
});

describe('insertMention', () => {
  it('replaces what was typed with the handle in the syntax the server reads', () => {
    const text = 'please check @vasq';
    const done = insertMention(text, mentionQueryAt(text, text.length)!, text.length, 'reviewer');
    expect(done).toEqual({ text: 'please check @reviewer ', caret: 23 });
    expect(handlesInText(done.text)).toEqual(['reviewer']);
  });

  it('keeps the text after the caret and does not double a space', () => {
    const text = 'hi @de there';
    const done = insertMention(text, mentionQueryAt(text, 6)!, 6, 'designer');
    expect(done.text).toBe('hi @designer there');
    expect(done.caret).toBe(13);
  });
});
