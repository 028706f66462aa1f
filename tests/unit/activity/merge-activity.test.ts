import { describe, expect, it } from 'vitest';
import { decodeActivityBefore, encodeActivityCursor, ListActivityQuery, type ActivityItem, type ActivityKind } from '@/lib/schemas/activity';
import { compareNewestFirst, isOlderThan, mergeActivity, positionOf, windowFor, type ActivityEntry } from '@/lib/services/activity/merge-activity';
import { markdownToPlain, plainExcerpt } from '@/lib/services/activity/plain-excerpt';

const T0 = Date.parse('2026-12-02T09:00:00.000Z');

function entry(kind: ActivityKind, at: number, seq: number): ActivityEntry {
  return { at, seq, item: { kind, id: `${kind}:${seq}`, at: new Date(at).toISOString(), actor: null, stepKey: null, text: '' } as ActivityItem };
}
const ids = (entries: ActivityEntry[]) => entries.map((e) => e.item.id);

describe('the feed order', () => {
  it('puts later times first, then the later write of one moment (move after its save, flag clear after its comment), then higher row ids', () => {
    const sources = [
      [entry('revision', T0, 7), entry('revision', T0 - 5, 6)],
      [entry('transition', T0, 3)],
      [entry('comment', T0 + 1, 10), entry('comment', T0 + 1, 11)],
      [entry('flag_cleared', T0 - 5, 2)],
    ];
    const { page, hasMore } = mergeActivity(sources, { limit: 10 });
    expect(ids(page)).toEqual(['comment:11', 'comment:10', 'transition:3', 'revision:7', 'flag_cleared:2', 'revision:6']);
    expect(hasMore).toBe(false);
  });

  it('is a total order: no two different entries compare equal', () => {
    const all = [entry('thread_resolved', T0, 1), entry('thread_reopened', T0, 2), entry('flag_raised', T0, 1), entry('flag_cleared', T0, 1)];
    for (const a of all) for (const b of all) if (a !== b) expect(compareNewestFirst(a, b)).not.toBe(0);
  });
});

describe('keyset pages', () => {
  // Many items in one millisecond across kinds: paging by cursor must visit each exactly once, in order.
  const world: ActivityEntry[][] = [
    [entry('revision', T0, 1), entry('revision', T0, 2), entry('revision', T0 - 1, 3)],
    [entry('transition', T0, 1), entry('transition', T0, 4)],
    [entry('comment', T0, 5), entry('comment', T0, 6), entry('comment', T0 + 2, 7)],
    [entry('thread_resolved', T0, 8), entry('thread_reopened', T0, 9)],
    [entry('flag_raised', T0, 1)],
    [entry('flag_cleared', T0, 1)],
  ];
  const everything = world.flat().sort(compareNewestFirst);

  // What a source query returns: its newest `take` rows inside the window for its rank.
  function query(rows: ActivityEntry[], before: ReturnType<typeof decodeActivityBefore> | undefined, take: number) {
    const rank = { revision: 1, transition: 2, comment: 3, flag_cleared: 4, flag_raised: 5, thread_resolved: 6, thread_reopened: 6 }[rows[0]!.item.kind];
    const w = windowFor(rank, before ?? undefined);
    return rows
      .filter((r) => !w || (w.mode === 'atOrBefore' ? r.at <= w.at.getTime() : w.mode === 'before' ? r.at < w.at.getTime() : r.at < w.at.getTime() || (r.at === w.at.getTime() && r.seq < w.seq)))
      .sort(compareNewestFirst)
      .slice(0, take);
  }

  for (const limit of [1, 2, 3, 5, 13, 20]) {
    it(`visits every entry once, in order, with pages of ${limit}`, () => {
      const seen: string[] = [];
      let before: ReturnType<typeof decodeActivityBefore> | undefined;
      for (let guard = 0; guard < 50; guard += 1) {
        const { page, last, hasMore } = mergeActivity(world.map((rows) => query(rows, before, limit + 1)), { before: before ?? undefined, limit });
        seen.push(...ids(page));
        if (!hasMore) break;
        before = decodeActivityBefore(encodeActivityCursor(positionOf(last!)));
        expect(before).not.toBeNull();
      }
      expect(seen).toEqual(ids(everything));
    });
  }

  it('a bare time lets through only what is strictly older', () => {
    const before = decodeActivityBefore('2026-12-02T09:00:00.000Z')!;
    expect(before).toEqual({ at: T0, kind: null, seq: 0 });
    expect(isOlderThan(entry('thread_resolved', T0, 1), before)).toBe(false);
    expect(isOlderThan(entry('revision', T0, 1), before)).toBe(false);
    expect(isOlderThan(entry('revision', T0 - 1, 1), before)).toBe(true);
    expect(ids(mergeActivity(world, { before, limit: 50 }).page)).toEqual(['revision:3']);
  });
});

