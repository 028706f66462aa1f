import { z } from 'zod';

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

export const ActiveTeamInput = z.strictObject({ teamId: z.number().int().positive() });
