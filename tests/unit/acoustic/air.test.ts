import { describe, it } from 'vitest';
import { airDensity, characteristicImpedance, speedOfSound } from '@/lib/acoustic';
import { expectClose } from './tolerance';

describe('air', () => {
  // ISO 9613-1 (1993) reference form c = 343.2 sqrt(T / 293.15), T in kelvin; values recomputed here.
  it.each([20, 0, 30, -10])('speed of sound at %s °C follows ISO 9613-1', (temperatureC) => {
    const expected = 343.2 * Math.sqrt((temperatureC + 273.15) / 293.15);
    expectClose(speedOfSound(temperatureC), expected, 1e-9, `c(${temperatureC} °C)`);
  });

  it('speed of sound matches the rounded sheet values (ISO 9613-1)', () => {
    expectClose(speedOfSound(20), 343.2, 0.005, 'c(20 °C)');
    expectClose(speedOfSound(0), 331.29, 0.005, 'c(0 °C)');
    expectClose(speedOfSound(30), 349.0, 0.005, 'c(30 °C)');
    expectClose(speedOfSound(-10), 325.17, 0.005, 'c(-10 °C)');
  });

  it('agrees with the older form 331.3 sqrt(1 + t/273.15) within 0.05 % (from memory)', () => {
    for (const temperatureC of [-20, 0, 20, 40]) {
      const older = 331.3 * Math.sqrt(1 + temperatureC / 273.15);
      expectClose(speedOfSound(temperatureC) / older, 1, 5e-4, `ratio at ${temperatureC} °C`);
    }
  });

  it('density is p / (R T) with R = 287.05 J/(kg·K) (ideal gas; R from memory)', () => {
    const expected = 101325 / (287.05 * 293.15);
    expectClose(airDensity(20), expected, 1e-12, 'rho(20 °C)');
    expectClose(airDensity(20), 1.2041, 1e-4, 'rho(20 °C) rounded');
  });

  it('characteristic impedance rho c is about 413.3 Pa·s/m at 20 °C (textbooks round to 415, from memory)', () => {
    expectClose(characteristicImpedance(20), (101325 / (287.05 * 293.15)) * 343.2, 1e-9, 'rho c');
    expectClose(characteristicImpedance(20), 413.3, 0.05, 'rho c rounded');
    expectClose(characteristicImpedance(20), 415, 2, 'textbook rounding');
  });
});