describe('the before parameter', () => {
  it('round-trips a cursor and accepts zoned ISO times', () => {
    const cursor = encodeActivityCursor({ at: T0, kind: 'flag_cleared', seq: 42 });
    expect(cursor).toBe('2026-12-02T09:00:00.000Z~flag_cleared~42');
    expect(decodeActivityBefore(cursor)).toEqual({ at: T0, kind: 'flag_cleared', seq: 42 });
    expect(decodeActivityBefore('2026-12-02T10:00:00+01:00')).toEqual({ at: T0, kind: null, seq: 0 });
  });

  it.each(['yesterday', '2026-12-02', '2026-12-02T09:00:00', '2026-12-02T09:00:00.000Z~nonsense~1', '2026-12-02T09:00:00.000Z~comment~x', '2026-12-02T09:00:00.000Z~comment~1~2'])(
    'refuses %s',
    (raw) => {
      expect(decodeActivityBefore(raw)).toBeNull();
      expect(ListActivityQuery.safeParse({ before: raw }).success).toBe(false);
    },
  );

  it('limits pages to 1–100 and defaults to 50', () => {
    expect(ListActivityQuery.parse({})).toEqual({ before: undefined, limit: 50 });
    expect(ListActivityQuery.parse({ limit: '100' }).limit).toBe(100);
    expect(ListActivityQuery.safeParse({ limit: '101' }).success).toBe(false);
    expect(ListActivityQuery.safeParse({ limit: '0' }).success).toBe(false);
  });
});

describe('comment excerpts', () => {
  it('drops markdown markup and keeps the words, code and formulas', () => {
    expect(markdownToPlain('**Check** the _pressure_ on [s1](https://example.test/s1) and `CH3OH(g)`.\n\n> quoted\n- item')).toBe(
      'Check the pressure on s1 and CH3OH(g). quoted item',
    );
    expect(markdownToPlain('```text\nT = 1100 K\n```\nthen cool')).toBe('T = 1100 K then cool');
    expect(markdownToPlain('keep snake_case_names, \\*literal stars\\* and [a ref][r]\n\n[r]: https://example.test')).toBe('keep snake_case_names, *literal stars* and a ref');
    expect(markdownToPlain('*nested **strong** words*  \nnext line')).toBe('nested strong words next line');
    expect(markdownToPlain('CH**3**OH and H~2~O')).toBe('CH3OH and H~2~O');
    // Raw HTML stays as text, as the comment renderer shows it.
    expect(markdownToPlain('is <b>1100 K</b> safe?')).toBe('is <b>1100 K</b> safe?');
  });

  it('cuts at a word near 160 characters with an ellipsis, and leaves short text alone', () => {
    const long = 'word '.repeat(60);
    const cut = plainExcerpt(long);
    expect(cut.length).toBeLessThanOrEqual(160);
    expect(cut.endsWith('word…')).toBe(true);
    expect(plainExcerpt('short')).toBe('short');
    expect(plainExcerpt('x'.repeat(300)).length).toBe(160);
  });
});
