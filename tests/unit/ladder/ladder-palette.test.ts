import { describe, expect, it } from 'vitest';
import { LADDER_COLOURS } from '@/components/ladder/ladder-palette';
import config from '@/tailwind.config';

type Colours = Record<string, string | Record<string, string>>;

describe('ladder palette', () => {
  it('uses exactly the hues of tailwind.config.ts (the export cannot read Tailwind classes)', () => {
    const c = config.theme?.extend?.colors as Colours;
    const pick = (name: string, shade = 'DEFAULT'): string => {
      const v = c[name];
      return typeof v === 'string' ? v : v![shade]!;
    };
    expect(LADDER_COLOURS).toMatchObject({
      paper: pick('paper'),
      paperDeep: pick('paper', 'deep'),
      paperEdge: pick('paper', 'edge'),
      ink: pick('ink'),
      inkSoft: pick('ink', 'soft'),
      inkFaint: pick('ink', 'faint'),
      brass: pick('brass', '500'),
      brassLight: pick('brass', '100'),
      brassDeep: pick('brass', '700'),
      downhill: pick('downhill'),
      downhillBg: pick('downhill', 'bg'),
      marginal: pick('marginal'),
      marginalBg: pick('marginal', 'bg'),
      uphill: pick('uphill'),
      uphillBg: pick('uphill', 'bg'),
    });
    expect([LADDER_COLOURS.downhill, LADDER_COLOURS.marginal, LADDER_COLOURS.uphill]).toEqual(['#2e6b5a', '#a06a12', '#a33b2b']);
  });
});
