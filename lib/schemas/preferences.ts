import { z } from 'zod';
import { NotificationMutes } from './notification';

export const ENERGY_UNITS = ['kJ', 'kcal'] as const;
export const TEMPERATURE_UNITS = ['K', 'degC'] as const;
export const PRESSURE_UNITS = ['bar', 'atm', 'kPa'] as const;

export type EnergyUnit = (typeof ENERGY_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export type PressureUnit = (typeof PRESSURE_UNITS)[number];

export const PreferencesInput = z.strictObject({
  energyUnit: z.enum(ENERGY_UNITS),
  temperatureUnit: z.enum(TEMPERATURE_UNITS),
  pressureUnit: z.enum(PRESSURE_UNITS),
});
export type PreferencesInput = z.infer<typeof PreferencesInput>;

// What PATCH /api/me/preferences takes: any of the units, any of the e-mail mutes and the caution's fold, at least one field.
export const PreferencesPatch = PreferencesInput.partial()
  .extend({
    notificationMutes: NotificationMutes.partial().optional(),
    cautionCollapsed: z.boolean({ message: 'cautionCollapsed is true or false.' }).optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Send at least one preference.', path: ['_'] });
export type PreferencesPatch = z.infer<typeof PreferencesPatch>;

export const ActiveTeamInput = z.strictObject({ teamId: z.number().int().positive() });
