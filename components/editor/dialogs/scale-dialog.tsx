'use client';

import { useState } from 'react';
import { distancePx, MAX_METRES_PER_PIXEL, metresPerPixelSchema, MIN_METRES_PER_PIXEL, type Point } from '@/lib/plan';
import { defaultLengthUnit, parseLength } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';
import { UnitHint } from '../panels/unit-hint';

interface ScaleDialogProps {
  points: [Point, Point];
  unitSystem: UnitSystem;
  onApply: (metresPerPixel: number) => void;
  onCancel: () => void;
}

// After two clicks: the real distance between them sets the plan's scale.
export function ScaleDialog({ points, unitSystem, onApply, onCancel }: ScaleDialogProps) {
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const pixels = distancePx(points[0], points[1]);
  // The same reading as every length field: a bare number in the person's unit for distances.
  const defaultUnit = defaultLengthUnit(unitSystem, 'run');

  function apply() {
    if (pixels < 2) { setError('The two points are too close together; click two points further apart.'); return; }
    const parsed = parseLength(text, { defaultUnit });
    if (!parsed.ok) { setError(parsed.message); return; }
    const metresPerPixel = parsed.valueM / pixels;
    if (!metresPerPixelSchema.safeParse(metresPerPixel).success) {
      setError(`That makes ${metresPerPixel.toPrecision(3)} m per pixel; a plan's scale must be between ${MIN_METRES_PER_PIXEL * 1000} mm and ${MAX_METRES_PER_PIXEL} m per pixel. Check the distance and its unit.`);
      return;
    }
    onApply(metresPerPixel);
  }

  return (
    <div role="dialog" aria-modal="true" aria-labelledby="scale-title" className="panel absolute left-1/2 top-6 z-30 w-80 -translate-x-1/2 p-4">
      <h2 id="scale-title" className="text-sm font-semibold">Set the scale</h2>
      <p className="mt-1 text-xs text-graphite-500">Real distance between the two points you clicked ({pixels.toFixed(0)} px on the plan), e.g. “12 m” or “40 ft”; a number alone is read in {defaultUnit}.</p>
      <form className="mt-3 space-y-2" onSubmit={(event) => { event.preventDefault(); apply(); }}>
        <label htmlFor="scale-distance" className="sr-only">Real distance</label>
        <div className="relative">
          <input id="scale-distance" autoFocus className="field-input mt-0 pr-9" value={text} placeholder={`in ${defaultUnit}`} onChange={(event) => setText(event.target.value)}
            aria-invalid={error ? true : undefined} aria-describedby="scale-distance-unit" />
          <UnitHint id="scale-distance-unit" unit={defaultUnit} text={text} />
        </div>
        {error && <p role="alert" className="text-xs text-risk-ink">{error}</p>}
        <div className="flex gap-2">
          <button type="submit" className="btn-primary">Set scale</button>
          <button type="button" className="btn-quiet" onClick={onCancel}>Cancel</button>
        </div>
      </form>
    </div>
  );
}
