import { AppError } from '../../api/errors';

// A path id that is not a positive integer names nothing.
export function positiveId(raw: string | undefined): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) throw new AppError('NOT_FOUND', 'No such revision of this route.');
  return id;
}
