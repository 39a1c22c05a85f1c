'use client';

import type { LengthUnit } from '@/lib/plan/units';

/** Text with no unit of its own: a bare number, read in the field's unit. */
function isBareNumber(text: string): boolean {
  return text.trim() !== '' && !/[a-zµ"'′″]/i.test(text);
}

// The unit a bare number is read in, inside the right end of a length field: shown while the text
// has no unit of its own, and always told to screen readers.
export function UnitHint({ id, unit, text }: { id: string; unit: LengthUnit; text: string }) {
  return (
    <>
      <span id={id} className="sr-only">A number alone is read in {unit}.</span>
      {isBareNumber(text) && (
        <span aria-hidden="true" data-testid="unit-hint" className="pointer-events-none absolute inset-y-0 right-2 flex items-center font-mono text-xs text-graphite-500">{unit}</span>
      )}
    </>
  );
}
