'use client';

import type { Reflection } from '@/lib/acoustic';
import { reflectionKindWords } from '@/lib/plan/reflection-words';
import { signedFixed } from '@/lib/signed-number';

// |R| per octave band at each discontinuity, with the phase in degrees on hover and in words for readers.
export function ReflectionTable({ reflections, formatPosition, placeName }: { reflections: Reflection[]; formatPosition: (metres: number) => string; placeName?: (atM: number, kind: string) => string | null }) {
  const bands = reflections[0]?.bands.map((band) => band.hz) ?? [];
  if (reflections.length === 0 || bands.length === 0) return <p className="text-sm text-graphite-500">No octave band lies below the cut-off.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-xs" aria-label="Reflections by octave band">
        <thead>
          <tr className="border-b border-graphite-100 text-left text-graphite-500">
            <th scope="col" className="py-1 pr-2 font-medium">Where</th>
            {bands.map((hz) => <th key={hz} scope="col" className="num py-1 pr-1 text-right font-medium">{hz >= 1000 ? `${hz / 1000}k` : hz}</th>)}
          </tr>
        </thead>
        <tbody>
          {reflections.map((reflection, index) => (
            <tr key={`${reflection.kind}-${index}`} className="border-b border-graphite-100">
              <th scope="row" className="py-1 pr-2 text-left font-normal">
                {reflectionKindWords(reflection.kind)}{placeName?.(reflection.atM, reflection.kind) ? <span className="num"> {placeName(reflection.atM, reflection.kind)}</span> : null} <span className="num text-graphite-500">{formatPosition(reflection.atM)}</span>
              </th>
              {reflection.bands.map((band) => {
                const degrees = (band.phaseRad * 180) / Math.PI;
                return (
                  <td key={band.hz} className="num py-1 pr-1 text-right" title={`|R| ${band.magnitude.toFixed(3)}, phase ${signedFixed(degrees, 0)}°`}>
                    {Math.abs(degrees) > 90 ? '−' : ''}{band.magnitude.toFixed(2)}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-graphite-500">|R| of the pressure wave, Hz across; “−” marks an inverted reflection (phase beyond ±90°).</p>
    </div>
  );
}
