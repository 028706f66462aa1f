// The display formatters live in lib/format (one place for every view, server text included); this module keeps
// the names the ladder, the board and the panels have always imported.
export {
  KELVIN_AT_ZERO_CELSIUS,
  KJ_PER_KCAL,
  energyFromKJ,
  energyToKJ,
  energyUnitLabel,
  formatEnergy,
  formatEnergyValue,
  formatTemperature,
  formatTemperatureChange,
  temperatureFromK,
  temperatureQuantity,
  temperatureToK,
  temperatureUnitLabel,
  type EnergyUnit,
  type TemperatureUnit,
} from '@/lib/format/units';
export { formatSigned, formatFold, formatConstant, formatSignificant as formatNumber } from '@/lib/format/numbers';
