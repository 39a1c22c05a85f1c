// Numbers as shown to people: a negative one with the typographic minus sign "−" (U+2212), never a
// hyphen, and never "−0.0" for a value that rounds to zero.

const MINUS = '\u2212';

/** value.toFixed(decimals) with "−" for a minus; a value that rounds to zero shows without a sign. */
export function signedFixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toFixed(decimals);
  if (/^-0(\.0+)?$/.test(text)) return text.slice(1);
  return text.startsWith('-') ? `${MINUS}${text.slice(1)}` : text;
}

/** With a plus sign for a positive value too ("+1.5", "−2.0", "0.0"), for changes and differences. */
export function changeFixed(value: number, decimals: number): string {
  const text = signedFixed(value, decimals);
  return value > 0 && !/^0(\.0+)?$/.test(text) ? `+${text}` : text;
}
