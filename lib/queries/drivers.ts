import { queryOptions } from '@tanstack/react-query';
import type { DriverDto } from '../services/drivers/list-drivers';
import { apiFetch } from './api-fetch';
import { routeKeys } from './routes';

export const driversQuery = () =>
  queryOptions({
    queryKey: routeKeys.drivers(),
    queryFn: () => apiFetch<{ drivers: DriverDto[] }>('/api/drivers').then((r) => r.drivers),
  });
