// Air temperatures typed in °C or °F ("20", "20 °C", "68 F", "-5,5 °C"), kept in °C.
import { MAX_TEMPERATURE_C, MIN_TEMPERATURE_C } from '../schema';
import type { UnitSystem } from './length';

export type TemperatureUnit = 'C' | 'F';
export type ParsedTemperature = { ok: true; valueC: number; understood: string } | { ok: false; message: string };

/** t/°C = (t/°F − 32) / 1.8 (NIST SP 811, appendix B). */
export function fahrenheitToCelsius(valueF: number): number {
  return (valueF - 32) / 1.8;
}

export function celsiusToFahrenheit(valueC: number): number {
  return valueC * 1.8 + 32;
}

const TEMPERATURE = /^\s*([+\-\u2212]?\d+(?:[.,]\d+)?)\s*(?:°\s*)?(c|f|degc|degf|celsius|fahrenheit)?\s*$/i;

export function parseTemperature(text: string, options: { defaultUnit: TemperatureUnit }): ParsedTemperature {
  const match = TEMPERATURE.exec(text);
  if (!match) return { ok: false, message: `"${text.trim()}" is not a temperature; type for example 20 °C or 68 °F.` };
  const value = Number(match[1].replace(',', '.').replace('\u2212', '-'));
  const unitText = (match[2] ?? options.defaultUnit).toLowerCase();
  const unit: TemperatureUnit = unitText.startsWith('f') || unitText === 'degf' ? 'F' : 'C';
  const valueC = unit === 'C' ? value : fahrenheitToCelsius(value);
  if (valueC < MIN_TEMPERATURE_C || valueC > MAX_TEMPERATURE_C) return { ok: false, message: `The air temperature must be between ${MIN_TEMPERATURE_C} °C and ${MAX_TEMPERATURE_C} °C.` };
  const understood = unit === 'C' ? `${value} °C` : `${value} °F (${valueC.toFixed(1)} °C)`;
  return { ok: true, valueC, understood };
}

/** One decimal, in °C (SI) or °F (imperial). */
export function formatTemperature(valueC: number, system: UnitSystem): string {
  if (!Number.isFinite(valueC)) return '—';
  const shown = system === 'si' ? valueC : celsiusToFahrenheit(valueC);
  return `${shown.toFixed(1).replace('-', '\u2212')} °${system === 'si' ? 'C' : 'F'}`;
}
