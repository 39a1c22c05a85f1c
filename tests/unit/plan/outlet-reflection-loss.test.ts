// The end reflection loss of each outlet of a plan. Expected values worked by hand from ASHRAE RP-1314
// (2007) as the engine codes it (from memory): ERL = 10 log10[1 + (a1 c / (π f D))^2], a1 = 0.7 flush,
// 1.0 free; c = 331.3 √(1 + t / 273.15) m/s (ISO 9613-1 near room temperature, from memory).
import { describe, expect, it } from 'vitest';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { outletReflectionLosses } from '@/lib/plan/outlet-reflection-loss';
import { expectClose } from '../acoustic/tolerance';

describe('outlet end reflection loss', () => {
  const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });

  it('finds both flanged Ø315 ceiling outlets of the demo run, each feeding the recital room, and not the closed start', () => {
    const outlets = outletReflectionLosses(doc);
    expect(outlets.map((outlet) => [outlet.label, outlet.mounting, outlet.rooms])).toEqual([['A3 end', 'flush', ['Recital room']], ['A5 end', 'flush', ['Recital room']]]);
    expect(outlets[0].diameterM).toBe(0.315);
  });

  it('at 63 Hz a flush Ø315 outlet in 16 °C air reflects about 11.9 dB (by hand: c = 340.9 m/s, 0.7·340.9/(π·63·0.315) = 3.83, 10 log(1 + 14.66) = 11.95)', () => {
    const [outlet] = outletReflectionLosses(doc);
    expectClose(outlet.erlDb[0], 11.95, 0.05, 'ERL at 63 Hz');
    // 8 kHz: 0.7·340.9/(π·8000·0.315) = 0.0301, 10 log(1 + 0.000908) = 0.004 dB
    expectClose(outlet.erlDb[7], 0.004, 0.001, 'ERL at 8 kHz');
  });

  it('an unflanged open end is free-hanging and a rectangular one is taken as the round one of equal area', () => {
    const rectangular = {
      ...doc,
      segments: doc.segments.map((segment) => (segment.id === 'recital-drop' ? { ...segment, section: { shape: 'rect' as const, widthM: 0.4, heightM: 0.25 } } : segment)),
      runs: doc.runs.map((run) => ({ ...run, terminations: { ...run.terminations, 'recital-outlet': { kind: 'open' as const, flange: 'unflanged' as const } } })),
    };
    const [outlet] = outletReflectionLosses(rectangular);
    // D = √(4 · 0.4 · 0.25 / π) = 0.3568 m; 1.0·340.9/(π·125·0.3568) = 2.433, 10 log(1 + 5.920) = 8.40 dB
    expectClose(outlet.diameterM, 0.3568, 0.0001, 'equal-area diameter');
    expect(outlet.mounting).toBe('free');
    expectClose(outlet.erlDb[1], 8.40, 0.05, 'ERL at 125 Hz');
  });

  it('a closed end feeding no room is not an outlet', () => {
    const closed = { ...doc, rooms: [], runs: doc.runs.map((run) => ({ ...run, terminations: { ...run.terminations, 'recital-outlet-2': { kind: 'closed' as const } } })) };
    expect(outletReflectionLosses(closed).map((outlet) => outlet.label)).toEqual(['A3 end']);
  });
});
