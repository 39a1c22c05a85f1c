// Units at the edges: lengths and temperatures typed and shown in SI or imperial.
export { parseLength, formatLength, defaultLengthUnit, keptLength } from './units/length';
export { plausibilityWarning, type LengthUse } from './units/plausible-length';
export { formatSpeed } from './units/speed';
export { gridStepM, gridStepWords } from './units/grid-step';
export type { LengthUnit, UnitSystem, LengthKind, ParseLengthOptions, ParsedLength } from './units/length';
export { parseTemperature, formatTemperature, fahrenheitToCelsius, celsiusToFahrenheit } from './units/temperature';
export type { TemperatureUnit, ParsedTemperature } from './units/temperature';
