// Units at the edges: lengths and temperatures typed and shown in SI or imperial.
export { parseLength, formatLength } from './units/length';
export type { LengthUnit, UnitSystem, LengthKind, ParseLengthOptions, ParsedLength } from './units/length';
export { parseTemperature, formatTemperature, fahrenheitToCelsius, celsiusToFahrenheit } from './units/temperature';
export type { TemperatureUnit, ParsedTemperature } from './units/temperature';
