// The header of an octave-band column: "63 Hz (dB)", "1000 Hz (dB)"; numbers with no thousands separator.

export function bandHeader(hz: number, unit: string, what = ''): string {
  return `${what}${what ? ' at ' : ''}${hz} Hz (${unit})`;
}
