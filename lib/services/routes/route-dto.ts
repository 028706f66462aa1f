import type { Route } from '../../../db/models/route';
import type { StepConditions } from '../../../db/models/step';
import type { LinkInput, StepInput } from '../../schemas/route';

export interface RouteSummaryDto {
  id: number;
  name: string;
  target: string;
  status: string;
  stepCount: number;
  overallDeltaG_kJ: number | null;
  uphillSteps: number | null;
  archived: boolean;
  originRouteId: number | null;
  updatedAt: string;
  updatedBy: string;
}

export interface RouteDocumentDto {
  id: number;
  name: string;
  target: string;
  targetAmount: string;
  status: string;
  version: number;
  marginalThreshold_kJ: number;
  originRouteId: number | null;
  archived: boolean;
  updatedAt: string;
  steps: StepInput[];
  links: LinkInput[];
}

export function toRouteSummary(route: Route, updatedByName: string): RouteSummaryDto {
  return {
    id: route.id,
    name: route.name,
    target: route.target,
    status: route.status,
    stepCount: route.stepCount,
    overallDeltaG_kJ: route.overallDgKj,
    uphillSteps: route.uphillSteps,
    archived: route.archivedAt !== null,
    originRouteId: route.originRouteId,
    updatedAt: route.updatedAt.toISOString(),
    updatedBy: updatedByName,
  };
}

export function toRouteDocument(route: Route, steps: StepInput[], links: LinkInput[]): RouteDocumentDto {
  return {
    id: route.id,
    name: route.name,
    target: route.target,
    targetAmount: route.targetAmount,
    status: route.status,
    version: route.version,
    marginalThreshold_kJ: route.marginalThresholdKj,
    originRouteId: route.originRouteId,
    archived: route.archivedAt !== null,
    updatedAt: route.updatedAt.toISOString(),
    steps,
    links,
  };
}

// Splits an editor step into the row's columns; conditions keep exactly the engine's request fields.
export function stepRow(step: StepInput, routeId: number, sortOrder: number) {
  const { id, equation, yieldPct, notes, position, ...conditions } = step;
  return {
    routeId,
    stepKey: id,
    sortOrder,
    equation,
    conditions: conditions satisfies StepConditions,
    yieldPct,
    notes,
    positionX: position.x,
    positionY: position.y,
  };
}
