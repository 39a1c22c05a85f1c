// The operating envelope a fan tone sweeps: the fan's speed range and the supply air's temperature range.
// Every natural frequency of a run scales with the speed of sound (all its lengths are fixed), so a
// tone f at speed n and air temperature T meets the run as analysed (at its own temperature T0) at
//   f (n / n0) c(T0) / c(T)
// and the envelope becomes one frequency interval on the analysed run's response.
import { speedOfSound } from '../air';
import { DEFAULT_SPEED_SLIP_PERCENT, DEFAULT_TEMPERATURE_C, DEFAULT_TEMPERATURE_SWING_C } from '../constants';
import { inputError, requireAboveAtMost, requireAtLeast } from '../input-error';
import { MAX_AIR_TEMPERATURE_C, MAX_FAN_RPM, MIN_AIR_TEMPERATURE_C } from '../input-limits';
import type { FanInput, RiskOptions } from './risk-types';

export interface OperatingEnvelope {
  /** The fan's speed range, rpm (the entered range, or the speed ± belt slip). */
  lowRpm: number;
  highRpm: number;
  /** Whether the speed range was entered (false: the default slip). */
  speedRangeEntered: boolean;
  /** The supply air's temperature range, °C. */
  lowTemperatureC: number;
  highTemperatureC: number;
}

const PERCENT = 100;

export function operatingEnvelope(fan: FanInput, runTemperatureC: number = DEFAULT_TEMPERATURE_C, options: RiskOptions = {}): OperatingEnvelope {
  const swingC = requireAtLeast(options.temperatureSwingC ?? DEFAULT_TEMPERATURE_SWING_C, 0, 'options.temperatureSwingC');
  const lowTemperatureC = Math.max(MIN_AIR_TEMPERATURE_C, runTemperatureC - swingC);
  const highTemperatureC = Math.min(MAX_AIR_TEMPERATURE_C, runTemperatureC + swingC);
  const entered = fan.minRpm != null || fan.maxRpm != null;
  if (!entered) {
    const slip = requireAtLeast(options.speedSlipPercent ?? DEFAULT_SPEED_SLIP_PERCENT, 0, 'options.speedSlipPercent') / PERCENT;
    return { lowRpm: fan.rpm * (1 - slip), highRpm: fan.rpm * (1 + slip), speedRangeEntered: false, lowTemperatureC, highTemperatureC };
  }
  const lowRpm = fan.minRpm == null ? fan.rpm : requireAboveAtMost(fan.minRpm, 0, MAX_FAN_RPM, 'fan.minRpm');
  const highRpm = fan.maxRpm == null ? fan.rpm : requireAboveAtMost(fan.maxRpm, 0, MAX_FAN_RPM, 'fan.maxRpm');
  if (lowRpm > highRpm) throw inputError('fan.maxRpm', `must be at least fan.minRpm (${lowRpm})`);
  return { lowRpm, highRpm, speedRangeEntered: true, lowTemperatureC, highTemperatureC };
}

/** The interval, Hz on the run as analysed, that a tone of toneHz at the fan's rated speed sweeps across the envelope. */
export function toneIntervalHz(toneHz: number, ratedRpm: number, envelope: OperatingEnvelope, runTemperatureC: number = DEFAULT_TEMPERATURE_C): [number, number] {
  const referenceMps = speedOfSound(runTemperatureC);
  return [
    toneHz * (envelope.lowRpm / ratedRpm) * (referenceMps / speedOfSound(envelope.highTemperatureC)),
    toneHz * (envelope.highRpm / ratedRpm) * (referenceMps / speedOfSound(envelope.lowTemperatureC)),
  ];
}

/** The interval a fixed frequency (a room mode) sweeps on the run as analysed, with the air's temperature alone. */
export function temperatureIntervalHz(frequencyHz: number, envelope: OperatingEnvelope, runTemperatureC: number = DEFAULT_TEMPERATURE_C): [number, number] {
  const referenceMps = speedOfSound(runTemperatureC);
  return [frequencyHz * (referenceMps / speedOfSound(envelope.highTemperatureC)), frequencyHz * (referenceMps / speedOfSound(envelope.lowTemperatureC))];
}

/** The envelope in words, e.g. "fan 1,411–1,469 rpm (±2 % belt slip), air 15–25 °C". */
export function describeEnvelope(envelope: OperatingEnvelope): string {
  const rpm = (value: number) => Math.round(value).toLocaleString('en-GB');
  const speed = envelope.lowRpm === envelope.highRpm ? `fan ${rpm(envelope.lowRpm)} rpm` : `fan ${rpm(envelope.lowRpm)}–${rpm(envelope.highRpm)} rpm`;
  const slip = envelope.speedRangeEntered ? '' : ' (belt slip)';
  const air = `air ${envelope.lowTemperatureC.toFixed(0)}–${envelope.highTemperatureC.toFixed(0)} °C`;
  return `${speed}${slip}, ${air}`;
}
