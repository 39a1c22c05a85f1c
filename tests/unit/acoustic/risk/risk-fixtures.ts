// A run whose third resonance sits on a 240 Hz blade-pass tone (invented).
import type { RiskInput, RunInput } from '@/lib/acoustic';

// closed–closed, f_n = n c / 2L (Kinsler & Frey ch. 10): L = 3 c / (2 * 241.2 Hz) puts f_3 near 241 Hz
const speedMps = 343.2;
const totalLengthM = (3 * speedMps) / (2 * 241.2);

export const toneRun: RunInput = {
  segments: [
    { lengthM: 0.6 * totalLengthM, section: { shape: 'round', diameterM: 0.2 } },
    { lengthM: 0.4 * totalLengthM, section: { shape: 'round', diameterM: 0.2 } },
  ],
  start: { kind: 'closed' },
  end: { kind: 'closed' },
  maxHz: 400,
};

/** 12 blades at 1200 rpm: 240 Hz (common practice, no source). */
export const toneInput: RiskInput = { run: toneRun, fan: { blades: 12, rpm: 1200, harmonics: 1 } };
