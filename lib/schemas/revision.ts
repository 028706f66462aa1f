import { z } from 'zod';

export const ListRevisionsQuery = z.object({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListRevisionsQuery = z.infer<typeof ListRevisionsQuery>;

const RevisionId = z.coerce.number({ message: 'Give a revision id.' }).int().positive({ message: 'Give a revision id.' });

export const CompareRevisionsQuery = z.object({ from: RevisionId, to: RevisionId });
export type CompareRevisionsQuery = z.infer<typeof CompareRevisionsQuery>;

export const RestoreRevisionInput = z.strictObject({ version: z.number().int().positive() });
export type RestoreRevisionInput = z.infer<typeof RestoreRevisionInput>;
