import { z } from 'zod';

export const DriverInput = z.strictObject({
  name: z.string().trim().min(1, { message: 'Name the driver reaction.' }).max(160),
  equation: z.string().trim().min(3, { message: 'Enter a balanced equation.' }).max(500),
  basis: z.string().trim().max(300).default(''),
});
export type DriverInput = z.infer<typeof DriverInput>;
