import type { StepFlag } from '../../../db/models/step-flag';
import type { FlagDto } from '../../schemas/flag';

export function toFlagDto(flag: StepFlag, names: Map<number, string>): FlagDto {
  const person = (id: number | null | undefined) => (typeof id === 'number' && names.has(id) ? { id, name: names.get(id)! } : null);
  return {
    id: flag.id,
    routeId: flag.routeId,
    stepKey: flag.stepKey,
    category: flag.category,
    reason: flag.reason,
    createdBy: person(flag.createdById),
    createdAt: flag.createdAt.toISOString(),
    isOpen: flag.clearedAt == null,
    clearedAt: flag.clearedAt?.toISOString() ?? null,
    clearedBy: person(flag.clearedById),
    clearCommentId: flag.clearCommentId ?? null,
  };
}

export function flagUserIds(flags: StepFlag[]): number[] {
  return flags.flatMap((f) => [f.createdById, f.clearedById]).filter((id): id is number => typeof id === 'number');
}
