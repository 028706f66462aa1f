import { z } from 'zod';
import { CommentBody } from './comment';
import { StepKey } from './route';

export const FLAG_CATEGORIES = ['thermodynamics', 'safety', 'cost', 'supply', 'other'] as const;
export type FlagCategory = (typeof FLAG_CATEGORIES)[number];

export const FLAG_REASON_MAX_CHARS = 2000;

export const CreateFlagInput = z.strictObject({
  stepKey: StepKey,
  category: z.enum(FLAG_CATEGORIES, { message: `Choose one of: ${FLAG_CATEGORIES.join(', ')}.` }),
  reason: z
    .string({ message: 'Say why the step is weak.' })
    .trim()
    .min(1, { message: 'Say why the step is weak.' })
    .max(FLAG_REASON_MAX_CHARS, { message: `A reason is at most ${FLAG_REASON_MAX_CHARS.toLocaleString('en')} characters.` }),
});
export type CreateFlagInput = z.infer<typeof CreateFlagInput>;

// Clearing a flag always leaves a comment on the step saying why.
export const ClearFlagInput = z.strictObject({ comment: CommentBody });
export type ClearFlagInput = z.infer<typeof ClearFlagInput>;

export const ListFlagsQuery = z.object({ state: z.enum(['open', 'all']).default('open') });
export type ListFlagsQuery = z.infer<typeof ListFlagsQuery>;

export interface FlagDto {
  id: number;
  routeId: number;
  stepKey: string;
  category: FlagCategory;
  reason: string;
  createdBy: { id: number; name: string } | null;
  createdAt: string;
  isOpen: boolean;
  clearedAt: string | null;
  clearedBy: { id: number; name: string } | null;
  clearCommentId: number | null;
}

export interface FlagListDto {
  flags: FlagDto[];
  /** Open flags per step key. */
  openByStep: Record<string, number>;
}
