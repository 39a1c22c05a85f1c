'use client';

import { useId } from 'react';
import type { RoomCorrectionChoice } from '@/lib/plan';

const CHOICES: { value: RoomCorrectionChoice; label: string; hint: string }[] = [
  { value: 'furnished', label: 'Furnished', hint: "Schultz's relation: offices, meeting rooms, classrooms with furniture and people" },
  { value: 'bare', label: 'Bare', hint: "The room equation with this room's own surfaces and air: empty halls, plant rooms, hard unfurnished rooms" },
];

// How the level at a listener follows from the sound power into the room, chosen per room.
export function RoomCorrectionField({ value, onChange }: { value: RoomCorrectionChoice | undefined; onChange: (choice: RoomCorrectionChoice) => void }) {
  const name = useId();
  const chosen = value ?? 'furnished';
  return (
    <fieldset data-testid="room-correction">
      <legend className="mb-1 text-xs font-semibold">Room correction</legend>
      <div className="space-y-1">
        {CHOICES.map((choice) => (
          <label key={choice.value} className="flex items-start gap-2 text-xs">
            <input type="radio" name={name} value={choice.value} checked={chosen === choice.value} onChange={() => onChange(choice.value)} className="mt-0.5" />
            <span><span className="font-medium">{choice.label}</span> <span className="text-graphite-500">— {choice.hint}</span></span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
