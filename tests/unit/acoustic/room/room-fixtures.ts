// Rooms shared by the room, risk and treatment tests (invented).
import type { RoomInput, RoomSurfaces } from '@/lib/acoustic';

export const uniformSurfaces = (absorption: number): RoomSurfaces => {
  const bands = Array.from({ length: 8 }, () => absorption);
  return { floor: bands, ceiling: bands, wallXMin: bands, wallXMax: bands, wallYMin: bands, wallYMax: bands };
};

export const meetingRoom: RoomInput = {
  box: { lengthM: 5, widthM: 4, heightM: 3, speedOfSoundMps: 343 },
  surfaces: uniformSurfaces(0.2),
  criterionNc: 30,
  outlet: { xM: 2.5, yM: 2, zM: 3 },
  listener: { xM: 2.5, yM: 2, zM: 1 },
};
