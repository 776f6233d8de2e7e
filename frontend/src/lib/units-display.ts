import type { LengthUnit, PressureUnit, TemperatureUnit } from '@shared/schemas/auth.schema';

export interface UnitOption<U extends string> {
  value: U;
  symbol: string;
  name: string;
}

export const PRESSURE_UNIT_OPTIONS: UnitOption<PressureUnit>[] = [
  { value: 'kPa', symbol: 'kPa', name: 'Kilopascal' },
  { value: 'bar', symbol: 'bar', name: 'Bar' },
  { value: 'psi', symbol: 'psi', name: 'Pounds per square inch' },
];

export const LENGTH_UNIT_OPTIONS: UnitOption<LengthUnit>[] = [
  { value: 'mm', symbol: 'mm', name: 'Millimetres' },
  { value: 'in', symbol: 'in', name: 'Inches' },
];

export const TEMPERATURE_UNIT_OPTIONS: UnitOption<TemperatureUnit>[] = [
  { value: 'C', symbol: '°C', name: 'Degrees Celsius' },
  { value: 'F', symbol: '°F', name: 'Degrees Fahrenheit' },
];

const symbolOf = <U extends string>(options: UnitOption<U>[], value: U) => options.find((o) => o.value === value)?.symbol ?? value;

export const pressureSymbol = (unit: PressureUnit) => symbolOf(PRESSURE_UNIT_OPTIONS, unit);
export const lengthSymbol = (unit: LengthUnit) => symbolOf(LENGTH_UNIT_OPTIONS, unit);
export const temperatureSymbol = (unit: TemperatureUnit) => symbolOf(TEMPERATURE_UNIT_OPTIONS, unit);
